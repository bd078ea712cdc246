import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { describeEvent, changesInWords } from './describe-event';
import { fieldOf } from './field-labels';

const AT = '2026-12-02T23:02:55.667Z';
const imperial = { system: 'imperial' } as const;
const metric = { system: 'metric' } as const;
const ampsEdit = (min: number) => ({
	variables: { electrical: { amps: { min, max: 130 } } }
});

describe('describeEvent', () => {
	it('says one changed value in a sentence, with its label and unit', () => {
		const d = describeEvent(
			{
				actor: 'Reuben Castell',
				action: 'procedure_revision.updated',
				at: AT,
				before: ampsEdit(110),
				after: ampsEdit(115)
			},
			imperial
		);
		// The issue's own example sentence.
		expect(d.sentence).toBe('Reuben Castell changed amperage, low end: 110 A → 115 A');
		expect(d.label).toBe('Draft edited');
		expect(d.changes).toEqual([
			{
				path: 'variables.electrical.amps.min',
				label: 'Amperage, low end',
				before: '110 A',
				after: '115 A',
				line: 'amperage, low end: 110 A → 115 A'
			}
		]);
	});

	it('shows quantities in the reader’s system, imperial and metric', () => {
		const e = {
			actor: 'Ines Marr',
			action: 'settings_record.updated',
			at: AT,
			before: { thicknessMm: 3.175, preheatC: 10, gasFlowLPerMin: 9.4389 },
			after: { thicknessMm: 4.7625, preheatC: 93.3333, gasFlowLPerMin: 11.7986 }
		};
		const inches = describeEvent(e, imperial).changes.map((c) => c.line);
		expect(inches).toEqual([
			'base metal thickness: 1/8 in → 3/16 in', // 1 in = 25.4 mm exactly (NIST SP 811)
			'preheat: 50 °F → 200 °F', // °F = °C × 9/5 + 32 (NIST SP 811)
			'shielding gas flow: 20 CFH → 25 CFH' // 1 ft³/h = 0.471947 L/min (NIST SP 811)
		]);
		const mm = describeEvent(e, metric).changes.map((c) => c.line);
		expect(mm).toEqual([
			'base metal thickness: 3.2 mm → 4.8 mm', // the stored mm, to one place
			'preheat: 10 °C → 93 °C', // the stored °C, rounded
			'shielding gas flow: 9.4 L/min → 12 L/min' // the stored L/min, one place under 10
		]);
		expect(describeEvent(e, imperial).sentence).toBe(
			'Ines Marr changed base metal thickness, preheat and shielding gas flow'
		);
	});

	it('says a revision’s state and a record’s freezing in words, booleans as yes and no', () => {
		const approved = describeEvent(
			{
				actor: 'Mirela Sand',
				action: 'procedure_revision.approved',
				at: AT,
				before: { state: 'in-review' },
				after: { state: 'approved', meaning: 'approved', printedName: 'Mirela Sand' }
			},
			imperial
		);
		expect(approved.sentence).toBe('Mirela Sand approved and signed the revision');
		expect(approved.changes[0]).toMatchObject({ label: 'State', before: 'In review' });
		expect(approved.changes[0]?.after).toBe('Approved');
		const frozen = describeEvent(
			{
				actor: 'Reuben Castell',
				action: 'settings_record.frozen',
				at: AT,
				before: { frozen: false },
				after: { frozen: true, citedBy: 'WPS-007', procedureId: 4 }
			},
			imperial
		);
		// The internal procedure id stays in the raw entry only.
		expect(frozen.changes.map((c) => c.line)).toEqual([
			'frozen: no → yes',
			'cited by procedure: WPS-007'
		]);
		expect(JSON.stringify(frozen)).not.toMatch(/true|false/);
		const certified = changesInWords({ state: 'draft' }, { state: 'certified' }, imperial);
		expect(certified[0]?.line).toBe('state: Draft → Certified');
	});

	it('gives the moment in UTC, labelled, or in the shop’s zone when one is set', () => {
		const e = { actor: 'A', action: 'procedure.created', at: AT };
		expect(describeEvent(e, imperial).at).toEqual({ iso: AT, text: '2 Dec 2026, 23:02 UTC' });
		// America/Chicago is UTC−6 in December (IANA tz database).
		expect(describeEvent(e, { ...imperial, timeZone: 'America/Chicago' }).at.text).toBe(
			'2 Dec 2026, 17:02 America/Chicago'
		);
		expect(describeEvent(e, { ...imperial, timeZone: 'Not/AZone' }).at.text).toBe(
			'2 Dec 2026, 23:02 UTC'
		);
		// A moment inside the values reads the same way; a calendar day has no zone.
		const w = changesInWords(
			{},
			{ submittedAt: AT, weldedOn: '2025-06-02', pwht: { required: false } },
			imperial
		);
		expect(w.map((c) => c.line)).toEqual([
			'submitted: 2 Dec 2026, 23:02 UTC',
			'welded on: 2 Jun 2025',
			'required: no'
		]);
	});

	it('labels unknown fields and codes from their own words, never the raw path', () => {
		expect(fieldOf('variables.electrical.pulseFrequencyHz.max').label).toBe(
			'Pulse frequency hz, high end'
		);
		expect(fieldOf('someNewThing').label).toBe('Some new thing');
		expect(fieldOf('printed.0.number').label).toBe('Number, item 1');
		const d = describeEvent(
			{ actor: 'system', action: 'weld_map.redrawn', at: AT, after: { layerCount: 3 } },
			metric
		);
		expect(d.label).toBe('Weld map redrawn');
		expect(d.sentence).toBe('Beadline recorded “weld map redrawn”');
		expect(d.changes[0]?.line).toBe('layer count: 3');
	});

	it('says an edit that changed nothing, and lists many changes by count', () => {
		const same = { actor: 'A', action: 'pqr.updated', at: AT, before: { x: 1 }, after: { x: 1 } };
		expect(describeEvent(same, metric).sentence).toBe('A edited the PQR, with no values changed');
		const many = describeEvent(
			{
				actor: 'A',
				action: 'welder.updated',
				at: AT,
				before: { a: 1, b: 1, c: 1, d: 1 },
				after: { a: 2, b: 2, c: 2, d: 2 }
			},
			metric
		);
		expect(many.sentence).toBe('A edited the welder, changing 4 values');
	});

	it('takes any stored values without throwing', () => {
		fc.assert(
			fc.property(fc.anything(), fc.anything(), fc.anything(), (before, after, at) => {
				const d = describeEvent(
					{ actor: 'A', action: 'pqr.updated', at: at as string, before, after },
					imperial
				);
				expect(typeof d.sentence).toBe('string');
			})
		);
	});
});
