import { createHash, randomBytes } from 'node:crypto';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { canonicalJson, digestOf, sha256Bytes, sha256Text } from './canonical';

const node = (b: Uint8Array | string) => createHash('sha256').update(b).digest('hex');

describe('canonical JSON', () => {
	it('sorts keys at every depth, keeps array order, has no whitespace', () => {
		expect(canonicalJson({ b: [1, 2.5, 'é', 1e21, 1e-7], a: { y: null, x: true } })).toBe(
			'{"a":{"x":true,"y":null},"b":[1,2.5,"é",1e+21,1e-7]}'
		);
	});

	it('prints numbers as JavaScript does and refuses what JSON cannot carry', () => {
		expect(canonicalJson([0.1 + 0.2, -0, 100, 3.175])).toBe('[0.30000000000000004,0,100,3.175]');
		expect(() => canonicalJson({ a: NaN })).toThrow();
		expect(() => canonicalJson({ a: Infinity })).toThrow();
		expect(() => canonicalJson({ a: () => 1 })).toThrow();
	});

	it('leaves out undefined members and reads the same whatever the insertion order', () => {
		expect(canonicalJson({ a: undefined, b: 1 })).toBe('{"b":1}');
		fc.assert(
			fc.property(fc.dictionary(fc.string(), fc.jsonValue()), (o) => {
				const reversed = Object.fromEntries(Object.entries(o).reverse());
				expect(canonicalJson(reversed)).toBe(canonicalJson(o));
				// Canonical output is valid JSON for the same value.
				expect(canonicalJson(JSON.parse(canonicalJson(o)))).toBe(canonicalJson(o));
			})
		);
	});
});

describe('SHA-256', () => {
	it('matches the FIPS 180-4 example vectors', () => {
		expect(sha256Text('')).toBe('e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855');
		expect(sha256Text('abc')).toBe(
			'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad'
		);
		expect(sha256Text('abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq')).toBe(
			'248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1'
		);
	});

	it('matches a known vector for a canonical document', () => {
		// Computed once with Node's crypto over the canonical text above.
		expect(digestOf({ b: [1, 2.5, 'é', 1e21, 1e-7], a: { y: null, x: true } })).toBe(
			'a23fb4e72803c4126a8285023efc729bc23cb72cd890144be107d169bdaaa883'
		);
	});

	it("agrees with Node's crypto on every length around the block edges and on unicode", () => {
		for (let n = 0; n < 200; n++) {
			const bytes = randomBytes(n);
			expect(sha256Bytes(bytes)).toBe(node(bytes));
		}
		fc.assert(fc.property(fc.string({ unit: 'grapheme' }), (s) => sha256Text(s) === node(s)));
	});
});
