import { describe, expect, it } from 'vitest';
import { asmeChanges, classifyChange } from './asme-variables';

// ASME IX QW-255 (GMAW/FCAW) and QW-256 (GTAW), as reproduced in public WPS/PQR checklists
// (BPVC IX 2004 with 2005 addenda; 2019).
describe('classing a variable', () => {
	it.each([
		['GTAW', 'QW-404.14', false, 'essential', true], // filler added or deleted: E for GTAW
		['GMAW', 'QW-409.2', false, 'essential', true], // transfer mode: E for GMAW
		['GTAW', 'QW-409.2', false, null, null], // no transfer variable for GTAW
		['GMAW', 'QW-409.1', false, 'supplementary essential', false], // heat input without toughness
		['GMAW', 'QW-409.1', true, 'supplementary essential', true], // and with toughness testing
		['GTAW', 'QW-409.8', false, 'nonessential', false], // amps/volts range: N
		['GTAW', 'QW-409.12', false, 'nonessential', false], // tungsten: N
		['GMAW', 'QW-408.2', false, 'essential', true], // gas: E
		['FCAW', 'QW-404.4', false, 'essential', true], // F-Number: E
		['SMAW', 'QW-404.4', false, null, null] // not QW-255/256
	])('%s %s (toughness %s) -> %s', (p, para, t, cls, req) => {
		const c = classifyChange(p, para, t);
		if (cls === null) expect(c).toBeNull();
		else expect(c).toEqual({ class: cls, requalify: req });
	});
});

describe('changes between a PQR and a WPS', () => {
	it('GTAW voltage, travel speed and wire feed beyond the PQR are nonessential (QW-409.8)', () => {
		const found = asmeChanges(
			{ process: 'GTAW', volts: { min: 10, max: 12 }, travelSpeedMmPerS: { min: 1, max: 2 } },
			{ process: 'GTAW', volts: { min: 10, max: 14 }, travelSpeedMmPerS: { min: 1, max: 3 } }
		);
		expect(found.map((f) => [f.variable, f.class])).toEqual([
			['volts', 'nonessential'],
			['travelSpeed', 'nonessential']
		]);
		expect(found[0]?.message).toContain('no new PQR');
	});
	it('a preheat more than 55 °C lower is essential (QW-406.1); a 50 °C drop is not a change', () => {
		expect(
			asmeChanges({ process: 'GMAW', preheatMinC: 120 }, { process: 'GMAW', preheatMinC: 60 })[0]
		).toMatchObject({ paragraph: 'QW-406.1', requalify: true });
		expect(
			asmeChanges({ process: 'GMAW', preheatMinC: 120 }, { process: 'GMAW', preheatMinC: 70 })
		).toEqual([]);
	});
	it('current and polarity are supplementary essential: requalify only with toughness testing', () => {
		const a = asmeChanges(
			{ process: 'GTAW', currentType: 'DCEN' },
			{ process: 'GTAW', currentType: 'AC' }
		);
		const b = asmeChanges(
			{ process: 'GTAW', currentType: 'DCEN' },
			{ process: 'GTAW', currentType: 'AC' },
			true
		);
		expect(a[0]).toMatchObject({ paragraph: 'QW-409.4', requalify: false });
		expect(b[0]).toMatchObject({ paragraph: 'QW-409.4', requalify: true });
	});
	it('no changes, no findings; nonsense in, nothing out', () => {
		expect(asmeChanges({ process: 'GMAW', gas: 'C25' }, { process: 'GMAW', gas: 'c25' })).toEqual(
			[]
		);
		expect(asmeChanges(null as never, {} as never)).toEqual([]);
	});
});
