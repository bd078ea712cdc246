// The notices the service worker puts at the top of a page it serves: offline with the saved
// copy's date and time, taps waiting to send, and what became of taps sent since. Plain markup
// with the app's own classes (no script: the booth view has none).
import { escapeHtml, localStamp } from './pages';

const wrap = (inner: string, cls: string, attrs: string) =>
	`<div class="${cls} px-4 py-4" ${attrs}><div class="mx-auto max-w-3xl">${inner}</div></div>`;

/** Offline, a kept copy: cannot be missed, and says what to check before welding to it. */
export function offlineBanner(savedAt: Date, locale?: string): string {
	const when = escapeHtml(localStamp(savedAt, locale));
	return wrap(
		`<p class="text-2xl leading-tight font-bold">Offline: this is the copy saved on this phone on <time datetime="${savedAt.toISOString()}">${when}</time>.</p>` +
			`<p class="mt-2 text-lg font-bold">Its status may have changed since. Check the revision on the posted sheet and ask the inspector before you weld to it.</p>`,
		'border-b-8 border-ink-900 bg-arc-400 text-ink-900',
		'role="alert" data-testid="offline-banner"'
	);
}

/** Offline, and the page was never opened on this phone online (the "not on this phone" page). */
export function offlineNotice(): string {
	return wrap(
		`<p class="text-2xl font-bold">Offline: no connection.</p>`,
		'border-b-8 border-ink-900 bg-arc-400 text-ink-900',
		'role="alert" data-testid="offline-banner"'
	);
}

export function queueBanner(waiting: number, justQueued: boolean): string {
	if (waiting <= 0) return '';
	const taps = waiting === 1 ? 'tap' : 'taps';
	const first = justQueued
		? '<p class="text-xl font-bold">Your tap is saved on this phone.</p>'
		: '';
	return wrap(
		`${first}<p class="text-2xl font-bold" data-testid="offline-queue">Waiting to send: ${waiting}</p>` +
			`<p class="mt-1 text-lg">${waiting} continuity ${taps} made offline. They are sent when this phone is online again and you open Beadline; each counts once.</p>`,
		'border-b-4 border-ink-900 bg-white text-ink-900',
		'role="status" data-testid="offline-queue-banner"'
	);
}

export interface TapNotice {
	kind: 'sent' | 'refused';
	message: string;
	madeAt: number;
}

/** What happened to queued taps since the last page: a refusal is loud, a send is a line. */
export function noticesBanner(notices: TapNotice[], locale?: string): string {
	return notices
		.map((n) => {
			const made = escapeHtml(localStamp(new Date(n.madeAt), locale));
			const text = escapeHtml(n.message);
			return n.kind === 'refused'
				? wrap(
						`<p class="text-2xl font-bold">Not logged: your tap of ${made} was refused.</p><p class="mt-1 text-xl">${text}</p>`,
						'border-b-8 border-ink-900 bg-stop-600 text-white',
						'role="alert" data-testid="tap-refused"'
					)
				: wrap(
						`<p class="text-xl font-bold">Sent from this phone: your tap of ${made}. ${text}</p>`,
						'border-b-4 border-sound-600 bg-sound-100 text-sound-700',
						'role="status" data-testid="tap-sent"'
					);
		})
		.join('');
}
