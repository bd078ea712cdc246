import { isHttpError } from '@sveltejs/kit';
import { describe, expect, it } from 'vitest';
import { postedForm, UNREADABLE_FORM } from './posted-form';

const post = (body: string, type: string) =>
	new Request('http://localhost/x', { method: 'POST', body, headers: { 'content-type': type } });

describe('postedForm', () => {
	it('reads a well-formed form', async () => {
		const fd = await postedForm(post('a=1&b=two', 'application/x-www-form-urlencoded'));
		expect(fd.get('b')).toBe('two');
	});

	it('answers 400 for a multipart body that is not multipart', async () => {
		const e = await postedForm(post('not multipart', 'multipart/form-data; boundary=x')).catch(
			(x: unknown) => x
		);
		expect(isHttpError(e) && e.status).toBe(400);
		expect(isHttpError(e) && e.body.message).toBe(UNREADABLE_FORM);
	});

	it('answers 400 for a body with no form type at all', async () => {
		const e = await postedForm(post('{}', 'application/json')).catch((x: unknown) => x);
		expect(isHttpError(e) && e.status).toBe(400);
	});
});
