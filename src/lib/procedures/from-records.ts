// A draft whose ranges span a set of settings records: min and max of each quantity, the
// positions, joints, fillers, gases and base metals used. The engineer adjusts it by hand.
import type { StoredValues } from '$lib/records/display';
import { JOINT_TYPES, POSITIONS, type JointType, type Position } from '$lib/records/options';
import type { RevisionVariables, Range } from '$lib/schemas/procedure';
import type { CodeId } from './options';
import { deriveGroupings, emptyVariables } from './variables';

type Numeric = {
	[K in keyof StoredValues]: StoredValues[K] extends number | null ? K : never;
}[keyof StoredValues];

const span = (records: StoredValues[], key: Numeric): Range => {
	const values = records.map((r) => r[key]).filter((v): v is number => typeof v === 'number');
	return values.length
		? { min: Math.min(...values), max: Math.max(...values) }
		: { min: null, max: null };
};

const used = (records: StoredValues[], key: keyof StoredValues): string[] => [
	...new Set(
		records
			.map((r) => r[key])
			.filter((v): v is string => typeof v === 'string' && v.trim() !== '')
			.map((v) => v.trim())
	)
];

/** The most frequent value, first seen wins a tie; null when none is given. */
const mostUsed = (values: (string | null)[]): string | null => {
	const counts = new Map<string, number>();
	for (const v of values) if (v) counts.set(v, (counts.get(v) ?? 0) + 1);
	let best: string | null = null;
	for (const [v, n] of counts) if (best === null || n > (counts.get(best) ?? 0)) best = v;
	return best;
};

export function variablesFromRecords(
	records: StoredValues[],
	p: { title: string; code: CodeId; process: RevisionVariables['process'] }
): RevisionVariables {
	// Records of another process than the procedure's do not shape its ranges.
	const rs = records.filter((r) => r.process === p.process);
	const doc = emptyVariables(p);
	const min = (key: Numeric) => span(rs, key).min;
	const max = (key: Numeric) => span(rs, key).max;
	doc.joints.types = used(rs, 'jointType').filter((j): j is JointType =>
		(JOINT_TYPES as readonly string[]).includes(j)
	);
	doc.baseMetals.specs = used(rs, 'baseMetalSpec');
	doc.baseMetals.family = (mostUsed(rs.map((r) => r.baseMetalFamily)) ??
		null) as RevisionVariables['baseMetals']['family'];
	doc.baseMetals.thicknessMm = span(rs, 'thicknessMm');
	doc.fillerMetals.classifications = used(rs, 'fillerClass').map((c) => c.toUpperCase());
	doc.fillerMetals.diameterMm = span(rs, 'fillerDiameterMm');
	doc.positions.allowed = POSITIONS.filter((pos: Position) => rs.some((r) => r.position === pos));
	doc.preheat = { minC: min('preheatC'), interpassMaxC: max('interpassC') };
	doc.gas.shielding = used(rs, 'gasName').join(', ').slice(0, 60);
	doc.gas.flowLPerMin = span(rs, 'gasFlowLPerMin');
	doc.electrical = {
		...doc.electrical,
		currentType: mostUsed(
			rs.map((r) => r.currentType)
		) as RevisionVariables['electrical']['currentType'],
		transfer:
			p.process === 'GMAW'
				? (mostUsed(rs.map((r) => r.transfer)) as RevisionVariables['electrical']['transfer'])
				: null,
		amps: span(rs, 'amps'),
		volts: span(rs, 'volts'),
		wireFeedMmPerS: span(rs, 'wireFeedMmPerS'),
		tungstenClass: p.process === 'GTAW' ? (mostUsed(rs.map((r) => r.tungstenClass)) ?? '') : '',
		tungstenDiameterMm: span(rs, 'tungstenDiameterMm')
	};
	doc.technique.travelSpeedMmPerS = span(rs, 'travelSpeedMmPerS');
	return deriveGroupings(doc);
}
