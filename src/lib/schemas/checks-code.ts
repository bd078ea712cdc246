// The governing code as an optional input of the checks API (issue 15). A body without `code`
// answers exactly as before; with it, the answer adds what that code says (or that Beadline has
// no rule of that code for a variable) and, for the range endpoints, that code's own ranges.
import { z } from 'zod';
import { cetPreheat } from '$lib/weld/cet-preheat';
import type { FindingSource } from '$lib/weld/findings';
import {
	codeRule,
	GOVERNING_CODE_LABELS,
	GOVERNING_CODES,
	normaliseCode,
	thicknessByCode,
	type CodeRule,
	type GoverningCode
} from '$lib/weld/governing-code';
import { heatInput } from '$lib/weld/heat-input';
import { welderPositionsIso } from '$lib/weld/iso-9606-ranges';
import type { WeldSettings } from '$lib/weld/settings';
import { lengthToMm, mmToLength } from '$lib/weld/units';
import {
	checksBodySchema,
	checksFieldErrors,
	pqrRangesAnswer,
	pqrRangesBodySchema,
	welderPositionsAnswer,
	welderPositionsBodySchema,
	type PqrRangesAnswer,
	type WelderPositionsAnswer
} from './checks';

const codeField = (codes: readonly string[], welder = false) =>
	z.preprocess(
		(v) => {
			if (typeof v !== 'string') return v;
			const c = normaliseCode(v) ?? v.trim();
			return welder && c === 'iso-15614-1' ? 'iso-9606-1' : c;
		},
		z.enum(codes as [string, ...string[]], {
			error: `Code is one of ${codes.join(', ')} (ISO 15609-1 and ISO 9606-1 are read as ISO 15614-1).`
		})
	);

export const checksCodeBodySchema = checksBodySchema.extend({
	code: codeField(GOVERNING_CODES).optional(),
	/** Diffusible hydrogen of the consumable, ml/100 g (for the EN 1011-2 CET preheat). */
	hydrogen: z
		.number({ error: 'Give the diffusible hydrogen in ml/100 g as a number.' })
		.gt(0, 'Must be more than zero.')
		.max(100, 'Keep it at or under 100 ml/100 g.')
		.optional()
});
export type ChecksCodeBody = z.output<typeof checksCodeBodySchema>;

// Which variables of the body the code rules are asked about.
const PRESENT: [keyof ChecksCodeBody, string][] = [
	['thickness', 'thickness'],
	['position', 'positions'],
	['currentType', 'currentType'],
	['transfer', 'transfer'],
	['amps', 'amps'],
	['volts', 'volts'],
	['travelSpeed', 'travelSpeed'],
	['wireFeed', 'wireFeed'],
	['gas', 'gas'],
	['filler', 'filler'],
	['preheat', 'preheat'],
	['baseMetal', 'baseMetal']
];

export interface CodeExtras {
	code: { id: GoverningCode; label: string };
	codeRules: CodeRule[];
	/** EN 1011-2 method B, when the code is ISO 15614-1 and the inputs are there. */
	cetPreheat?: { cet: number; preheatC: number; message: string; source: FindingSource };
}

/** What the governing code adds to a checks answer; undefined without a code. */
export function codeExtras(body: ChecksCodeBody, s: WeldSettings): CodeExtras | undefined {
	const id = body.code as GoverningCode | undefined;
	if (!id) return undefined;
	const codeRules = PRESENT.filter(([k]) => body[k] !== undefined).map(([, v]) =>
		codeRule(id, v, body.process)
	);
	const out: CodeExtras = { code: { id, label: GOVERNING_CODE_LABELS[id] }, codeRules };
	if (id === 'iso-15614-1' && s.chemistry && s.thicknessMm && body.hydrogen) {
		const hi =
			s.volts && s.amps && s.travelSpeedMmPerS
				? heatInput(s.process, s.volts, s.amps, s.travelSpeedMmPerS)
				: null;
		if (hi) {
			const r = cetPreheat({
				chemistry: s.chemistry,
				thicknessMm: s.thicknessMm,
				hydrogen: body.hydrogen,
				heatInputKjPerMm: hi.isoKJPerMm
			});
			if (r.ok)
				out.cetPreheat = {
					cet: r.cet,
					preheatC: r.preheatC,
					message: r.message,
					source: r.source
				};
		}
	}
	return out;
}

// ---- pqr-ranges with a code ----

export const pqrRangesCodeBodySchema = pqrRangesBodySchema.extend({
	code: codeField(GOVERNING_CODES).optional(),
	/** ISO 15614-1 single-run or multi-run (multi when left out). */
	runs: z.enum(['single', 'multi'], { error: 'Runs is single or multi.' }).optional()
});
export type PqrRangesCodeBody = z.output<typeof pqrRangesCodeBodySchema>;

type Qty = { value: number; unit: 'in' | 'mm' };
export type PqrRangesCodeAnswer =
	| PqrRangesAnswer
	| {
			ok: true;
			answer: {
				code: GoverningCode;
				baseMetal: { min: Qty; max: Qty | null };
				row: string;
				notes: string[];
				source?: FindingSource;
			};
	  };

/** ASME IX (and no code) as before; D1.1 and ISO 15614-1 by their own thickness rows. */
export function pqrRangesCodeAnswer(body: PqrRangesCodeBody): PqrRangesCodeAnswer {
	const code = body.code as GoverningCode | undefined;
	if (!code || code === 'asme-ix') return pqrRangesAnswer(body);
	const unit = body.couponThickness.unit;
	const mm = lengthToMm(body.couponThickness.value, unit);
	const r = thicknessByCode(code, mm, {
		transfer: body.process === 'GMAW' ? body.transfer : undefined,
		runs: body.runs
	});
	if (!r.ok) return { ok: false, errors: { code: [r.message] } };
	const q = (v: number): Qty => ({
		// Thousandths of an inch: the mm rows are kept to 0.01 mm, so 4 places would show 0.1252.
		value: unit === 'in' ? Math.round(mmToLength(v, 'in') * 1000) / 1000 : v,
		unit
	});
	return {
		ok: true,
		answer: {
			code,
			baseMetal: { min: q(r.minMm), max: r.maxMm === null ? null : q(r.maxMm) },
			row: r.rule,
			notes: [
				...r.notes,
				'The deposited weld metal limit is an ASME IX idea (QW-451.1); not given for this code.'
			],
			...(r.source ? { source: r.source } : {})
		}
	};
}

// ---- welder-positions with a code ----

export const welderPositionsCodeBodySchema = z.object({
	code: codeField(['asme-ix', 'iso-9606-1', 'aws-d1.1'], true).optional(),
	testPositions: z.unknown(),
	weld: z.enum(['butt', 'fillet'], { error: 'Weld is butt or fillet.' }).optional()
});

/** ASME IX (and no code) as before; ISO 9606-1 in ISO 6947 terms; D1.1 says it has no rule. */
export function welderPositionsCodeAnswer(
	raw: z.output<typeof welderPositionsCodeBodySchema>
): WelderPositionsAnswer | { ok: true; answer: Record<string, unknown> } {
	const code = typeof raw.code === 'string' ? raw.code : undefined;
	if (!code || code === 'asme-ix') {
		const p = welderPositionsBodySchema.safeParse({ testPositions: raw.testPositions });
		return p.success
			? welderPositionsAnswer(p.data)
			: { ok: false, errors: checksFieldErrors(p.error) };
	}
	if (code === 'aws-d1.1')
		return {
			ok: false,
			errors: { code: ['No D1.1 welder position rule is modelled; no other code is applied.'] }
		};
	const list = Array.isArray(raw.testPositions) ? raw.testPositions : [];
	if (list.length === 0 || list.length > 10)
		return { ok: false, errors: { testPositions: ['Give 1 to 10 test positions, e.g. ["PF"].'] } };
	const r = welderPositionsIso(list, raw.weld ?? 'butt');
	if (r.unknown.length)
		return {
			ok: false,
			errors: {
				testPositions: [`Not ISO 6947 positions: ${r.unknown.join(', ')} (use PA, PB, … H-L045).`]
			}
		};
	return {
		ok: true,
		answer: {
			code: 'iso-9606-1',
			weld: raw.weld ?? 'butt',
			qualified: r.qualified,
			source: r.source
		}
	};
}
