// A PQR's coupon read by ISO 15614-1 as well as ASME IX, for shops that qualify to both: the
// same actual values, the ISO result set beside the ASME one. Pure; never throws.
import { PROCESS_ISO4063 } from '$reference/heat-input-k';
import { ASME_TO_ISO } from '$reference/iso-6947';
import { heatInput } from '$lib/weld/heat-input';
import { isoProcedureRanges } from '$lib/weld/iso-15614-procedure';
import type { IsoRangeItem } from '$lib/weld/iso-15614-ranges';
import type { PqrValues, TestResult } from '$lib/schemas/pqr';

export interface IsoResultSet {
	level: 1 | 2;
	items: IsoRangeItem[];
	notes: string[];
}

export function isoResultSet(v: PqrValues, tests: TestResult[]): IsoResultSet | null {
	try {
		const hi =
			v.volts && v.amps && v.travelSpeedMmPerS
				? heatInput(v.process, v.volts, v.amps, v.travelSpeedMmPerS)
				: null;
		const impact = tests.some((t) => t.kind === 'impact' && t.result !== '');
		const r = isoProcedureRanges({
			level: 2,
			process: String(PROCESS_ISO4063[v.process] ?? ''),
			transfer: v.transfer ?? undefined,
			thicknessMm: v.couponThicknessMm ?? undefined,
			position: v.testPosition ? ASME_TO_ISO[v.testPosition]?.[0] : undefined,
			joint: v.testPosition?.endsWith('F') ? 'fillet' : v.testPosition ? 'butt-plate' : undefined,
			heatInputKjPerMm: hi?.isoKJPerMm,
			impact,
			currentType: v.currentType ?? undefined,
			filler: v.fillerClass ? { designation: v.fillerClass } : undefined,
			gas: v.gasName || undefined,
			preheatC: v.preheatC ?? undefined,
			interpassMaxC: v.interpassC ?? undefined
		});
		return { level: r.level, items: r.items, notes: r.notes };
	} catch {
		return null;
	}
}
