// A revision against its PQRs judged by the revision's own governing code (issue 15):
// - thickness from the coupon by D1.1 Table 4.2 or ISO 15614-1 Table 7 (ASME IX keeps QW-451.1
//   in findings.ts);
// - changes from the PQR classed by ASME IX QW-255 / QW-256, or by ISO 15614-1 8.4 / 8.5;
// - where Beadline has no rule of that code, a finding that says so instead of another code's.
import {
	asmeChanges,
	codeRule,
	formatLength,
	mmToIn,
	thicknessByCode,
	type FindingSource,
	type UnitSystem
} from '$lib/weld';
import { sourceOf } from '$lib/weld/findings';
import { ISO_15614_1_2017 } from '$reference/sources';
import type { Transfer } from '$reference/types';
import type { RevisionVariables } from '$lib/schemas/procedure';
import type { ProcedureFinding } from './findings';
import type { PqrQualified } from './pqr-values';

export interface PqrWithCoupon {
	number: string;
	qualified: PqrQualified;
	/** From the PQR's actual values; absent for callers that do not read them. */
	coupon?: { thicknessMm: number | null; transfer: Transfer | null; testPosition?: string | null };
}

const PRODUCT_NOTE: FindingSource = {
	label: 'Beadline: the governing code of the procedure',
	kind: 'common practice'
};
const num = <T>(x: T | null | undefined): T | undefined => (x === null ? undefined : x);

/** Thickness of the revision against what each PQR's coupon qualifies under D1.1 or ISO. */
export function codeThicknessFindings(
	v: RevisionVariables,
	pqrs: PqrWithCoupon[],
	system: UnitSystem
): ProcedureFinding[] {
	const code = v.code === 'aws-d1.1' ? 'aws-d1.1' : 'iso-15614-1';
	const label = code === 'aws-d1.1' ? 'D1.1 Table 4.2' : 'ISO 15614-1 Table 7';
	const tr = v.baseMetals.thicknessMm;
	if (tr.min === null && tr.max === null) return [];
	const out: ProcedureFinding[] = [];
	const unit = system === 'imperial' ? 'in' : 'mm';
	const conv = (mm: number) =>
		system === 'imperial' ? Math.round(mmToIn(mm) * 10000) / 10000 : Math.round(mm * 100) / 100;
	const len = (mm: number) => formatLength(mm, system);
	for (const p of pqrs) {
		const t = p.coupon?.thicknessMm;
		if (t === undefined || t === null) {
			out.push({
				check: 'pqr-ranges',
				status: 'caution',
				message: `${p.number}: no coupon thickness recorded, so the ${label} range cannot be worked out (no other code's range is used instead).`,
				value: null,
				expected: { unit },
				source: PRODUCT_NOTE,
				at: 'thickness',
				pqr: p.number
			});
			continue;
		}
		const r = thicknessByCode(code, t, { transfer: p.coupon?.transfer ?? undefined });
		if (!r.ok) {
			out.push({
				check: 'pqr-ranges',
				status: 'caution',
				message: `${p.number}: ${r.message}`,
				value: null,
				expected: { unit },
				source: PRODUCT_NOTE,
				at: 'thickness',
				pqr: p.number
			});
			continue;
		}
		const range = `${len(r.minMm)}–${r.maxMm === null ? 'unlimited' : len(r.maxMm)}`;
		for (const [end, value] of [
			['low', tr.min],
			['high', tr.max]
		] as const) {
			if (value === null) continue;
			const outside = value < r.minMm - 0.005 || (r.maxMm !== null && value > r.maxMm + 0.005);
			out.push({
				check: 'pqr-ranges',
				status: outside ? 'outside' : 'ok',
				message: `${p.number}: thickness ${len(value)} is ${outside ? 'outside' : 'within'} what its ${len(t)} coupon qualifies by ${r.rule} (${range}).${r.notes.length ? ` ${r.notes.join(' ')}` : ''}`,
				value: conv(value),
				expected: {
					min: conv(r.minMm),
					...(r.maxMm === null ? {} : { max: conv(r.maxMm) }),
					unit
				},
				source: r.source ?? sourceOf(ISO_15614_1_2017),
				at: 'thickness',
				end,
				pqr: p.number
			});
		}
	}
	return out;
}

/** Changes from one PQR, classed by the revision's code (ASME IX or ISO 15614-1). */
export function codeChangeFindings(v: RevisionVariables, p: PqrWithCoupon): ProcedureFinding[] {
	const q = p.qualified;
	const out: ProcedureFinding[] = [];
	if (v.code === 'asme-ix') {
		const wps = {
			process: v.process,
			currentType: num(v.electrical.currentType),
			transfer: num(v.electrical.transfer),
			amps: { min: num(v.electrical.amps.min), max: num(v.electrical.amps.max) },
			volts: { min: num(v.electrical.volts.min), max: num(v.electrical.volts.max) }
		};
		const pqr = {
			process: q.process,
			// Current type is its own check (pqr-current-type, QW-409.4); not repeated here.
			transfer: num(q.transfer),
			amps: { min: num(q.amps), max: num(q.amps) },
			volts: { min: num(q.volts), max: num(q.volts) }
		};
		for (const c of asmeChanges(pqr, { ...wps, currentType: undefined }))
			out.push({
				check: 'pqr-code-rules',
				status: c.requalify ? 'outside' : 'ok',
				message: `${p.number}: ${c.message}`,
				value: null,
				expected: { unit: c.paragraph },
				source: c.source,
				at: c.variable === 'transfer' ? 'transfer' : c.variable,
				pqr: p.number
			});
		return out;
	}
	// ISO 15614-1: transfer is qualified as tested (8.5.2.3); amps and volts alone have no range.
	const t = num(v.electrical.transfer);
	if (
		q.transfer &&
		t &&
		q.transfer !== t &&
		(q.transfer === 'short-circuit') !== (t === 'short-circuit')
	)
		out.push({
			check: 'pqr-code-rules',
			status: 'outside',
			message: `${p.number}: welded with ${q.transfer} transfer; ${t} needs its own test (ISO 15614-1 8.5.2.3: short-circuit qualifies short-circuit only).`,
			value: t,
			expected: { unit: q.transfer },
			source: sourceOf(ISO_15614_1_2017),
			at: 'transfer',
			pqr: p.number
		});
	for (const variable of ['amps', 'volts'] as const) {
		const set = v.electrical[variable];
		if (set.min === null && set.max === null) continue;
		const rule = codeRule('iso-15614-1', variable, v.process);
		if (!rule.modelled)
			out.push({
				check: 'pqr-code-rules',
				status: 'caution',
				message: `${p.number}: ${rule.message} ISO 15614-1 limits heat input (8.4.7) when impact or hardness requirements apply.`,
				value: null,
				expected: { unit: variable },
				source: PRODUCT_NOTE,
				at: variable,
				pqr: p.number
			});
	}
	return out;
}
