import * as sources from '$reference/sources';
import type { Source } from '$reference/types';
import { CHECK_CATALOGUE } from '$lib/weld';
import { PROCEDURE_CHECK_CATALOGUE, PROCEDURE_SOURCES } from '$lib/procedures/check-catalogue';
import type { PageServerLoad } from './$types';

// Public: it describes the product's checks and their sources, and holds no shop data.
export const load: PageServerLoad = () => {
	const checks = [...CHECK_CATALOGUE, ...PROCEDURE_CHECK_CATALOGUE].map((c) => ({ ...c }));
	const all = [...Object.values(sources as Record<string, Source>), ...PROCEDURE_SOURCES].sort(
		(a, b) => a.label.localeCompare(b.label)
	);
	return { checks, sources: all };
};
