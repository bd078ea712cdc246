import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CHECK_CATALOGUE, CHECK_IDS } from './check-catalogue';
import { runChecks } from './run-checks';
import type { WeldSettings } from './settings';
import { flowToLPerMin, inToMm, speedToMmPerS } from './units';

// The settings record of the checks API contract example in BRIEF.md, in SI.
const contract: WeldSettings = {
	process: 'GTAW',
	currentType: 'DCEN',
	amps: 125,
	volts: 12,
	travelSpeedMmPerS: speedToMmPerS(4, 'in/min'),
	wireFeedMmPerS: speedToMmPerS(200, 'in/min'),
	thicknessMm: inToMm(0.125),
	baseMetal: { spec: 'A36' },
	filler: { classification: 'ER70S-6', diameterMm: inToMm(0.09375) },
	tungsten: { classification: 'EWLa-1.5', diameterMm: 2.4 },
	gas: { name: 'argon', flowLPerMin: flowToLPerMin(20, 'CFH') }
};

describe('the contract example', () => {
	const r = runChecks(contract);
	it('derived values match BRIEF.md', () => {
		expect(r.derived.heatInput).toEqual({
			asmeJPerIn: 22500,
			arcEnergyKJPerMm: 0.886,
			isoKJPerMm: 0.531,
			k: 0.6
		});
		expect(r.derived.shade).toEqual({ minimum: 8, suggested: 12 }); // OSHA 1910.133(a)(5); ANSI Z49.1
		expect(r.derived.filler).toEqual({
			spec: 'AWS A5.18',
			minTensileKsi: 70,
			fNumber: 6,
			aNumber: 1
		});
	});
	it('amps-vs-thickness matches BRIEF.md', () => {
		expect(r.findings[0]).toMatchObject({
			check: 'amps-vs-thickness',
			status: 'ok',
			value: 125,
			expected: { min: 94, max: 156, unit: 'A' }, // common practice, no source: 125 A ±25 %
			source: { kind: 'common practice' },
			field: 'amps'
		});
		expect(r.findings[0]?.message).toBe(
			'125 A is within the usual band for 1/8 in carbon steel (94–156 A).'
		);
	});
	it('every finding has the contract’s shape and a catalogue id', () => {
		const ids = new Set<string>(CHECK_IDS);
		for (const f of r.findings) {
			expect(ids.has(f.check)).toBe(true);
			expect(['ok', 'caution', 'outside']).toContain(f.status);
			expect(f.message.length).toBeGreaterThan(10);
			expect(typeof f.expected.unit).toBe('string');
			expect(['published', 'common practice', 'from memory']).toContain(f.source.kind);
			expect(typeof f.field).toBe('string');
		}
	});
	it('findings come in catalogue order', () => {
		const order = r.findings.map((f) => CHECK_IDS.indexOf(f.check));
		expect([...order].sort((a, b) => a - b)).toEqual(order);
	});
});

describe('missing inputs leave checks out, never failed', () => {
	it('process alone gives nothing', () => {
		expect(runChecks({ process: 'GMAW' })).toEqual({ findings: [], derived: {} });
	});
	it('amps alone gives only the shade', () => {
		const r = runChecks({ process: 'GMAW', amps: 180 });
		expect(r.findings).toEqual([]);
		expect(r.derived).toEqual({ shade: { minimum: 10, suggested: 12 } });
	});
	it('no heat input without travel speed', () => {
		expect(
			runChecks({ ...contract, travelSpeedMmPerS: undefined }).derived.heatInput
		).toBeUndefined();
	});
	it('bad values count as missing', () => {
		const r = runChecks({
			process: 'GTAW',
			amps: NaN,
			volts: -12,
			thicknessMm: Infinity
		} as WeldSettings);
		expect(r).toEqual({ findings: [], derived: {} });
	});
	it('no process, or not an object: empty answer', () => {
		expect(runChecks({} as WeldSettings)).toEqual({ findings: [], derived: {} });
		expect(runChecks(null as unknown as WeldSettings)).toEqual({ findings: [], derived: {} });
	});
});

describe('the demo procedures', () => {
	it('GMAW 3/16 in A36 with 0.035 in ER70S-6 in 75/25', () => {
		const r = runChecks({
			process: 'GMAW',
			currentType: 'DCEP',
			transfer: 'short-circuit',
			amps: 160,
			volts: 19,
			wireFeedMmPerS: speedToMmPerS(256, 'in/min'),
			travelSpeedMmPerS: speedToMmPerS(14, 'in/min'),
			thicknessMm: inToMm(3 / 16),
			baseMetal: { spec: 'A36' },
			filler: { classification: 'ER70S-6', diameterMm: inToMm(0.035) },
			gas: { name: '75/25', flowLPerMin: flowToLPerMin(30, 'CFH') }
		});
		expect(r.findings.filter((f) => f.status !== 'ok')).toEqual([]);
		expect(r.derived.heatInput?.k).toBe(0.8);
	});
	it('GTAW 6061 1/8 in AC with ER4043', () => {
		const r = runChecks({
			process: 'GTAW',
			currentType: 'AC',
			amps: 150,
			thicknessMm: inToMm(1 / 8),
			baseMetal: { spec: '6061-T6' },
			filler: { classification: 'ER4043', diameterMm: inToMm(3 / 32) },
			tungsten: { classification: 'EWLa-1.5', diameterMm: inToMm(3 / 32) },
			gas: { name: 'argon', flowLPerMin: flowToLPerMin(20, 'CFH') }
		});
		const by = (id: string) => r.findings.find((f) => f.check === id);
		expect(by('amps-vs-thickness')?.status).toBe('ok'); // aluminium band 117-195 A
		expect(by('filler-vs-base-metal')?.status).toBe('ok');
		expect(by('current-type')?.status).toBe('ok');
		expect(r.derived.filler).toEqual({
			spec: 'AWS A5.10',
			minTensileKsi: null,
			fNumber: 23,
			aNumber: null
		});
	});
	it('messages and units follow the user’s system', () => {
		const r = runChecks(contract, { system: 'metric' });
		expect(r.findings[0]?.message).toBe(
			'125 A is within the usual band for 3.2 mm carbon steel (94–156 A).'
		);
		expect(r.findings.find((f) => f.check === 'gas-flow')?.expected.unit).toBe('L/min');
	});
	it('a filler that does not suit the base metal, and an unreadable tungsten', () => {
		const r = runChecks({
			...contract,
			filler: { classification: 'ER308L' },
			tungsten: { classification: 'EWX', diameterMm: 2.4 }
		});
		// AWS A5.9: ER308L is stainless wire; on A36 the mismatch is a caution (issue 3 §4)
		const fit = r.findings.find((f) => f.check === 'filler-vs-base-metal');
		expect(fit?.status).toBe('caution');
		expect(fit?.message).toContain('Wrong filler family');
		expect(r.findings.find((f) => f.field === 'tungsten.classification')?.status).toBe('caution');
	});
});

describe('catalogue', () => {
	it('lists every check id once, each with a title, what it compares and sources', () => {
		expect(CHECK_CATALOGUE.map((c) => c.id)).toEqual([...CHECK_IDS]);
		for (const c of CHECK_CATALOGUE) {
			expect(c.title.length).toBeGreaterThan(3);
			expect(c.compares.length).toBeGreaterThan(10);
			for (const s of c.sources)
				expect(['published', 'common practice', 'from memory']).toContain(s.kind);
		}
	});
});

describe('properties (fast-check)', () => {
	const settings = fc.record(
		{
			process: fc.constantFrom('GTAW', 'GMAW', 'FCAW', 'SMAW'),
			currentType: fc.constantFrom('DCEN', 'DCEP', 'AC'),
			transfer: fc.constantFrom('short-circuit', 'globular', 'spray', 'pulsed-spray'),
			amps: fc.double({ min: -10, max: 1600 }),
			volts: fc.double({ min: -1, max: 80 }),
			travelSpeedMmPerS: fc.double({ min: -1, max: 100 }),
			wireFeedMmPerS: fc.double({ min: 0, max: 500 }),
			thicknessMm: fc.double({ min: -1, max: 300 }),
			baseMetal: fc.record(
				{
					spec: fc.constantFrom('A36', '304L', '6061', 'A516-70', 'junk', ''),
					family: fc.constantFrom('carbon-steel', 'stainless', 'aluminium')
				},
				{ requiredKeys: [] }
			),
			filler: fc.record(
				{
					classification: fc.constantFrom(
						'ER70S-6',
						'ER308L',
						'ER4043',
						'E71T-1C',
						'E7018',
						'E71T-11',
						'??'
					),
					diameterMm: fc.double({ min: 0, max: 6 })
				},
				{ requiredKeys: [] }
			),
			tungsten: fc.record(
				{
					classification: fc.constantFrom('EWLa-1.5', 'EWP', 'EWTh-2', 'nope'),
					diameterMm: fc.constantFrom(1, 1.6, 2.4, 3.2, 7)
				},
				{ requiredKeys: [] }
			),
			gas: fc.record(
				{
					name: fc.constantFrom('argon', '75/25', 'co2', 'tri-mix', 'air'),
					flowLPerMin: fc.double({ min: 0, max: 100 })
				},
				{ requiredKeys: [] }
			),
			preheatC: fc.double({ min: -60, max: 400 }),
			lensShade: fc.integer({ min: 0, max: 14 }),
			chemistry: fc.record({ C: fc.double({ min: 0, max: 1 }), Mn: fc.double({ min: 0, max: 2 }) }),
			procedure: fc.record(
				{
					amps: fc.record({ min: fc.double(), max: fc.double() }),
					heatInputMax: fc.record({ jPerMm: fc.double(), basis: fc.constantFrom('asme', 'iso') })
				},
				{ requiredKeys: [] }
			)
		},
		{ requiredKeys: ['process'] }
	);
	it('findings are deterministic', () => {
		fc.assert(
			fc.property(settings, fc.constantFrom('imperial', 'metric' as const), (s, system) => {
				const a = runChecks(s as WeldSettings, { system: system as 'imperial' });
				const b = runChecks(structuredClone(s) as WeldSettings, { system: system as 'imperial' });
				expect(b).toEqual(a);
			}),
			{ numRuns: 100 }
		);
	});
	it('never throws, and every finding is well formed', () => {
		fc.assert(
			fc.property(settings, (s) => {
				for (const f of runChecks(s as WeldSettings).findings) {
					expect(CHECK_IDS).toContain(f.check);
					expect(f.message).not.toMatch(/NaN|undefined|Infinity/);
				}
			}),
			{ numRuns: 150 }
		);
		fc.assert(fc.property(fc.anything(), (x) => void runChecks(x as WeldSettings)));
	});
});
