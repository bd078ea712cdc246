// One value of an audit entry as the shop reads it: a quantity in the reader's units, a choice by
// its label, yes/no for booleans, a moment in local time. Pure; never throws on odd input.
import type { UnitSystem } from '$lib/weld';
import { showQuantity } from '$lib/procedures/quantities';
import type { ValueKind } from './field-labels';

/** The reader's way of seeing values: their unit system and, if the shop has one, its zone. */
export interface Reading {
	system: UnitSystem;
	/** An IANA zone ("America/Chicago"). Absent: times are shown in UTC and labelled so. */
	timeZone?: string | null;
}

const ISO_INSTANT = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:?\d{2})$/;
const ISO_DAY = /^\d{4}-\d{2}-\d{2}$/;

function zoneOrUtc(timeZone: string | null | undefined): string {
	if (!timeZone) return 'UTC';
	try {
		new Intl.DateTimeFormat('en-GB', { timeZone });
		return timeZone;
	} catch {
		return 'UTC'; // a zone this runtime does not know: UTC, labelled, rather than a wrong hour
	}
}

/**
 * A moment as "2 Dec 2026, 23:02 UTC" (or in the shop's zone, named). The server cannot know the
 * reader's own zone, so the text says which zone it is in; the page puts the exact instant in
 * `<time datetime>` beside it. Same text on server and browser (fixed locale and zone).
 */
export function momentText(at: string | Date, reading: Pick<Reading, 'timeZone'>): string {
	const d = at instanceof Date ? at : new Date(at);
	if (Number.isNaN(d.getTime())) return String(at);
	const zone = zoneOrUtc(reading.timeZone);
	const text = new Intl.DateTimeFormat('en-GB', {
		timeZone: zone,
		day: 'numeric',
		month: 'short',
		year: 'numeric',
		hour: '2-digit',
		minute: '2-digit',
		hourCycle: 'h23'
	}).format(d);
	return `${text} ${zone === 'UTC' ? 'UTC' : zone.replace(/_/g, ' ')}`;
}

/** "2026-06-02" as "2 Jun 2026": a calendar day has no zone. */
export function dayText(day: string): string {
	const d = new Date(`${day}T12:00:00Z`);
	if (Number.isNaN(d.getTime())) return day;
	return new Intl.DateTimeFormat('en-GB', {
		timeZone: 'UTC',
		day: 'numeric',
		month: 'short',
		year: 'numeric'
	}).format(d);
}

function bytesText(n: number): string {
	if (n < 1024) return `${n} bytes`;
	if (n < 1024 * 1024) return `${Math.round(n / 102.4) / 10} KB`;
	return `${Math.round(n / (1024 * 104.8576)) / 10} MB`;
}

const NONE = '—';

/** A leaf value in words; '—' for nothing. Arrays read item by item, joined with commas. */
export function valueText(v: unknown, kind: ValueKind, reading: Reading): string {
	if (v === null || v === undefined || v === '') return NONE;
	if (Array.isArray(v)) {
		const items = v.map((x) => valueText(x, kind, reading)).filter((x) => x !== NONE);
		return items.length ? items.join(', ') : NONE;
	}
	if (typeof v === 'boolean') return v ? 'yes' : 'no';
	if (typeof kind === 'object' && 'quantity' in kind && typeof v === 'number')
		return Number.isFinite(v) ? showQuantity(kind.quantity, v, reading.system) : String(v);
	if (typeof kind === 'object' && 'choices' in kind && typeof v === 'string')
		return Object.hasOwn(kind.choices, v) ? kind.choices[v]! : v;
	if (kind === 'bytes' && typeof v === 'number') return bytesText(v);
	if (typeof v === 'string' && (kind === 'day' || ISO_DAY.test(v))) return dayText(v);
	if (typeof v === 'string' && ISO_INSTANT.test(v)) return momentText(v, reading);
	try {
		return typeof v === 'object' ? JSON.stringify(v) : String(v);
	} catch {
		return typeof v; // nothing JSON or a string can hold: say what kind it was
	}
}
