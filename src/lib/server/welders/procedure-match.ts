// Which welders are qualified, today, to weld to a procedure: the foreman's question before
// assigning work. Pure: give it a plain description of the procedure and the welders as read.
import type { WeldPosition } from '$reference/asme-ix-qw-461-9';
import type { FindingSource } from '$lib/weld/findings';
import type { QualificationView, WelderView } from './read';

export interface ProcedureDescription {
	process: string;
	/** Positions as a WPS lists them: test-style ('2F', '3G', '6G') or plain ('F', 'H', 'V', 'O'). */
	positions: readonly string[];
	/** For plain positions (F, H, V, O): groove or fillet; groove when not given (the stricter). */
	joint?: 'groove' | 'fillet';
	/** Base metal thickness range of the procedure, mm. */
	thicknessMm?: { min?: number | null; max?: number | null } | null;
	fNumber?: number | null;
	/** Pipe outside diameter, mm, when the procedure is for pipe. */
	pipeOdMm?: number | null;
}

export interface MatchCheck {
	what: 'status' | 'process' | 'positions' | 'thickness' | 'f-number' | 'diameter';
	ok: boolean;
	message: string;
}

export interface WelderMatch {
	welderId: number;
	name: string;
	stamp: string;
	qualified: boolean;
	/** The qualification that covers the procedure, or the closest one when none does. */
	qualificationId: number | null;
	lapsesOn: string | null;
	daysLeft: number | null;
	checks: MatchCheck[];
}

const PLAIN: readonly WeldPosition[] = ['F', 'H', 'V', 'O'];
// The weld positions a WPS position entry asks for (ASME IX QW-461.1 to QW-461.6 names).
const NEEDS: Record<string, readonly WeldPosition[]> = {
	'1G': ['F'],
	'2G': ['H'],
	'3G': ['V'],
	'4G': ['O'],
	'5G': ['F', 'V', 'O'],
	'6G': ['F', 'H', 'V', 'O'],
	'1F': ['F'],
	'2F': ['H'],
	'2FR': ['H'],
	'3F': ['V'],
	'4F': ['O'],
	'5F': ['F', 'V', 'O']
};

export function positionsNeeded(list: readonly string[]): WeldPosition[] {
	const need = new Set<WeldPosition>();
	for (const raw of list) {
		const p = raw.trim().toUpperCase();
		if ((PLAIN as readonly string[]).includes(p)) need.add(p as WeldPosition);
		for (const n of NEEDS[p] ?? []) need.add(n);
	}
	return PLAIN.filter((p) => need.has(p));
}

/**
 * ASME IX QW-433, simplified: for SMAW a higher F-Number 1 to 4 also qualifies the lower ones
 * (F-4 covers F-1 to F-4; the with/without backing split is not modelled); every other case,
 * e.g. F-6, needs the same F-Number. As summarised in a public welder-variables sheet (QW-404.15
 * "F-Number as permitted in QW-433": "All F No. up to F No. qualified"; "All F No. 6").
 */
export const F_NUMBER_SOURCE: FindingSource = {
	label: 'ASME BPVC Section IX QW-433 (F-Number alternates), simplified',
	kind: 'published'
};
export function fNumberCovers(process: string, held: number, needed: number): boolean {
	if (held === needed) return true;
	return process === 'SMAW' && held >= 1 && held <= 4 && needed >= 1 && needed < held;
}

const mmText = (mm: number) => `${Math.round(mm * 10) / 10} mm`;

/** '3G' is a groove position, '2F' and '2FR' fillet ones; plain 'F'..'O' follow the joint given. */
function jointOf(position: string, fallback: 'groove' | 'fillet'): 'groove' | 'fillet' {
	const p = position.trim().toUpperCase();
	if (/^\dG$/.test(p)) return 'groove';
	if (/^\dFR?$/.test(p)) return 'fillet';
	return fallback;
}

function checkQualification(
	q: QualificationView,
	p: ProcedureDescription,
	joint: 'groove' | 'fillet'
): MatchCheck[] {
	const checks: MatchCheck[] = [];
	const current = q.status.state === 'current';
	checks.push({
		what: 'status',
		ok: current,
		message: current
			? `current until ${q.status.lapsesOn} (${q.status.daysLeft} days)`
			: `${q.status.state} since ${q.status.lapsesOn}`
	});
	const pipe = !!p.pipeOdMm;
	for (const kind of ['groove', 'fillet'] as const) {
		const listed = p.positions.filter((x) => jointOf(x, joint) === kind);
		if (listed.length === 0) continue;
		const held = kind === 'fillet' ? q.ranges.fillet : pipe ? q.ranges.groovePipe : q.ranges.groove;
		const need = positionsNeeded(listed);
		const missing = need.filter((n) => !held.includes(n));
		checks.push({
			what: 'positions',
			ok: missing.length === 0,
			message: missing.length
				? `not qualified for ${kind} ${missing.join(', ')} (holds ${held.join(', ') || 'none'})`
				: `${kind} ${need.join(', ')} covered (QW-461.9)`
		});
	}
	if (p.positions.length === 0)
		checks.push({ what: 'positions', ok: false, message: 'the procedure lists no positions' });
	const max = p.thicknessMm?.max ?? null;
	const grooves = p.positions.some((x) => jointOf(x, joint) === 'groove');
	if (grooves && max != null) {
		const dep = q.ranges.depositMaxMm;
		const ok = dep === null || max <= dep + 1e-6;
		checks.push({
			what: 'thickness',
			ok,
			message:
				dep === null
					? 'deposit thickness unlimited (QW-452.1(b))'
					: `deposit up to ${mmText(dep)} qualified; procedure up to ${mmText(max)} (QW-452.1(b))`
		});
	}
	if (p.fNumber != null) {
		const ok = q.fNumber != null && fNumberCovers(p.process, q.fNumber, p.fNumber);
		checks.push({
			what: 'f-number',
			ok,
			message:
				q.fNumber == null
					? `the test record has no F-Number; the procedure needs F-${p.fNumber}`
					: `tested with F-${q.fNumber}; procedure F-${p.fNumber}`
		});
	}
	if (pipe && grooves && q.ranges.minDiameterMm != null) {
		const ok = (p.pipeOdMm ?? 0) >= q.ranges.minDiameterMm - 1e-6;
		checks.push({
			what: 'diameter',
			ok,
			message: `pipe from ${mmText(q.ranges.minDiameterMm)} OD qualified; procedure ${mmText(p.pipeOdMm ?? 0)}`
		});
	}
	return checks;
}

/** One answer per active welder: qualified ones first (most days left first), then the others. */
export function matchWelders(
	p: ProcedureDescription,
	welders: readonly WelderView[]
): WelderMatch[] {
	const joint = p.joint ?? 'groove';
	const out: WelderMatch[] = [];
	for (const w of welders) {
		if (!w.active) continue;
		const candidates = w.qualifications.filter(
			(q) => q.process === p.process && q.status.state !== 'withdrawn'
		);
		let best: { q: QualificationView; checks: MatchCheck[]; fails: number } | null = null;
		for (const q of candidates) {
			const checks = checkQualification(q, p, joint);
			const fails = checks.filter((c) => !c.ok).length;
			if (
				!best ||
				fails < best.fails ||
				(fails === best.fails && q.status.daysLeft > best.q.status.daysLeft)
			)
				best = { q, checks, fails };
		}
		out.push({
			welderId: w.id,
			name: w.name,
			stamp: w.stamp,
			qualified: best?.fails === 0,
			qualificationId: best?.q.id ?? null,
			lapsesOn: best?.q.status.lapsesOn ?? null,
			daysLeft: best?.q.status.daysLeft ?? null,
			checks: best?.checks ?? [
				{ what: 'process', ok: false, message: `no ${p.process} qualification` }
			]
		});
	}
	return out.sort(
		(a, b) =>
			Number(b.qualified) - Number(a.qualified) ||
			(b.daysLeft ?? -1e9) - (a.daysLeft ?? -1e9) ||
			a.name.localeCompare(b.name)
	);
}
