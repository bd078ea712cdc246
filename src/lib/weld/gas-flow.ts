// Shielding gas: read the mix, check it suits the job, check the flow.
import {
	GAS_FLOW,
	GAS_MIXES,
	SPRAY_MIN_ARGON,
	gasUseFor,
	type FlowRow,
	type GasMix
} from '$reference/shielding-gas';
import { GAS_MIX_PRACTICE } from '$reference/sources';
import type { Process } from '$reference/types';
import type { CheckContext } from './context';
import {
	bandStatus,
	isNum,
	rangeText,
	round,
	sourceOf,
	type Finding,
	type FindingStatus,
	guardCheck
} from './findings';
import { flowToLPerMin, formatFlow, lPerMinToFlow } from './units';

export type { GasMix };
export type GasResult = { ok: true; gas: GasMix } | { ok: false; message: string };

const squash = (s: string): string => s.toLowerCase().replace(/[\s%]/g, '').replace(/[–—−]/g, '-');
const LOOKUP = new Map<string, GasMix>();
for (const g of GAS_MIXES) {
	LOOKUP.set(squash(g.id), g);
	LOOKUP.set(squash(g.name), g);
	for (const a of g.aliases) LOOKUP.set(squash(a), g);
}

/** Reads "argon", "75/25", "C25", "98/2 Ar/O2", "100% CO2", "tri-mix" and similar. */
export function parseGas(text: unknown): GasResult {
	if (typeof text !== 'string' || text.trim() === '' || text.length > 60)
		return { ok: false, message: 'Enter a shielding gas such as argon, 75/25 or 98/2 Ar/O2.' };
	const hit = LOOKUP.get(squash(text));
	if (hit) return { ok: true, gas: hit };
	return {
		ok: false,
		message: `“${text.trim()}” is not a gas Beadline knows. Known: ${GAS_MIXES.map((g) => g.name).join('; ')}.`
	};
}

const heliumRich = (g: GasMix): boolean => g.he >= 50;
const inert = (g: GasMix): boolean => g.co2 === 0 && g.o2 === 0;

/** Usual flow for a process and gas, or null where no shielding gas is used (SMAW). */
export function gasFlowRange(process: Process, gas?: GasMix): FlowRow | null {
	const use = gasUseFor(process, gas ? heliumRich(gas) : false);
	return GAS_FLOW.find((r) => r.use === use) ?? null;
}

function checkGasFlowUnguarded(ctx: CheckContext): Finding | null {
	const flow = ctx.s.gas?.flowLPerMin;
	if (!isNum(flow) || ctx.filler?.gas === 'none') return null;
	const row = gasFlowRange(ctx.s.process, ctx.gas);
	if (!row) return null;
	const lpm = { min: flowToLPerMin(row.cfh.min, 'CFH'), max: flowToLPerMin(row.cfh.max, 'CFH') };
	const imperial = ctx.system === 'imperial';
	const band = imperial ? row.cfh : lpm;
	// Flow is forgiving: anything outside the usual band is a caution, never "outside".
	const inside = bandStatus(flow, lpm, 0) === 'ok';
	const low = flow < lpm.min;
	const range = rangeText(formatFlow(lpm.min, ctx.system), formatFlow(lpm.max, ctx.system));
	const what = `${ctx.s.process}${ctx.gas ? ` with ${ctx.gas.name}` : ''}`;
	const shown = formatFlow(flow, ctx.system);
	return {
		check: 'gas-flow',
		status: inside ? 'ok' : 'caution',
		message: inside
			? `${shown} is within the usual flow for ${what} (${range}).`
			: `${shown} is ${low ? 'below' : 'above'} the usual flow for ${what} (${range}); ${low ? 'too little gas gives porosity' : 'too much can pull air into the arc'}. Usual range: ${row.note}.`,
		value: round(imperial ? lPerMinToFlow(flow, 'CFH') : flow, 1),
		expected: {
			min: round(band.min, 1),
			max: round(band.max, 1),
			unit: imperial ? 'CFH' : 'L/min'
		},
		source: sourceOf(row.source),
		field: 'gas.flow'
	};
}

interface Verdict {
	status: FindingStatus;
	message: string;
}

function gasVerdict(ctx: CheckContext, g: GasMix): Verdict {
	const { process, transfer } = ctx.s;
	const family = ctx.family;
	const name = g.name;
	if (process === 'GTAW')
		return inert(g)
			? { status: 'ok', message: `${name} suits GTAW.` }
			: {
					status: 'outside',
					message: `GTAW needs an inert gas (argon, helium or a mix of them); ${name} will burn the tungsten.`
				};
	if (process === 'GMAW') {
		if (family === 'aluminium' && !inert(g))
			return {
				status: 'outside',
				message: `Aluminium needs argon, helium or a mix of them; ${name} oxidises the weld.`
			};
		if (
			(transfer === 'spray' || transfer === 'pulsed-spray') &&
			g.ar < SPRAY_MIN_ARGON &&
			!heliumRich(g)
		)
			return {
				status: 'outside',
				message: `Spray transfer needs about ${SPRAY_MIN_ARGON} % argon or more; ${name} will stay globular.`
			};
		if (family === 'stainless' && g.co2 > 5 && g.id !== 'tri-mix')
			return {
				status: 'caution',
				message: `${name} adds carbon to stainless; 98/2 mixes or tri-mix are usual.`
			};
		if ((family === 'carbon-steel' || family === 'low-alloy') && inert(g))
			return {
				status: 'caution',
				message: `${name} alone gives an unstable arc and poor wetting on steel; add CO2 or O2.`
			};
		return {
			status: 'ok',
			message: `${name} suits GMAW${family ? ` on ${family.replace('-', ' ')}` : ''}.`
		};
	}
	if (process === 'FCAW') {
		const wants = ctx.filler?.gas;
		if (wants === 'none')
			return {
				status: 'caution',
				message: `${ctx.filler?.classification} is self-shielded; it needs no gas.`
			};
		if (wants === 'CO2' && g.id !== 'co2')
			return {
				status: 'caution',
				message: `${ctx.filler?.classification} is classified with 100 % CO2 (the C); ${name} changes the deposit.`
			};
		if (wants === 'Ar/CO2 75-80 %' && !(g.co2 >= 20 && g.co2 <= 25 && g.he === 0))
			return {
				status: 'caution',
				message: `${ctx.filler?.classification} is classified with 75-80 % argon / CO2 (the M); ${name} changes the deposit.`
			};
		return {
			status: 'ok',
			message: `${name} suits ${ctx.filler?.classification ?? 'gas-shielded FCAW'}.`
		};
	}
	return { status: 'caution', message: 'SMAW needs no shielding gas.' };
}

function checkGasForProcessUnguarded(ctx: CheckContext): Finding | null {
	const g = ctx.gas;
	if (!g) return null;
	const v = gasVerdict(ctx, g);
	return {
		check: 'gas-vs-process',
		status: v.status,
		message: v.message,
		value: g.name,
		expected: { unit: 'gas' },
		source: sourceOf(GAS_MIX_PRACTICE),
		field: 'gas.name'
	};
}

export const checkGasFlow = guardCheck(checkGasFlowUnguarded, null);
export const checkGasForProcess = guardCheck(checkGasForProcessUnguarded, null);
