// A PQR's form text to its stored documents and back, and the ranges it qualifies, computed by
// the weld core (QW-451.1 thickness, QW-461.9 positions) plus the groupings read from it.
import {
	lengthToMm,
	mmToLength,
	parseBaseMetal,
	parseFiller,
	pqrThicknessRange,
	welderPositions,
	type FindingSource,
	type Length,
	type UnitSystem
} from '$lib/weld';
import type { PqrForm, PqrValues, TestResult } from '$lib/schemas/pqr';
import { PQR_QUANTITIES } from '$lib/schemas/pqr';
import { TEST_KINDS } from './options';
import { readQuantity, showQuantity, type QuantityKind } from './quantities';

type Text = Record<string, string>;

function quantities(f: PqrForm): Record<keyof typeof PQR_QUANTITIES, number | null> {
	const t = f as unknown as Text;
	const out = {} as Record<keyof typeof PQR_QUANTITIES, number | null>;
	for (const [key, kind] of Object.entries(PQR_QUANTITIES) as [
		keyof typeof PQR_QUANTITIES,
		QuantityKind
	][]) {
		const raw = t[key] ?? '';
		const r = raw === '' ? null : readQuantity(kind, raw, f.units);
		out[key] = r?.ok ? r.value : null;
	}
	return out;
}

const num = (s: string): number | null => {
	if (s.trim() === '') return null;
	const n = Number(s.replace(',', ''));
	return Number.isFinite(n) ? n : null;
};

export function formToPqr(f: PqrForm): { values: PqrValues; tests: TestResult[] } {
	const q = quantities(f);
	const metal = f.baseMetalSpec ? parseBaseMetal(f.baseMetalSpec) : null;
	const filler = f.fillerClass ? parseFiller(f.fillerClass) : null;
	const values: PqrValues = {
		v: 1,
		process: f.process,
		currentType: (f.currentType || null) as PqrValues['currentType'],
		transfer: (f.process === 'GMAW' ? f.transfer || null : null) as PqrValues['transfer'],
		amps: q.amps,
		volts: q.volts,
		travelSpeedMmPerS: q.travelSpeed,
		wireFeedMmPerS: q.wireFeed,
		fillerClass: f.fillerClass.toUpperCase(),
		fillerDiameterMm: q.fillerDiameter,
		fNumber: filler?.ok ? filler.filler.fNumber : null,
		aNumber: filler?.ok ? filler.filler.aNumber : null,
		tungstenClass: f.process === 'GTAW' ? f.tungstenClass : '',
		tungstenDiameterMm: f.process === 'GTAW' ? q.tungstenDiameter : null,
		gasName: f.gasName,
		gasFlowLPerMin: q.gasFlow,
		baseMetalSpec: f.baseMetalSpec,
		baseMetalFamily: metal?.ok ? metal.metal.family : null,
		pNumber: metal?.ok ? metal.metal.pNumber : null,
		couponThicknessMm: q.couponThickness,
		couponUnit: f.units === 'metric' ? 'mm' : 'in',
		depositedThicknessMm: q.depositedThickness,
		testPosition: f.testPosition as PqrValues['testPosition'],
		jointType: f.jointType as PqrValues['jointType'],
		preheatC: q.preheat,
		interpassC: q.interpass,
		pwht: f.pwht,
		weldedOn: f.weldedOn,
		welder: f.welder,
		lab: f.lab
	};
	const t = f as unknown as Text;
	const tests: TestResult[] = TEST_KINDS.map((kind) => {
		const entry: TestResult = {
			kind,
			result: (t[`${kind}Result`] ?? '') as TestResult['result'],
			notes: t[`${kind}Notes`] ?? '',
			values: []
		};
		if (kind === 'tensile')
			for (const [i, key] of ['tensile1', 'tensile2'].entries()) {
				const n = num(t[key] ?? '');
				if (n !== null)
					entry.values.push({ label: `Specimen ${i + 1}`, value: n, unit: f.tensileUnit });
			}
		if (kind === 'impact') {
			const e = num(f.impactEnergy);
			if (e !== null) entry.values.push({ label: 'Absorbed energy', value: e, unit: f.impactUnit });
			const temp = f.impactTemperature
				? readQuantity('temperature', f.impactTemperature, f.units)
				: null;
			if (temp?.ok) entry.values.push({ label: 'Test temperature', value: temp.value, unit: '°C' });
		}
		return entry;
	});
	return { values, tests };
}

export function pqrToForm(
	p: { number: string; title: string; values: PqrValues; tests: TestResult[] },
	system: UnitSystem
): PqrForm {
	const v = p.values;
	const show = (n: number | null, kind: QuantityKind) =>
		n === null ? '' : showQuantity(kind, n, system);
	const test = (kind: string) => p.tests.find((x) => x.kind === kind);
	const tensile = test('tensile')?.values ?? [];
	const impact = test('impact')?.values ?? [];
	const energy = impact.find((x) => x.label === 'Absorbed energy');
	const temp = impact.find((x) => x.label === 'Test temperature');
	const out: Record<string, unknown> = {
		units: system,
		number: p.number,
		title: p.title,
		process: v.process,
		currentType: v.currentType ?? '',
		transfer: v.transfer ?? '',
		fillerClass: v.fillerClass,
		tungstenClass: v.tungstenClass,
		gasName: v.gasName,
		baseMetalSpec: v.baseMetalSpec,
		testPosition: v.testPosition,
		jointType: v.jointType,
		pwht: v.pwht,
		weldedOn: v.weldedOn,
		welder: v.welder,
		lab: v.lab,
		amps: show(v.amps, 'amps'),
		volts: show(v.volts, 'volts'),
		travelSpeed: show(v.travelSpeedMmPerS, 'travel'),
		wireFeed: show(v.wireFeedMmPerS, 'wire'),
		fillerDiameter: show(v.fillerDiameterMm, 'diameter'),
		tungstenDiameter: show(v.tungstenDiameterMm, 'diameter'),
		gasFlow: show(v.gasFlowLPerMin, 'flow'),
		couponThickness: show(v.couponThicknessMm, 'thickness'),
		depositedThickness: show(v.depositedThicknessMm, 'thickness'),
		preheat: show(v.preheatC, 'temperature'),
		interpass: show(v.interpassC, 'temperature'),
		tensile1: tensile[0] ? String(tensile[0].value) : '',
		tensile2: tensile[1] ? String(tensile[1].value) : '',
		tensileUnit: tensile[0]?.unit ?? 'psi',
		impactEnergy: energy ? String(energy.value) : '',
		impactUnit: energy?.unit ?? 'ft-lbf',
		impactTemperature: temp ? show(temp.value, 'temperature') : ''
	};
	for (const kind of TEST_KINDS) {
		out[`${kind}Result`] = test(kind)?.result ?? '';
		out[`${kind}Notes`] = test(kind)?.notes ?? '';
	}
	return out as unknown as PqrForm;
}

export interface PqrQualified {
	process: PqrValues['process'];
	currentType: PqrValues['currentType'];
	transfer: PqrValues['transfer'];
	amps: number | null;
	volts: number | null;
	/** QW-451.1 base metal range, in the unit the coupon was given in. */
	thickness: {
		min: Length;
		max: Length;
		row: string;
		notes: string[];
		source: FindingSource;
	} | null;
	depositedMax: Length | null;
	/** Positions the test position covers (QW-461.9), groove and fillet. */
	positions: { groove: string[]; fillet: string[]; source: FindingSource } | null;
	pNumbers: string[];
	fNumbers: number[];
	/** Messages for inputs the computation could not use. */
	problems: string[];
}

/** What a PQR qualifies, computed now from its actual values. */
export function qualifiedRanges(v: PqrValues): PqrQualified {
	const problems: string[] = [];
	let thickness: PqrQualified['thickness'] = null;
	let depositedMax: Length | null = null;
	if (v.couponThicknessMm !== null) {
		const unit = v.couponUnit;
		const coupon = { value: mmToLength(v.couponThicknessMm, unit), unit };
		const dep =
			v.depositedThicknessMm === null
				? undefined
				: { value: mmToLength(v.depositedThicknessMm, unit), unit };
		const r = pqrThicknessRange(coupon, dep, v.transfer ?? undefined);
		if (r.ok) {
			thickness = {
				min: r.baseMetal.min,
				max: r.baseMetal.max,
				row: r.row,
				notes: r.notes,
				source: r.source
			};
			depositedMax = r.depositedMax ?? null;
		} else problems.push(r.message);
	} else problems.push('No coupon thickness T: the thickness range cannot be computed.');
	let positions: PqrQualified['positions'] = null;
	if (v.testPosition) {
		const p = welderPositions([v.testPosition]);
		positions = { groove: p.groove, fillet: p.fillet, source: p.source };
	}
	return {
		process: v.process,
		currentType: v.currentType,
		transfer: v.transfer,
		amps: v.amps,
		volts: v.volts,
		thickness,
		depositedMax,
		positions,
		pNumbers: v.pNumber ? [v.pNumber] : [],
		fNumbers: v.fNumber === null ? [] : [v.fNumber],
		problems
	};
}

/** A Length in mm, for comparisons. */
export const lengthMm = (l: Length): number => lengthToMm(l.value, l.unit);
