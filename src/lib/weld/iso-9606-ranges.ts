// ISO 9606-1:2012 welder ranges of qualification (clause 5), in the standard's own terms. Pure;
// never throws; ranges never empty or inverted. Rows read from the text (reference/sources.ts
// ISO_9606_1_2012); the standard the contract names decides.
import {
	DIAMETER,
	FILLER_GROUPS,
	FILLER_GROUP_QUALIFIES,
	PARENT_GROUPS_QUALIFIED,
	POSITIONS_BUTT,
	POSITIONS_FILLET,
	PROCESS_ALSO,
	PRODUCT,
	THICKNESS_BUTT,
	THICKNESS_FILLET,
	type FillerGroup
} from '$reference/iso-9606-1';
import { ASME_TO_ISO, ISO_POSITIONS, type IsoPosition } from '$reference/iso-6947';
import {
	ISO_9606_1_2012,
	ISO_9606_1_FILLET_SUPPLEMENT,
	ISO_9606_1_RANGES
} from '$reference/sources';
import { isNum, sourceOf, type FindingSource } from './findings';
import type { MmRange } from './iso-15614-ranges';

const EPS = 1e-9;
const SRC = sourceOf(ISO_9606_1_2012);

type Fail = { ok: false; message: string };

/**
 * Table 6 (butt, deposited thickness = t for one process): t < 3: t to 3 or 2t, whichever is
 * greater; 3 <= t < 12: 3 to 2t; t >= 12: 3 mm and over. Table 8 (fillet): t < 3: t to 2t or 3,
 * whichever is greater; t >= 3: 3 mm and over.
 */
export function welderThicknessIso(
	t: unknown,
	weld: unknown = 'butt'
): ({ ok: true } & MmRange) | Fail {
	if (!isNum(t) || t <= 0 || t > 2000)
		return { ok: false, message: 'Give the test piece thickness t in mm, above zero.' };
	if (weld === 'fillet') {
		const f = THICKNESS_FILLET;
		return t < f.below - EPS
			? { ok: true, min: t, max: Math.max(f.maxAtLeastMm, 2 * t) }
			: { ok: true, min: f.minAtOrOverMm, max: null };
	}
	const b = THICKNESS_BUTT;
	if (t < b.thinBelow - EPS) return { ok: true, min: t, max: Math.max(2 * t, b.minMm) };
	if (t < b.thickFrom - EPS) return { ok: true, min: b.minMm, max: 2 * t };
	return { ok: true, min: b.minMm, max: null };
}

/** Table 7: D <= 25 mm: D to 2D; D > 25 mm: 0.5D and over, 25 mm at least. */
export function welderDiameterIso(d: unknown): ({ ok: true } & MmRange) | Fail {
	if (!isNum(d) || d <= 0 || d > 20_000)
		return { ok: false, message: 'Give the pipe outside diameter D in mm, above zero.' };
	if (d <= DIAMETER.smallUpTo + EPS) return { ok: true, min: d, max: 2 * d };
	return { ok: true, min: Math.max(0.5 * d, DIAMETER.minMm), max: null };
}

const isPos = (p: unknown): p is IsoPosition =>
	typeof p === 'string' && (ISO_POSITIONS as readonly string[]).includes(p.trim().toUpperCase());

/** Tables 9 (butt) and 10 (fillet): positions qualified by the test positions (their union). */
export function welderPositionsIso(
	tests: unknown,
	weld: unknown = 'butt'
): { qualified: IsoPosition[]; unknown: string[]; source: FindingSource } {
	const table = weld === 'fillet' ? POSITIONS_FILLET : POSITIONS_BUTT;
	const set = new Set<IsoPosition>();
	const unknown: string[] = [];
	let reading = false;
	for (const t of Array.isArray(tests) ? tests.slice(0, 20) : [tests]) {
		const k = typeof t === 'string' ? t.trim().toUpperCase() : '';
		const row = isPos(k) ? table[k as IsoPosition] : undefined;
		if (!row) {
			unknown.push(typeof t === 'string' ? t.slice(0, 10) : '?');
			continue;
		}
		// H-L045 / J-L045 add PH / PJ by Beadline's reading, not by a column of Table 9.
		if (weld !== 'fillet' && k.endsWith('-L045')) reading = true;
		row.forEach((p) => set.add(p));
	}
	return {
		qualified: ISO_POSITIONS.filter((p) => set.has(p)),
		unknown,
		source: reading ? sourceOf(ISO_9606_1_RANGES) : SRC
	};
}

const isFm = (g: unknown): g is FillerGroup =>
	typeof g === 'string' && (FILLER_GROUPS as readonly string[]).includes(g.trim().toUpperCase());

/** Table 3: filler groups covered; 5.5.2: parent material groups 1 to 11 with any of them. */
export function welderFillerGroupsIso(
	group: unknown
): { ok: true; fillers: FillerGroup[]; parentGroups: string[] } | Fail {
	if (!isFm(group)) return { ok: false, message: 'Give the filler group FM1 to FM6.' };
	const g = group.trim().toUpperCase() as FillerGroup;
	const fillers = [...FILLER_GROUP_QUALIFIES[g]];
	return { ok: true, fillers, parentGroups: [...PARENT_GROUPS_QUALIFIED] };
}

export interface IsoWelderTest {
	/** ISO 4063 number. */
	process?: string;
	product?: 'plate' | 'pipe';
	weld?: 'butt' | 'fillet';
	/** Butt test welded with the supplementary fillet test (5.4). */
	supplementaryFillet?: boolean;
	thicknessMm?: number;
	outsideDiameterMm?: number;
	rotated?: boolean;
	fillerGroup?: string;
	materialGroup?: string;
	positions?: string[];
}

export interface IsoWelderItem {
	variable: string;
	clause: string;
	qualified: string;
	range?: MmRange & { unit: string };
	source: FindingSource;
}

const mm = (r: MmRange): string =>
	r.max === null ? `${r.min} mm and over` : `${r.min}–${r.max} mm`;

/** Every range of one ISO 9606-1 test, in ISO terms. Never throws. */
export function isoWelderRanges(input: unknown): { items: IsoWelderItem[]; source: FindingSource } {
	const t = (typeof input === 'object' && input !== null ? input : {}) as IsoWelderTest;
	const items: IsoWelderItem[] = [];
	const weld = t.weld === 'fillet' ? 'fillet' : 'butt';
	try {
		if (typeof t.process === 'string' && t.process.trim()) {
			const p = t.process.trim().slice(0, 10);
			const also = Object.hasOwn(PROCESS_ALSO, p) ? PROCESS_ALSO[p]! : [];
			items.push({
				variable: 'Process',
				clause: '5.2',
				qualified: also.length ? `${p} and ${also.join(', ')}` : `${p} only`,
				source: SRC
			});
		}
		if (t.product === 'plate' || t.product === 'pipe')
			items.push({
				variable: 'Product type',
				clause: '5.3',
				qualified:
					t.product === 'plate'
						? `plate, and pipe over ${t.rotated ? PRODUCT.plateRotatedToPipeOverMm : PRODUCT.plateToPipeOverMm} mm OD${t.rotated ? ' welded rotated (PA, PB, PC or PD)' : ''}`
						: `pipe, and plate when the pipe is over ${PRODUCT.pipeToPlateOverMm} mm OD`,
				source: SRC
			});
		items.push({
			variable: 'Type of weld',
			clause: '5.4',
			qualified:
				weld === 'fillet'
					? 'fillet welds'
					: t.supplementaryFillet
						? 'butt welds, and fillet welds (supplementary fillet test)'
						: 'butt welds (fillet welds need the supplementary fillet test)',
			source: weld === 'butt' ? sourceOf(ISO_9606_1_FILLET_SUPPLEMENT) : SRC
		});
		const fm = welderFillerGroupsIso(t.fillerGroup);
		if (fm.ok) {
			items.push({
				variable: 'Filler material group',
				clause: '5.5, Table 3',
				qualified: fm.fillers.join(', '),
				source: SRC
			});
			items.push({
				variable: 'Parent material group (ISO/TR 15608)',
				clause: '5.5.2',
				qualified: `groups ${fm.parentGroups[0]} to ${fm.parentGroups.at(-1)}${typeof t.materialGroup === 'string' && t.materialGroup.trim() ? ` (tested on ${t.materialGroup.trim().slice(0, 10)})` : ''}`,
				source: SRC
			});
		}
		if (isNum(t.thicknessMm)) {
			const r = welderThicknessIso(t.thicknessMm, weld);
			if (r.ok)
				items.push({
					variable: 'Material thickness',
					clause: weld === 'fillet' ? '5.7, Table 8' : '5.7, Table 6',
					qualified: mm(r),
					range: { ...r, unit: 'mm' },
					source: SRC
				});
		}
		if (isNum(t.outsideDiameterMm)) {
			const r = welderDiameterIso(t.outsideDiameterMm);
			if (r.ok)
				items.push({
					variable: 'Outside pipe diameter',
					clause: '5.7, Table 7',
					qualified: mm(r),
					range: { ...r, unit: 'mm' },
					source: SRC
				});
		}
		if (Array.isArray(t.positions) && t.positions.length) {
			const p = welderPositionsIso(t.positions, weld);
			items.push({
				variable: 'Welding positions (ISO 6947)',
				clause: weld === 'fillet' ? '5.8, Table 10' : '5.8, Table 9',
				qualified: [
					p.qualified.join(', ') || 'none',
					p.unknown.length ? `(not in the table: ${p.unknown.join(', ')})` : ''
				]
					.filter(Boolean)
					.join(' '),
				source: p.source
			});
		}
	} catch {
		// Keep what was found.
	}
	return { items, source: SRC };
}

/** ASME / AWS test positions with their ISO 6947 equivalents, e.g. "3G (PF/PG)". Never throws. */
export function withIso6947(positions: unknown): string {
	if (!Array.isArray(positions)) return '';
	return positions
		.slice(0, 20)
		.map((p) => {
			if (typeof p !== 'string') return '?';
			const k = p.trim().toUpperCase();
			const iso = Object.hasOwn(ASME_TO_ISO, k) ? ASME_TO_ISO[k] : undefined;
			return iso ? `${p.slice(0, 10)} (${iso.join('/')})` : p.slice(0, 10);
		})
		.join(', ');
}
