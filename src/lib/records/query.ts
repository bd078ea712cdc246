// The list's state lives in the URL so a view can be bookmarked and shared; these build links.

/** The current search with some params changed (null or '' removes one); page resets unless set. */
export function withParams(
	search: URLSearchParams,
	changes: Record<string, string | number | null>
): string {
	const next = new URLSearchParams(search);
	if (!('page' in changes)) next.delete('page');
	for (const [k, v] of Object.entries(changes)) {
		if (v === null || v === '') next.delete(k);
		else next.set(k, String(v));
	}
	for (const [k, v] of [...next]) if (v === '') next.delete(k);
	const s = next.toString();
	return s ? `?${s}` : '';
}

/** Only the filter params (for the plot, the export and back links). */
export const FILTER_KEYS = [
	'q',
	'process',
	'family',
	'tmin',
	'tmax',
	'filler',
	'position',
	'outcome',
	'author',
	'from',
	'to'
] as const;

export function filterSearch(search: URLSearchParams, keep: readonly string[] = []): string {
	const next = new URLSearchParams();
	for (const k of [...FILTER_KEYS, ...keep]) {
		const v = search.get(k);
		if (v) next.set(k, v);
	}
	const s = next.toString();
	return s ? `?${s}` : '';
}
