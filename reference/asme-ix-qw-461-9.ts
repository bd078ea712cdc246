import { ASME_IX_QW_461_9 } from './sources';
import type { Source } from './types';

export type WeldPosition = 'F' | 'H' | 'V' | 'O';
export const ALL_POSITIONS: readonly WeldPosition[] = ['F', 'H', 'V', 'O'];

export interface Qw461Row {
	test: string;
	form: 'plate' | 'pipe';
	/** Groove, plate and pipe over 24 in (610 mm) OD. */
	groove: readonly WeldPosition[];
	/** Groove, pipe 24 in (610 mm) OD and under (plate tests: pipe 2-7/8 in OD and over only). */
	groovePipe: readonly WeldPosition[];
	/** Fillet or tack, plate and pipe. */
	fillet: readonly WeldPosition[];
	source: Source;
}

const ALL = ALL_POSITIONS;
const r = (
	test: string,
	form: 'plate' | 'pipe',
	groove: readonly WeldPosition[],
	groovePipe: readonly WeldPosition[],
	fillet: readonly WeldPosition[]
): Qw461Row => ({ test, form, groove, groovePipe, fillet, source: ASME_IX_QW_461_9 });

// Single-position rows. The combination rows of the table (3G+4G, 2G+3G+4G, 3F+4F, 2G+5G) equal
// the union of their single rows, which the tests check, so combinations are computed, not stored.
export const QW_461_9: readonly Qw461Row[] = [
	r('1G', 'plate', ['F'], ['F'], ['F']),
	r('2G', 'plate', ['F', 'H'], ['F', 'H'], ['F', 'H']),
	r('3G', 'plate', ['F', 'V'], ['F'], ['F', 'H', 'V']),
	r('4G', 'plate', ['F', 'O'], ['F'], ['F', 'H', 'O']),
	r('1F', 'plate', [], [], ['F']),
	r('2F', 'plate', [], [], ['F', 'H']),
	r('3F', 'plate', [], [], ['F', 'H', 'V']),
	r('4F', 'plate', [], [], ['F', 'H', 'O']),
	r('1G', 'pipe', ['F'], ['F'], ['F']),
	r('2G', 'pipe', ['F', 'H'], ['F', 'H'], ['F', 'H']),
	r('5G', 'pipe', ['F', 'V', 'O'], ['F', 'V', 'O'], ALL),
	r('6G', 'pipe', ALL, ALL, ALL),
	r('1F', 'pipe', [], [], ['F']),
	r('2F', 'pipe', [], [], ['F', 'H']),
	r('2FR', 'pipe', [], [], ['F', 'H']),
	r('4F', 'pipe', [], [], ['F', 'H', 'O']),
	r('5F', 'pipe', [], [], ALL)
];

/** The combination rows as printed, used only to check the union rule. */
export const QW_461_9_COMBINATIONS: readonly Qw461Row[] = [
	r('3G+4G', 'plate', ['F', 'V', 'O'], ['F'], ALL),
	r('2G+3G+4G', 'plate', ALL, ['F', 'H'], ALL),
	r('3F+4F', 'plate', [], [], ALL),
	r('2G+5G', 'pipe', ALL, ALL, ALL)
];
