// The one entry for a settings record: every check that has its inputs, plus derived values.
// Never throws: input is cleaned first, and each check runs guarded.
import { checkAmpsVsFiller, checkAmpsVsThickness, checkWfsVsAmps } from './amperage';
import { baseMetalFromFamily, checkBaseMetal, parseBaseMetal, type BaseMetal } from './base-metal';
import { CHECK_IDS } from './check-catalogue';
import type { CheckContext } from './context';
import { checkFillerClassification, checkFillerVsBaseMetal } from './filler-checks';
import { parseFiller } from './filler';
import { isNum, sourceOf, type Finding } from './findings';
import { checkGasFlow, checkGasForProcess, parseGas } from './gas-flow';
import { checkHeatInput, heatInput, type HeatInput } from './heat-input';
import { checkCurrentType } from './polarity';
import {
	carbonEquivalentIIW,
	checkCarbonEquivalent,
	checkPreheat,
	d11MinimumPreheat
} from './preheat';
import { checkWithinProcedure } from './requalification';
import type { CheckOptions, Chemistry, ProcedureRanges, WeldSettings } from './settings';
import { checkLensShade, lensShade } from './shade';
import { checkAmpsVsTungsten, checkTungstenVsCurrent, parseTungsten } from './tungsten';
import { AWS_A5_12, GAS_MIX_PRACTICE } from '$reference/sources';
import type { MetalFamily } from '$reference/types';

export interface Derived {
	heatInput?: HeatInput;
	shade?: { minimum: number; suggested: number | null };
	filler?: { spec: string; minTensileKsi: number | null; fNumber: number; aNumber: number | null };
	baseMetal?: { family: MetalFamily; pNumber: string | null; group: number | null };
	preheat?: { minimumF: number; minimumC: number; carbonEquivalent?: number };
}

export interface CheckResult {
	findings: Finding[];
	derived: Derived;
}

const PROCESSES = ['GTAW', 'GMAW', 'FCAW', 'SMAW'] as const;
const CURRENTS = ['DCEN', 'DCEP', 'AC'] as const;
const TRANSFERS = ['short-circuit', 'globular', 'spray', 'pulsed-spray'] as const;

const pos = (v: unknown): number | undefined => (isNum(v) && v > 0 ? v : undefined);
const num = (v: unknown): number | undefined => (isNum(v) ? v : undefined);
const str = (v: unknown): string | undefined =>
	typeof v === 'string' && v.trim() !== '' ? v.slice(0, 80) : undefined;
const oneOf = <T extends string>(v: unknown, list: readonly T[]): T | undefined =>
	typeof v === 'string' && (list as readonly string[]).includes(v) ? (v as T) : undefined;
const obj = (v: unknown): Record<string, unknown> | undefined =>
	typeof v === 'object' && v !== null && !Array.isArray(v)
		? (v as Record<string, unknown>)
		: undefined;
const band = (v: unknown) => {
	const o = obj(v);
	if (!o) return undefined;
	const b = { min: num(o.min), max: num(o.max) };
	return b.min === undefined && b.max === undefined ? undefined : b;
};

/** Keeps only well-formed values; anything else counts as not given. */
export function cleanSettings(input: unknown): WeldSettings | null {
	const o = obj(input);
	const process = oneOf(o?.process, PROCESSES);
	if (!o || !process) return null;
	const filler = obj(o.filler);
	const tungsten = obj(o.tungsten);
	const gas = obj(o.gas);
	const base = obj(o.baseMetal);
	const chem = obj(o.chemistry);
	const proc = obj(o.procedure);
	const hi = obj(proc?.heatInputMax);
	const chemistry: Chemistry | undefined = chem
		? Object.fromEntries(
				['C', 'Mn', 'Cr', 'Mo', 'V', 'Ni', 'Cu'].flatMap((k) =>
					isNum(chem[k]) && (chem[k] as number) >= 0 ? [[k, chem[k]]] : []
				)
			)
		: undefined;
	const procedure: ProcedureRanges | undefined = proc
		? {
				amps: band(proc.amps),
				volts: band(proc.volts),
				travelSpeedMmPerS: band(proc.travelSpeedMmPerS),
				wireFeedMmPerS: band(proc.wireFeedMmPerS),
				heatInputMax:
					hi && pos(hi.jPerMm)
						? { jPerMm: hi.jPerMm as number, basis: hi.basis === 'iso' ? 'iso' : 'asme' }
						: undefined,
				preheatMinC: num(proc.preheatMinC)
			}
		: undefined;
	return {
		process,
		currentType: oneOf(o.currentType, CURRENTS),
		transfer: oneOf(o.transfer, TRANSFERS),
		amps: pos(o.amps),
		volts: pos(o.volts),
		travelSpeedMmPerS: pos(o.travelSpeedMmPerS),
		wireFeedMmPerS: pos(o.wireFeedMmPerS),
		thicknessMm: pos(o.thicknessMm),
		baseMetal: base
			? {
					spec: str(base.spec),
					family: oneOf(base.family, [
						'carbon-steel',
						'low-alloy',
						'stainless',
						'aluminium'
					] as const)
				}
			: undefined,
		filler: filler
			? { classification: str(filler.classification), diameterMm: pos(filler.diameterMm) }
			: undefined,
		tungsten: tungsten
			? { classification: str(tungsten.classification), diameterMm: pos(tungsten.diameterMm) }
			: undefined,
		gas: gas ? { name: str(gas.name), flowLPerMin: pos(gas.flowLPerMin) } : undefined,
		position: str(o.position),
		preheatC: num(o.preheatC),
		lensShade: pos(o.lensShade),
		chemistry,
		procedure
	};
}

function resolveMetal(s: WeldSettings): BaseMetal | undefined {
	const spec = s.baseMetal?.spec;
	if (spec) {
		const r = parseBaseMetal(spec);
		if (r.ok) return r.metal;
	}
	const f = s.baseMetal?.family;
	if (f) {
		const r = baseMetalFromFamily(f);
		if (r.ok) return r.metal;
	}
	return undefined;
}

function context(s: WeldSettings, options: CheckOptions | undefined): CheckContext {
	const metal = resolveMetal(s);
	const filler = s.filler?.classification ? parseFiller(s.filler.classification) : undefined;
	const tungsten = s.tungsten?.classification
		? parseTungsten(s.tungsten.classification)
		: undefined;
	const gas = s.gas?.name ? parseGas(s.gas.name) : undefined;
	return {
		s,
		system: options?.system === 'metric' ? 'metric' : 'imperial',
		metal,
		family: metal?.family,
		filler: filler?.ok ? filler.filler : undefined,
		tungsten: tungsten?.ok ? tungsten.tungsten : undefined,
		gas: gas?.ok ? gas.gas : undefined
	};
}

/** Findings for inputs that were given but could not be read (tungsten, gas). */
function unreadable(ctx: CheckContext): Finding[] {
	const out: Finding[] = [];
	const t = ctx.s.tungsten?.classification;
	if (t && !ctx.tungsten) {
		const r = parseTungsten(t);
		if (!r.ok)
			out.push({
				check: 'tungsten-vs-current',
				status: 'caution',
				message: r.message,
				value: t,
				expected: { unit: 'classification' },
				source: sourceOf(AWS_A5_12),
				field: 'tungsten.classification'
			});
	}
	const g = ctx.s.gas?.name;
	if (g && !ctx.gas) {
		const r = parseGas(g);
		if (!r.ok)
			out.push({
				check: 'gas-vs-process',
				status: 'caution',
				message: r.message,
				value: g,
				expected: { unit: 'gas' },
				source: sourceOf(GAS_MIX_PRACTICE),
				field: 'gas.name'
			});
	}
	return out;
}

const CHECKS: readonly ((ctx: CheckContext) => Finding | Finding[] | null)[] = [
	checkAmpsVsThickness,
	checkAmpsVsFiller,
	checkAmpsVsTungsten,
	checkTungstenVsCurrent,
	checkWfsVsAmps,
	checkCurrentType,
	checkHeatInput,
	checkLensShade,
	checkGasForProcess,
	checkGasFlow,
	checkFillerClassification,
	checkFillerVsBaseMetal,
	checkBaseMetal,
	checkPreheat,
	checkCarbonEquivalent,
	checkWithinProcedure,
	unreadable
];

function guarded<T>(f: () => T, fallback: T): T {
	try {
		return f();
	} catch {
		return fallback;
	}
}

function derive(ctx: CheckContext): Derived {
	const { s } = ctx;
	const d: Derived = {};
	const hi =
		isNum(s.volts) && isNum(s.amps) && isNum(s.travelSpeedMmPerS)
			? heatInput(s.process, s.volts, s.amps, s.travelSpeedMmPerS)
			: null;
	if (hi) d.heatInput = hi;
	const shade = isNum(s.amps) ? lensShade(s.process, s.amps) : null;
	if (shade) d.shade = { minimum: shade.minimum, suggested: shade.suggested };
	if (ctx.filler)
		d.filler = {
			spec: ctx.filler.spec,
			minTensileKsi: ctx.filler.minTensileKsi,
			fNumber: ctx.filler.fNumber,
			aNumber: ctx.filler.aNumber
		};
	if (ctx.metal)
		d.baseMetal = { family: ctx.metal.family, pNumber: ctx.metal.pNumber, group: ctx.metal.group };
	const pre =
		ctx.family === 'carbon-steel' && isNum(s.thicknessMm)
			? d11MinimumPreheat(s.thicknessMm, ctx.system)
			: null;
	const ce = carbonEquivalentIIW(s.chemistry);
	if (pre)
		d.preheat = {
			minimumF: pre.minF,
			minimumC: pre.minC,
			...(ce === null ? {} : { carbonEquivalent: Math.round(ce * 100) / 100 })
		};
	return d;
}

/**
 * Runs every check whose inputs are present. `settings` is the SI record (see settings.ts); the
 * findings come in catalogue order and are the same for the same input.
 */
export function runChecks(settings: WeldSettings, options?: CheckOptions): CheckResult {
	return guarded(
		() => {
			const s = cleanSettings(settings);
			if (!s) return { findings: [], derived: {} };
			const ctx = context(s, options);
			const findings = CHECKS.flatMap((check) => {
				const r = guarded(() => check(ctx), null);
				return r === null ? [] : Array.isArray(r) ? r : [r];
			});
			const rank = (f: Finding) => CHECK_IDS.indexOf(f.check);
			findings.sort((a, b) => rank(a) - rank(b));
			return { findings, derived: guarded(() => derive(ctx), {}) };
		},
		{ findings: [], derived: {} }
	);
}
