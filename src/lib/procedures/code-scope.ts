// Which code judges a revision, and what that code says where findings.ts would otherwise reach
// for ASME IX (issue 15): positions by D1.1 Table 4.1 or ISO 15614-1 8.4.2, the process and
// current-type sources in the procedure's own code, and a plain "no D1.1 rule modelled for this
// variable" where Beadline has no rule of that code, instead of another code's. Pure.
import { codeRule, d11WpsPositions, type Finding, type FindingSource } from '$lib/weld';
import { AWS_D1_1_TABLE_4_5, ISO_15614_1_2017 } from '$reference/sources';
import type { Source } from '$reference/types';
import type { RevisionVariables } from '$lib/schemas/procedure';
import type { ProcedureFinding } from './findings';
import { CODE_LABELS, type CodeId } from './options';
import type { PqrWithCoupon } from './code-findings';

const PRODUCT_NOTE: FindingSource = {
	label: 'Beadline: the governing code of the procedure',
	kind: 'common practice'
};
const short = (code: CodeId) =>
	code === 'aws-d1.1' ? 'D1.1' : code === 'iso-15609-1' ? 'ISO 15614-1' : CODE_LABELS[code];

/** The line the review screen shows: which code judges the revision, and what that means. */
export function judgedBy(code: CodeId): { label: string; text: string } {
	if (code === 'asme-ix')
		return {
			label: 'ASME IX',
			text: 'Ranges and changes from the PQRs are judged by ASME IX (QW-451.1, QW-255/QW-256, QW-424, QW-432).'
		};
	if (code === 'aws-d1.1')
		return {
			label: 'AWS D1.1',
			text: 'Ranges and changes from the PQRs are judged by AWS D1.1 (Table 4.1 positions, Table 4.2 thickness, Table 4.5 changes). Where Beadline has no D1.1 rule for a variable, the finding says so; no ASME IX rule is applied in its place.'
		};
	if (code === 'iso-15609-1')
		return {
			label: 'ISO 15614-1 (WPS to ISO 15609-1)',
			text: 'Ranges and changes from the PQRs are judged by ISO 15614-1 clause 8. Where Beadline has no ISO 15614-1 rule for a variable, the finding says so; no ASME IX rule is applied in its place.'
		};
	return {
		label: CODE_LABELS[code],
		text: 'No code judges this revision. The PQR comparisons use ASME IX rules as the shop’s yardstick and show the AWS D1.1 triggers for comparison only.'
	};
}

/** The source of the same-process and same-current checks in the revision's own code. */
export function ownCodeSource(code: CodeId, variable: 'process' | 'currentType', asme: Source) {
	if (code === 'aws-d1.1') return AWS_D1_1_TABLE_4_5;
	if (code === 'iso-15609-1')
		return {
			...ISO_15614_1_2017,
			label: `ISO 15614-1:2017 ${variable === 'process' ? '8.4.1 (process)' : '8.4.6 (current type)'}`
		};
	return asme;
}

/**
 * A weld-core finding that quotes AWS D1.1 (the prequalified preheat of Table 3.3) on a revision
 * that follows another code: kept for comparison, never "outside", and it says whose rule it is.
 */
export function inOwnCode(f: Finding, code: CodeId): Finding {
	if (code === 'aws-d1.1' || code === 'shop' || !f.source.label.includes('D1.1')) return f;
	return {
		...f,
		status: f.status === 'outside' ? 'caution' : f.status,
		message: `${f.message} (An AWS D1.1 table, shown for comparison: this procedure follows ${CODE_LABELS[code]}, which sets no such minimum here; the WPS${code === 'iso-15609-1' ? ' and EN 1011-2' : ''} and the engineer decide.)`
	};
}

const LETTERS: Record<string, string[]> = {
	'1': ['F'],
	'2': ['H'],
	'3': ['V'],
	'4': ['OH'],
	'5': ['F', 'V', 'OH'],
	'6': ['F', 'H', 'V', 'OH']
};
const lettersOf = (p: string) => LETTERS[/^([1-6])[GF]R?$/.exec(p)?.[1] ?? ''] ?? null;

/** Production positions against the PQRs' test positions by D1.1 or ISO 15614-1. */
export function codePositionFindings(
	v: RevisionVariables,
	pqrs: PqrWithCoupon[]
): ProcedureFinding[] {
	const allowed = v.positions.allowed;
	if (!allowed.length || !pqrs.length) return [];
	const names = pqrs.map((p) => p.number).join(', ');
	const tests = pqrs.flatMap((p) => (p.coupon?.testPosition ? [p.coupon.testPosition] : []));
	const base = { check: 'pqr-positions' as const, at: 'positions', value: allowed.join(', ') };
	if (!tests.length)
		return [
			{
				...base,
				status: 'caution',
				message: `No test position is recorded on ${names}, so the ${short(v.code)} positions qualified cannot be worked out (no other code's rule is used instead).`,
				expected: { unit: 'test position' },
				source: PRODUCT_NOTE
			}
		];
	if (v.code === 'aws-d1.1') {
		const q = d11WpsPositions(tests);
		const got: readonly string[] = q.positions;
		const missing = allowed.filter((p) => lettersOf(p)?.some((l) => !got.includes(l)));
		const covered = q.positions.join(', ') || 'none';
		return [
			{
				...base,
				status: missing.length ? 'outside' : 'ok',
				message: missing.length
					? `${missing.join(', ')} ${missing.length > 1 ? 'are' : 'is'} not qualified by the test position of ${names} (${tests.join(', ')} qualifies ${covered} by D1.1 Table 4.1).`
					: `Every position is qualified by the test position of ${names} (${tests.join(', ')} qualifies ${covered} by D1.1 Table 4.1).`,
				expected: { unit: covered },
				source: q.source
			}
		];
	}
	// ISO 15614-1 8.4.2: one position qualifies all where neither impact nor hardness is asked for.
	const tested = new Set(tests.flatMap((t) => lettersOf(t) ?? []));
	const beyond = allowed.filter((p) => lettersOf(p)?.some((l) => !tested.has(l)));
	return [
		{
			...base,
			status: beyond.length ? 'caution' : 'ok',
			message: beyond.length
				? `${beyond.join(', ')} ${beyond.length > 1 ? 'go' : 'goes'} beyond the test position of ${names} (${tests.join(', ')}). ISO 15614-1 8.4.2: one position qualifies all positions where no impact or hardness requirement applies; where one does, the impact specimens come from the highest and the hardness from the lowest heat-input position. Confirm which applies; vertical-down positions (PG, PJ, J-L045) need a test piece of their own.`
				: `Every position is the test position of ${names} (${tests.join(', ')}; ISO 15614-1 8.4.2).`,
			expected: { unit: tests.join(', ') },
			source: { label: 'ISO 15614-1:2017 8.4.2 (welding position)', kind: ISO_15614_1_2017.kind }
		}
	];
}

type Gap = { variable: string; label: string; at: string; set: (v: RevisionVariables) => boolean };
const has = (r: { min: number | null; max: number | null }) => r.min !== null || r.max !== null;
const GAPS: Gap[] = [
	{ variable: 'amps', label: 'amperage', at: 'amps', set: (v) => has(v.electrical.amps) },
	{ variable: 'volts', label: 'voltage', at: 'volts', set: (v) => has(v.electrical.volts) },
	{
		variable: 'travelSpeed',
		label: 'travel speed',
		at: 'travelSpeed',
		set: (v) => has(v.technique.travelSpeedMmPerS)
	},
	{
		variable: 'wireFeed',
		label: 'wire feed speed',
		at: 'wireFeed',
		set: (v) => has(v.electrical.wireFeedMmPerS)
	},
	{
		variable: 'heatInput',
		label: 'heat input',
		at: 'heatInput',
		set: (v) => v.electrical.heatInputMaxJPerMm !== null
	},
	{ variable: 'gas', label: 'shielding gas', at: 'gasName', set: (v) => v.gas.shielding !== '' },
	{
		variable: 'filler',
		label: 'filler metal',
		at: 'fillerClasses',
		set: (v) => v.fillerMetals.classifications.length > 0
	},
	{ variable: 'preheat', label: 'preheat', at: 'preheat', set: (v) => v.preheat.minC !== null },
	{ variable: 'pwht', label: 'PWHT', at: 'pwht', set: (v) => v.pwht.required },
	{
		variable: 'baseMetal',
		label: 'P-Number (an ASME IX grouping)',
		at: 'pNumbers',
		set: (v) => v.baseMetals.pNumbers.length > 0
	},
	{
		variable: 'filler',
		label: 'F-Number (an ASME IX grouping)',
		at: 'fNumbers',
		set: (v) => v.fillerMetals.fNumbers.length > 0
	}
];
// Rules the ISO module names (codeRule) that the review does not yet compare with the PQR.
const ISO_NOT_COMPARED = new Set(['heatInput', 'gas', 'filler', 'preheat', 'pwht', 'baseMetal']);
// Amps and volts: D1.1 Table 4.5 answers them where it has a limit (requalification.ts); for
// ISO the per-PQR finding of code-findings.ts already says there is no rule.
const ELECTRICAL = new Set(['amps', 'volts']);

/**
 * For D1.1 and ISO revisions: one finding a variable the revision sets where Beadline has no rule
 * of that code (or has one it does not compare with the PQR yet). None for ASME IX or shop.
 */
export function codeGapFindings(v: RevisionVariables, pqrs: PqrWithCoupon[]): ProcedureFinding[] {
	if ((v.code !== 'aws-d1.1' && v.code !== 'iso-15609-1') || !pqrs.length) return [];
	const out: ProcedureFinding[] = [];
	for (const g of GAPS) {
		if (!g.set(v)) continue;
		const rule = codeRule(v.code, g.variable, v.process);
		if (ELECTRICAL.has(g.variable) && (v.code === 'iso-15609-1' || rule.modelled)) continue;
		const pNumberLike = g.at === 'pNumbers' || g.at === 'fNumbers';
		let message: string;
		if (!rule.modelled || (v.code === 'aws-d1.1' && pNumberLike))
			message = `No ${short(v.code)} rule modelled for this variable (${g.label}${v.code === 'aws-d1.1' && ['amps', 'volts'].includes(g.variable) ? `, ${v.process}` : ''}): it is not compared with the PQR, and no other code's rule is applied in its place.`;
		else if (v.code === 'iso-15609-1' && pNumberLike)
			message = `ISO 15614-1 groups parent metals and fillers by ISO/TR 15608 and its own filler rules (${rule.rule}), not by ${g.at === 'pNumbers' ? 'P-Number' : 'F-Number'}: not compared with the PQR, and no ASME IX rule is applied in its place.`;
		else if (v.code === 'iso-15609-1' && ISO_NOT_COMPARED.has(g.variable))
			message = `ISO 15614-1 ${rule.rule} governs this variable (${g.label}); Beadline does not compare it with the PQR yet, and applies no other code's rule in its place.`;
		else continue;
		out.push({
			check: 'pqr-code-rules',
			status: 'caution',
			message,
			value: null,
			expected: { unit: g.label },
			source: PRODUCT_NOTE,
			at: g.at
		});
	}
	return out;
}
