// Preheat by carbon equivalent, beside the table-based D1.1 minimum in preheat.ts:
// - EN 1011-2 Annex C.3 (method B): CET and the preheat formula Tp.
// - EN 1011-2 Annex C.2 (method A): CE(IIW), hydrogen scale A-E and combined thickness; the
//   method reads the preheat off graphs that Beadline does not reproduce, so it gives the inputs
//   and says where to read the answer.
// Both are guidance: the code, the WPS and the welding engineer decide.
import {
	EN_1011_2_CET,
	EN_1011_2_CET_LIMITS,
	EN_1011_2_HYDROGEN_SCALES,
	IIW_CE
} from '$reference/sources';
import { isNum, sourceOf, type FindingSource } from './findings';
import { carbonEquivalentIIW } from './preheat';
import type { Chemistry } from './settings';

const pct = (n: unknown): number => (isNum(n) && n >= 0 && n <= 100 ? n : 0);

/** CET = C + (Mn + Mo)/10 + (Cr + Cu)/20 + Ni/40 (weight %); null without carbon. */
export function carbonEquivalentCET(chem: Chemistry | undefined): number | null {
	if (!chem || typeof chem !== 'object' || !isNum(chem.C) || chem.C < 0 || chem.C > 100)
		return null;
	const v =
		pct(chem.C) +
		(pct(chem.Mn) + pct(chem.Mo)) / 10 +
		(pct(chem.Cr) + pct(chem.Cu)) / 20 +
		pct(chem.Ni) / 40;
	return Number.isFinite(v) ? v : null;
}

/** Validity ranges of the CET method (recalled, see source). */
export const CET_LIMITS = {
	cet: { min: 0.2, max: 0.5 },
	thicknessMm: { min: 10, max: 90 },
	hydrogen: { min: 1, max: 20 },
	heatInput: { min: 0.5, max: 4 }
} as const;

export interface CetInput {
	chemistry?: Chemistry;
	/** Plate thickness d, mm. */
	thicknessMm?: number;
	/** Diffusible hydrogen HD, ml/100 g deposited metal. */
	hydrogen?: number;
	/** Heat input Q, kJ/mm. */
	heatInputKjPerMm?: number;
}

export type CetResult =
	| {
			ok: true;
			cet: number;
			/** Tp in degC as the formula gives it (may be below room temperature). */
			preheatC: number;
			/** Inputs outside the method's validity ranges: the answer is then not to be relied on. */
			outsideValidity: string[];
			message: string;
			source: FindingSource;
			limitsSource: FindingSource;
	  }
	| { ok: false; message: string };

/** Tp = 697 CET + 160 tanh(d/35) + 62 HD^0.35 + (53 CET - 32) Q - 328, degC. */
export function cetPreheat(input: CetInput): CetResult {
	const cet = carbonEquivalentCET(input?.chemistry);
	if (cet === null)
		return { ok: false, message: 'Give the carbon content (and the other elements).' };
	const { thicknessMm: d, hydrogen: hd, heatInputKjPerMm: q } = input;
	if (!isNum(d) || d <= 0 || d > 1000)
		return { ok: false, message: 'Give the plate thickness d in mm, above zero.' };
	if (!isNum(hd) || hd <= 0 || hd > 100)
		return { ok: false, message: 'Give the diffusible hydrogen HD in ml/100 g, above zero.' };
	if (!isNum(q) || q <= 0 || q > 100)
		return { ok: false, message: 'Give the heat input Q in kJ/mm, above zero.' };
	const tp = 697 * cet + 160 * Math.tanh(d / 35) + 62 * hd ** 0.35 + (53 * cet - 32) * q - 328;
	const L = CET_LIMITS;
	const outside: string[] = [];
	const chk = (v: number, r: { min: number; max: number }, what: string) => {
		if (v < r.min - 1e-9 || v > r.max + 1e-9)
			outside.push(`${what} ${v} (method: ${r.min}–${r.max})`);
	};
	chk(Math.round(cet * 1000) / 1000, L.cet, 'CET');
	chk(d, L.thicknessMm, 'thickness mm');
	chk(hd, L.hydrogen, 'HD ml/100 g');
	chk(q, L.heatInput, 'Q kJ/mm');
	const t = Math.round(tp);
	const message = `CET ${cet.toFixed(2)}: EN 1011-2 method B gives a minimum preheat of ${t} °C${t <= 20 ? ' (at or below room temperature: no preheat from this method)' : ''}.${outside.length ? ` Outside the method's range: ${outside.join('; ')}; do not rely on it.` : ''} Guidance only: the code, the WPS and the engineer decide.`;
	return {
		ok: true,
		cet: Math.round(cet * 1000) / 1000,
		preheatC: Math.round(tp * 10) / 10,
		outsideValidity: outside,
		message,
		source: sourceOf(EN_1011_2_CET),
		limitsSource: sourceOf(EN_1011_2_CET_LIMITS)
	};
}

export type HydrogenScale = 'A' | 'B' | 'C' | 'D' | 'E';

/** EN 1011-2 Table C.2: A > 15; B 10-15; C 5-10; D 3-5; E <= 3 ml/100 g. */
export function hydrogenScale(hd: unknown): HydrogenScale | null {
	if (!isNum(hd) || hd < 0 || hd > 100) return null;
	if (hd <= 3) return 'E';
	if (hd <= 5) return 'D';
	if (hd <= 10) return 'C';
	if (hd <= 15) return 'B';
	return 'A';
}

/** Combined thickness: the sum of the thicknesses the heat flows into (C.2.4), mm. */
export function combinedThickness(paths: unknown): number | null {
	if (!Array.isArray(paths) || paths.length === 0 || paths.length > 6) return null;
	if (!paths.every((p) => isNum(p) && p > 0 && p <= 1000)) return null;
	return (paths as number[]).reduce((a, b) => a + b, 0);
}

/** Method A's inputs (CE, scale, combined thickness, Q) and where to read the preheat. */
export function ceMethodA(input: {
	chemistry?: Chemistry;
	hydrogen?: number;
	paths?: number[];
	heatInputKjPerMm?: number;
}):
	| {
			ok: true;
			ce: number;
			scale: HydrogenScale;
			combinedMm: number;
			message: string;
			source: FindingSource;
	  }
	| { ok: false; message: string } {
	const ce = carbonEquivalentIIW(input?.chemistry);
	if (ce === null)
		return { ok: false, message: 'Give the carbon content (and the other elements).' };
	const scale = hydrogenScale(input.hydrogen);
	if (!scale) return { ok: false, message: 'Give the diffusible hydrogen HD in ml/100 g.' };
	const combined = combinedThickness(input.paths);
	if (combined === null)
		return { ok: false, message: 'Give the thickness of each part the heat flows into, in mm.' };
	const q =
		isNum(input.heatInputKjPerMm) && input.heatInputKjPerMm > 0 ? input.heatInputKjPerMm : null;
	return {
		ok: true,
		ce: Math.round(ce * 1000) / 1000,
		scale,
		combinedMm: Math.round(combined * 10) / 10,
		message: `CE(IIW) ${ce.toFixed(2)}, hydrogen scale ${scale}, combined thickness ${Math.round(combined)} mm${q ? `, heat input ${q} kJ/mm` : ''}: read the minimum preheat from the EN 1011-2 Annex C.2 graph for scale ${scale} (Beadline does not reproduce the graphs). Guidance only.`,
		source: sourceOf(scale ? EN_1011_2_HYDROGEN_SCALES : IIW_CE)
	};
}
