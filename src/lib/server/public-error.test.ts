import { describe, expect, it } from 'vitest';
import { GENERIC_SERVER_ERROR, publicError } from './public-error';

describe('publicError', () => {
	it('shows a 5xx as one generic line and a reference; the detail goes to the log only', () => {
		const logged: unknown[][] = [];
		const e = new Error('SQLITE_CORRUPT at /srv/beadline/src/lib/server/db.ts:42');
		const shown = publicError(e, 500, 'Internal Error', (...a) => logged.push(a));
		expect(shown.message).toBe(GENERIC_SERVER_ERROR);
		expect(shown.ref).toMatch(/^[0-9a-f]{8}$/);
		expect(JSON.stringify(shown)).not.toMatch(/SQLITE|\/srv|\.ts:\d+/);
		expect(logged).toEqual([[`[${shown.ref}]`, e]]);
	});

	it('keeps the message of a 4xx and logs nothing', () => {
		const logged: unknown[][] = [];
		const shown = publicError(new Error('x'), 404, 'Not Found', (...a) => logged.push(a));
		expect(shown.message).toBe('Not Found');
		expect(logged).toEqual([]);
	});
});
