// Issue 15, 1b: every range and requalification finding follows the revision's own code, and
// where Beadline has no rule of that code the finding says so. The WPS-002 case: a D1.1 GMAW
// T-joint in 1F-3F backed by a 3G short-circuit coupon.
import { describe, expect, it } from 'vitest';
import type { RevisionVariables } from '$lib/schemas/procedure';
import { codeGapFindings, codePositionFindings, judgedBy } from './code-scope';
import { revisionFindings, type PqrForFindings } from './findings';
import type { PqrQualified } from './pqr-values';
import { emptyVariables } from './variables';

const revision = (
	code: RevisionVariables['code'],
	over: (v: RevisionVariables) => void = () => {},
	process: RevisionVariables['process'] = 'GMAW'
): RevisionVariables => {
	const v = emptyVariables({ title: 'Code scope', code, process });
	over(v);
	return v;
};
const qualified = (over: Partial<PqrQualified> = {}): PqrQualified => ({
	process: 'GMAW',
	currentType: 'DCEP',
	transfer: 'short-circuit',
	amps: 180,
	volts: 19.5,
	thickness: null,
	depositedMax: null,
	// What QW-461.9 gives a 3G test (ASME IX QW-461.9): groove F, V; fillet F, H, V.
	positions: {
		groove: ['F', 'V'],
		fillet: ['F', 'H', 'V'],
		source: { label: 'ASME BPVC Section IX QW-461.9', kind: 'published' }
	} as PqrQualified['positions'],
	pNumbers: ['1'],
	fNumbers: [6],
	problems: [],
	...over
});
const pqr = (
	testPosition: string | null = '3G',
	over: Partial<PqrQualified> = {}
): PqrForFindings => ({
	number: 'PQR-002',
	qualified: qualified(over),
	coupon: { thicknessMm: 9.525, transfer: 'short-circuit', testPosition }
});
const wps002 = (code: RevisionVariables['code']) =>
	revision(code, (v) => {
		v.positions.allowed = ['1F', '2F', '3F'];
		v.baseMetals.pNumbers = ['1'];
		v.fillerMetals.fNumbers = [6];
		v.fillerMetals.classifications = ['ER70S-6'];
		v.electrical.currentType = 'DCEP';
		v.electrical.volts = { min: 18, max: 22 };
		v.technique.travelSpeedMmPerS = { min: 5.08, max: 6.77 };
		v.gas.shielding = '75/25';
	});

describe('positions by the revision’s own code', () => {
	it('D1.1: a 3G test qualifies V only by Table 4.1, so 1F and 2F are not qualified', () => {
		const [f] = codePositionFindings(wps002('aws-d1.1'), [pqr('3G')]);
		// AWS D1.1:2015 Table 4.1 as recalled in reference/aws-d1-1-qualification.ts // from memory
		expect(f).toMatchObject({ status: 'outside', check: 'pqr-positions', expected: { unit: 'V' } });
		expect(f!.message).toContain('1F, 2F are not qualified');
		expect(f!.message).toContain('D1.1 Table 4.1');
		expect(f!.message).not.toContain('QW-461.9');
	});
	it('D1.1: a 6G test qualifies F, H, V and OH, so every position is covered', () => {
		const [f] = codePositionFindings(wps002('aws-d1.1'), [pqr('6G')]);
		// AWS D1.1:2015 Table 4.1 as recalled // from memory
		expect(f).toMatchObject({ status: 'ok', expected: { unit: 'F, H, V, OH' } });
	});
	it('D1.1: two tests, 1G and 2G, qualify F and H: 3F is still not qualified', () => {
		const [f] = codePositionFindings(wps002('aws-d1.1'), [pqr('1G'), pqr('2G')]);
		// AWS D1.1:2015 Table 4.1 as recalled // from memory
		expect(f).toMatchObject({ status: 'outside', expected: { unit: 'F, H' } });
		expect(f!.message).toContain('3F is not qualified');
	});
	it('ISO 15614-1: positions beyond the test one are a caution naming 8.4.2, not outside', () => {
		const [f] = codePositionFindings(wps002('iso-15609-1'), [pqr('3G')]);
		// ISO 15614-1:2017 8.4.2 (read by main's sources: ISO_15614_1_2017, published)
		expect(f).toMatchObject({ status: 'caution' });
		expect(f!.message).toContain('ISO 15614-1 8.4.2');
		expect(f!.message).toContain('vertical-down');
		expect(f!.source.kind).toBe('published');
	});
	it('no test position recorded: it says so and borrows no other code’s rule', () => {
		const [f] = codePositionFindings(wps002('aws-d1.1'), [pqr(null)]);
		expect(f).toMatchObject({ status: 'caution' }); // common practice, no source
		expect(f!.message).toContain('no other code');
	});
});

describe('variables the code has no rule for', () => {
	it('D1.1: travel speed, shielding gas, filler, P- and F-Numbers say "No D1.1 rule modelled"', () => {
		const gaps = codeGapFindings(wps002('aws-d1.1'), [pqr()]);
		expect(gaps.map((g) => g.at).sort()).toEqual(
			['fNumbers', 'fillerClasses', 'gasName', 'pNumbers', 'travelSpeed'].sort()
		); // governing-code.ts: D1.1 rules modelled for thickness, positions, process, current, transfer, amps, volts
		for (const g of gaps) {
			expect(g.status).toBe('caution');
			expect(g.message).toContain('No D1.1 rule modelled for this variable');
		}
	});
	it('D1.1: GMAW volts are answered by Table 4.5; GTAW volts have no D1.1 rule and say so', () => {
		const gmaw = codeGapFindings(wps002('aws-d1.1'), [pqr()]);
		expect(gmaw.some((g) => g.at === 'volts')).toBe(false); // AWS D1.1:2015 Table 4.5 (7 %, GMAW)
		const gtaw = revision('aws-d1.1', (v) => (v.electrical.volts = { min: 10, max: 12 }), 'GTAW');
		const [g] = codeGapFindings(gtaw, [pqr('3G', { process: 'GTAW' })]);
		// AWS D1.1:2015 Table 4.5 has no GTAW voltage limit as modelled (qualification-rules.ts)
		expect(g!.message).toContain('No D1.1 rule modelled for this variable (voltage, GTAW)');
	});
	it('ISO 15614-1: the gas rule is named (8.5.2.1 / 8.5.3.1) but said not to be compared yet', () => {
		const gaps = codeGapFindings(wps002('iso-15609-1'), [pqr()]);
		const gas = gaps.find((g) => g.at === 'gasName');
		// ISO 15614-1:2017 8.5.2.1 / 8.5.3.1 (governing-code.ts, read by main from the 2017 text)
		expect(gas!.message).toContain('ISO 15614-1 8.5.2.1 / 8.5.3.1 governs this variable');
		expect(gaps.find((g) => g.at === 'pNumbers')!.message).toContain('ISO/TR 15608');
		// ISO volts are said once per PQR by code-findings.ts, not again here.
		expect(gaps.some((g) => g.at === 'volts')).toBe(false);
	});
	it('ASME IX and shop practice: no gap findings (their rules are the ones applied)', () => {
		expect(codeGapFindings(wps002('asme-ix'), [pqr()])).toEqual([]);
		expect(codeGapFindings(wps002('shop'), [pqr()])).toEqual([]);
	});
});

describe('the whole review of WPS-002 by D1.1', () => {
	it('cites no ASME IX paragraph in any PQR finding, and says where D1.1 has no rule', () => {
		const all = revisionFindings(wps002('aws-d1.1'), [pqr()], 'imperial').filter(
			(f) => f.pqr !== undefined || f.check.startsWith('pqr-')
		);
		expect(all.some((f) => f.message.includes('QW-') || f.source.label.includes('QW-'))).toBe(
			false
		);
		expect(all.some((f) => f.check === 'pqr-p-number' || f.check === 'pqr-f-number')).toBe(false);
		expect(all.filter((f) => f.message.includes('No D1.1 rule modelled')).length).toBe(5);
		// The current type is judged once, by D1.1 Table 4.5, not again by QW-409.4.
		expect(all.filter((f) => f.at === 'currentType').map((f) => f.source.label)).toEqual([
			'AWS D1.1/D1.1M:2015 Table 4.5 (PQR changes requiring requalification)'
		]);
	});
	it('ASME IX keeps its own: P-Number by QW-424, positions by QW-461.9', () => {
		const all = revisionFindings(wps002('asme-ix'), [pqr()], 'imperial');
		expect(all.find((f) => f.check === 'pqr-p-number')?.status).toBe('ok'); // ASME IX QW-424
		expect(all.find((f) => f.check === 'pqr-positions')?.status).toBe('ok'); // ASME IX QW-461.9
	});
});

describe('which code judges the revision', () => {
	it('names the code and says no other code fills the gaps', () => {
		expect(judgedBy('aws-d1.1').label).toBe('AWS D1.1');
		expect(judgedBy('aws-d1.1').text).toContain('no ASME IX rule is applied in its place');
		expect(judgedBy('iso-15609-1').label).toContain('ISO 15614-1');
		expect(judgedBy('asme-ix').text).toContain('QW-451.1');
		expect(judgedBy('shop').text).toContain('No code judges this revision');
	});
});

describe('a D1.1 table quoted on a revision of another code', () => {
	const preheat = (code: RevisionVariables['code']) =>
		revisionFindings(
			revision(code, (v) => {
				v.baseMetals.specs = ['A36'];
				v.baseMetals.thicknessMm = { min: 25.4, max: 50.8 };
				v.preheat.minC = 0;
			}),
			[],
			'metric'
		).filter((f) => f.check === 'preheat');
	it('D1.1: its own Table 3.3 minimum judges the preheat', () => {
		// AWS D1.1:2015 Table 3.3 category B: 2 in (over 1-1/2 to 2-1/2 in) needs 150 °F (65 °C)
		expect(preheat('aws-d1.1').some((f) => f.status === 'outside')).toBe(true);
	});
	it('ISO 15614-1 and ASME IX: shown for comparison, never outside, and says whose table it is', () => {
		for (const code of ['iso-15609-1', 'asme-ix'] as const) {
			const found = preheat(code);
			expect(found.length).toBeGreaterThan(0);
			expect(found.some((f) => f.status === 'outside')).toBe(false); // common practice, no source
			expect(
				found.every((f) => f.message.includes('An AWS D1.1 table, shown for comparison'))
			).toBe(true);
		}
	});
});
