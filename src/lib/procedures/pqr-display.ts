// A PQR's actual values, test results and qualified ranges as people read them.
import { formatLength, lengthToMm, type UnitSystem } from '$lib/weld';
import {
	JOINT_LABELS,
	PROCESS_LABELS,
	TRANSFER_LABELS,
	type JointType
} from '$lib/records/options';
import type { PqrValues, TestResult } from '$lib/schemas/pqr';
import type { Row } from './display';
import { TEST_LABELS } from './options';
import type { PqrQualified } from './pqr-values';
import { showQuantity, type QuantityKind } from './quantities';

export function pqrRows(v: PqrValues, system: UnitSystem): Row[] {
	const q = (n: number | null, kind: QuantityKind) =>
		n === null ? '' : showQuantity(kind, n, system);
	const rows: [string, string, string][] = [
		['process', 'Process', PROCESS_LABELS[v.process]],
		['currentType', 'Current and polarity', v.currentType ?? ''],
		['transfer', 'Transfer mode', v.transfer ? TRANSFER_LABELS[v.transfer] : ''],
		['amps', 'Amperage', q(v.amps, 'amps')],
		['volts', 'Voltage', q(v.volts, 'volts')],
		['travelSpeed', 'Travel speed', q(v.travelSpeedMmPerS, 'travel')],
		['wireFeed', 'Wire feed speed', q(v.wireFeedMmPerS, 'wire')],
		['fillerClass', 'Filler', v.fillerClass],
		['fNumber', 'F-Number', v.fNumber === null ? '' : `F-${v.fNumber}`],
		['fillerDiameter', 'Filler diameter', q(v.fillerDiameterMm, 'diameter')],
		['tungstenClass', 'Tungsten', v.tungstenClass],
		['tungstenDiameter', 'Tungsten diameter', q(v.tungstenDiameterMm, 'diameter')],
		['gasName', 'Shielding gas', v.gasName],
		['gasFlow', 'Gas flow', q(v.gasFlowLPerMin, 'flow')],
		['baseMetalSpec', 'Base metal', v.baseMetalSpec],
		['pNumber', 'P-Number', v.pNumber ? `P-${v.pNumber}` : ''],
		['couponThickness', 'Coupon thickness T', q(v.couponThicknessMm, 'thickness')],
		['depositedThickness', 'Deposited weld metal t', q(v.depositedThicknessMm, 'thickness')],
		['testPosition', 'Test position', v.testPosition],
		[
			'jointType',
			'Joint',
			v.jointType ? (JOINT_LABELS[v.jointType as JointType] ?? v.jointType) : ''
		],
		['preheat', 'Preheat', q(v.preheatC, 'temperature')],
		['interpass', 'Interpass', q(v.interpassC, 'temperature')],
		['pwht', 'PWHT', v.pwht],
		['weldedOn', 'Date welded', v.weldedOn],
		['welder', 'Welder', v.welder],
		['lab', 'Testing lab', v.lab]
	];
	return rows.map(([key, label, value]) => ({ key, label, value })).filter((r) => r.value !== '');
}

export function testRows(tests: TestResult[], system: UnitSystem) {
	return tests.map((t) => ({
		kind: t.kind,
		label: TEST_LABELS[t.kind],
		result: t.result,
		notes: t.notes,
		values: t.values
			.map((x) =>
				x.unit === '°C'
					? `${x.label}: ${showQuantity('temperature', x.value, system)}`
					: `${x.label}: ${x.value.toLocaleString('en-US')} ${x.unit}`
			)
			.join('; ')
	}));
}

export function qualifiedRows(q: PqrQualified, system: UnitSystem): Row[] {
	const len = (l: { value: number; unit: 'in' | 'mm' }) =>
		formatLength(lengthToMm(l.value, l.unit), system);
	const rows: [string, string, string][] = [
		[
			'thickness',
			'Base metal thickness (QW-451.1)',
			q.thickness ? `${len(q.thickness.min)} – ${len(q.thickness.max)}` : ''
		],
		['depositedMax', 'Deposited weld metal, up to', q.depositedMax ? len(q.depositedMax) : ''],
		[
			'positions',
			'Positions (QW-461.9)',
			q.positions
				? `groove ${q.positions.groove.join(', ') || 'none'}; fillet ${q.positions.fillet.join(', ') || 'none'}`
				: ''
		],
		['pNumbers', 'P-Numbers', q.pNumbers.map((p) => `P-${p}`).join(', ')],
		['fNumbers', 'F-Numbers', q.fNumbers.map((f) => `F-${f}`).join(', ')],
		['process', 'Process', q.process],
		['currentType', 'Current and polarity', q.currentType ?? '']
	];
	return rows.map(([key, label, value]) => ({ key, label, value })).filter((r) => r.value !== '');
}
