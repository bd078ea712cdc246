// The safety cautions of a procedure as data, for the printed sheet and the booth view: the same
// points as SafetyCautions.svelte (ANSI Z49.1, OSHA 29 CFR 1910 Subpart Q), with the ones that
// depend on the job only when they apply. Pure: runs on the server and in the browser.
import { ADVISORY_NOTE, lensShade, SHADE_ADVICE, type Process } from '$lib/weld';

export interface Caution {
	id: 'arc' | 'fumes' | 'chromium' | 'shock' | 'fire' | 'cylinders' | 'thoria';
	title: string;
	text: string;
}

export interface ShadeAdvice {
	/** OSHA 29 CFR 1910.133(a)(5) minimum protective shade. */
	minimum: number;
	/** ANSI Z49.1 / AWS F2.2 suggested comfort shade; null where the guide gives none. */
	suggested: number | null;
	/** The highest current the shade was read for; absent when read for one current. */
	atAmps?: number;
}

export const SAFE_PRACTICE = 'Safe practice in full: ANSI Z49.1 and OSHA 29 CFR 1910 Subpart Q.';
export { ADVISORY_NOTE, SHADE_ADVICE };

/**
 * The shade for an amperage range: the darkest minimum over both ends, and the suggestion at the
 * top of the range (a range that spans two bands must be safe at its hottest).
 */
export function shadeForRange(
	process: Process,
	amps: { min: number | null; max: number | null }
): ShadeAdvice | null {
	const ends = [amps.min, amps.max].filter((a): a is number => a !== null && Number.isFinite(a));
	if (!ends.length) return null;
	const top = Math.max(...ends);
	const shades = ends.map((a) => lensShade(process, a)).filter((s) => s !== null);
	const atTop = lensShade(process, top);
	if (!shades.length || !atTop) return null;
	return {
		minimum: Math.max(...shades.map((s) => s.minimum)),
		suggested: atTop.suggested,
		atAmps: top
	};
}

const thoriated = (tungsten: string | null | undefined) => /^\s*(E?WT|EWTh)/i.test(tungsten ?? '');

export function cautionsFor(job: {
	/** Unknown process: every gas caution shows. */
	process?: Process | null;
	family?: string | null;
	tungsten?: string | null;
	shade?: ShadeAdvice | null;
}): Caution[] {
	const s = job.shade;
	const shadeText = s
		? `lens shade at least ${s.minimum}${s.suggested ? ` (suggested ${s.suggested})` : ''} ${s.atAmps ? `up to ${s.atAmps} A` : 'for this current'} (OSHA 29 CFR 1910.133(a)(5); ANSI Z49.1 / AWS F2.2).`
		: 'use the lens shade for the current (OSHA 29 CFR 1910.133(a)(5)).';
	const out: Caution[] = [
		{
			id: 'arc',
			title: 'Arc radiation',
			text: `${shadeText} ${SHADE_ADVICE} Screen bystanders; wear ANSI Z87.1 eyewear under the helmet.`
		},
		{
			id: 'fumes',
			title: 'Fumes',
			text: 'ventilate or extract at the arc and keep your head out of the plume; manganese fume is in most steel fillers.'
		}
	];
	if (job.family === 'stainless')
		out.push({
			id: 'chromium',
			title: 'Hexavalent chromium',
			text: 'stainless makes hexavalent chromium fume: local exhaust, and the limits of OSHA 29 CFR 1910.1026 apply.'
		});
	out.push(
		{
			id: 'shock',
			title: 'Electric shock',
			text: 'dry gloves, sound insulation, never stand in water; the work lead is not a ground.'
		},
		{
			id: 'fire',
			title: 'Fire',
			text: 'combustibles 35 ft (11 m) away or shielded; a fire watch for at least 30 minutes after (29 CFR 1910.252(a), NFPA 51B).'
		}
	);
	if (job.process !== 'SMAW')
		out.push({
			id: 'cylinders',
			title: 'Gas cylinders',
			text: 'secured upright and capped when not in use; oxygen stored apart from fuel gas (29 CFR 1910.253).'
		});
	if (thoriated(job.tungsten))
		out.push({
			id: 'thoria',
			title: 'Thoriated tungsten',
			text: 'its grinding dust is radioactive. Grind with local exhaust on a dedicated wheel, or prefer ceriated or lanthanated electrodes.'
		});
	return out;
}
