// Each procedure is judged by its own governing code. This module says, for a code and a
// variable, which rule Beadline applies, or says plainly that it has none ("no D1.1 rule modelled
// for this variable") instead of borrowing another code's rule. Pure; never throws.
import type { Transfer } from '$reference/types';
import { d11ThicknessRange } from './d1-1-ranges';
import type { FindingSource } from './findings';
import { isoThicknessRange } from './iso-15614-ranges';
import { pqrThicknessRange } from './qualified-ranges';

export const GOVERNING_CODES = ['asme-ix', 'aws-d1.1', 'iso-15614-1', 'shop'] as const;
export type GoverningCode = (typeof GOVERNING_CODES)[number];

export const GOVERNING_CODE_LABELS: Record<GoverningCode, string> = {
	'asme-ix': 'ASME IX',
	'aws-d1.1': 'AWS D1.1',
	'iso-15614-1': 'ISO 15614-1',
	shop: 'shop practice (no code)'
};
const SHORT: Record<GoverningCode, string> = {
	'asme-ix': 'ASME IX',
	'aws-d1.1': 'D1.1',
	'iso-15614-1': 'ISO 15614-1',
	shop: 'shop-practice'
};

/** Reads the ways a code is written across Beadline (ids, labels, the WPS standard ISO 15609-1). */
export function normaliseCode(x: unknown): GoverningCode | null {
	if (typeof x !== 'string') return null;
	const k = x.trim().toLowerCase().replace(/\s+/g, ' ');
	if (['asme-ix', 'asme ix', 'asme', 'asme bpvc ix'].includes(k)) return 'asme-ix';
	if (['aws-d1.1', 'aws d1.1', 'd1.1'].includes(k)) return 'aws-d1.1';
	if (
		[
			'iso-15614-1',
			'iso 15614-1',
			'iso-15609-1',
			'iso 15609-1',
			'iso 9606-1',
			'iso-9606-1',
			'iso'
		].includes(k)
	)
		return 'iso-15614-1';
	if (['shop', 'shop practice'].includes(k)) return 'shop';
	return null;
}

export const CODE_VARIABLES = [
	'thickness',
	'diameter',
	'positions',
	'process',
	'currentType',
	'transfer',
	'amps',
	'volts',
	'travelSpeed',
	'wireFeed',
	'heatInput',
	'gas',
	'filler',
	'preheat',
	'pwht',
	'baseMetal'
] as const;
export type CodeVariable = (typeof CODE_VARIABLES)[number];

// Where each code's rule for a variable lives in Beadline. A missing entry is "not modelled".
const RULES: Record<Exclude<GoverningCode, 'shop'>, Partial<Record<CodeVariable, string>>> = {
	'asme-ix': {
		thickness: 'QW-451.1 (QW-403.8; QW-403.10 for short-circuit GMAW)',
		positions: 'QW-405.1: a position is a nonessential variable for the procedure',
		process: 'QW-401: each process qualified on its own',
		currentType: 'QW-409.4',
		transfer: 'QW-409.2 (GMAW)',
		amps: 'QW-409.8 (nonessential)',
		volts: 'QW-409.8 (nonessential)',
		travelSpeed: 'QW-409.8 / QW-409.1 (nonessential unless toughness testing applies)',
		wireFeed: 'QW-409.8 (nonessential)',
		heatInput: 'QW-409.1 (supplementary essential)',
		gas: 'QW-408.2',
		filler: 'QW-404.4 (F-Number), QW-404.5 (A-Number)',
		preheat: 'QW-406.1',
		pwht: 'QW-407.1',
		baseMetal: 'QW-403.11 (P-Number), QW-403.5 (Group Number)'
	},
	'aws-d1.1': {
		thickness: 'Table 4.2 (2015): CJP groove plate thickness qualified',
		diameter: 'Table 4.2 (2015): pipe diameter qualified',
		positions: 'Table 4.1 (2015): production positions qualified',
		process: 'Table 4.5: a change of process',
		currentType: 'Table 4.5: a change of current type or polarity',
		transfer: 'Table 4.5: a change of transfer mode',
		amps: 'Table 4.5: amperage beyond 10 % (GMAW, FCAW) or 25 % (GTAW)',
		volts: 'Table 4.5: voltage beyond 7 % (GMAW, FCAW)'
	},
	'iso-15614-1': {
		thickness: '8.3.2, Table 7',
		diameter: '8.3.3, Table 9',
		positions: '8.4.2',
		process: '8.4.1',
		currentType: '8.4.6',
		transfer: '8.5.2.3 (metal transfer)',
		heatInput: '8.4.7',
		gas: '8.5.2.1 / 8.5.3.1',
		filler: '8.4.4',
		preheat: '8.4.8 (and interpass 8.4.9)',
		pwht: '8.4.11',
		baseMetal: '8.3.1, Table 5 (ISO/TR 15608 groups)'
	}
};

// Variables a code's rule covers only for some processes.
const D11_PROCESS_LIMITS: Partial<Record<CodeVariable, readonly string[]>> = {
	amps: ['GMAW', 'FCAW', 'GTAW'],
	volts: ['GMAW', 'FCAW']
};

export type CodeRule =
	| { modelled: true; code: GoverningCode; variable: string; rule: string }
	| { modelled: false; code: GoverningCode | null; variable: string; message: string };

/** The rule the governing code gives a variable, or a plain "no rule modelled". */
export function codeRule(code: unknown, variable: unknown, process?: unknown): CodeRule {
	const c = normaliseCode(code);
	const v = typeof variable === 'string' ? variable.slice(0, 40) : '(not a variable name)';
	if (c === null)
		return {
			modelled: false,
			code: null,
			variable: v,
			message: 'No governing code is set for this procedure; no code rule applied.'
		};
	if (c === 'shop')
		return {
			modelled: false,
			code: c,
			variable: v,
			message: 'Shop practice: no code rule applies to this variable; findings are advice.'
		};
	const rule = Object.hasOwn(RULES[c], v) ? RULES[c][v as CodeVariable] : undefined;
	const limited =
		c === 'aws-d1.1' && Object.hasOwn(D11_PROCESS_LIMITS, v)
			? D11_PROCESS_LIMITS[v as CodeVariable]
			: undefined;
	if (!rule || (limited && typeof process === 'string' && !limited.includes(process)))
		return {
			modelled: false,
			code: c,
			variable: v,
			message: `No ${SHORT[c]} rule modelled for this variable (${v}${limited && typeof process === 'string' ? `, ${process}` : ''}); no other code's rule is applied in its place.`
		};
	return { modelled: true, code: c, variable: v, rule };
}

export type CodeThickness =
	| {
			ok: true;
			code: GoverningCode;
			minMm: number;
			maxMm: number | null;
			rule: string;
			notes: string[];
			source?: FindingSource;
	  }
	| { ok: false; code: GoverningCode | null; message: string };

/** The base-metal thickness a coupon qualifies under the procedure's own code. */
export function thicknessByCode(
	code: unknown,
	couponMm: unknown,
	opts: { transfer?: Transfer; runs?: 'single' | 'multi' } = {}
): CodeThickness {
	const c = normaliseCode(code);
	try {
		if (c === 'asme-ix') {
			const r = pqrThicknessRange({ value: couponMm, unit: 'mm' }, undefined, opts.transfer);
			if (!r.ok) return { ok: false, code: c, message: r.message };
			return {
				ok: true,
				code: c,
				minMm: r.baseMetal.min.value,
				maxMm: r.baseMetal.max.value,
				rule: `QW-451.1 ${r.row}`,
				notes: r.notes,
				source: r.source
			};
		}
		if (c === 'aws-d1.1') {
			const r = d11ThicknessRange(couponMm, opts.transfer);
			if (!r.ok) return { ok: false, code: c, message: r.message };
			return {
				ok: true,
				code: c,
				minMm: r.minMm,
				maxMm: r.maxMm,
				rule: `D1.1 Table 4.2, ${r.row}`,
				notes: r.notes,
				source: r.source
			};
		}
		if (c === 'iso-15614-1') {
			const r = isoThicknessRange(couponMm, opts.runs ?? 'multi');
			if (!r.ok) return { ok: false, code: c, message: r.message };
			return {
				ok: true,
				code: c,
				minMm: r.min,
				maxMm: r.max,
				rule: 'ISO 15614-1 Table 7',
				notes: r.notes,
				source: r.source
			};
		}
	} catch {
		return { ok: false, code: c, message: 'The thickness could not be worked out.' };
	}
	const rule = codeRule(code, 'thickness');
	return { ok: false, code: c, message: rule.modelled ? '' : rule.message };
}
