// ISO designations beside AWS classifications (issue 15), for the wires and rods Beadline knows.
// A row says "this AWS wire is normally also designated so"; it is not an equivalence the codes
// grant: ISO 15614-1 8.4.4 and ASME IX QW-404 each judge the filler by their own rules, and a
// wire carries a designation only where its maker certified it. Source beside each row.
import {
	ALUMINIUM_FILLER_SHEETS,
	AWS_A5_9_2017,
	ISO_14341_GUIDE,
	ISO_14343_GUIDE,
	ISO_FILLER_MEMORY
} from './sources';
import type { Source } from './types';

export interface IsoFillerRow {
	/** AWS classification, canonical (ER70S-6). */
	aws: string;
	/** Which ISO standard the designation is in. */
	standard: 'ISO 14341' | 'ISO 636' | 'ISO 14343' | 'ISO 18273';
	/** The ISO designation of the wire or rod (chemistry symbol, with its system). */
	designation: string;
	/** Solid wire for GMAW, rod for GTAW, or both (stainless and aluminium are one standard). */
	use: 'GMAW' | 'GTAW' | 'both';
	source: Source;
	/** What the source shows and what it does not. */
	note: string;
}

const M = ISO_FILLER_MEMORY;

export const ISO_FILLER_ROWS: readonly IsoFillerRow[] = [
	// Carbon steel solid wire (A5.18) and rod.
	{
		aws: 'ER70S-6',
		standard: 'ISO 14341',
		designation: 'ISO 14341-A G3Si1 or G4Si1 (by the wire\u2019s own analysis)',
		use: 'GMAW',
		source: { ...M, note: ISO_14341_GUIDE.note },
		note: 'G3Si1 and G4Si1 chemistry read from a public ISO 14341-A guide; ER70S-6 spans both (Mn to 1.85, Si to 1.15 %), so the pairing is recalled, not read.'
	},
	{
		aws: 'ER70S-6',
		standard: 'ISO 636',
		designation: 'ISO 636-A W3Si1',
		use: 'GTAW',
		source: M,
		note: 'Recalled.'
	},
	{
		aws: 'ER70S-3',
		standard: 'ISO 14341',
		designation: 'ISO 14341-A G2Si',
		use: 'GMAW',
		source: M,
		note: 'Recalled.'
	},
	{
		aws: 'ER70S-2',
		standard: 'ISO 636',
		designation: 'ISO 636-A W2Ti',
		use: 'GTAW',
		source: M,
		note: 'Recalled.'
	},
	// Stainless (A5.9 is ISO 14343 modified: the B system uses the same alloy types).
	{
		aws: 'ER316LSi',
		standard: 'ISO 14343',
		designation: 'ISO 14343-A G/W 19 12 3 L Si; ISO 14343-B SS316LSi',
		use: 'both',
		source: ISO_14343_GUIDE,
		note: 'The A and B designations are one wire in the guide\u2019s example; ER316LSi is the same B alloy type (A5.9:2017 is ISO 14343:2009 MOD).'
	},
	{
		aws: 'ER308Mo',
		standard: 'ISO 14343',
		designation: 'ISO 14343-A G/W 20 10 3; ISO 14343-B SS308Mo',
		use: 'both',
		source: ISO_14343_GUIDE,
		note: 'The A and B designations are one wire in the guide\u2019s example; ER308Mo is the same B alloy type (A5.9:2017 is ISO 14343:2009 MOD).'
	},
	{
		aws: 'ER308L',
		standard: 'ISO 14343',
		designation: 'ISO 14343-A G/W 19 9 L; ISO 14343-B SS308L',
		use: 'both',
		source: { ...M, note: AWS_A5_9_2017.note },
		note: 'The B designation follows from A5.9 being ISO 14343 modified; the A symbol 19 9 L is recalled.'
	},
	{
		aws: 'ER316L',
		standard: 'ISO 14343',
		designation: 'ISO 14343-A G/W 19 12 3 L; ISO 14343-B SS316L',
		use: 'both',
		source: { ...M, note: AWS_A5_9_2017.note },
		note: 'The B designation follows from A5.9 being ISO 14343 modified; the A symbol 19 12 3 L is recalled (the guide shows 19 12 3 L Si for the Si variant).'
	},
	{
		aws: 'ER309L',
		standard: 'ISO 14343',
		designation: 'ISO 14343-A G/W 23 12 L; ISO 14343-B SS309L',
		use: 'both',
		source: { ...M, note: AWS_A5_9_2017.note },
		note: 'The B designation follows from A5.9 being ISO 14343 modified; the A symbol 23 12 L is recalled.'
	},
	// Aluminium (A5.10).
	{
		aws: 'ER4043',
		standard: 'ISO 18273',
		designation: 'ISO 18273 AlSi5',
		use: 'both',
		source: ALUMINIUM_FILLER_SHEETS,
		note: 'The chemical symbol a maker\u2019s 4043 sheet gives beside AWS A5.10 ER4043 (not AlSi5(A), the 4043A alloy, which Beadline had recalled); the ISO alloy limits differ slightly from A5.10\u2019s.'
	},
	{
		aws: 'ER5356',
		standard: 'ISO 18273',
		designation: 'ISO 18273 AlMg5Cr(A)',
		use: 'both',
		source: ALUMINIUM_FILLER_SHEETS,
		note: 'The chemical symbol a maker\u2019s 5356 sheet gives beside AWS A5.10 ER5356.'
	}
];
