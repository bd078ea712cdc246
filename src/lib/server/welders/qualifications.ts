// Recording a welder's qualification test. The ranges are not stored: they are computed from
// these facts by the weld core whenever shown, so a corrected table corrects every page.
import type { RequestEvent } from '@sveltejs/kit';
import type { QualificationInput, WithdrawQualificationInput } from '$lib/schemas/welder';
import { parseFiller } from '$lib/weld/filler';
import { parseLength } from '$lib/weld/units';
import { audit } from '../audit';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import { Qualification } from '../models';
import { NotFoundError, RefusedError } from '../people/errors';
import { discardUploads, saveUpload, UploadRefused } from '../storage';
import { actingMember, MANAGE_ROLES } from './access';
import { findWelder } from './welders';

export const MAX_RECORD_BYTES = 15 * 1024 * 1024;

export interface IncomingFile {
	name: string;
	bytes: Uint8Array;
}

function mm(text: string, unit: 'in' | 'mm'): number | null {
	if (text === '') return null;
	const r = parseLength(text, unit);
	if (!r.ok) throw new RefusedError(r.message);
	return r.mm;
}

/** The F-Number typed, or the one the weld core reads from the filler classification. */
function fNumberOf(input: QualificationInput): number | null {
	if (input.fNumber !== '') return Number(input.fNumber);
	if (!input.fillerClass) return null;
	const f = parseFiller(input.fillerClass);
	return f.ok && f.filler.fNumber != null ? Number(f.filler.fNumber) : null;
}

export function qualificationValues(input: QualificationInput) {
	const unit = input.units === 'metric' ? 'mm' : 'in';
	return {
		process: input.process,
		code: input.code,
		testDate: input.testDate,
		wpsRef: input.wpsRef || null,
		testPositions: input.testPositions.join(','),
		couponType: input.couponType,
		couponDiameterMm: input.couponType === 'pipe' ? mm(input.couponDiameter, unit) : null,
		couponThicknessMm: mm(input.couponThickness, unit) ?? 0,
		depositThicknessMm: mm(input.depositThickness, unit) ?? 0,
		depositLayers: input.depositLayers === '' ? null : Number(input.depositLayers),
		lengthUnit: unit,
		fNumber: fNumberOf(input),
		fillerClass: input.fillerClass || null,
		backing: (input.backing || null) as 'with' | 'without' | null,
		currentType: input.currentType || null,
		results: input.results || null,
		witnessedBy: input.witnessedBy || null
	} as const;
}

async function storeRecord(file: IncomingFile | null) {
	if (!file || file.bytes.length === 0) return null;
	try {
		const s = await saveUpload(file.bytes, {
			accept: ['application/pdf'],
			maxBytes: MAX_RECORD_BYTES,
			name: file.name
		});
		return { key: s.key, name: file.name.slice(0, 200) || 'test-record.pdf' };
	} catch (e) {
		if (e instanceof UploadRefused) throw new RefusedError(e.message, 'record');
		throw e;
	}
}

export async function addQualification(
	actor: SessionUser,
	welderId: number,
	input: QualificationInput,
	file: IncomingFile | null,
	event: RequestEvent | null = null
): Promise<{ id: number }> {
	const values = qualificationValues(input);
	const stored = await storeRecord(file);
	try {
		return await write(async (t) => {
			const me = await actingMember(actor, MANAGE_ROLES, t);
			const w = await findWelder(actor.shopId, welderId, t);
			const q = await Qualification.create(
				{
					shopId: actor.shopId,
					welderId: w.id,
					...values,
					recordKey: stored?.key ?? null,
					recordName: stored?.name ?? null,
					createdById: me.id
				},
				{ transaction: t }
			);
			await audit(
				{
					shopId: actor.shopId,
					actor: me,
					action: 'qualification.created',
					objectType: 'qualification',
					objectId: q.id,
					after: { welderId: w.id, ...values, record: stored?.name ?? null }
				},
				event,
				t
			);
			return { id: q.id };
		});
	} catch (e) {
		await discardUploads([stored?.key]);
		throw e;
	}
}

/** The stored test record of a qualification of the actor's shop, or null. */
export async function qualificationRecord(shopId: number, welderId: number, id: number) {
	const q = await Qualification.findOne({ where: { id, welderId, shopId } });
	if (!q?.recordKey) return null;
	return { key: q.recordKey, name: q.recordName ?? 'test-record.pdf' };
}

/**
 * Withdraws a qualification for good: it stops covering any work and shows as withdrawn, its
 * history kept. The reason goes to the audit trail; a welder who requalifies gets a new record.
 */
export async function withdrawQualification(
	actor: SessionUser,
	welderId: number,
	input: WithdrawQualificationInput,
	event: RequestEvent | null = null
): Promise<void> {
	await write(async (t) => {
		const me = await actingMember(actor, MANAGE_ROLES, t);
		const q = await Qualification.findOne({
			where: { id: input.qualificationId, welderId, shopId: actor.shopId },
			transaction: t
		});
		if (!q) throw new NotFoundError('No such qualification for this welder.');
		if (q.withdrawnAt)
			throw new RefusedError(
				`Already withdrawn on ${q.withdrawnAt.toISOString().slice(0, 10)}.`,
				'qualificationId'
			);
		const at = new Date();
		await q.update({ withdrawnAt: at }, { transaction: t });
		await audit(
			{
				shopId: actor.shopId,
				actor: me,
				action: 'qualification.withdrawn',
				objectType: 'qualification',
				objectId: q.id,
				before: { withdrawnAt: null },
				after: { withdrawnAt: at.toISOString(), reason: input.reason }
			},
			event,
			t
		);
	});
}
