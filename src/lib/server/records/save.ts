// Create and update settings records: the form's text to SI, the findings computed by the same
// weld core the checks API runs, photos referenced, and an audit event in the same transaction.
import type { RequestEvent } from '@sveltejs/kit';
import type { Transaction } from 'sequelize';
import { runChecks, type UnitSystem } from '$lib/weld';
import { recordValues, weldSettings, type RecordValues } from '$lib/records/values';
import type { SettingsRecordForm } from '$lib/schemas/settings-record';
import { audit } from '../audit';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import { SettingsPhoto, SettingsRecord } from '../models';
import { actorRef } from '../people/actor';
import { ForbiddenError, NotFoundError, RefusedError } from '../people/errors';
import { canEdit, CREATE_ROLES, currentActor, isFrozen, mayEdit } from './access';
import { discardPhotos, storePhotos, type IncomingPhoto, type StoredPhoto } from './photos';

type Columns = Omit<
	SettingsRecord['_creationAttributes'],
	'id' | 'shopId' | 'authorId' | 'createdAt' | 'updatedAt' | 'frozenAt' | 'citedByProcedureId'
>;

/** The stored columns for a form's values, with the findings computed now. */
export function columnsFor(form: SettingsRecordForm, system: UnitSystem): Columns {
	const v: RecordValues = recordValues(form);
	const { findings, derived } = runChecks(weldSettings(v), { system });
	const { entered, ...values } = v;
	const search = [
		v.jobRef,
		v.machine,
		v.notes,
		v.defects,
		v.outcome,
		v.fillerClass,
		v.baseMetalSpec,
		v.gasName,
		v.tungstenClass,
		v.process,
		v.position
	]
		.filter(Boolean)
		.join(' ')
		.toLowerCase();
	return {
		...values,
		entered: JSON.stringify({ units: form.units, fields: entered }),
		findings: JSON.stringify(findings),
		derived: JSON.stringify(derived),
		cautionCount: findings.filter((f) => f.status !== 'ok').length,
		searchText: search
	};
}

const SNAPSHOT_OMITS = [
	'findings',
	'derived',
	'searchText',
	'entered',
	'createdAt',
	'updatedAt',
	'id',
	'shopId',
	'authorId',
	'frozenAt',
	'citedByProcedureId'
];

/** What the audit trail keeps of a record: its values, not the derived blobs. */
function snapshot(r: Columns | SettingsRecord): Record<string, unknown> {
	const o = 'toJSON' in r ? (r.toJSON() as Record<string, unknown>) : { ...r };
	for (const k of SNAPSHOT_OMITS) delete o[k];
	return o;
}

async function addPhotos(
	record: SettingsRecord,
	stored: StoredPhoto[],
	actor: SessionUser,
	t: Transaction
): Promise<void> {
	for (const s of stored)
		await SettingsPhoto.create(
			{
				shopId: record.shopId,
				recordId: record.id,
				storageKey: s.key,
				thumbKey: s.thumbKey,
				mime: s.mime,
				originalName: s.originalName,
				bytes: s.bytes,
				width: s.width,
				height: s.height,
				uploadedById: actor.id
			},
			{ transaction: t }
		);
}

export async function createRecord(
	actor: SessionUser,
	form: SettingsRecordForm,
	photos: IncomingPhoto[] = [],
	event: RequestEvent | null = null
): Promise<{ id: number }> {
	if (!CREATE_ROLES.includes(actor.role)) throw new ForbiddenError();
	const columns = columnsFor(form, form.units);
	const stored = await storePhotos(photos, 0);
	try {
		return await write(async (t) => {
			const me = await currentActor(actor, t);
			if (!CREATE_ROLES.includes(me.role)) throw new ForbiddenError();
			const record = await SettingsRecord.create(
				{ ...columns, shopId: actor.shopId, authorId: me.id },
				{ transaction: t }
			);
			await addPhotos(record, stored, actor, t);
			await audit(
				{
					shopId: actor.shopId,
					actor: actorRef(me),
					action: 'settings_record.created',
					objectType: 'settings_record',
					objectId: record.id,
					after: { ...snapshot(columns), photos: stored.map((s) => s.originalName) }
				},
				event,
				t
			);
			return { id: record.id };
		});
	} catch (e) {
		await discardPhotos(stored);
		throw e;
	}
}

/** The record of the actor's shop, or NotFoundError (another shop's id is "not found" too). */
export async function findOwn(
	actor: SessionUser,
	id: number,
	t?: Transaction
): Promise<SettingsRecord> {
	const r = await SettingsRecord.findOne({ where: { id, shopId: actor.shopId }, transaction: t });
	if (!r) throw new NotFoundError('No such settings record in your shop.');
	return r;
}

/**
 * Refuses before the form is read when the member may not edit this record at all, so a
 * refused request gets 403 (not field errors); a frozen record is explained by the save itself.
 */
export async function requireEditable(actor: SessionUser, id: number): Promise<void> {
	const record = await findOwn(actor, id);
	if (!mayEdit(actor, record))
		throw new ForbiddenError('Your role does not allow editing this record.');
}

export async function updateRecord(
	actor: SessionUser,
	id: number,
	form: SettingsRecordForm,
	photos: IncomingPhoto[] = [],
	event: RequestEvent | null = null
): Promise<void> {
	const existing = await findOwn(actor, id);
	if (isFrozen(existing)) throw new RefusedError(frozenMessage());
	if (!canEdit(actor, existing))
		throw new ForbiddenError('Your role does not allow editing this record.');
	const kept = await SettingsPhoto.count({
		where: { recordId: id, shopId: actor.shopId, removedAt: null }
	});
	const columns = columnsFor(form, form.units);
	const stored = await storePhotos(photos, kept);
	try {
		await write(async (t) => {
			const me = await currentActor(actor, t);
			const record = await findOwn(actor, id, t);
			// Re-checked under the lock: a procedure may have cited it since the page was loaded.
			if (isFrozen(record)) throw new RefusedError(frozenMessage());
			if (!canEdit(me, record))
				throw new ForbiddenError('Your role does not allow editing this record.');
			const before = snapshot(record);
			await record.update(columns, { transaction: t });
			await addPhotos(record, stored, actor, t);
			await audit(
				{
					shopId: actor.shopId,
					actor: actorRef(me),
					action: 'settings_record.updated',
					objectType: 'settings_record',
					objectId: id,
					before,
					after: {
						...snapshot(columns),
						...(stored.length ? { photosAdded: stored.map((s) => s.originalName) } : {})
					}
				},
				event,
				t
			);
		});
	} catch (e) {
		await discardPhotos(stored);
		throw e;
	}
}

export const frozenMessage = () =>
	'A procedure cites this record, so it is frozen and can no longer be edited. Record a new one instead.';

/** Takes a photo off a record (the file stays, so the trail's reference stays true). */
export async function removePhoto(
	actor: SessionUser,
	recordId: number,
	photoId: number,
	event: RequestEvent | null = null
): Promise<void> {
	await write(async (t) => {
		const me = await currentActor(actor, t);
		const record = await findOwn(actor, recordId, t);
		if (isFrozen(record)) throw new RefusedError(frozenMessage());
		if (!canEdit(me, record)) throw new ForbiddenError();
		const photo = await SettingsPhoto.findOne({
			where: { id: photoId, recordId, shopId: actor.shopId, removedAt: null },
			transaction: t
		});
		if (!photo) throw new NotFoundError('No such photo on this record.');
		await photo.update({ removedAt: new Date() }, { transaction: t });
		await audit(
			{
				shopId: actor.shopId,
				actor: actorRef(me),
				action: 'settings_photo.removed',
				objectType: 'settings_record',
				objectId: recordId,
				before: { photo: photo.originalName }
			},
			event,
			t
		);
	});
}

/** For procedures (issue #5): freezes the record inside the procedure's own transaction. */
export async function freezeRecord(
	shopId: number,
	recordId: number,
	procedureId: number,
	t: Transaction
): Promise<boolean> {
	const [n] = await SettingsRecord.update(
		{ frozenAt: new Date(), citedByProcedureId: procedureId },
		{ where: { id: recordId, shopId, frozenAt: null }, transaction: t }
	);
	return n > 0;
}
