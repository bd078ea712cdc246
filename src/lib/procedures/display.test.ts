import { describe, expect, it } from 'vitest';
import { diffRows, groupsOf } from './display';
import { emptyVariables } from './variables';

const keys = (process: 'GMAW' | 'GTAW') =>
	groupsOf(emptyVariables({ title: 'T', code: 'asme-ix', process }), 'imperial').flatMap((g) =>
		g.rows.map((r) => r.key)
	);

describe('groupsOf', () => {
	it('leaves empty tungsten rows out of a GMAW revision and keeps them on GTAW', () => {
		expect(keys('GMAW')).not.toContain('tungstenClass');
		expect(keys('GMAW')).not.toContain('tungstenDiameter');
		expect(keys('GTAW')).toContain('tungstenClass');
		expect(keys('GTAW')).toContain('tungstenDiameter');
	});

	it('shows a tungsten that was entered, whatever the process (nothing saved is hidden)', () => {
		const v = emptyVariables({ title: 'T', code: 'asme-ix', process: 'GMAW' });
		v.electrical.tungstenClass = 'EWCe-2';
		const rows = groupsOf(v, 'imperial').flatMap((g) => g.rows);
		expect(rows.find((r) => r.key === 'tungstenClass')?.value).toBe('EWCe-2');
	});

	it('diffs GTAW against GMAW row by row, the tungsten rows included', () => {
		const a = emptyVariables({ title: 'T', code: 'asme-ix', process: 'GTAW' });
		a.electrical.tungstenClass = 'EWLa-1.5';
		const b = emptyVariables({ title: 'T', code: 'asme-ix', process: 'GMAW' });
		const rows = diffRows(a, b, 'imperial');
		expect(rows.find((r) => r.key === 'tungstenClass')).toMatchObject({
			a: 'EWLa-1.5',
			b: '',
			changed: true
		});
		expect(rows.find((r) => r.key === 'process')?.changed).toBe(true);
	});

	it('leaves the empty tungsten rows out of a diff of two GMAW revisions', () => {
		const a = emptyVariables({ title: 'T', code: 'asme-ix', process: 'GMAW' });
		const b = emptyVariables({ title: 'T', code: 'asme-ix', process: 'GMAW' });
		b.electrical.amps = { min: 150, max: 190 };
		const keys = diffRows(a, b, 'imperial').map((r) => r.key);
		expect(keys).not.toContain('tungstenClass');
		expect(keys).not.toContain('tungstenDiameter');
		expect(keys).toContain('amps');
	});
});
