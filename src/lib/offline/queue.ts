// The phone's own store (IndexedDB through idb-keyval): who is signed in as far as the worker
// knows, the continuity taps waiting to send, the notices about sent or refused taps that the
// next page shows, and when the running worker took over from an older deployment's (for the
// "updated, reload" prompt of agent.js). Taps are filed by person and wait for that
// person to be signed in again: a tap made offline is never dropped by a sign-out or by another
// person using the phone.
import { createStore, del, get, set, update, type UseStore } from 'idb-keyval';
import type { TapNotice } from './banners';

export interface QueuedTap {
	/** Made by the phone (or carried by the booth form): the server takes each once. */
	id: string;
	token: string;
	member: string;
	/** Epoch milliseconds, the phone's clock. */
	madeAt: number;
}

interface StoredNotice extends TapNotice {
	member: string;
}

let store: UseStore | null = null;
const db = () => (store ??= createStore('beadline-offline', 'state'));

export const currentMember = async () => (await get<string>('member', db())) ?? null;
export const setMember = async (member: string | null) =>
	member ? set('member', member, db()) : del('member', db());

/** Epoch ms when this deployment's worker replaced an older one; null after a first install. */
export const replacedAt = async () => (await get<number>('replacedAt', db())) ?? null;
export const setReplacedAt = (at: number) => set('replacedAt', at, db());

const sameLocalDay = (a: number, b: number) =>
	new Date(a).toDateString() === new Date(b).toDateString();

/**
 * Queues a tap; a second tap of the same sheet by the same person on the same day is the same
 * use (the server logs a process once a day), so it is not queued again. Returns the tap kept.
 */
export async function enqueue(tap: QueuedTap): Promise<{ tap: QueuedTap; added: boolean }> {
	let kept = tap;
	let added = false;
	await update<QueuedTap[]>(
		'taps',
		(taps = []) => {
			const twin = taps.find(
				(t) =>
					t.id === tap.id ||
					(t.member === tap.member && t.token === tap.token && sameLocalDay(t.madeAt, tap.madeAt))
			);
			if (twin) {
				kept = twin;
				return taps;
			}
			added = true;
			return [...taps, tap];
		},
		db()
	);
	return { tap: kept, added };
}

export async function waiting(member: string): Promise<QueuedTap[]> {
	return ((await get<QueuedTap[]>('taps', db())) ?? []).filter((t) => t.member === member);
}

export async function dequeue(id: string): Promise<void> {
	await update<QueuedTap[]>('taps', (taps = []) => taps.filter((t) => t.id !== id), db());
}

export async function addNotice(member: string, notice: TapNotice): Promise<void> {
	await update<StoredNotice[]>('notices', (n = []) => [...n, { ...notice, member }], db());
}

/** The person's notices, once: they are removed as they are read. */
export async function takeNotices(member: string): Promise<TapNotice[]> {
	let mine: StoredNotice[] = [];
	await update<StoredNotice[]>(
		'notices',
		(n = []) => {
			mine = n.filter((x) => x.member === member);
			return n.filter((x) => x.member !== member);
		},
		db()
	);
	return mine.map(({ kind, message, madeAt }) => ({ kind, message, madeAt }));
}

/** Signed out: the person's notices go (the server's audit trail keeps what happened). */
export async function dropNotices(): Promise<void> {
	await del('notices', db());
}
