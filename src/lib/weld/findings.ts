// The shape every check answers with, and the small helpers the checks share.
import type { Band, Source, SourceKind } from '$reference/types';
import type { CheckContext, Expected, FindingSource, FindingStatus } from './types';

export type { Expected, Finding, FindingSource, FindingStatus } from './types';

/** Shown once in the UI beside the findings, not repeated in each message. */
export const ADVISORY_NOTE =
	'Beadline advises and records; the governing code, the engineer of record, the inspector and certified welders decide.';

const KINDS: readonly SourceKind[] = ['published', 'common practice', 'from memory'];

export const sourceOf = (s: Source): FindingSource => ({
	label: typeof s?.label === 'string' ? s.label : '',
	kind: KINDS.includes(s?.kind) ? s.kind : 'from memory'
});

export const isNum = (n: unknown): n is number => typeof n === 'number' && Number.isFinite(n);

/**
 * Status of a value against a band. Rule-of-thumb bands are soft: up to `margin` (10 %) past an
 * edge is a caution, further is outside. Published limits pass margin 0.
 */
export function bandStatus(value: number, band: Partial<Band>, margin = 0.1): FindingStatus {
	if (!isNum(value)) return 'outside';
	const { min, max } = band ?? {};
	if (!isNum(margin)) margin = 0.1;
	if (isNum(min) && value < min)
		return value >= min * (1 - margin) && margin > 0 ? 'caution' : 'outside';
	if (isNum(max) && value > max)
		return value <= max * (1 + margin) && margin > 0 ? 'caution' : 'outside';
	return 'ok';
}

/** "94–156 A", "at least 50 °F", "at most 35 CFH"; a shared unit is printed once. */
export function rangeText(min: string | null, max: string | null): string {
	if (typeof min !== 'string') min = null;
	if (typeof max !== 'string') max = null;
	if (min !== null && max !== null) {
		const a = min.lastIndexOf(' ');
		const unit = a > 0 ? min.slice(a) : '';
		if (unit !== '' && max.endsWith(unit) && max.length > unit.length)
			return `${min.slice(0, a)}–${max}`;
		return `${min}–${max}`;
	}
	if (min !== null) return `at least ${min}`;
	if (max !== null) return `at most ${max}`;
	return 'any value';
}

const round = (n: number, places: number): number => {
	if (!isNum(n) || !isNum(places)) return NaN;
	const f = 10 ** places;
	return Math.round(n * f) / f;
};

/** Expected block with values rounded for display (amps whole, others to `places`). */
export function expected(band: Partial<Band>, unit: string, places = 0): Expected {
	band = band ?? {};
	if (typeof unit !== 'string') unit = '';
	if (!isNum(places) || places < 0 || places > 10) places = 0;
	return {
		...(isNum(band.min) ? { min: round(band.min, places) } : {}),
		...(isNum(band.max) ? { max: round(band.max, places) } : {}),
		unit
	};
}

export { round };

/**
 * Wraps a check so that a malformed context gives no finding rather than an exception: the
 * checks also run in the browser on half-typed forms.
 */
export function guardCheck<R>(check: (ctx: CheckContext) => R, none: R): (ctx: CheckContext) => R {
	return (ctx) => {
		if (!ctx || typeof ctx !== 'object' || !ctx.s || typeof ctx.s !== 'object') return none;
		try {
			return check(ctx);
		} catch {
			return none;
		}
	};
}
