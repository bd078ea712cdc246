import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { TEST_POSITIONS } from '$lib/weld/qualified-ranges';
import { runChecks } from '$lib/weld/run-checks';
import {
	POSITIONS,
	bodyUnitSystem,
	checksBodySchema,
	checksBodyToSettings,
	parseChecksBody,
	pqrRangesAnswer,
	pqrRangesBodySchema,
	welderPositionsAnswer,
	welderPositionsBodySchema
} from './checks';

// The request body of the contract example in BRIEF.md.
const contractBody = {
	process: 'GTAW',
	currentType: 'DCEN',
	transfer: 'short-circuit',
	amps: 125,
	volts: 12,
	travelSpeed: { value: 4, unit: 'in/min' },
	wireFeed: { value: 200, unit: 'in/min' },
	thickness: { value: 0.125, unit: 'in' },
	baseMetal: { spec: 'A36' },
	filler: { classification: 'ER70S-6', diameter: { value: 0.09375, unit: 'in' } },
	tungsten: { classification: 'EWLa-1.5', diameter: { value: 2.4, unit: 'mm' } },
	gas: { name: 'argon', flow: { value: 20, unit: 'CFH' } }
};

const errors = (raw: unknown) => {
	const r = parseChecksBody(raw);
	return r.ok ? {} : r.errors;
};

describe('checks body', () => {
	it('accepts the contract example and answers as BRIEF.md says', () => {
		const r = parseChecksBody(contractBody);
		expect(r.ok).toBe(true);
		if (!r.ok) return;
		expect(r.system).toBe('imperial');
		expect(r.settings.thicknessMm).toBeCloseTo(3.175, 10);
		expect(r.settings.gas?.flowLPerMin).toBeCloseTo(9.43895, 4);
		const out = runChecks(r.settings, { system: r.system });
		expect(out.derived.heatInput).toEqual({
			asmeJPerIn: 22500,
			arcEnergyKJPerMm: 0.886,
			isoKJPerMm: 0.531,
			k: 0.6
		});
		expect(out.derived.shade).toEqual({ minimum: 8, suggested: 12 });
		expect(out.derived.filler).toEqual({
			spec: 'AWS A5.18',
			minTensileKsi: 70,
			fNumber: 6,
			aNumber: 1
		});
		expect(out.findings[0]).toMatchObject({
			check: 'amps-vs-thickness',
			status: 'ok',
			value: 125,
			expected: { min: 94, max: 156, unit: 'A' }
		});
	});
	it('needs only the process', () => {
		expect(parseChecksBody({ process: 'GMAW' })).toEqual({
			ok: true,
			settings: { process: 'GMAW' },
			system: 'imperial'
		});
		expect(errors({})).toHaveProperty('process');
		expect(errors({ process: 'TIG' })).toHaveProperty('process');
	});
	it('strips unknown keys', () => {
		const r = checksBodySchema.parse({
			process: 'GTAW',
			colour: 'blue',
			filler: { classification: 'ER70S-6', brand: 'x' }
		});
		expect(r).toEqual({ process: 'GTAW', filler: { classification: 'ER70S-6' } });
	});
	it('accepts the allowed units, and °F / °C for temperature', () => {
		const ok = (body: object) =>
			expect(parseChecksBody({ process: 'GMAW', ...body }).ok).toBe(true);
		ok({ thickness: { value: 4.8, unit: 'mm' } });
		ok({ travelSpeed: { value: 3, unit: 'mm/s' } });
		ok({ travelSpeed: { value: 250, unit: 'mm/min' } });
		ok({ gas: { flow: { value: 12, unit: 'L/min' } } });
		ok({ preheat: { value: 150, unit: 'degF' } });
		ok({ preheat: { value: 150, unit: '°F' } });
		ok({ preheat: { value: 65, unit: '°C' } });
		const r = parseChecksBody({ process: 'GMAW', preheat: { value: 150, unit: '°F' } });
		expect(r.ok && r.settings.preheatC).toBeCloseTo(65.5556, 4);
	});
	it('rejects wrong units and absurd numbers with field paths', () => {
		expect(errors({ process: 'GMAW', thickness: { value: 1, unit: 'ft' } })).toHaveProperty([
			'thickness.unit'
		]);
		expect(errors({ process: 'GMAW', amps: 1e9 })).toHaveProperty('amps');
		expect(errors({ process: 'GMAW', amps: -5 })).toHaveProperty('amps');
		expect(errors({ process: 'GMAW', amps: '125' })).toHaveProperty('amps');
		expect(errors({ process: 'GMAW', volts: 0 })).toHaveProperty('volts');
		expect(errors({ process: 'GMAW', thickness: { value: 0, unit: 'in' } })).toHaveProperty([
			'thickness.value'
		]);
		expect(errors({ process: 'GMAW', thickness: { value: 30, unit: 'in' } })).toHaveProperty([
			'thickness.value'
		]);
		expect(errors({ process: 'GMAW', gas: { flow: { value: 500, unit: 'CFH' } } })).toHaveProperty([
			'gas.flow.value'
		]);
		expect(
			errors({ process: 'GMAW', travelSpeed: { value: 5000, unit: 'in/min' } })
		).toHaveProperty(['travelSpeed.value']);
		expect(errors({ process: 'GMAW', baseMetal: {} })).toHaveProperty('baseMetal');
		expect(errors({ process: 'GMAW', baseMetal: { family: 'wood' } })).toHaveProperty([
			'baseMetal.family'
		]);
		expect(errors({ process: 'GMAW', lensShade: 10.5 })).toHaveProperty('lensShade');
		expect(errors({ process: 'GMAW', preheat: { value: -100, unit: 'degC' } })).toHaveProperty([
			'preheat.value'
		]);
	});
	it('infers the unit system from the first quantity', () => {
		const sys = (b: object) => bodyUnitSystem(checksBodySchema.parse({ process: 'GTAW', ...b }));
		expect(sys({})).toBe('imperial');
		expect(sys({ thickness: { value: 3, unit: 'mm' } })).toBe('metric');
		expect(sys({ gas: { flow: { value: 20, unit: 'CFH' } } })).toBe('imperial');
	});
	it('converts to SI exactly', () => {
		const s = checksBodyToSettings(checksBodySchema.parse(contractBody));
		expect(s.travelSpeedMmPerS).toBeCloseTo(1.6933333, 6);
		expect(s.filler?.diameterMm).toBeCloseTo(2.38125, 10);
		expect(s.tungsten?.diameterMm).toBe(2.4);
	});
	it('never throws on arbitrary bodies (fast-check)', () => {
		fc.assert(fc.property(fc.anything(), (x) => void parseChecksBody(x)));
		fc.assert(
			fc.property(
				fc.record({
					process: fc.constantFrom('GTAW', 'GMAW'),
					amps: fc.double(),
					thickness: fc.record({ value: fc.double(), unit: fc.string() })
				}),
				(x) => {
					const r = parseChecksBody(x);
					if (r.ok) runChecks(r.settings, { system: r.system });
				}
			)
		);
	});
});

describe('pqr-ranges body and answer (ASME IX QW-451.1)', () => {
	it('answers in the unit of the request', () => {
		const body = pqrRangesBodySchema.parse({
			process: 'GTAW',
			couponThickness: { value: 0.375, unit: 'in' },
			depositedThickness: { value: 0.375, unit: 'in' }
		});
		const r = pqrRangesAnswer(body);
		expect(r.ok && r.answer.baseMetal).toEqual({
			min: { value: 0.0625, unit: 'in' },
			max: { value: 0.75, unit: 'in' }
		}); // QW-451.1: 1/16 in to 2T
		expect(r.ok && r.answer.depositedMax).toEqual({ value: 0.75, unit: 'in' }); // QW-451.1: 2t
		expect(r.ok && r.answer.source.kind).toBe('published');
		const mm = (t: number) =>
			pqrRangesAnswer(
				pqrRangesBodySchema.parse({
					process: 'GMAW',
					couponThickness: { value: 25, unit: 'mm' },
					depositedThickness: { value: t, unit: 'mm' }
				})
			);
		const thin = mm(10);
		expect(thin.ok && thin.answer.baseMetal).toEqual({
			min: { value: 5, unit: 'mm' },
			max: { value: 50, unit: 'mm' }
		}); // QW-451.1: 19 to <38 mm row, 5 mm to 2T
		expect(thin.ok && thin.answer.depositedMax).toEqual({ value: 20, unit: 'mm' }); // QW-451.1: t < 19 mm -> 2t
		const thick = mm(25);
		expect(thick.ok && thick.answer.depositedMax).toEqual({ value: 50, unit: 'mm' }); // QW-451.1: t >= 19 mm -> 2T
	});
	it('applies the short-circuit limit only to GMAW', () => {
		const b = (process: string) =>
			pqrRangesBodySchema.parse({
				process,
				transfer: 'short-circuit',
				couponThickness: { value: 0.25, unit: 'in' },
				depositedThickness: { value: 0.25, unit: 'in' }
			});
		expect(
			pqrRangesAnswer(b('GMAW')).ok &&
				(pqrRangesAnswer(b('GMAW')) as { answer: { baseMetal: { max: { value: number } } } }).answer
					.baseMetal.max.value
		).toBe(0.275);
		const g = pqrRangesAnswer(b('GTAW'));
		expect(g.ok && g.answer.baseMetal.max.value).toBe(0.5);
	});
	it('rejects bad bodies with field paths', () => {
		const r = pqrRangesBodySchema.safeParse({
			process: 'GTAW',
			couponThickness: { value: -1, unit: 'in' }
		});
		expect(r.success).toBe(false);
		expect(r.error?.issues[0]?.path).toEqual(['couponThickness', 'value']);
		expect(pqrRangesBodySchema.safeParse({ process: 'GTAW' }).success).toBe(false);
		// The contract's body carries t: without it there is no depositedMax to answer.
		const noT = pqrRangesBodySchema.safeParse({
			process: 'GTAW',
			couponThickness: { value: 0.375, unit: 'in' }
		});
		expect(noT.error?.issues.map((i) => i.path.join('.'))).toEqual(['depositedThickness']);
		expect(noT.error?.issues[0]?.message).toMatch(/^Required\. Give it as \{ "value"/);
	});
});

describe('welder-positions body and answer (ASME IX QW-461.9)', () => {
	it('3G -> groove F, V and fillet F, H, V', () => {
		const r = welderPositionsAnswer(welderPositionsBodySchema.parse({ testPositions: ['3G'] }));
		expect(r.ok && r.answer).toMatchObject({
			groove: ['F', 'V'],
			fillet: ['F', 'H', 'V'],
			groovePipe: ['F']
		}); // QW-461.9
	});
	it('6G -> all; lower case is fine; combinations add up', () => {
		const all = welderPositionsAnswer(welderPositionsBodySchema.parse({ testPositions: ['6g'] }));
		expect(all.ok && all.answer.groove).toEqual(['F', 'H', 'V', 'O']); // QW-461.9
		const combo = welderPositionsAnswer(
			welderPositionsBodySchema.parse({ testPositions: ['2G', '5G'] })
		);
		expect(combo.ok && combo.answer.groove).toEqual(['F', 'H', 'V', 'O']); // QW-461.9: 2G and 5G -> all
	});
	it('refuses unknown positions, empty lists and 6GR with messages', () => {
		expect(
			welderPositionsBodySchema.safeParse({ testPositions: ['7G'] }).error?.issues[0]?.path
		).toEqual(['testPositions', 0]);
		expect(welderPositionsBodySchema.safeParse({ testPositions: [] }).success).toBe(false);
		expect(welderPositionsBodySchema.safeParse({ testPositions: '3G' }).success).toBe(false);
		const gr = welderPositionsAnswer(welderPositionsBodySchema.parse({ testPositions: ['6GR'] }));
		expect(gr.ok).toBe(false);
	});
	it('the schema’s positions are the reference table’s, plus 6GR', () => {
		expect([...POSITIONS].sort()).toEqual([...TEST_POSITIONS, '6GR'].sort());
	});
});
