import { describe, expect, it } from 'vitest';
import { codeRule, normaliseCode, thicknessByCode } from './governing-code';

describe('each procedure is judged by its own code', () => {
	it.each([
		['aws-d1.1', 'heatInput', 'GMAW', 'No D1.1 rule modelled for this variable'],
		['aws-d1.1', 'volts', 'GTAW', 'No D1.1 rule modelled'], // D1.1 Table 4.5 7 % voltage: wire processes only
		['iso-15614-1', 'amps', 'GMAW', 'No ISO 15614-1 rule modelled'],
		['shop', 'thickness', 'GTAW', 'no code rule applies']
	])('%s %s (%s) says so plainly', (code, v, p, text) => {
		const r = codeRule(code, v, p);
		expect(r.modelled).toBe(false);
		expect(!r.modelled && r.message).toContain(text);
	});
	it.each([
		['asme-ix', 'heatInput', 'QW-409.1'],
		['AWS D1.1', 'volts', 'Table 4.5'],
		['ISO 15609-1', 'heatInput', '8.4.7']
	])('%s %s -> %s', (code, v, rule) => {
		const r = codeRule(code, v, 'GMAW');
		expect(r.modelled && r.rule).toContain(rule);
	});
	it('reads the ways a code is written', () => {
		expect(normaliseCode('ISO 9606-1')).toBe('iso-15614-1');
		expect(normaliseCode('asme ix')).toBe('asme-ix');
		expect(normaliseCode('nope')).toBeNull();
	});
});

describe('the thickness a 6 mm short-circuit GMAW coupon qualifies, code by code', () => {
	it('ASME IX: QW-403.10 1.1T; D1.1: Table 4.2 1/8 in to 2T; ISO: Table 7 3 to 2t', () => {
		const asme = thicknessByCode('asme-ix', 6, { transfer: 'short-circuit' });
		const d11 = thicknessByCode('aws-d1.1', 6, { transfer: 'short-circuit' });
		const iso = thicknessByCode('iso-15614-1', 6);
		expect(asme).toMatchObject({ ok: true, minMm: 1.5, maxMm: 6.6 }); // QW-451.1 1/16 in (1.5 mm); QW-403.10 1.1T (API RP 577 11.3)
		expect(d11).toMatchObject({ ok: true, minMm: 3.175, maxMm: 12 }); // D1.1 Table 4.2, 1/8 in = 3.175 mm // from memory
		expect(iso).toMatchObject({ ok: true, minMm: 3, maxMm: 12 }); // ISO 15614-1:2017 Table 7: 3 < t <= 12, 3 to 2t
		expect(d11.ok && d11.rule).not.toContain('QW');
	});
	it('shop practice has no thickness rule and says so', () => {
		expect(thicknessByCode('shop', 6)).toMatchObject({ ok: false, code: 'shop' });
	});
});
