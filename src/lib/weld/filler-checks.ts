// The filler checks: what a classification encodes (or that it could not be read), and whether
// it suits the base metal's family.
import { AWS_A5_CLASSIFICATION } from '$reference/sources';
import type { MetalFamily } from '$reference/types';
import { fillerSuits, parseFiller, wrongFamily } from './filler';
import { sourceOf, guardCheck } from './findings';
import type { CheckContext, Finding } from './types';

const FAMILY_WORDS: Record<MetalFamily, string> = {
	'carbon-steel': 'carbon steel',
	'low-alloy': 'low-alloy steel',
	stainless: 'stainless',
	aluminium: 'aluminium'
};

const aOrAn = (w: string): string => `${/^[aeiou]/i.test(w) ? 'an' : 'a'} ${w}`;

/** Reports what the classification encodes, or that it could not be read. */
function checkFillerClassificationUnguarded(ctx: CheckContext): Finding | null {
	const text = ctx.s.filler?.classification;
	if (text === undefined) return null;
	const r = ctx.filler ? ({ ok: true, filler: ctx.filler } as const) : parseFiller(text);
	if (!r.ok)
		return {
			check: 'filler-classification',
			status: 'caution',
			message: r.message,
			value: typeof text === 'string' ? text.slice(0, 40) : null,
			expected: { unit: 'classification' },
			source: sourceOf(AWS_A5_CLASSIFICATION),
			field: 'filler.classification'
		};
	const f = r.filler;
	const parts = [
		f.spec,
		f.minTensileKsi === null
			? 'no tensile requirement in the spec'
			: `${f.minTensileKsi} ksi minimum tensile`,
		`F-${f.fNumber}`,
		f.aNumber === null ? 'A-Number from the deposit analysis' : `A-${f.aNumber}`
	];
	const twin = f.enteredAs ? ` (${f.enteredAs} is the metric twin of ${f.classification})` : '';
	const kinds = [f.fNumberSource.kind, f.aNumberSource.kind];
	const memory = kinds.includes('from memory')
		? ' Some of these groupings are recalled, not read from the code: verify.'
		: '';
	return {
		check: 'filler-classification',
		status: f.inTable ? 'ok' : 'caution',
		message: `${f.classification}${twin}: ${parts.join(', ')}. ${f.meaning}.${f.inTable ? '' : ' Not in Beadline’s table; groupings are from the spec alone.'}${memory}`,
		value: f.classification,
		expected: { unit: 'classification' },
		source: sourceOf(f.source),
		field: 'filler.classification'
	};
}

function checkFillerVsBaseMetalUnguarded(ctx: CheckContext): Finding | null {
	const f = ctx.filler;
	const base = ctx.family;
	if (!f || !base) return null;
	const fit = fillerSuits(f, base);
	const words = FAMILY_WORDS[base];
	const message = wrongFamily(f, base)
		? `Wrong filler family: ${f.classification} is ${aOrAn(FAMILY_WORDS[f.family])} filler and does not suit ${words}.`
		: fit === 'ok'
			? `${f.classification} suits ${words}.`
			: f.family === 'stainless'
				? `${f.classification} on ${words} is normally for joining it to stainless; check that is intended.`
				: `${f.classification} is a ${FAMILY_WORDS[f.family]} filler, stronger than ${words} usually needs; check the procedure calls for it.`;
	return {
		check: 'filler-vs-base-metal',
		status: fit,
		message,
		value: f.classification,
		expected: { unit: words },
		source: sourceOf(AWS_A5_CLASSIFICATION),
		field: 'filler.classification'
	};
}

export const checkFillerClassification = guardCheck(checkFillerClassificationUnguarded, null);
export const checkFillerVsBaseMetal = guardCheck(checkFillerVsBaseMetalUnguarded, null);
