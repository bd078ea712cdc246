// Lab reports of a PQR: PDF only (checked by its first bytes, not its name), at most 20 MB,
// stored under a random name with the SHA-256 of its bytes. Every upload and download is audited,
// and a download whose bytes no longer match their digest is refused.
import type { RequestEvent } from '@sveltejs/kit';
import { createHash } from 'node:crypto';
import { audit } from '../audit';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import { PqrReport } from '../models';
import { NotFoundError, RefusedError } from '../people/errors';
import { actingMember, actorOf, AUTHOR_ROLES, VIEW_ROLES } from '../procedures/access';
import { discardUploads, openUpload, saveUpload, UploadRefused } from '../storage';
import { CERTIFIED_MESSAGE, findPqr } from './save';

export const MAX_REPORT_BYTES = 20 * 1024 * 1024;

const sha256 = (b: Uint8Array) => createHash('sha256').update(b).digest('hex');
const cleanName = (name: string) =>
	(name.replace(/[\\/\r\n"]/g, '_').trim() || 'lab-report.pdf').slice(0, 200);

export async function uploadReport(
	actor: SessionUser,
	pqrId: number,
	file: { bytes: Uint8Array; name: string },
	event: RequestEvent | null = null
): Promise<{ id: number }> {
	const pqr = await findPqr(actor, pqrId);
	if (pqr.state !== 'draft') throw new RefusedError(CERTIFIED_MESSAGE, 'report');
	const name = cleanName(file.name);
	let stored;
	try {
		stored = await saveUpload(file.bytes, {
			accept: ['application/pdf'],
			maxBytes: MAX_REPORT_BYTES,
			name
		});
	} catch (e) {
		if (e instanceof UploadRefused) throw new RefusedError(e.message, 'report');
		throw e;
	}
	try {
		return await write(async (t) => {
			const me = await actingMember(actor, AUTHOR_ROLES, t);
			const fresh = await findPqr(actor, pqrId, t);
			if (fresh.state !== 'draft') throw new RefusedError(CERTIFIED_MESSAGE, 'report');
			const digest = sha256(file.bytes);
			const r = await PqrReport.create(
				{
					shopId: actor.shopId,
					pqrId,
					storageKey: stored.key,
					originalName: name,
					bytes: stored.bytes,
					sha256: digest,
					uploadedById: me.id
				},
				{ transaction: t }
			);
			await audit(
				{
					shopId: actor.shopId,
					actor: actorOf(me),
					action: 'pqr_report.uploaded',
					objectType: 'pqr',
					objectId: pqrId,
					after: { reportId: r.id, name, bytes: stored.bytes, sha256: digest }
				},
				event,
				t
			);
			return { id: r.id };
		});
	} catch (e) {
		await discardUploads([stored.key]);
		throw e;
	}
}

/** The bytes of a report for a member of the owning shop; the download goes on the trail. */
export async function openReport(
	actor: SessionUser,
	pqrId: number,
	reportId: number,
	event: RequestEvent | null = null
): Promise<{ bytes: Buffer; name: string }> {
	await findPqr(actor, pqrId);
	const r = await PqrReport.findOne({
		where: { id: reportId, pqrId, shopId: actor.shopId, removedAt: null }
	});
	if (!r) throw new NotFoundError('No such lab report on this PQR.');
	const bytes = await openUpload(r.storageKey);
	if (!bytes) throw new NotFoundError('The lab report file is missing from storage.');
	const intact = sha256(bytes) === r.sha256;
	await write(async (t) => {
		const me = await actingMember(actor, VIEW_ROLES, t);
		await audit(
			{
				shopId: actor.shopId,
				actor: actorOf(me),
				action: intact ? 'pqr_report.downloaded' : 'pqr_report.tamper_detected',
				objectType: 'pqr',
				objectId: pqrId,
				after: {
					reportId,
					name: r.originalName,
					sha256: r.sha256,
					...(intact ? {} : { found: sha256(bytes) })
				}
			},
			event,
			t
		);
	});
	if (!intact)
		throw new RefusedError('The stored lab report no longer matches its digest; it was not sent.');
	return { bytes, name: r.originalName };
}
