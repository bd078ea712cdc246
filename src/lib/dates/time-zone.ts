// A shop's time zone: an IANA name ("America/Chicago") or UTC. The runtime's own zone list is
// the catalogue, so a zone this Node or browser does not know is refused rather than guessed.
const known = (): readonly string[] => Intl.supportedValuesOf('timeZone');

/** Every zone a shop may pick: UTC first, then the runtime's IANA zones. */
export const timeZoneChoices = (): string[] => ['UTC', ...known()];

export function isTimeZone(zone: unknown): zone is string {
	if (typeof zone !== 'string' || zone.length === 0 || zone.length > 64) return false;
	if (zone === 'UTC') return true;
	try {
		new Intl.DateTimeFormat('en-GB', { timeZone: zone });
		return true;
	} catch {
		return false;
	}
}

/** The zone to compute in: the given one when valid, else UTC (never the server's own zone). */
export const zoneOr = (zone: string | null | undefined): string =>
	isTimeZone(zone) ? zone : 'UTC';

/** The zone this process runs in (TZ), where it is one the runtime knows; else UTC. */
export const machineZone = (): string => zoneOr(Intl.DateTimeFormat().resolvedOptions().timeZone);

// A formatter costs far more to make than to use, and the booth view asks for a day on every scan.
const dayFormats = new Map<string, Intl.DateTimeFormat>();
function dayFormat(zone: string): Intl.DateTimeFormat {
	let f = dayFormats.get(zone);
	if (!f) {
		f = new Intl.DateTimeFormat('en-CA', {
			timeZone: zone,
			year: 'numeric',
			month: '2-digit',
			day: '2-digit'
		});
		dayFormats.set(zone, f);
	}
	return f;
}

/** The calendar day ('YYYY-MM-DD') a moment falls on in a zone. Never throws. */
export function dayIn(moment: Date, zone: string | null | undefined): string {
	const at = Number.isFinite(moment.getTime()) ? moment : new Date(0);
	const parts = dayFormat(zoneOr(zone)).formatToParts(at);
	const part = (type: string) => parts.find((p) => p.type === type)?.value ?? '01';
	return `${part('year').padStart(4, '0')}-${part('month')}-${part('day')}`;
}
