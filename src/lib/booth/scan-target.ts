// What the in-app scanner may open: only a booth link of this very site (/b/<token>), so a code
// printed by anyone else cannot send a shared booth tablet somewhere else.
const TOKEN = /^\/b\/[A-Za-z0-9_-]{24}$/;

export function boothTarget(text: string, origin: string): string | null {
	let url: URL;
	try {
		url = new URL(text.trim(), origin);
	} catch {
		return null;
	}
	if (url.origin !== new URL(origin).origin) return null;
	return TOKEN.test(url.pathname) ? url.pathname : null;
}
