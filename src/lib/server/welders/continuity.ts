// The continuity log: dated uses of a process per welder, from a booth tap or entered by an
// engineer or admin, and the ISO 9606-1 six-monthly confirmations.
import type { RequestEvent } from '@sveltejs/kit';
import type { Transaction } from 'sequelize';
import type { Process } from '$lib/weld';
import { parseDate } from '$lib/weld/continuity';
import { audit } from '../audit';
import { write } from '../db';
import { insertUnlessDuplicate } from '../db/dialect';
import {
	ContinuityEntry,
	ContinuityTap,
	Qualification,
	QualificationConfirmation,
	User,
	Welder
} from '../models';
import type { ContinuitySource } from '../models/continuity-entry';
import { ForbiddenError, NotFoundError, RefusedError } from '../people/errors';
import { actingMember, MANAGE_ROLES } from './access';
import { shopDay } from './shop-day';
import { findWelder } from './welders';

export interface RecordContinuityInput {
	shopId: number;
	/** The welder, or the signed-in account linked to one (the booth view knows only the user). */
	welderId?: number;
	userId?: string;
	process: Process;
	/** 'YYYY-MM-DD'; the server's today when left out. */
	date?: string;
	source: ContinuitySource;
	/** Required for manual entries: what was welded. */
	note?: string;
	/** Who records it: the welder themself for a booth tap, an engineer or admin for manual. */
	actor: { id: string; name?: string };
	event?: RequestEvent | null;
	/** A tap from a phone with the id it made: kept once (see models/continuity-tap.ts). */
	tap?: { clientId: string; madeAt: Date; linkId: number | null };
}

export interface RecordedUse {
	id: number;
	welderId: number;
	process: Process;
	usedOn: string;
	source: ContinuitySource;
	/** False when the welder had already logged this process that day: nothing changed. */
	created: boolean;
}

const PROCESSES: readonly string[] = ['GTAW', 'GMAW', 'FCAW', 'SMAW'];

/**
 * Logs that a welder used a process on a day. Idempotent: once per welder, process and day (a
 * unique index and INSERT OR IGNORE inside the write queue), so a double tap changes nothing.
 * Throws NotFoundError (no such welder in the shop), ForbiddenError (the actor may not log for
 * this welder) or RefusedError (bad date, process or missing note).
 */
export async function recordContinuity(input: RecordContinuityInput): Promise<RecordedUse> {
	const today = await shopDay(input.shopId);
	const usedOn = input.date ?? today;
	if (!parseDate(usedOn)) throw new RefusedError('Enter the date as YYYY-MM-DD.', 'usedOn');
	if (usedOn > today) throw new RefusedError('The date is in the future.', 'usedOn');
	if (!PROCESSES.includes(input.process)) throw new RefusedError('Unknown process.', 'process');
	const note = input.note?.trim().slice(0, 500) || null;
	if (input.source === 'manual' && !note)
		throw new RefusedError('Say what the welder welded (job, part or WPS).', 'note');

	return write(async (t) => {
		let welder: Welder | null;
		if (input.welderId !== undefined) welder = await findWelder(input.shopId, input.welderId, t);
		else if (input.userId)
			welder = await Welder.findOne({
				where: { shopId: input.shopId, userId: input.userId },
				transaction: t
			});
		else welder = null;
		if (!welder) throw new NotFoundError('No welder of your shop is linked to this account.');
		if (!welder.active) throw new RefusedError('This welder is marked inactive.');

		let recorder: User;
		if (input.source === 'manual') {
			recorder = await actingMember({ id: input.actor.id, shopId: input.shopId }, MANAGE_ROLES, t);
		} else {
			const u = await User.findOne({
				where: { id: input.actor.id, shopId: input.shopId, active: true },
				transaction: t
			});
			if (!u || u.id !== welder.userId)
				throw new ForbiddenError('Only the welder can log their own use at the booth.');
			recorder = u;
		}

		const now = new Date();
		const { entry, created } = await logUse(t, {
			shopId: input.shopId,
			welder,
			process: input.process,
			usedOn,
			source: input.source,
			note,
			recorder,
			now
		});
		// A second arrival of the same tap id fails the unique index here and rolls all of it back.
		if (input.tap)
			await ContinuityTap.create(
				{
					shopId: input.shopId,
					userId: recorder.id,
					clientId: input.tap.clientId,
					linkId: input.tap.linkId,
					continuityEntryId: entry.id,
					outcome: created ? 'logged' : 'already',
					message: null,
					madeAt: input.tap.madeAt,
					receivedAt: now
				},
				{ transaction: t }
			);
		const tap = input.tap && {
			id: input.tap.clientId,
			madeAt: input.tap.madeAt.toISOString(),
			receivedAt: now.toISOString()
		};
		if (created)
			await audit(
				{
					shopId: input.shopId,
					actor: { id: recorder.id, name: recorder.name },
					action: 'continuity.recorded',
					objectType: 'welder',
					objectId: welder.id,
					after: { process: input.process, usedOn, source: input.source, note, ...(tap && { tap }) }
				},
				input.event ?? null,
				t
			);
		return {
			id: entry.id,
			welderId: welder.id,
			process: entry.process,
			usedOn: entry.usedOn,
			source: entry.source,
			created
		};
	});
}

/**
 * Inside a write: one use of a process by a welder on a day, unless that day is logged already
 * (the unique index decides, whichever process tapped first). Shared by the booth tap, the manual
 * entry and the job weld log (which records it in the same transaction as the weld).
 */
export async function logUse(
	t: Transaction,
	u: {
		shopId: number;
		welder: Welder;
		process: Process;
		usedOn: string;
		source: ContinuitySource;
		note: string | null;
		recorder: User;
		now?: Date;
	}
): Promise<{ entry: ContinuityEntry; created: boolean }> {
	const now = u.now ?? new Date();
	const created = await insertUnlessDuplicate(
		ContinuityEntry,
		{
			shopId: u.shopId,
			welderId: u.welder.id,
			process: u.process,
			usedOn: u.usedOn,
			source: u.source,
			note: u.note,
			recordedById: u.recorder.id,
			recordedByName: u.recorder.name,
			createdAt: now,
			updatedAt: now
		},
		t
	);
	const entry = await ContinuityEntry.findOne({
		where: { welderId: u.welder.id, process: u.process, usedOn: u.usedOn },
		transaction: t,
		rejectOnEmpty: true
	});
	return { entry, created };
}

/** ISO 9606-1: the employer's responsible person confirms the qualification (every 6 months). */
export async function recordConfirmation(
	actor: { id: string; shopId: number },
	welderId: number,
	input: { qualificationId: number; confirmedOn: string; responsiblePerson: string; note: string },
	event: RequestEvent | null = null
): Promise<{ id: number }> {
	if (input.confirmedOn > (await shopDay(actor.shopId)))
		throw new RefusedError('The date is in the future.', 'confirmedOn');
	return write(async (t) => {
		const me = await actingMember(actor, MANAGE_ROLES, t);
		const q = await Qualification.findOne({
			where: { id: input.qualificationId, welderId, shopId: actor.shopId },
			transaction: t
		});
		if (!q) throw new NotFoundError('No such qualification for this welder.');
		if (q.code !== 'ISO 9606-1')
			throw new RefusedError(
				'Confirmations are for ISO 9606-1 qualifications; log a use instead.',
				'qualificationId'
			);
		const c = await QualificationConfirmation.create(
			{
				shopId: actor.shopId,
				qualificationId: q.id,
				confirmedOn: input.confirmedOn,
				responsiblePerson: input.responsiblePerson,
				note: input.note || null,
				recordedById: me.id
			},
			{ transaction: t }
		);
		await audit(
			{
				shopId: actor.shopId,
				actor: me,
				action: 'qualification.confirmed',
				objectType: 'qualification',
				objectId: q.id,
				after: { confirmedOn: input.confirmedOn, responsiblePerson: input.responsiblePerson }
			},
			event,
			t
		);
		return { id: c.id };
	});
}
