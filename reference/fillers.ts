import {
	ASME_IX_QW_432,
	ASME_IX_QW_432_MEMORY,
	ASME_IX_QW_442,
	ASME_IX_QW_442_MEMORY,
	AWS_A5_CLASSIFICATION,
	AWS_D1_2_FILLER_GROUPS,
	ISO_15614_1_TABLE_A1,
	ISO_15614_1_TABLE_A2
} from './sources';
import type { MetalFamily, Source } from './types';

export interface FillerRow {
	/** Canonical classification, e.g. "ER70S-6". */
	classification: string;
	spec: string;
	family: MetalFamily;
	/** Minimum tensile strength of the deposit in ksi; null where the A5 spec sets none. */
	minTensileKsi: number | null;
	fNumber: number;
	/** A-Numbers are for ferrous weld metal only; null for aluminium or when not settled. */
	aNumber: number | null;
	/** Base metal families this filler is normally used on. */
	suits: readonly MetalFamily[];
	/** What the letters and digits mean, in plain words. */
	meaning: string;
	source: Source;
	fNumberSource: Source;
	aNumberSource: Source;
}

const F = ASME_IX_QW_432;
const FM = ASME_IX_QW_432_MEMORY;
const A = ASME_IX_QW_442;
const AM = ASME_IX_QW_442_MEMORY;
/** A-Numbers read off the QW-442 analysis ranges as printed in ISO 15614-1 Table A.2. */
const A2 = ISO_15614_1_TABLE_A2;
const S = AWS_A5_CLASSIFICATION;

const a518 = (n: string, meaning: string): FillerRow => ({
	classification: `ER70S-${n}`,
	spec: 'AWS A5.18',
	family: 'carbon-steel',
	minTensileKsi: 70,
	fNumber: 6,
	aNumber: 1,
	suits: ['carbon-steel'],
	meaning: `ER = electrode or rod, 70 = 70 ksi minimum tensile, S = solid, -${n} = ${meaning}`,
	source: S,
	fNumberSource: F,
	aNumberSource: A
});

export const FILLERS: readonly FillerRow[] = [
	a518('2', 'triple deoxidised (Al, Ti, Zr), for rusty or dirty steel and root passes'),
	a518('3', 'silicon-manganese deoxidised, general purpose on clean steel'),
	a518('4', 'more silicon and manganese than -3'),
	a518('6', 'highest silicon and manganese, tolerates mill scale'),
	a518('7', 'higher manganese, wets out well'),
	{
		classification: 'ER80S-D2',
		spec: 'AWS A5.28',
		family: 'low-alloy',
		minTensileKsi: 80,
		fNumber: 6,
		aNumber: null,
		suits: ['carbon-steel', 'low-alloy'],
		meaning: 'Low-alloy solid wire, 80 ksi, manganese-molybdenum (D2)',
		source: S,
		fNumberSource: F,
		aNumberSource: AM
	},
	{
		classification: 'ER80S-B2',
		spec: 'AWS A5.28',
		family: 'low-alloy',
		minTensileKsi: 80,
		fNumber: 6,
		aNumber: 3,
		suits: ['low-alloy'],
		meaning: 'Low-alloy solid wire, 80 ksi, 1-1/4 Cr - 1/2 Mo (B2) for chrome-moly steel',
		source: S,
		fNumberSource: F,
		// 1-1/4 Cr - 1/2 Mo falls in A-3 (Cr 0.40-2.00, Mo 0.40-0.65).
		aNumberSource: A2
	},
	...(['308L', '309L', '316L', '308LSi', '309LSi', '316LSi'] as const).map((t): FillerRow => ({
		classification: `ER${t}`,
		spec: 'AWS A5.9',
		family: 'stainless',
		minTensileKsi: null,
		fNumber: 6,
		aNumber: 8,
		suits: t.startsWith('309') ? ['stainless', 'carbon-steel'] : ['stainless'],
		meaning: `Stainless type ${t.replace(/L.*/, '')}, L = low carbon${t.endsWith('Si') ? ', Si = higher silicon for wetting' : ''}${t.startsWith('309') ? '; also used to join stainless to carbon steel' : ''}`,
		source: S,
		fNumberSource: F,
		// 308 (about 20 Cr, 10 Ni), 309 (23 Cr, 12-13 Ni), 316 (19 Cr, 12 Ni, 2.5 Mo): all in A-8.
		aNumberSource: A2
	})),
	...(
		[
			['1100', 21],
			['4043', 23],
			['4047', 23],
			['5356', 22],
			['5183', 22],
			['5554', 22],
			['5556', 22]
		] as const
	).map(([alloy, f]): FillerRow => ({
		classification: `ER${alloy}`,
		spec: 'AWS A5.10',
		family: 'aluminium',
		minTensileKsi: null,
		fNumber: f,
		aNumber: null,
		suits: ['aluminium'],
		meaning: `Aluminium alloy ${alloy} bare electrode or rod`,
		source: S,
		// F21 1100; F22 5183, 5356, 5554, 5556; F23 4043, 4047 (D1.2:2014 Clause 3 groups).
		fNumberSource: AWS_D1_2_FILLER_GROUPS,
		// No A-Number: the twelve QW-442 ranges (Table A.2) are all ferrous weld metal.
		aNumberSource: A2
	}))
];

/** A5.20 flux-cored carbon steel: E7xT-n[C|M]. Usability numbers the parser knows. */
export const A5_20_USABILITY: Readonly<
	Record<string, { gas: 'required' | 'none'; polarity: 'DCEP' | 'DCEN'; note: string }>
> = {
	'1': {
		gas: 'required',
		polarity: 'DCEP',
		note: 'gas-shielded, rutile slag, single and multiple pass'
	},
	'5': { gas: 'required', polarity: 'DCEP', note: 'gas-shielded, basic slag' },
	'9': {
		gas: 'required',
		polarity: 'DCEP',
		note: 'gas-shielded, like -1 with toughness requirement'
	},
	'8': { gas: 'none', polarity: 'DCEN', note: 'self-shielded' },
	'11': { gas: 'none', polarity: 'DCEN', note: 'self-shielded, general purpose' }
};

/** A5.1 covered electrodes: last two digits to F-Number (QW-432 groups, as in ISO 15614-1 Table A.1). */
export const A5_1_F_NUMBER: Readonly<Record<string, number>> = {
	'10': 3,
	'11': 3,
	'12': 2,
	'13': 2,
	'14': 2,
	'19': 2,
	'20': 1,
	'22': 1,
	'24': 1,
	'27': 1,
	'28': 1,
	'15': 4,
	'16': 4,
	'18': 4,
	'48': 4
};
/** Digits whose F-Number was read (Table A.1); EXX22 is not in that table and stays recalled. */
export const a5_1FNumberSource = (usability: string): Source =>
	usability === '22' ? FM : ISO_15614_1_TABLE_A1;
/**
 * A5.1 carbon steel deposits: A-1 (mild steel) by the Table A.2 ranges (A5.1 caps Mn at 1.60 %,
 * the A-1 limit). A5.20 flux-cored deposits may carry more manganese, so theirs stays recalled.
 */
export const A5_1_A_NUMBER_SOURCE: Source = A2;
