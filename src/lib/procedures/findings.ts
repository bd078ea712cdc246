// Findings on a revision: the weld core's checks at each end of the ranges, and the ranges
// against what the supporting PQRs qualify (QW-451.1 thickness, positions, P-Number, F-Number,
// process, current type) with the AWS D1.1 requalification triggers. Advice only: nothing here
// stops a save, a submission or a decision.
import {
	formatLength,
	mmToIn,
	requalificationTriggers,
	runChecks,
	type CheckId,
	type Finding,
	type FindingSource,
	type UnitSystem,
	type WeldSettings
} from '$lib/weld';
import type { Source } from '$reference/types';
import type { RevisionVariables } from '$lib/schemas/procedure';
import { CODE_LABELS } from './options';
import {
	type ProcedureOnlyCheckId,
	PRODUCT,
	QW_401,
	QW_404_4,
	QW_409_4,
	QW_424
} from './check-catalogue';
import { codeChangeFindings, codeThicknessFindings, type PqrWithCoupon } from './code-findings';
import { codeGapFindings, codePositionFindings, inOwnCode, ownCodeSource } from './code-scope';
import { lengthMm } from './pqr-values';

export type ProcedureCheckId = CheckId | ProcedureOnlyCheckId;

export interface ProcedureFinding extends Omit<Finding, 'check'> {
	check: ProcedureCheckId;
	/** The display row the finding belongs beside (see display.ts). */
	at: string;
	/** Which end of the ranges the weld core checked; absent when both ends agree. */
	end?: 'low' | 'high';
	/** The PQR compared against. */
	pqr?: string;
}

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

const n = <T>(v: T | null | undefined): T | undefined => (v === null ? undefined : v);

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

function weldCoreFindings(v: RevisionVariables, system: UnitSystem): ProcedureFinding[] {
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

/** A cited PQR: what it qualifies and, where read, its coupon (for the D1.1 and ISO rows). */
export type PqrForFindings = PqrWithCoupon;

/** Production positions to the letters F, H, V, O of groove and fillet work. */
export function positionLetters(
	position: string
): { kind: 'groove' | 'fillet'; letters: string[] } | null {
	const m = /^([1-6])([GF])$/.exec(position);
	if (!m) return null;
	const kind = m[2] === 'G' ? 'groove' : 'fillet';
	const byNumber: Record<string, string[]> = {
		'1': ['F'],
		'2': ['H'],
		'3': ['V'],
		'4': ['O'],
		'5': ['F', 'V', 'O'],
		'6': ['F', 'H', 'V', 'O']
	};
	return { kind, letters: byNumber[m[1]!] ?? [] };
}

function pqrFindings(
	v: RevisionVariables,
	pqrs: PqrForFindings[],
	system: UnitSystem
): ProcedureFinding[] {
	const out: ProcedureFinding[] = [];
	const names = pqrs.map((p) => p.number).join(', ');
	const f = (x: Omit<ProcedureFinding, 'source'> & { source: Source | FindingSource }) => ({
		...x,
		source: { label: x.source.label, kind: x.source.kind }
	});
	if (pqrs.length === 0) {
		if (v.code !== 'shop')
			out.push(
				f({
					check: 'pqr-support',
					status: 'caution',
					message: `No PQR supports this revision yet, so its ranges cannot be checked against a qualification (${CODE_LABELS[v.code]}).`,
					value: null,
					expected: { unit: 'PQR' },
					source: PRODUCT,
					at: 'pqrs'
				})
			);
		return out;
	}
	const same = pqrs.filter((p) => p.qualified.process === v.process);
	for (const p of pqrs.filter((p) => p.qualified.process !== v.process))
		out.push(
			f({
				check: 'pqr-process',
				status: 'outside',
				message: `${p.number} was welded with ${p.qualified.process}; this procedure is ${v.process}.`,
				value: v.process,
				expected: { unit: p.qualified.process },
				source: ownCodeSource(v.code, 'process', QW_401),
				at: 'process',
				pqr: p.number
			})
		);
	if (same.length === 0) return out;

	// Thickness by the revision's own code: D1.1 and ISO from the coupon; ASME IX (and shop
	// practice, which has no code) by QW-451.1, the hull of what the PQRs qualify.
	const byCode = v.code === 'aws-d1.1' || v.code === 'iso-15609-1';
	if (byCode) out.push(...codeThicknessFindings(v, same, system));
	const t = byCode
		? []
		: same.flatMap((p) => (p.qualified.thickness ? [p.qualified.thickness] : []));
	const tr = v.baseMetals.thicknessMm;
	if (t.length && (tr.min !== null || tr.max !== null)) {
		const qMin = Math.min(...t.map((x) => lengthMm(x.min)));
		const qMax = Math.max(...t.map((x) => lengthMm(x.max)));
		const len = (mm: number) => formatLength(mm, system);
		const unit = system === 'imperial' ? 'in' : 'mm';
		const conv = (mm: number) =>
			system === 'imperial' ? Math.round(mmToIn(mm) * 10000) / 10000 : Math.round(mm * 100) / 100;
		for (const [end, value] of [
			['low', tr.min],
			['high', tr.max]
		] as const) {
			if (value === null) continue;
			const outside = value < qMin - 0.005 || value > qMax + 0.005;
			out.push(
				f({
					check: 'pqr-ranges',
					status: outside ? 'outside' : 'ok',
					message: outside
						? `Thickness ${len(value)} is outside what ${names} qualif${same.length > 1 ? 'y' : 'ies'} (${len(qMin)}–${len(qMax)}).`
						: `Thickness ${len(value)} is within what ${names} qualif${same.length > 1 ? 'y' : 'ies'} (${len(qMin)}–${len(qMax)}).`,
					value: conv(value),
					expected: { min: conv(qMin), max: conv(qMax), unit },
					source: t[0]!.source,
					at: 'thickness',
					end
				})
			);
		}
	}

	// Positions: every production position must be covered by a PQR's test position, by the
	// revision's own code (D1.1 Table 4.1, ISO 15614-1 8.4.2; else QW-461.9 as the shop's rule).
	if (byCode) out.push(...codePositionFindings(v, same));
	const pos = byCode
		? []
		: same.flatMap((p) => (p.qualified.positions ? [p.qualified.positions] : []));
	if (pos.length && v.positions.allowed.length) {
		const groove = new Set(pos.flatMap((x) => x.groove));
		const fillet = new Set(pos.flatMap((x) => x.fillet));
		const missing = v.positions.allowed.filter((p) => {
			const l = positionLetters(p);
			return l ? l.letters.some((x) => !(l.kind === 'groove' ? groove : fillet).has(x)) : false;
		});
		const covered = `groove ${[...groove].join(', ') || 'none'}; fillet ${[...fillet].join(', ') || 'none'}`;
		out.push(
			f({
				check: 'pqr-positions',
				status: missing.length ? 'outside' : 'ok',
				message: missing.length
					? `${missing.join(', ')} ${missing.length > 1 ? 'are' : 'is'} not covered by the test position of ${names} (${covered}; QW-461.9 applied to the procedure as the shop's rule).`
					: `Every position is covered by the test position of ${names} (${covered}).`,
				value: v.positions.allowed.join(', '),
				expected: { unit: covered },
				source: pos[0]!.source,
				at: 'positions'
			})
		);
	}

	const setCheck = (
		check: ProcedureCheckId,
		label: string,
		mine: (string | number)[],
		theirs: (string | number)[],
		source: Source,
		at: string,
		show: (x: string | number) => string
	) => {
		if (!mine.length || !theirs.length) return;
		const missing = mine.filter((x) => !theirs.includes(x));
		out.push(
			f({
				check,
				status: missing.length ? 'outside' : 'ok',
				message: missing.length
					? `${label} ${missing.map(show).join(', ')} ${missing.length > 1 ? 'are' : 'is'} not qualified by ${names} (${theirs.map(show).join(', ')}).`
					: `${label} ${mine.map(show).join(', ')} ${mine.length > 1 ? 'are' : 'is'} qualified by ${names}.`,
				value: mine.map(show).join(', '),
				expected: { unit: theirs.map(show).join(', ') },
				source,
				at
			})
		);
	};
	const uniq = <T>(xs: T[]) => [...new Set(xs)];
	// P- and F-Numbers are ASME IX groupings: D1.1 and ISO revisions get codeGapFindings instead.
	if (!byCode)
		setCheck(
			'pqr-p-number',
			'P-Number',
			v.baseMetals.pNumbers,
			uniq(same.flatMap((p) => p.qualified.pNumbers)),
			QW_424,
			'pNumbers',
			(x) => `P-${x}`
		);
	if (!byCode)
		setCheck(
			'pqr-f-number',
			'F-Number',
			v.fillerMetals.fNumbers,
			uniq(same.flatMap((p) => p.qualified.fNumbers)),
			QW_404_4,
			'fNumbers',
			(x) => `F-${x}`
		);
	const currents = uniq(
		same.flatMap((p) => (p.qualified.currentType ? [p.qualified.currentType] : []))
	);
	// D1.1 classes a current change by Table 4.5 with the other triggers below.
	if (v.electrical.currentType && v.code !== 'aws-d1.1')
		setCheck(
			'pqr-current-type',
			'Current',
			[v.electrical.currentType],
			currents,
			ownCodeSource(v.code, 'currentType', QW_409_4),
			'currentType',
			String
		);

	// Where the revision's code has no rule for a variable it sets, a finding that says so.
	out.push(...codeGapFindings(v, same));
	// Changes from each PQR by the revision's own code: ASME IX QW-255/256 or ISO 15614-1 8.4.
	if (v.code === 'asme-ix' || v.code === 'iso-15609-1') {
		for (const p of same) out.push(...codeChangeFindings(v, p));
		return out;
	}
	// AWS D1.1 requalification triggers, each PQR on its own (shop practice: for comparison).
	for (const p of same) {
		const q = p.qualified;
		const found = requalificationTriggers(
			{
				process: q.process,
				amps: q.amps ?? undefined,
				volts: q.volts ?? undefined,
				currentType: q.currentType ?? undefined,
				transfer: q.transfer ?? undefined
			},
			{
				process: v.process,
				amps: { min: n(v.electrical.amps.min), max: n(v.electrical.amps.max) },
				volts: { min: n(v.electrical.volts.min), max: n(v.electrical.volts.max) },
				currentType: n(v.electrical.currentType),
				transfer: n(v.electrical.transfer)
			}
		);
		const d11 = v.code === 'aws-d1.1';
		for (const x of found)
			out.push({
				...x,
				status: !d11 && x.status === 'outside' ? 'caution' : x.status,
				message: `${p.number}: ${x.message}${d11 || x.status === 'ok' ? '' : ` (an AWS D1.1 rule; this procedure follows ${CODE_LABELS[v.code]}.)`}`,
				at: x.field === 'transfer' ? 'transfer' : (x.field ?? 'general'),
				pqr: p.number
			});
	}
	return out;
}

/** Every finding on a revision, weld core first, then against the PQRs. Never throws. */
export function revisionFindings(
	v: RevisionVariables,
	pqrs: PqrForFindings[],
	system: UnitSystem
): ProcedureFinding[] {
	try {
		return [...weldCoreFindings(v, system), ...pqrFindings(v, pqrs, system)];
	} catch {
		return [];
	}
}

export const countOf = (fs: ProcedureFinding[], status: ProcedureFinding['status']) =>
	fs.filter((f) => f.status === status).length;
