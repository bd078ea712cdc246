// Base metal spec and grade to family, P-Number and Group.
import { BASE_METALS, type BaseMetalRow } from '$reference/base-metals';
import { D1_1_CATEGORY_B_SPECS } from '$reference/aws-d1-1-preheat';
import { ASME_IX_QW_422 } from '$reference/sources';
import type { MetalFamily } from '$reference/types';
import { sourceOf, guardCheck } from './findings';
import type { BaseMetal, CheckContext, Finding } from './types';

export type { BaseMetal } from './types';

export type BaseMetalResult = { ok: true; metal: BaseMetal } | { ok: false; message: string };

const BY_KEY = new Map(BASE_METALS.map((r) => [r.key, r]));
const STAINLESS = /(?<![0-9])(30[0-9]L?|31[0-9]L?|321|347)H?(?![0-9])/g;
const ALLOY = /(?:^|[^0-9])(1100|3003|5052|5083|5086|6061|6063)(?:$|[^0-9])/;

const fromRow = (row: BaseMetalRow): BaseMetal => ({
	row,
	family: row.family,
	pNumber: row.pNumber,
	group: row.group,
	d11CategoryB: D1_1_CATEGORY_B_SPECS.includes(row.key)
});

export const FAMILIES: readonly MetalFamily[] = [
	'carbon-steel',
	'low-alloy',
	'stainless',
	'aluminium'
];

export function baseMetalFromFamily(family: unknown): BaseMetalResult {
	if (typeof family === 'string' && (FAMILIES as readonly string[]).includes(family))
		return {
			ok: true,
			metal: {
				row: null,
				family: family as MetalFamily,
				pNumber: null,
				group: null,
				d11CategoryB: false
			}
		};
	return { ok: false, message: 'Family is one of carbon-steel, stainless or aluminium.' };
}

/**
 * Reads "A36", "ASTM A36", "SA-36", "A106 Gr B", "SA-516-70", "A240 304L", "TP316L", "6061-T6".
 * Never throws; an unknown spec gets a message saying what Beadline does know.
 */
export function parseBaseMetal(spec: unknown): BaseMetalResult {
	if (typeof spec !== 'string' || spec.trim() === '' || spec.length > 60)
		return {
			ok: false,
			message: 'Enter a base metal spec and grade, e.g. A36, A516-70, 304L or 6061.'
		};
	const raw = spec.trim();
	const s = raw
		.toUpperCase()
		.replace(/[–—−]/g, '-')
		.replace(/\b(ASTM|ASME|AISI|SAE|AA|UNS|TYPE|TP|ALLOY)\b\.?/g, ' ')
		.replace(/-T\d+\b/g, ' ')
		.replace(/\s+/g, ' ')
		.trim();
	// "A312 TP304L" holds two stainless-looking numbers; the first one in the table wins.
	for (const st of s.matchAll(STAINLESS)) {
		const row = st[1] ? BY_KEY.get(st[1]) : undefined;
		if (row) return { ok: true, metal: fromRow(row) };
	}
	const al = ALLOY.exec(s);
	if (al?.[1]) {
		const row = BY_KEY.get(al[1]);
		if (row) return { ok: true, metal: fromRow(row) };
	}
	const plain = BY_KEY.get(s.replace(/\s+/g, ''));
	if (plain) return { ok: true, metal: fromRow(plain) };
	const m = /^S?A\s*-?\s*(\d{2,4})(?:\s*-?\s*(?:GR(?:ADE)?\.?)?\s*-?\s*([A-Z0-9]{1,4}))?$/.exec(s);
	if (m) {
		const base = `A${m[1]}`;
		const withGrade = m[2] ? BY_KEY.get(`${base}-${m[2]}`) : BY_KEY.get(base);
		if (withGrade) return { ok: true, metal: fromRow(withGrade) };
		const grades = BASE_METALS.filter((r) => r.key.startsWith(`${base}-`));
		if (grades.length > 0 && !m[2])
			return {
				ok: false,
				message: `${raw}: give the grade (${grades.map((r) => r.key.slice(base.length + 1)).join(', ')}); P-Number and Group depend on it.`
			};
	}
	return {
		ok: false,
		message: `${raw} is not in Beadline's base metal table. Known: ${BASE_METALS.map((r) => r.key).join(', ')}. You can give the family instead.`
	};
}

function checkBaseMetalUnguarded(ctx: CheckContext): Finding | null {
	const spec = ctx.s.baseMetal?.spec;
	if (spec === undefined) return null;
	const r = ctx.metal?.row ? ({ ok: true, metal: ctx.metal } as const) : parseBaseMetal(spec);
	const field = 'baseMetal.spec';
	if (!r.ok || !r.metal.row)
		return {
			check: 'base-metal',
			status: 'caution',
			message: r.ok ? 'No spec given.' : r.message,
			value: typeof spec === 'string' ? spec.slice(0, 60) : null,
			expected: { unit: 'spec' },
			source: sourceOf(ASME_IX_QW_422),
			field
		};
	const row = r.metal.row;
	const grouping =
		row.pNumber === null
			? 'no P-Number is assigned to it; qualify with the same spec or a listed equivalent'
			: `P-${row.pNumber}${row.group === null ? '' : ` Group ${row.group}`}`;
	const memory =
		row.source.kind === 'from memory' ? ' (recalled, not read from the table: verify)' : '';
	return {
		check: 'base-metal',
		status: row.pNumber === null ? 'caution' : 'ok',
		message: `${row.name}: ${grouping}${memory}.`,
		value: row.key,
		expected: { unit: 'spec' },
		source: sourceOf(row.source),
		field
	};
}

export const checkBaseMetal = guardCheck(checkBaseMetalUnguarded, null);
