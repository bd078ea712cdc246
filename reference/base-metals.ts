import { ASME_IX_QW_422, ASME_IX_QW_422_2013_AL, ASME_IX_QW_422_MEMORY } from './sources';
import type { MetalFamily, Source } from './types';

export interface BaseMetalRow {
	/** Normalised key: spec and grade joined by '-', e.g. "A516-70", "304L", "6061". */
	key: string;
	name: string;
	family: MetalFamily;
	/** P-Number as printed (P-Numbers can carry letters, e.g. "5A"); null if none is assigned. */
	pNumber: string | null;
	/** Group Number (ferrous only). */
	group: number | null;
	minTensileKsi: number | null;
	source: Source;
}

const P = ASME_IX_QW_422;
const M = ASME_IX_QW_422_MEMORY;
const AL = ASME_IX_QW_422_2013_AL;

const cs = (
	key: string,
	name: string,
	group: number | null,
	minTensileKsi: number | null,
	source: Source
): BaseMetalRow => ({
	key,
	name,
	family: 'carbon-steel',
	pNumber: group === null ? null : '1',
	group,
	minTensileKsi,
	source
});

export const BASE_METALS: readonly BaseMetalRow[] = [
	cs('A36', 'ASTM A36 / ASME SA-36 structural plate, bar and shapes', 1, 58, P),
	cs('A53-B', 'A53 Grade B pipe', 1, 60, P),
	cs('A53-A', 'A53 Grade A pipe', 1, 48, P),
	cs('A106-A', 'A106 Grade A seamless pipe', 1, 48, P),
	cs('A106-B', 'A106 Grade B seamless pipe', 1, 60, P),
	cs('A106-C', 'A106 Grade C seamless pipe', 2, 70, P),
	cs('A105', 'A105 flanges and fittings', 2, 70, P),
	cs('A516-55', 'A516 Grade 55 pressure vessel plate', 1, 55, M),
	cs('A516-60', 'A516 Grade 60 pressure vessel plate', 1, 60, M),
	cs('A516-65', 'A516 Grade 65 pressure vessel plate', 1, 65, M),
	cs('A516-70', 'A516 Grade 70 pressure vessel plate', 2, 70, M),
	cs('A572-50', 'A572 Grade 50 high-strength low-alloy structural steel', 1, 65, M),
	cs('A500-B', 'A500 Grade B structural tubing', 1, 58, M),
	cs('A500-C', 'A500 Grade C structural tubing', 1, 62, M),
	cs('A992', 'A992 wide-flange shapes', 1, 65, M),
	cs('1018', 'AISI 1018 bar', 1, null, P),
	cs('1020', 'AISI 1020 bar', 1, null, P),
	// Sheet and mechanical tube specs without a P-Number: family only.
	cs('A1011', 'A1011 hot-rolled sheet', null, null, M),
	cs('A1008', 'A1008 cold-rolled sheet', null, null, M),
	cs('A513', 'A513 mechanical tubing', null, null, M),
	...(['304', '304L', '316', '316L', '321', '347'] as const).map((t): BaseMetalRow => ({
		key: t,
		name: `Type ${t} austenitic stainless (e.g. A240, A312, A554)`,
		family: 'stainless',
		pNumber: '8',
		group: 1,
		minTensileKsi: t.endsWith('L') ? 70 : 75,
		source: M
	})),
	// Aluminium: 1100, 3003, 5083, 6061, 6063 read in the 2013 table's B361 fittings rows; 5052
	// and 5086 recalled.
	...(
		[
			['1100', '21', AL],
			['3003', '21', AL],
			['5052', '22', M],
			['5083', '25', AL],
			['5086', '25', M],
			['6061', '23', AL],
			['6063', '23', AL]
		] as const
	).map(([alloy, p, source]): BaseMetalRow => ({
		key: alloy,
		name: `Aluminium alloy ${alloy}`,
		family: 'aluminium',
		pNumber: p,
		group: null,
		minTensileKsi: null,
		source
	}))
];
