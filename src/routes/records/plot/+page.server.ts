import { requireRole } from '$lib/server/auth/guards';
import { authorNames, fillersInUse, plotPoints, VIEW_ROLES } from '$lib/server/records';
import { readFilters } from '$lib/schemas/settings-record';
import { thicknessAmpBand, type MetalFamily } from '$lib/weld';
import type { PageServerLoad } from './$types';

/** The rule-of-thumb band sampled across the plotted thicknesses (where the rule applies). */
function bandSamples(process: string | undefined, family: MetalFamily, maxMm: number) {
	if (!process) return { samples: [], source: null };
	const out: { mm: number; min: number; max: number }[] = [];
	let source: string | null = null;
	const steps = 80;
	for (let i = 1; i <= steps; i++) {
		const mm = (maxMm * i) / steps;
		const b = thicknessAmpBand(process as 'GTAW', mm, family);
		if (!b) continue;
		source ??= `${b.source.label} (${b.source.kind})`;
		out.push({ mm, min: b.band.min, max: b.band.max });
	}
	return { samples: out, source };
}

/** The process most of the plotted records use: its band is shown until a filter picks one. */
function mostCommonProcess(points: { process: string }[]): string | undefined {
	const counts = new Map<string, number>();
	for (const p of points) counts.set(p.process, (counts.get(p.process) ?? 0) + 1);
	return [...counts].sort((a, b) => b[1] - a[1] || a[0].localeCompare(b[0]))[0]?.[0];
}

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...VIEW_ROLES);
	const filters = readFilters(event.url.searchParams);
	const [plot, names, fillers] = await Promise.all([
		plotPoints(user, filters),
		authorNames(user.shopId),
		fillersInUse(user.shopId)
	]);
	const maxMm = Math.max(6.35, ...plot.points.map((p) => p.thicknessMm)) * 1.1;
	const family = (filters.family ?? 'carbon-steel') as MetalFamily;
	const bandProcess = filters.process ?? mostCommonProcess(plot.points);
	return {
		...plot,
		band: bandSamples(bandProcess, family, maxMm),
		bandProcess: bandProcess ?? null,
		family,
		maxMm,
		filters,
		authors: [...names].map(([id, name]) => ({ id, name })),
		fillers,
		system: user.unitSystem
	};
};
