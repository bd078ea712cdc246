// A continuity tap that may arrive late and more than once: made on a phone (offline, queued with
// an id the phone made) or posted from the booth form with the id the page carried. The server
// takes each id once per person and gives a retry the answer the first arrival got; a refusal
// (link withdrawn, revision no longer in force meanwhile) is recorded and answered in words the
// welder reads, never dropped.
import type { RequestEvent } from '@sveltejs/kit';
import { UniqueConstraintError } from 'sequelize';
import type { SessionUser } from '../auth/session-user';
import { audit } from '../audit';
import { write } from '../db';
import { ContinuityEntry, ContinuityTap } from '../models';
import type { TapOutcome } from '../models/continuity-tap';
import { ForbiddenError, RefusedError } from '../people/errors';
import { resolveBoothToken } from './resolve';
import { tapContinuity } from './tap';

export interface TapAnswer {
	outcome: TapOutcome;
	message: string;
	/** True when this id had arrived before: the answer is the stored one, nothing changed. */
	repeat: boolean;
	usedOn: string | null;
	process: string | null;
}

/** A tap older than this is not taken from a phone's queue: an engineer enters it by hand. */
export const MAX_TAP_AGE_DAYS = 30;
const DAY_MS = 86_400_000;

export const UNKNOWN_LINK =
	'This booth link is unknown. The use was not logged: ask an engineer to enter it by hand.';

export async function receiveTap(
	user: SessionUser,
	token: string,
	input: { id: string; madeAt: Date },
	event: RequestEvent | null
): Promise<TapAnswer> {
	const seen = await storedAnswer(user, input.id);
	if (seen) return seen;
	const now = new Date();
	// A phone clock ahead of the server's would log a day that has not come: take the arrival.
	const madeAt = input.madeAt > now ? now : input.madeAt;
	const status = await resolveBoothToken(token);
	const linkId = status && status.shopId === user.shopId ? status.link.id : null;
	try {
		if (!status || linkId === null) throw new RefusedError(UNKNOWN_LINK);
		if (now.getTime() - madeAt.getTime() > MAX_TAP_AGE_DAYS * DAY_MS)
			throw new RefusedError(
				`This tap was made more than ${MAX_TAP_AGE_DAYS} days ago and was not logged: ask an engineer to enter the use by hand.`
			);
		const r = await tapContinuity(user, status, event, { clientId: input.id, madeAt });
		return {
			outcome: r.created ? 'logged' : 'already',
			message: `${r.created ? 'Logged' : 'Already logged'}: ${r.process} on ${r.usedOn}.`,
			repeat: false,
			usedOn: r.usedOn,
			process: r.process
		};
	} catch (e) {
		if (e instanceof UniqueConstraintError) return (await storedAnswer(user, input.id)) ?? raise(e);
		if (!(e instanceof RefusedError || e instanceof ForbiddenError)) throw e;
		return refuse(user, input.id, madeAt, linkId, e.message, event);
	}
}

function raise(e: Error): never {
	throw e;
}

async function storedAnswer(user: SessionUser, clientId: string): Promise<TapAnswer | null> {
	const row = await ContinuityTap.findOne({ where: { userId: user.id, clientId } });
	if (!row) return null;
	const entry = row.continuityEntryId
		? await ContinuityEntry.findOne({ where: { id: row.continuityEntryId, shopId: user.shopId } })
		: null;
	return {
		outcome: row.outcome,
		message:
			row.outcome === 'refused'
				? (row.message ?? 'Refused.')
				: `Already logged: ${entry?.process ?? 'the process'} on ${entry?.usedOn ?? 'that day'} (this tap had arrived before; it counts once).`,
		repeat: true,
		usedOn: entry?.usedOn ?? null,
		process: entry?.process ?? null
	};
}

/** Keeps the refusal (and the answer for a retry) with its audit event. */
async function refuse(
	user: SessionUser,
	clientId: string,
	madeAt: Date,
	linkId: number | null,
	message: string,
	event: RequestEvent | null
): Promise<TapAnswer> {
	try {
		await write(async (t) => {
			const receivedAt = new Date();
			await ContinuityTap.create(
				{
					shopId: user.shopId,
					userId: user.id,
					clientId,
					linkId,
					continuityEntryId: null,
					outcome: 'refused',
					message: message.slice(0, 300),
					madeAt,
					receivedAt
				},
				{ transaction: t }
			);
			await audit(
				{
					shopId: user.shopId,
					actor: { id: user.id, name: user.name },
					action: 'continuity.refused',
					objectType: 'booth-link',
					objectId: linkId,
					after: {
						tap: {
							id: clientId,
							madeAt: madeAt.toISOString(),
							receivedAt: receivedAt.toISOString()
						},
						message
					}
				},
				event,
				t
			);
		});
	} catch (e) {
		if (e instanceof UniqueConstraintError) return (await storedAnswer(user, clientId)) ?? raise(e);
		throw e;
	}
	return { outcome: 'refused', message, repeat: false, usedOn: null, process: null };
}
