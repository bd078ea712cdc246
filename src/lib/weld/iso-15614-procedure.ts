// ISO 15614-1: every range one test coupon qualifies, each with its clause, from the rules in
// iso-15614-ranges.ts. Pure; never throws.
import { ISO_15614_1_DIAMETER, ISO_15614_1_TEMPERATURE } from '$reference/iso-15614-1';
import { ISO_POSITIONS, type IsoPosition } from '$reference/iso-6947';
import { ISO_15614_1_LEVELS, ISO_TR_15608 } from '$reference/sources';
import { isNum, sourceOf, type FindingSource } from './findings';
import { isoFillerDesignations } from './iso-filler';
import {
	ISO_15614_SOURCE as SRC,
	isoDiameterRange,
	isoHeatInputRange,
	isoMaterialGroups,
	isoThicknessRange,
	type IsoCoupon,
	type IsoJoint,
	type IsoRangeItem,
	type IsoSide
} from './iso-15614-ranges';

const isIsoPosition = (p: unknown): p is IsoPosition =>
	typeof p === 'string' && (ISO_POSITIONS as readonly string[]).includes(p);

function jointItem(joint: IsoJoint | undefined, side: IsoSide | undefined): IsoRangeItem | null {
	if (!joint && !side) return null;
	const what: string[] = [];
	if (joint === 'butt-plate' || joint === 'butt-pipe')
		what.push('butt welds, and fillet welds', joint === 'butt-pipe' ? 'branch connections' : '');
	else if (joint === 'branch') what.push('branch connections at the angle tested and over');
	else if (joint === 't-butt') what.push('T-joint butt welds and fillet welds');
	else if (joint === 'fillet') what.push('fillet welds only');
	if (side === 'one-side-no-backing')
		what.push('welded from one side without backing, from one side with backing, and both sides');
	else if (side === 'one-side-backing') what.push('one side with backing, and both sides');
	else if (side === 'both-sides') what.push('both sides, and one side with backing');
	return {
		variable: 'Joint type',
		clause: '8.4.3',
		qualified: what.filter(Boolean).join('; '),
		notes: [],
		source: SRC
	};
}

/** Every range one coupon qualifies, each with its clause. Never throws. */
export function isoProcedureRanges(input: unknown): {
	level: 1 | 2;
	items: IsoRangeItem[];
	notes: string[];
	source: FindingSource;
} {
	const c = (typeof input === 'object' && input !== null ? input : {}) as IsoCoupon;
	const level = c.level === 1 ? 1 : 2;
	const items: IsoRangeItem[] = [];
	const notes: string[] = [
		'Level 2 qualifies level 1 as well, not the reverse; with no level in the contract, level 2 applies.'
	];
	if (level === 1)
		notes.push(
			'Level 1: Beadline shows the level 2 ranges (the level 1 columns are not modelled); confirm them in ISO 15614-1:2017.'
		);
	try {
		if (typeof c.process === 'string' && c.process.trim()) {
			const p = c.process.trim().slice(0, 10);
			const t = c.transfer;
			const mig = /^13[1-8]$/.test(p);
			items.push({
				variable: 'Process',
				clause: mig && t ? '8.4.1; transfer 8.5.2.3' : '8.4.1',
				qualified: `${p} only${mig && t ? (t === 'short-circuit' ? ', short-circuit transfer only' : ', spray, pulsed or globular transfer (not short-circuit)') : ''}`,
				notes: [],
				source: SRC
			});
		}
		const t = c.thicknessMm;
		if (isNum(t)) {
			const th = isoThicknessRange(t, c.runs ?? 'multi');
			if (th.ok)
				items.push({
					variable: 'Parent material thickness',
					clause: '8.3.2, Table 7',
					qualified: `${th.min}${th.max === null ? ' mm and over' : `–${th.max} mm`}`,
					range: { min: th.min, max: th.max, unit: 'mm' },
					notes: [
						c.joint === 'fillet'
							? 'Fillet welds: the fillet table (throat thickness) applies; not modelled here, the butt row is shown.'
							: '',
						...th.notes
					].filter(Boolean),
					source: th.source
				});
		}
		if (isNum(c.outsideDiameterMm)) {
			const d = isoDiameterRange(c.outsideDiameterMm);
			if (d.ok)
				items.push({
					variable: 'Pipe outside diameter',
					clause: '8.3.3, Table 9',
					qualified: `${d.min}${d.max === null ? ' mm and over' : `–${d.max} mm`}`,
					range: { min: d.min, max: d.max, unit: 'mm' },
					notes: [],
					source: SRC
				});
		} else if (c.joint === 'butt-plate')
			items.push({
				variable: 'Pipe outside diameter',
				clause: '8.3.3',
				qualified: `pipe over ${ISO_15614_1_DIAMETER.plateQualifiesPipeOverMm} mm OD (over ${ISO_15614_1_DIAMETER.plateRotatedQualifiesPipeOverMm} mm when welded in PC, or rotated in PA or PF)`,
				range: { min: ISO_15614_1_DIAMETER.plateQualifiesPipeOverMm, max: null, unit: 'mm' },
				notes: [],
				source: SRC
			});
		if (typeof c.materialGroup === 'string' && c.materialGroup.trim()) {
			const g = isoMaterialGroups(c.materialGroup);
			items.push({
				variable: 'Parent material group (ISO/TR 15608)',
				clause: '8.3.1, Table 5',
				qualified: g.known
					? g.qualified.join(', ')
					: `${g.qualified.join(', ')} only (group not in Beadline's ISO/TR 15608 list)`,
				notes: ['Dissimilar joints (two groups) are not modelled.'],
				source: sourceOf(ISO_TR_15608)
			});
		}
		if (isNum(c.heatInputKjPerMm)) {
			const h = isoHeatInputRange(c.heatInputKjPerMm, c.impact, c.hardness);
			if (h.ok) {
				const txt =
					h.min === null && h.max === null
						? 'not limited (no impact or hardness requirements)'
						: `${h.min === null ? 'no lower limit' : `${h.min} kJ/mm`} to ${h.max === null ? 'no upper limit' : `${h.max} kJ/mm`}`;
				items.push({
					variable: 'Heat input',
					clause: '8.4.7',
					qualified: txt,
					...(h.min !== null || h.max !== null
						? { range: { min: h.min ?? 0, max: h.max, unit: 'kJ/mm' } }
						: {}),
					notes: [],
					source: SRC
				});
			}
		}
		if (c.position !== undefined) {
			const p = isIsoPosition(c.position) ? c.position : null;
			const strict = c.impact === true || c.hardness === true;
			items.push({
				variable: 'Welding position (ISO 6947)',
				clause: '8.4.2',
				qualified: !p
					? 'unknown position given'
					: strict
						? `${p}; all positions only when impact specimens come from the highest and hardness from the lowest heat-input position`
						: 'all positions (no impact or hardness requirements)',
				notes: ['Vertical-down positions (PG, PJ, J-L045) need a test piece of their own (8.4.2).'],
				source: SRC
			});
		}
		const joint = jointItem(c.joint, c.side);
		if (joint) items.push(joint);
		if (typeof c.filler?.designation === 'string' && c.filler.designation.trim())
			items.push({
				variable: 'Filler material',
				clause: '8.4.4',
				qualified: `${c.filler.designation.trim().slice(0, 40)} and fillers of equivalent mechanical properties, the same type of covering, core or flux, the same nominal composition and the same or lower hydrogen${c.impact === true && c.filler.make ? `; with impact requirements, the make tested (${c.filler.make.slice(0, 40)})` : ''}`,
				notes: [
					...(c.impact === true && c.filler.make
						? [
								'8.4.4 restricts the make for impact tests below −20 °C with processes 111, 114, 12, 136 and 132; Beadline asks it for every impact test.'
							]
						: []),
					// The ISO designation beside the AWS one, where Beadline has one (iso-filler.ts).
					...isoFillerDesignations(c.filler.designation, c.process).map(
						(d) =>
							`ISO designation beside the AWS one: ${d.designation} (${d.source.kind === 'from memory' ? 'from memory: check the maker\u2019s certificate' : d.source.label}).`
					)
				],
				source: SRC
			});
		if (typeof c.gas === 'string' && c.gas.trim())
			items.push({
				variable: 'Shielding gas (ISO 14175)',
				clause: '8.5.2.1 (process 13), 8.5.3.1 (process 14)',
				qualified: `${c.gas.trim().slice(0, 20)} (the nominal composition used in the test)`,
				notes: [],
				source: SRC
			});
		if (c.currentType === 'AC' || c.currentType === 'DCEN' || c.currentType === 'DCEP') {
			const mma = c.process?.trim() === '111';
			items.push({
				variable: 'Current type and polarity',
				clause: '8.4.6',
				qualified: `${c.currentType}${c.pulsed ? ' pulsed' : ''} as tested${mma && c.currentType === 'AC' && c.impact !== true ? '; for 111, AC also covers DC (both polarities) without impact requirements' : ''}`,
				notes: [],
				source: SRC
			});
		}
		const temp = ISO_15614_1_TEMPERATURE;
		if (isNum(c.preheatC) && c.preheatC > -60 && c.preheatC < 1000) {
			const tested = Math.round(c.preheatC);
			const min = tested - temp.preheatDropC;
			items.push({
				variable: 'Preheat',
				clause: '8.4.8',
				qualified: `at least ${min} °C (${tested} °C tested, less ${temp.preheatDropC} °C)`,
				range: { min, max: null, unit: 'degC' },
				notes: [
					`A preheat below ${tested} °C is allowed only where the preheat rules for the joint (e.g. ISO/TR 17671-2, combined thickness) are met.`
				],
				source: SRC
			});
		}
		if (isNum(c.interpassMaxC) && c.interpassMaxC > -60 && c.interpassMaxC < 1000) {
			const tested = Math.round(c.interpassMaxC);
			const g = typeof c.materialGroup === 'string' ? c.materialGroup.trim().split('.')[0] : '';
			const asTested =
				level === 2 && (temp.interpassAsTestedGroups as readonly string[]).includes(g ?? '');
			items.push({
				variable: 'Interpass temperature',
				clause: '8.4.9',
				qualified: asTested
					? `at most ${tested} °C (the highest reached in the test; group ${g}, level 2)`
					: `at most ${tested + temp.interpassRiseC} °C (${tested} °C reached in the test, plus ${temp.interpassRiseC} °C)`,
				notes: asTested
					? []
					: [
							'For ISO/TR 15608 groups 8, 10 and 41 to 48 at level 2, the limit is the highest reached in the test.'
						],
				source: SRC
			});
		}
		if (typeof c.pwht === 'boolean')
			items.push({
				variable: 'Post-weld heat treatment',
				clause: '8.4.11',
				qualified: c.pwht
					? 'the heat treatment tested'
					: 'no heat treatment (adding one needs a new test)',
				notes: [],
				source: SRC
			});
	} catch {
		// A malformed part of the coupon leaves the items found so far.
	}
	return { level, items, notes, source: sourceOf(ISO_15614_1_LEVELS) };
}
