import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ACTION_WORDS, actionWords, objectWords } from './action-labels';

// Every event code the app writes, read from the source: the `action:` of each audit entry (up to
// its objectType), the code handed to changeMember and the `…_AUDIT_CODES` tables of helpers. A new code without words fails here.
function sources(dir: string): string[] {
	return readdirSync(dir, { withFileTypes: true }).flatMap((d) => {
		const p = join(dir, d.name);
		if (d.isDirectory()) return sources(p);
		return d.name.endsWith('.ts') && !d.name.endsWith('.test.ts') ? [p] : [];
	});
}
const CODE = /'([a-z][a-z_-]*\.[a-z][a-z_]*)'/g;

function writtenCodes(): Set<string> {
	const codes = new Set<string>();
	for (const file of sources(join(process.cwd(), 'src'))) {
		const text = readFileSync(file, 'utf8');
		if (!/\baudit\(|changeMember\(/.test(text)) continue;
		for (const m of text.matchAll(/action:([\s\S]{0,300}?)objectType/g))
			for (const c of (m[1] ?? '').matchAll(CODE)) codes.add(c[1]!);
		for (const m of text.matchAll(/changeMember\(([^;]*)/g))
			for (const c of (m[1] ?? '').matchAll(CODE)) codes.add(c[1]!);
	}
	// Codes a helper writes for its caller's step, listed whole in a `…_AUDIT_CODES` table.
	for (const file of sources(join(process.cwd(), 'src'))) {
		const text = readFileSync(file, 'utf8');
		for (const m of text.matchAll(/_AUDIT_CODES = \{([^}]*)\}/g))
			for (const c of (m[1] ?? '').matchAll(CODE)) codes.add(c[1]!);
	}
	return codes;
}

describe('action words', () => {
	const written = writtenCodes();

	it('finds the codes the app writes (the scan itself works)', () => {
		for (const known of [
			'procedure_revision.updated',
			'procedure_revision.approved',
			'procedure_revision.returned',
			'booth_link.reissued',
			'user.role_changed',
			'verification-link.issued'
		])
			expect(written, known).toContain(known);
		expect(written.size).toBeGreaterThan(45);
	});

	it('has words for every code written anywhere, so none reads as a code', () => {
		const missing = [...written].filter((c) => !Object.hasOwn(ACTION_WORDS, c));
		expect(missing).toEqual([]);
	});

	it('has no words for a code nothing writes any more', () => {
		expect(Object.keys(ACTION_WORDS).filter((c) => !written.has(c))).toEqual([]);
	});

	it('reads an unknown code and object type from their own words', () => {
		expect(actionWords('pqr.reopened').label).toBe('Pqr reopened');
		expect(actionWords('').label).toBe('Event');
		expect(objectWords('procedure_revision')).toBe('Procedure revision');
		expect(objectWords('weld_map')).toBe('Weld map');
	});
});
