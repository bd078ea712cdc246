import { describe, expect, it } from 'vitest';
import { CHECK_CATALOGUE } from './check-catalogue';
import { continuityStatus } from './continuity';
import {
	pqrThicknessRange,
	welderDepositThickness,
	welderDiameterRange,
	welderPositions
} from './qualified-ranges';
import { requalificationTriggers } from './requalification';
import { runChecks } from './run-checks';
import type { WeldSettings } from './settings';
import { flowToLPerMin, inToMm, speedToMmPerS } from './units';

// The help page (/help/checks) lists each check's sources from CHECK_CATALOGUE (issue 3 §6): a
// finding whose source is missing there would cite something the help page never names.
const ipm = (v: number) => speedToMmPerS(v, 'in/min');
const cfh = (v: number) => flowToLPerMin(v, 'CFH');

const VARIED: WeldSettings[] = [
	// The checks API contract example (BRIEF.md), with a shade in use.
	{
		process: 'GTAW',
		currentType: 'DCEN',
		amps: 125,
		volts: 12,
		travelSpeedMmPerS: ipm(4),
		wireFeedMmPerS: ipm(200),
		thicknessMm: inToMm(0.125),
		baseMetal: { spec: 'A36' },
		filler: { classification: 'ER70S-6', diameterMm: inToMm(0.09375) },
		tungsten: { classification: 'EWLa-1.5', diameterMm: 2.4 },
		gas: { name: 'argon', flowLPerMin: cfh(20) },
		lensShade: 9
	},
	// GMAW short-circuit on thick carbon steel, against a procedure, with chemistry and preheat.
	{
		process: 'GMAW',
		currentType: 'DCEP',
		transfer: 'short-circuit',
		amps: 180,
		volts: 19,
		travelSpeedMmPerS: ipm(12),
		wireFeedMmPerS: ipm(300),
		thicknessMm: 40,
		baseMetal: { spec: 'A572 Gr 50' },
		filler: { classification: 'ER70S-6', diameterMm: 0.9 },
		gas: { name: '75/25', flowLPerMin: cfh(30) },
		preheatC: 10,
		lensShade: 11,
		chemistry: { C: 0.22, Mn: 1.3, Cr: 0.1, Ni: 0.1, Cu: 0.2 },
		procedure: {
			amps: { min: 150, max: 170 },
			volts: { min: 18, max: 20 },
			travelSpeedMmPerS: { min: ipm(10), max: ipm(14) },
			wireFeedMmPerS: { min: ipm(250), max: ipm(350) },
			heatInputMax: { jPerMm: 1000, basis: 'asme' },
			preheatMinC: 65
		}
	},
	// GMAW spray with a wrong-family filler and a gas the wire does not want.
	{
		process: 'GMAW',
		currentType: 'DCEN',
		transfer: 'spray',
		amps: 280,
		volts: 28,
		wireFeedMmPerS: ipm(400),
		thicknessMm: inToMm(0.375),
		baseMetal: { family: 'stainless' },
		filler: { classification: 'ER4043', diameterMm: inToMm(0.045) },
		gas: { name: 'CO2', flowLPerMin: cfh(60) },
		lensShade: 8
	},
	// FCAW self-shielded and gas-shielded types.
	{
		process: 'FCAW',
		currentType: 'DCEP',
		amps: 200,
		volts: 24,
		wireFeedMmPerS: ipm(250),
		thicknessMm: inToMm(0.5),
		baseMetal: { spec: 'A36' },
		filler: { classification: 'E71T-11', diameterMm: inToMm(0.072) },
		gas: { name: 'argon' }
	},
	{
		process: 'FCAW',
		amps: 230,
		filler: { classification: 'E71T-1C', diameterMm: inToMm(0.045) },
		gas: { name: '75/25', flowLPerMin: cfh(40) },
		baseMetal: { family: 'carbon-steel' },
		thicknessMm: 12
	},
	// SMAW low hydrogen, on AC, with a thin-plate preheat question.
	{
		process: 'SMAW',
		currentType: 'AC',
		amps: 90,
		volts: 22,
		travelSpeedMmPerS: ipm(6),
		thicknessMm: inToMm(0.25),
		baseMetal: { spec: 'A516 Gr 70' },
		filler: { classification: 'E7018', diameterMm: inToMm(0.125) },
		lensShade: 10,
		preheatC: 0
	},
	{
		process: 'SMAW',
		currentType: 'DCEN',
		amps: 300,
		filler: { classification: 'E6010', diameterMm: inToMm(0.125) },
		baseMetal: { spec: 'A106 Gr B' },
		lensShade: 12
	},
	// GTAW aluminium on AC, pure and zirconiated tungsten; stainless with thoriated on DCEP.
	{
		process: 'GTAW',
		currentType: 'AC',
		amps: 160,
		volts: 15,
		travelSpeedMmPerS: ipm(8),
		thicknessMm: inToMm(0.125),
		baseMetal: { spec: '6061-T6' },
		filler: { classification: 'ER5356', diameterMm: inToMm(0.125) },
		tungsten: { classification: 'EWP', diameterMm: inToMm(0.125) },
		gas: { name: 'helium', flowLPerMin: cfh(8) },
		lensShade: 13
	},
	{
		process: 'GTAW',
		currentType: 'AC',
		amps: 40,
		tungsten: { classification: 'EWZr-1', diameterMm: 4 },
		baseMetal: { family: 'aluminium' },
		thicknessMm: 1
	},
	{
		process: 'GTAW',
		currentType: 'DCEP',
		amps: 600,
		thicknessMm: inToMm(0.0625),
		baseMetal: { spec: '304L' },
		filler: { classification: 'ER309L', diameterMm: inToMm(0.0625) },
		tungsten: { classification: 'EWTh-2', diameterMm: 1.6 },
		gas: { name: 'argon', flowLPerMin: cfh(50) },
		lensShade: 10
	},
	// Things that cannot be read: filler, tungsten, gas, base metal spec.
	{
		process: 'GTAW',
		amps: 100,
		baseMetal: { spec: 'unobtainium' },
		filler: { classification: 'ER70S-9' },
		tungsten: { classification: 'EWX' },
		gas: { name: 'nitrous' }
	},
	{ process: 'GMAW', filler: { classification: 'ER80S-D2' }, baseMetal: { spec: 'A36' } }
];

const RUNS = VARIED.flatMap((settings, i) =>
	(['imperial', 'metric'] as const).map((system) => ({
		name: `settings ${i + 1} (${settings.process}, ${system})`,
		findings: runChecks(settings, { system }).findings
	}))
);

describe('every finding cites a source its catalogue entry lists', () => {
	const byId = new Map(CHECK_CATALOGUE.map((c) => [c.id, c]));
	it.each(RUNS)('$name', ({ findings }) => {
		expect(findings.length).toBeGreaterThan(0);
		const missing = findings
			.filter((f) => !(byId.get(f.check)?.sources ?? []).some((s) => s.label === f.source.label))
			.map((f) => `${f.check}: ${f.source.label}`);
		expect(missing).toEqual([]);
	});
	it('the settings above reach every check run on settings', () => {
		const seen = new Set(RUNS.flatMap((r) => r.findings.map((f) => f.check)));
		const onSettings = CHECK_CATALOGUE.filter((c) => c.on === 'settings').map((c) => c.id);
		expect(onSettings.filter((id) => !seen.has(id))).toEqual([]);
	});
});

describe('the PQR and welder checks cite a source their catalogue entry lists', () => {
	const labels = (id: string) =>
		CHECK_CATALOGUE.find((c) => c.id === id)?.sources.map((s) => s.label) ?? [];
	const source = <T>(r: T) => (r as { source?: { label: string } }).source?.label;
	it.each([
		['pqr-ranges', pqrThicknessRange({ value: 0.375, unit: 'in' }, { value: 0.25, unit: 'in' })],
		['pqr-ranges', pqrThicknessRange({ value: 6, unit: 'mm' }, undefined, 'short-circuit')],
		['welder-positions', welderPositions(['3G', '4F'])],
		['welder-deposit-thickness', welderDepositThickness({ value: 0.5, unit: 'in' }, 3)],
		['welder-diameter', welderDiameterRange({ value: 2, unit: 'in' })],
		['continuity', continuityStatus({ testDate: '2026-01-15' }, '2026-03-01')]
	])('%s', (id, result) => {
		expect(labels(id)).toContain(source(result));
	});
	it('requalification', () => {
		const found = requalificationTriggers(
			{ process: 'GMAW', amps: 200, volts: 24, currentType: 'DCEP', transfer: 'spray' },
			{ process: 'GMAW', amps: { min: 150, max: 260 }, volts: 30, transfer: 'short-circuit' }
		);
		expect(found.length).toBeGreaterThan(0);
		for (const f of found) expect(labels(f.check), f.message).toContain(f.source.label);
	});
});
