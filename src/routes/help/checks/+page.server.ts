import * as sources from '$reference/sources';
import type { Source } from '$reference/types';
import { CHECK_CATALOGUE } from '$lib/weld';
import type { PageServerLoad } from './$types';

// Public: it describes the product's checks and their sources, and holds no shop data.
export const load: PageServerLoad = () => {
	const all = Object.values(sources as Record<string, Source>).sort((a, b) =>
		a.label.localeCompare(b.label)
	);
	return { checks: CHECK_CATALOGUE.map((c) => ({ ...c })), sources: all };
};
