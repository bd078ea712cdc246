// A D1.1 PQR's coupon read by AWS D1.1 (issue 15): thickness by Table 4.2, positions by Table 4.1,
// and the Table 4.5 limits a WPS written from it must keep. Beside the ASME IX set, so a D1.1
// shop sees its own code's ranges. Pure; never throws.
import { D1_1_REQUALIFICATION } from '$reference/qualification-rules';
import { AWS_D1_1_TABLE_4_5 } from '$reference/sources';
import {
	d11ThicknessRange,
	d11WpsPositions,
	formatLength,
	sourceOf,
	type FindingSource,
	type UnitSystem
} from '$lib/weld';
import type { PqrValues } from '$lib/schemas/pqr';

export interface D11Item {
	variable: string;
	qualified: string;
	clause: string;
	notes: string[];
	source: FindingSource;
}

const round = (x: number) => Math.round(x * 10) / 10;

export function d11ResultSet(v: PqrValues, system: UnitSystem): D11Item[] {
	const items: D11Item[] = [];
	try {
		if (v.couponThicknessMm !== null) {
			const r = d11ThicknessRange(v.couponThicknessMm, v.transfer ?? undefined);
			items.push(
				r.ok
					? {
							variable: 'Base metal thickness',
							qualified: `${formatLength(r.minMm, system)} – ${r.maxMm === null ? 'unlimited' : formatLength(r.maxMm, system)}`,
							clause: `Table 4.2, ${r.row}`,
							notes: r.notes,
							source: r.source
						}
					: {
							variable: 'Base metal thickness',
							qualified: 'not worked out',
							clause: 'Table 4.2',
							notes: [r.message],
							source: sourceOf(AWS_D1_1_TABLE_4_5)
						}
			);
		}
		if (v.testPosition) {
			const p = d11WpsPositions([v.testPosition]);
			items.push({
				variable: 'Production positions',
				qualified: p.positions.join(', ') || 'none worked out',
				clause: 'Table 4.1',
				notes: p.unknown.length ? [`No D1.1 row for ${p.unknown.join(', ')}.`] : [],
				source: p.source
			});
		}
		const rule = Object.hasOwn(D1_1_REQUALIFICATION, v.process)
			? D1_1_REQUALIFICATION[v.process as keyof typeof D1_1_REQUALIFICATION]
			: undefined;
		const band = (what: 'amps' | 'volts', base: number | null, f: number | null | undefined) => {
			const unit = what === 'amps' ? 'A' : 'V';
			const label = what === 'amps' ? 'Amperage' : 'Voltage';
			if (base === null) return;
			items.push(
				typeof f === 'number'
					? {
							variable: label,
							qualified: `${round(base * (1 - f))}–${round(base * (1 + f))} ${unit} (within ${Math.round(f * 100)} % of ${round(base)} ${unit})`,
							clause: 'Table 4.5',
							notes: [],
							source: sourceOf(AWS_D1_1_TABLE_4_5)
						}
					: {
							variable: label,
							qualified: `no D1.1 limit modelled for ${v.process}`,
							clause: 'Table 4.5',
							notes: ['No D1.1 rule modelled for this variable; no other code’s rule is applied.'],
							source: sourceOf(AWS_D1_1_TABLE_4_5)
						}
			);
		};
		band('amps', v.amps, rule?.amps);
		band('volts', v.volts, rule?.volts);
		for (const [field, label] of [
			['currentType', 'Current and polarity'],
			['transfer', 'Transfer mode']
		] as const) {
			const x = v[field];
			if (x && (field === 'currentType' || v.process === 'GMAW'))
				items.push({
					variable: label,
					qualified: `${x} only (a change needs a new PQR)`,
					clause: 'Table 4.5',
					notes: [],
					source: sourceOf(AWS_D1_1_TABLE_4_5)
				});
		}
	} catch {
		return items;
	}
	return items;
}
