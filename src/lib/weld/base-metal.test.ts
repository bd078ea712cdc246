import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { baseMetalFromFamily, checkBaseMetal, parseBaseMetal } from './base-metal';

const m = (s: string) => {
	const r = parseBaseMetal(s);
	if (!r.ok) throw new Error(r.message);
	return r.metal;
};

describe('spec and grade to P-Number and Group', () => {
	it('published rows (ASME BPVC IX QW/QB-422, 2017)', () => {
		expect(m('A36')).toMatchObject({ family: 'carbon-steel', pNumber: '1', group: 1 }); // QW/QB-422
		expect(m('A106 Gr B')).toMatchObject({ pNumber: '1', group: 1 }); // QW/QB-422
		expect(m('A106-C')).toMatchObject({ pNumber: '1', group: 2 }); // QW/QB-422
		expect(m('A53 B')).toMatchObject({ pNumber: '1', group: 1 }); // QW/QB-422
		expect(m('A36').row?.source.kind).toBe('published');
		// QW/QB-422 (2013), B361 WP6061 P-23 (public copy, anyflip.com/pegaz/aval/basic/251-300)
		expect(m('6061')).toMatchObject({ family: 'aluminium', pNumber: '23', group: null });
		expect(m('6061').row?.source.kind).toBe('published');
	});
	it('rows from memory are marked so', () => {
		expect(m('A516-70')).toMatchObject({ pNumber: '1', group: 2 }); // from memory
		expect(m('304')).toMatchObject({ family: 'stainless', pNumber: '8', group: 1 }); // from memory
		expect(m('316L')).toMatchObject({ family: 'stainless', pNumber: '8' }); // from memory
		expect(m('A516-70').row?.source.kind).toBe('from memory');
	});
	it('reads the ways people write specs', () => {
		for (const s of ['ASTM A36', 'SA-36', 'A 36', 'sa36']) expect(m(s).row?.key).toBe('A36');
		for (const s of ['SA-516-70', 'A516 Gr 70', 'A516 Grade 70', 'A516-70'])
			expect(m(s).row?.key).toBe('A516-70');
		expect(m('A240 304L').row?.key).toBe('304L');
		expect(m('A312 TP316L').row?.key).toBe('316L');
		expect(m('6061-T6').row?.key).toBe('6061');
		expect(m('AA 5052').row?.key).toBe('5052');
		expect(m('A36').d11CategoryB).toBe(true);
	});
	it('asks for a grade where it matters; names the table when unknown', () => {
		const g = parseBaseMetal('A106');
		expect(g.ok).toBe(false);
		if (!g.ok) expect(g.message).toContain('grade');
		const u = parseBaseMetal('unobtainium 9000');
		expect(u.ok).toBe(false);
		if (!u.ok) expect(u.message).toContain('A36');
	});
	it('family only', () => {
		const r = baseMetalFromFamily('aluminium');
		expect(r.ok && r.metal).toMatchObject({ family: 'aluminium', pNumber: null, row: null });
		expect(baseMetalFromFamily('wood').ok).toBe(false);
	});
	it('the finding', () => {
		const f = checkBaseMetal({
			s: { process: 'GTAW', baseMetal: { spec: 'A36' } },
			system: 'imperial'
		});
		expect(f).toMatchObject({
			check: 'base-metal',
			status: 'ok',
			value: 'A36',
			field: 'baseMetal.spec'
		});
		expect(f?.message).toContain('P-1 Group 1');
		const sheet = checkBaseMetal({
			s: { process: 'GTAW', baseMetal: { spec: 'A1011' } },
			system: 'imperial'
		});
		expect(sheet?.status).toBe('caution');
	});
});

it('never throws (fast-check)', () => {
	fc.assert(fc.property(fc.anything(), (x) => void parseBaseMetal(x)));
	fc.assert(fc.property(fc.string({ maxLength: 30 }), (x) => void parseBaseMetal(`A${x}`)));
});
