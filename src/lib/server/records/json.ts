// A record as the JSON API answers it: SI quantities as { value, unit }, like the checks API.
import type { RecordView } from './read';

const q = (value: number | null, unit: string) => (value === null ? null : { value, unit });

export function recordJson(r: RecordView) {
	const v = r.values;
	return {
		id: r.id,
		process: v.process,
		currentType: v.currentType,
		transfer: v.transfer,
		amps: v.amps,
		volts: v.volts,
		wireFeed: q(v.wireFeedMmPerS, 'mm/s'),
		travelSpeed: q(v.travelSpeedMmPerS, 'mm/s'),
		filler: { classification: v.fillerClass, diameter: q(v.fillerDiameterMm, 'mm') },
		tungsten: { classification: v.tungstenClass, diameter: q(v.tungstenDiameterMm, 'mm') },
		gas: { name: v.gasName, flow: q(v.gasFlowLPerMin, 'L/min') },
		baseMetal: { spec: v.baseMetalSpec, family: v.baseMetalFamily, pNumber: v.pNumber },
		thickness: q(v.thicknessMm, 'mm'),
		jointType: v.jointType,
		position: v.position,
		preheat: q(v.preheatC, 'degC'),
		interpass: q(v.interpassC, 'degC'),
		machine: v.machine,
		jobRef: v.jobRef,
		outcome: v.outcome,
		outcomeKind: v.outcomeKind,
		defects: v.defects,
		notes: v.notes,
		weldedOn: v.weldedOn,
		author: r.author,
		findings: r.findings,
		derived: r.derived,
		photos: r.photos.map((p) => ({ ...p, url: `/records/${r.id}/photos/${p.id}` })),
		frozen: r.frozen,
		citedByProcedureId: r.citedByProcedureId,
		createdAt: r.createdAt,
		updatedAt: r.updatedAt
	};
}
