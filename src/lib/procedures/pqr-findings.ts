// A revision's ranges against what its supporting PQRs qualify: QW-451.1 thickness, positions,
// P-Number, F-Number, process, current type, then the changes by the revision's own code
// (ASME IX QW-255/256, ISO 15614-1 8.4) or the AWS D1.1 requalification triggers.
import {
	formatLength,
	mmToIn,
	requalificationTriggers,
	type FindingSource,
	type UnitSystem
} from '$lib/weld';
import type { Source } from '$reference/types';
import type { RevisionVariables } from '$lib/schemas/procedure';
import { CODE_LABELS } from './options';
import { PRODUCT, QW_401, QW_404_4, QW_409_4, QW_424 } from './check-catalogue';
import { codeChangeFindings, codeThicknessFindings } from './code-findings';
import { codeGapFindings, codePositionFindings, ownCodeSource } from './code-scope';
import { lengthMm } from './pqr-values';
import {
	n,
	type PqrForFindings,
	type ProcedureCheckId,
	type ProcedureFinding
} from './procedure-finding';

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

export function pqrFindings(
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
