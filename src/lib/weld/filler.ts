// AWS filler classifications: read the designation, say what it encodes.
import {
	A5_1_A_NUMBER_SOURCE,
	A5_1_F_NUMBER,
	A5_20_USABILITY,
	a5_1FNumberSource,
	FILLERS,
	type FillerRow
} from '$reference/fillers';
import {
	ASME_IX_QW_432,
	ASME_IX_QW_442,
	ASME_IX_QW_442_MEMORY,
	AWS_A5_CLASSIFICATION
} from '$reference/sources';
import type { CurrentType, MetalFamily } from '$reference/types';
import { sourceOf, guardCheck } from './findings';
import type { CheckContext, Filler, Finding } from './types';

export type { Filler, FillerForm } from './types';

export type FillerResult = { ok: true; filler: Filler } | { ok: false; message: string };

const EXAMPLES = 'Examples: ER70S-6, ER48S-6, ER80S-D2, ER308L, ER4043, E71T-1C, E7018.';

const fromRow = (r: FillerRow, enteredAs?: string): Filler => ({
	classification: r.classification,
	spec: r.spec,
	family: r.family,
	form: 'solid wire or rod',
	minTensileKsi: r.minTensileKsi,
	fNumber: r.fNumber,
	aNumber: r.aNumber,
	suits: r.suits,
	meaning: r.meaning,
	inTable: true,
	source: r.source,
	fNumberSource: r.fNumberSource,
	aNumberSource: r.aNumberSource,
	...(enteredAs ? { enteredAs } : {})
});

const byClass = new Map(FILLERS.map((r) => [r.classification.toUpperCase(), r]));

function normalise(text: string): string {
	return text
		.toUpperCase()
		.replace(/[–—−]/g, '-')
		.replace(/^\s*(AWS|ASME|SFA)?\s*-?\s*(SFA|A)?\s*-?\s*5\.\d+M?\s*[:/]?\s*/, '')
		.replace(/\s+/g, '');
}

function a5_18(tensile: string, suffix: string, raw: string): FillerResult {
	const metric = tensile === '48';
	const canonical = `ER70S-${suffix}`;
	const enteredAs = metric ? `ER48S-${suffix}` : undefined;
	const row = byClass.get(canonical);
	if (row) return { ok: true, filler: fromRow(row, enteredAs) };
	if (suffix === 'G')
		return {
			ok: true,
			filler: {
				...fromRow({ ...(byClass.get('ER70S-6') as FillerRow) }, enteredAs),
				classification: canonical,
				aNumber: null,
				aNumberSource: ASME_IX_QW_442_MEMORY,
				meaning:
					'ER = electrode or rod, 70 = 70 ksi minimum tensile, S = solid, -G = composition agreed with the maker',
				inTable: false
			}
		};
	return {
		ok: false,
		message: `${raw} reads as AWS A5.18, but -${suffix} is not a classification Beadline knows (A5.18 lists -2, -3, -4, -6, -7 and -G).`
	};
}

function flux(
	tensileDigit: string,
	positionDigit: string,
	usability: string,
	gas: string,
	raw: string
): FillerResult {
	const u = A5_20_USABILITY[usability];
	if (!u)
		return {
			ok: false,
			message: `${raw} reads as AWS A5.20 flux-cored wire, but T-${usability} is not a usability type Beadline knows (-1, -5, -8, -9, -11).`
		};
	if (u.gas === 'required' && gas === '')
		return {
			ok: false,
			message: `${raw} needs a gas letter: E${tensileDigit}${positionDigit}T-${usability}C for CO2 or -${usability}M for argon mix.`
		};
	const minTensileKsi = Number(tensileDigit) * 10;
	return {
		ok: true,
		filler: {
			classification: `E${tensileDigit}${positionDigit}T-${usability}${gas}`,
			spec: 'AWS A5.20',
			family: 'carbon-steel',
			form: 'flux-cored wire',
			minTensileKsi,
			fNumber: 6,
			aNumber: 1,
			suits: ['carbon-steel'],
			meaning: `Flux-cored electrode, ${minTensileKsi} ksi, ${positionDigit === '1' ? 'all positions' : 'flat and horizontal'}, ${u.note}${gas === 'C' ? ', CO2 shielding' : gas === 'M' ? ', 75-80 % argon / CO2 shielding' : ''}`,
			gas: u.gas === 'none' ? 'none' : gas === 'C' ? 'CO2' : 'Ar/CO2 75-80 %',
			currents: [u.polarity],
			inTable: true,
			source: AWS_A5_CLASSIFICATION,
			fNumberSource: ASME_IX_QW_432,
			aNumberSource: ASME_IX_QW_442_MEMORY
		}
	};
}

// Currents by the last digit of an A5.1 electrode, recalled from the A5.1 usability table.
const A5_1_CURRENTS: Readonly<Record<string, readonly CurrentType[]>> = {
	'10': ['DCEP'],
	'11': ['AC', 'DCEP'],
	'13': ['AC', 'DCEP', 'DCEN'],
	'15': ['DCEP'],
	'16': ['AC', 'DCEP'],
	'18': ['AC', 'DCEP'],
	'24': ['AC', 'DCEP', 'DCEN']
};

function covered(tensile: string, usability: string, suffix: string, raw: string): FillerResult {
	const fNumber = A5_1_F_NUMBER[usability];
	if (fNumber === undefined)
		return {
			ok: false,
			message: `${raw} reads as AWS A5.1, but E${tensile}${usability} is not one Beadline knows.`
		};
	const lowHydrogen = fNumber === 4;
	const currents = A5_1_CURRENTS[usability];
	return {
		ok: true,
		filler: {
			classification: `E${tensile}${usability}${suffix}`,
			spec: 'AWS A5.1',
			family: 'carbon-steel',
			form: 'covered electrode',
			minTensileKsi: Number(tensile),
			fNumber,
			aNumber: 1,
			suits: ['carbon-steel'],
			meaning: `Covered electrode, ${tensile} ksi${usability.startsWith('1') ? ', all positions' : usability.startsWith('2') ? ', flat and horizontal fillets' : ''}${lowHydrogen ? ', low hydrogen' : ''}`,
			...(currents ? { currents } : {}),
			inTable: true,
			source: AWS_A5_CLASSIFICATION,
			fNumberSource: a5_1FNumberSource(usability),
			aNumberSource: A5_1_A_NUMBER_SOURCE
		}
	};
}

/** Parses an AWS filler designation. Never throws; unknown or malformed input gets a message. */
export function parseFiller(text: unknown): FillerResult {
	if (typeof text !== 'string' || text.trim() === '' || text.length > 40)
		return { ok: false, message: `Enter an AWS filler classification. ${EXAMPLES}` };
	const raw = text.trim();
	const s = normalise(raw);
	let m = /^ER(70|48)S-?(\d{1,2}|G)$/.exec(s);
	if (m) return a5_18(m[1] ?? '70', m[2] ?? '', raw);
	m = /^ER(80|90)S-?(D2|B2|B3|NI1|NI2|G)$/.exec(s);
	if (m) {
		const row = byClass.get(`ER${m[1]}S-${m[2]}`);
		if (row) return { ok: true, filler: fromRow(row) };
		return {
			ok: true,
			filler: {
				...fromRow(byClass.get('ER80S-D2') as FillerRow),
				classification: `ER${m[1]}S-${m[2]}`,
				minTensileKsi: Number(m[1]),
				aNumber: null,
				meaning: `Low-alloy solid wire, ${m[1]} ksi (AWS A5.28)`,
				inTable: false
			}
		};
	}
	m = /^E?R(3\d\d|2209)(L|H)?(SI)?$/.exec(s);
	if (m) {
		const cls = `ER${m[1]}${m[2] ?? ''}${m[3] ? 'Si' : ''}`;
		const row = byClass.get(cls.toUpperCase());
		if (row) return { ok: true, filler: fromRow(row) };
		return {
			ok: true,
			filler: {
				...fromRow(byClass.get('ER308L') as FillerRow),
				classification: cls,
				aNumber: null,
				aNumberSource: ASME_IX_QW_442,
				meaning: `Stainless solid wire or rod type ${m[1]}${m[2] ?? ''} (AWS A5.9); check the A-Number against the deposit analysis`,
				inTable: false
			}
		};
	}
	m = /^E?R(\d{4})$/.exec(s);
	if (m) {
		const row = byClass.get(`ER${m[1]}`);
		if (row) return { ok: true, filler: fromRow(row) };
		return {
			ok: false,
			message: `${raw} is not an AWS A5.10 aluminium classification Beadline knows (ER1100, ER4043, ER4047, ER5356, ER5183, ER5554, ER5556).`
		};
	}
	m = /^E([6-9])([01])T-?(\d{1,2})(C|M)?(-?(J|H\d{1,2}))*$/.exec(s);
	if (m) return flux(m[1] ?? '', m[2] ?? '', m[3] ?? '', m[4] ?? '', raw);
	m = /^E(60|70)(\d\d)(-1)?(H4|H8|H16)?R?$/.exec(s);
	if (m) return covered(m[1] ?? '', m[2] ?? '', m[3] ?? '', raw);
	return {
		ok: false,
		message: `Could not read “${raw}” as an AWS filler classification. ${EXAMPLES}`
	};
}

/**
 * Whether a filler suits a base metal family: 'ok', or 'caution' both for an unusual but used
 * pairing and for the wrong family (issue 3 §4: findings advise, a mismatch is a caution whose
 * message says plainly it is the wrong family). `wrongFamily` tells the two cautions apart.
 */
export function fillerSuits(filler: Filler, base: MetalFamily): 'ok' | 'caution' {
	if (wrongFamily(filler, base)) return 'caution';
	// ER309L on carbon steel is for joining it to stainless; alone it is an odd choice.
	if (filler.family !== base && filler.family === 'stainless') return 'caution';
	if (filler.family === 'low-alloy' && base === 'carbon-steel') return 'caution';
	return 'ok';
}

/** True when the filler is not made for that base metal family at all. */
export function wrongFamily(filler: Filler, base: MetalFamily): boolean {
	return !filler || !Array.isArray(filler.suits) || !filler.suits.includes(base);
}

const FAMILY_WORDS: Record<MetalFamily, string> = {
	'carbon-steel': 'carbon steel',
	'low-alloy': 'low-alloy steel',
	stainless: 'stainless',
	aluminium: 'aluminium'
};

const aOrAn = (w: string): string => `${/^[aeiou]/i.test(w) ? 'an' : 'a'} ${w}`;

/** Reports what the classification encodes, or that it could not be read. */
function checkFillerClassificationUnguarded(ctx: CheckContext): Finding | null {
	const text = ctx.s.filler?.classification;
	if (text === undefined) return null;
	const r = ctx.filler ? ({ ok: true, filler: ctx.filler } as const) : parseFiller(text);
	if (!r.ok)
		return {
			check: 'filler-classification',
			status: 'caution',
			message: r.message,
			value: typeof text === 'string' ? text.slice(0, 40) : null,
			expected: { unit: 'classification' },
			source: sourceOf(AWS_A5_CLASSIFICATION),
			field: 'filler.classification'
		};
	const f = r.filler;
	const parts = [
		f.spec,
		f.minTensileKsi === null
			? 'no tensile requirement in the spec'
			: `${f.minTensileKsi} ksi minimum tensile`,
		`F-${f.fNumber}`,
		f.aNumber === null ? 'A-Number from the deposit analysis' : `A-${f.aNumber}`
	];
	const twin = f.enteredAs ? ` (${f.enteredAs} is the metric twin of ${f.classification})` : '';
	const kinds = [f.fNumberSource.kind, f.aNumberSource.kind];
	const memory = kinds.includes('from memory')
		? ' Some of these groupings are recalled, not read from the code: verify.'
		: '';
	return {
		check: 'filler-classification',
		status: f.inTable ? 'ok' : 'caution',
		message: `${f.classification}${twin}: ${parts.join(', ')}. ${f.meaning}.${f.inTable ? '' : ' Not in Beadline’s table; groupings are from the spec alone.'}${memory}`,
		value: f.classification,
		expected: { unit: 'classification' },
		source: sourceOf(f.source),
		field: 'filler.classification'
	};
}

function checkFillerVsBaseMetalUnguarded(ctx: CheckContext): Finding | null {
	const f = ctx.filler;
	const base = ctx.family;
	if (!f || !base) return null;
	const fit = fillerSuits(f, base);
	const words = FAMILY_WORDS[base];
	const message = wrongFamily(f, base)
		? `Wrong filler family: ${f.classification} is ${aOrAn(FAMILY_WORDS[f.family])} filler and does not suit ${words}.`
		: fit === 'ok'
			? `${f.classification} suits ${words}.`
			: f.family === 'stainless'
				? `${f.classification} on ${words} is normally for joining it to stainless; check that is intended.`
				: `${f.classification} is a ${FAMILY_WORDS[f.family]} filler, stronger than ${words} usually needs; check the procedure calls for it.`;
	return {
		check: 'filler-vs-base-metal',
		status: fit,
		message,
		value: f.classification,
		expected: { unit: words },
		source: sourceOf(AWS_A5_CLASSIFICATION),
		field: 'filler.classification'
	};
}

export const checkFillerClassification = guardCheck(checkFillerClassificationUnguarded, null);
export const checkFillerVsBaseMetal = guardCheck(checkFillerVsBaseMetalUnguarded, null);
