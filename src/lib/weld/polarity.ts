// Current type and polarity against the process, base metal and filler classification.
import { AWS_A5_CLASSIFICATION, POLARITY_PRACTICE } from '$reference/sources';
import type { Source } from '$reference/types';
import type { CheckContext } from './context';
import { sourceOf, type Finding, type FindingStatus, guardCheck } from './findings';

interface Verdict {
	status: FindingStatus;
	message: string;
	source: Source;
}

function verdict(ctx: CheckContext): Verdict | null {
	const { process, currentType: c } = ctx.s;
	if (!c) return null;
	const f = ctx.filler;
	const practice = (status: FindingStatus, message: string): Verdict => ({
		status,
		message,
		source: POLARITY_PRACTICE
	});
	if (f?.currents && (process === 'FCAW' || process === 'SMAW')) {
		return f.currents.includes(c)
			? {
					status: 'ok',
					message: `${f.classification} runs on ${c}.`,
					source: AWS_A5_CLASSIFICATION
				}
			: {
					status: 'outside',
					message: `${f.classification} is made for ${f.currents.join(' or ')}, not ${c}.`,
					source: AWS_A5_CLASSIFICATION
				};
	}
	switch (process) {
		case 'GTAW':
			if (c === 'DCEP')
				return practice(
					'caution',
					'GTAW on DCEP overheats the tungsten; it is rarely used (very thin aluminium, large tungsten).'
				);
			if (ctx.family === 'aluminium' && c === 'DCEN')
				return practice(
					'caution',
					'Aluminium on DCEN gets no oxide cleaning; AC is usual unless you run helium on purpose.'
				);
			if (ctx.family && ctx.family !== 'aluminium' && c === 'AC')
				return practice(
					'caution',
					'Steel and stainless are normally welded GTAW on DCEN; AC gives a wider, shallower weld.'
				);
			return practice('ok', `${c} suits GTAW${ctx.family === 'aluminium' ? ' on aluminium' : ''}.`);
		case 'GMAW':
			return c === 'DCEP'
				? practice('ok', 'DCEP suits GMAW.')
				: practice(
						'outside',
						`Solid-wire GMAW runs on DCEP; ${c} gives an unstable arc and heavy spatter.`
					);
		case 'FCAW':
			return c === 'AC'
				? practice(
						'outside',
						'Flux-cored wire runs on DC (DCEP for gas-shielded, DCEN for most self-shielded).'
					)
				: practice('ok', `${c} is used for flux-cored wire; check the wire maker's polarity.`);
		default:
			return null;
	}
}

function checkCurrentTypeUnguarded(ctx: CheckContext): Finding | null {
	const v = verdict(ctx);
	if (!v || !ctx.s.currentType) return null;
	return {
		check: 'current-type',
		status: v.status,
		message: v.message,
		value: ctx.s.currentType,
		expected: { unit: 'current type' },
		source: sourceOf(v.source),
		field: 'currentType'
	};
}

export const checkCurrentType = guardCheck(checkCurrentTypeUnguarded, null);
