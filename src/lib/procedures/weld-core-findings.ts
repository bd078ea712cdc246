// The weld core's checks at each end of a revision's ranges (low amps with fast travel, high
// amps with slow travel), each finding placed beside the display row it concerns.
import { runChecks, type Finding, type UnitSystem, type WeldSettings } from '$lib/weld';
import type { RevisionVariables } from '$lib/schemas/procedure';
import { inOwnCode } from './code-scope';
import { n, type ProcedureFinding } from './procedure-finding';

const AT: Record<string, string> = {
	amps: 'amps',
	volts: 'volts',
	wireFeed: 'wireFeed',
	travelSpeed: 'travelSpeed',
	currentType: 'currentType',
	'baseMetal.spec': 'baseMetalSpecs',
	'filler.classification': 'fillerClasses',
	'filler.diameter': 'fillerDiameter',
	'tungsten.classification': 'tungstenClass',
	'tungsten.diameter': 'tungstenDiameter',
	'gas.name': 'gasName',
	'gas.flow': 'gasFlow',
	preheat: 'preheat'
};
const atFor = (f: Finding): string =>
	f.check === 'heat-input' ? 'heatInput' : (AT[f.field ?? ''] ?? 'general');

/** The weld core's settings at one end of every range (heat input: high amps and volts, slow travel). */
function endSettings(v: RevisionVariables, end: 'low' | 'high'): WeldSettings {
	const e = v.electrical;
	const pick = (r: { min: number | null; max: number | null }) => n(end === 'low' ? r.min : r.max);
	return {
		process: v.process,
		currentType: n(e.currentType),
		transfer: n(e.transfer),
		amps: pick(e.amps),
		volts: pick(e.volts),
		wireFeedMmPerS: pick(e.wireFeedMmPerS),
		travelSpeedMmPerS: n(
			end === 'low' ? v.technique.travelSpeedMmPerS.max : v.technique.travelSpeedMmPerS.min
		),
		thicknessMm: pick(v.baseMetals.thicknessMm),
		baseMetal: v.baseMetals.specs[0]
			? { spec: v.baseMetals.specs[0] }
			: v.baseMetals.family
				? { family: v.baseMetals.family }
				: undefined,
		filler: {
			classification: v.fillerMetals.classifications[0],
			diameterMm: pick(v.fillerMetals.diameterMm)
		},
		tungsten: {
			classification: v.electrical.tungstenClass || undefined,
			diameterMm: pick(e.tungstenDiameterMm)
		},
		gas: { name: v.gas.shielding || undefined, flowLPerMin: pick(v.gas.flowLPerMin) },
		preheatC: n(v.preheat.minC),
		procedure:
			e.heatInputMaxJPerMm === null
				? undefined
				: {
						heatInputMax: {
							jPerMm: e.heatInputMaxJPerMm,
							basis: v.code === 'iso-15609-1' ? 'iso' : 'asme'
						}
					}
	};
}

export function weldCoreFindings(v: RevisionVariables, system: UnitSystem): ProcedureFinding[] {
	// A D1.1 table quoted on a revision of another code says so (code-scope.ts).
	const own = (f: Finding) => inOwnCode(f, v.code);
	const low = runChecks(endSettings(v, 'low'), { system }).findings.map(own);
	const high = runChecks(endSettings(v, 'high'), { system }).findings.map(own);
	const key = (f: Finding) => `${f.check}|${f.field ?? ''}|${f.message}`;
	const lowKeys = new Set(low.map(key));
	const highKeys = new Set(high.map(key));
	const out: ProcedureFinding[] = [];
	for (const f of low)
		out.push({ ...f, at: atFor(f), ...(highKeys.has(key(f)) ? {} : { end: 'low' as const }) });
	for (const f of high) if (!lowKeys.has(key(f))) out.push({ ...f, at: atFor(f), end: 'high' });
	// Further base metals and fillers listed: their own grouping and match findings.
	const extra = [
		...v.baseMetals.specs
			.slice(1)
			.map((spec) => ({ spec, filler: v.fillerMetals.classifications[0] })),
		...v.fillerMetals.classifications
			.slice(1)
			.map((filler) => ({ spec: v.baseMetals.specs[0], filler }))
	];
	for (const x of extra) {
		const r = runChecks({
			process: v.process,
			baseMetal: x.spec ? { spec: x.spec } : undefined,
			filler: x.filler ? { classification: x.filler } : undefined
		}).findings;
		for (const f of r)
			if (
				['base-metal', 'filler-classification', 'filler-vs-base-metal'].includes(f.check) &&
				!lowKeys.has(key(f))
			)
				out.push({ ...f, at: atFor(f) });
	}
	return out;
}
