// What the service worker keeps for offline use and how it marks a kept copy (issue #16). Pure
// string work, shared by the worker and its unit tests; no DOM (a worker has none).

/** At most this many pages a person: booth views, the booth start page, the own card. */
export const MAX_KEPT = 20;

/** The answer header that says who is signed in (see src/lib/server/auth/member-key.ts). */
export const MEMBER_HEADER = 'x-beadline-member';
/** Set by the worker on a kept copy: when the phone saved it (ISO). */
export const SAVED_AT_HEADER = 'x-beadline-saved-at';

const BOOTH = /^\/b\/[A-Za-z0-9_-]{8,40}$/;
const CARD = /^\/q\/[A-Za-z0-9_-]{8,64}$/;

/** The pages opened online that a phone keeps for the signed-in person. */
export function isKeptPath(pathname: string): boolean {
	return (
		BOOTH.test(pathname) ||
		CARD.test(pathname) ||
		pathname === '/booth' ||
		pathname === '/welders/me'
	);
}

/** A booth view's tap form posts here; the worker queues it when the post cannot go. */
export function boothTapToken(pathname: string, search: string): string | null {
	if (search !== '?/used' || !BOOTH.test(pathname)) return null;
	return pathname.slice(3);
}

const ESCAPES: Record<string, string> = {
	'&': '&amp;',
	'<': '&lt;',
	'>': '&gt;',
	'"': '&quot;',
	"'": '&#39;'
};
export const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => ESCAPES[c]!);

/** The phone's own date and time, as the person reads it (their locale and time zone). */
export function localStamp(at: Date, locale?: string): string {
	return at.toLocaleString(locale, { dateStyle: 'medium', timeStyle: 'short' });
}

/**
 * A kept page is shown offline as plain HTML: its scripts would hydrate against data that can
 * not be fetched, and the booth view has none anyway. Forms still post (the worker takes them).
 */
export function stripScripts(html: string): string {
	return html
		.replace(/<script\b[^>]*>[\s\S]*?<\/script>/gi, '')
		.replace(/<link\b[^>]*rel="modulepreload"[^>]*>/gi, '');
}

/**
 * Puts markup first in <body>: outside the element the app hydrates, so an online page with
 * JavaScript still hydrates cleanly.
 */
export function prependToBody(html: string, fragment: string): string {
	if (!fragment) return html;
	const at = html.search(/<body\b[^>]*>/i);
	if (at < 0) return fragment + html;
	const end = html.indexOf('>', at) + 1;
	return html.slice(0, end) + fragment + html.slice(end);
}

/** The stylesheets and fonts a page links to: kept with it so it reads right after an update. */
export function linkedAssets(html: string): string[] {
	const out = new Set<string>();
	for (const m of html.matchAll(/<link\b[^>]*>/gi)) {
		const tag = m[0];
		if (!/rel="(stylesheet|preload)"/i.test(tag)) continue;
		const href = /href="([^"]+)"/i.exec(tag)?.[1];
		if (href) out.add(href);
	}
	return [...out];
}
