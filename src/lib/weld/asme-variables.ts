// ASME IX QW-255 (GMAW, FCAW) and QW-256 (GTAW): a change from the PQR classed as essential,
// supplementary essential (only when toughness testing applies) or nonessential, with the
// paragraph it trips. Pure; never throws.
import {
	QW_255_256,
	type AsmeVariableRow,
	type VariableClass
} from '$reference/asme-ix-qw-255-256';
import type { Band, CurrentType, Process, Transfer } from '$reference/types';
import { isNum, sourceOf, type FindingSource } from './findings';

export type ChangeClass = 'essential' | 'supplementary essential' | 'nonessential';

export interface ClassedChange {
	paragraph: string;
	variable: string;
	class: ChangeClass;
	/** Needs a new or supplemented PQR under the code. */
	requalify: boolean;
	message: string;
	source: FindingSource;
}

const NAMES: Record<VariableClass, ChangeClass> = {
	E: 'essential',
	S: 'supplementary essential',
	N: 'nonessential'
};

/** The QW-255 / QW-256 row of a paragraph for a process, or null where the table has none. */
export function asmeRow(process: unknown, paragraph: unknown): AsmeVariableRow | null {
	if (typeof paragraph !== 'string') return null;
	const row = QW_255_256.find((r) => r.paragraph === paragraph.trim().toUpperCase());
	if (!row) return null;
	const classes =
		process === 'GTAW' ? row.gtaw : process === 'GMAW' || process === 'FCAW' ? row.gmaw : [];
	return classes.length ? row : null;
}

/**
 * How a change under `paragraph` is classed for `process`. With toughness testing a
 * supplementary essential counts as essential; without it, as nonessential.
 */
export function classifyChange(
	process: unknown,
	paragraph: unknown,
	toughness: unknown
): { class: ChangeClass; requalify: boolean } | null {
	const row = asmeRow(process, paragraph);
	if (!row) return null;
	const classes = process === 'GTAW' ? row.gtaw : row.gmaw;
	if (classes.includes('E')) return { class: 'essential', requalify: true };
	if (classes.includes('S') && toughness === true)
		return { class: 'supplementary essential', requalify: true };
	return { class: classes.includes('S') ? 'supplementary essential' : NAMES.N, requalify: false };
}

export interface AsmeSide {
	process?: Process;
	currentType?: CurrentType;
	transfer?: Transfer;
	gas?: string;
	amps?: Partial<Band>;
	volts?: Partial<Band>;
	travelSpeedMmPerS?: Partial<Band>;
	wireFeedMmPerS?: Partial<Band>;
	heatInputJPerMm?: number;
	preheatMinC?: number;
	pwht?: boolean;
	fillerDiameterMm?: number;
	fillerAdded?: boolean;
	tungsten?: string;
}

const band = (b: Partial<Band> | undefined) => ({
	min: isNum(b?.min) ? b.min : null,
	max: isNum(b?.max) ? b.max : null
});
const wider = (wps: Partial<Band> | undefined, pqr: Partial<Band> | undefined): boolean => {
	const w = band(wps);
	const p = band(pqr);
	if (p.min === null && p.max === null) return false;
	const lo = p.min ?? p.max!;
	const hi = p.max ?? p.min!;
	return (w.min !== null && w.min < lo - 1e-9) || (w.max !== null && w.max > hi + 1e-9);
};

/** Every change between the PQR (as welded) and the WPS, classed by QW-255 / QW-256. */
export function asmeChanges(pqr: AsmeSide, wps: AsmeSide, toughness = false): ClassedChange[] {
	const out: ClassedChange[] = [];
	if (!pqr || !wps || typeof pqr !== 'object' || typeof wps !== 'object') return out;
	const process = wps.process ?? pqr.process;
	const add = (paragraph: string, variable: string, what: string) => {
		const c = classifyChange(process, paragraph, toughness);
		const row = asmeRow(process, paragraph);
		if (!c || !row) return;
		const why =
			c.class === 'supplementary essential'
				? toughness
					? 'supplementary essential, and toughness testing applies: a new or supplemented PQR is needed'
					: 'supplementary essential, nonessential here because no toughness testing applies'
				: c.class === 'essential'
					? 'essential: a new PQR is needed'
					: 'nonessential: revise the WPS, no new PQR';
		out.push({
			paragraph,
			variable,
			class: c.class,
			requalify: c.requalify,
			message: `${what} — ${paragraph} (${row.brief}) is ${why}.`,
			source: sourceOf(row.source)
		});
	};
	try {
		if (pqr.currentType && wps.currentType && pqr.currentType !== wps.currentType)
			add(
				'QW-409.4',
				'currentType',
				`Current ${pqr.currentType} in the PQR, ${wps.currentType} in the WPS`
			);
		if (pqr.transfer && wps.transfer && pqr.transfer !== wps.transfer)
			add(
				'QW-409.2',
				'transfer',
				`Transfer ${pqr.transfer} in the PQR, ${wps.transfer} in the WPS`
			);
		const g = (s?: string) => (typeof s === 'string' ? s.trim().toLowerCase() : '');
		if (g(pqr.gas) && g(wps.gas) && g(pqr.gas) !== g(wps.gas))
			add('QW-408.2', 'gas', `Shielding gas ${pqr.gas} in the PQR, ${wps.gas} in the WPS`);
		if (wider(wps.amps, pqr.amps))
			add('QW-409.8', 'amps', 'The WPS amperage range goes beyond the PQR');
		if (wider(wps.volts, pqr.volts))
			add('QW-409.8', 'volts', 'The WPS voltage range goes beyond the PQR');
		if (wider(wps.travelSpeedMmPerS, pqr.travelSpeedMmPerS))
			add('QW-409.8', 'travelSpeed', 'The WPS travel speed range goes beyond the PQR');
		if (wider(wps.wireFeedMmPerS, pqr.wireFeedMmPerS))
			add('QW-409.8', 'wireFeed', 'The WPS wire feed range goes beyond the PQR');
		if (
			isNum(pqr.heatInputJPerMm) &&
			isNum(wps.heatInputJPerMm) &&
			wps.heatInputJPerMm > pqr.heatInputJPerMm + 1e-9
		)
			add('QW-409.1', 'heatInput', 'The WPS heat input is above the PQR');
		if (isNum(pqr.preheatMinC) && isNum(wps.preheatMinC) && wps.preheatMinC < pqr.preheatMinC - 55)
			add('QW-406.1', 'preheat', 'The WPS preheat is more than 100 °F (55 °C) below the PQR');
		if (typeof pqr.pwht === 'boolean' && typeof wps.pwht === 'boolean' && pqr.pwht !== wps.pwht)
			add(
				'QW-407.1',
				'pwht',
				`PWHT ${pqr.pwht ? 'in the PQR, none' : 'none in the PQR, one'} in the WPS`
			);
		if (
			isNum(pqr.fillerDiameterMm) &&
			isNum(wps.fillerDiameterMm) &&
			Math.abs(pqr.fillerDiameterMm - wps.fillerDiameterMm) > 1e-6
		)
			add(
				process === 'GTAW' ? 'QW-404.3' : 'QW-404.6',
				'fillerDiameter',
				'The filler diameter differs from the PQR'
			);
		if (
			typeof pqr.fillerAdded === 'boolean' &&
			typeof wps.fillerAdded === 'boolean' &&
			pqr.fillerAdded !== wps.fillerAdded
		)
			add(
				'QW-404.14',
				'filler',
				`Filler ${pqr.fillerAdded ? 'added in the PQR, autogenous' : 'autogenous in the PQR, added'} in the WPS`
			);
		if (g(pqr.tungsten) && g(wps.tungsten) && g(pqr.tungsten) !== g(wps.tungsten))
			add(
				'QW-409.12',
				'tungsten',
				`Tungsten ${pqr.tungsten} in the PQR, ${wps.tungsten} in the WPS`
			);
	} catch {
		// Keep what was found.
	}
	return out;
}
