// "I welded with this today" from the booth view: logs the revision's process for the welder
// linked to the signed-in account, once a day (recordContinuity of the welders issue is
// idempotent), which keeps that welder's qualifications for the process alive.
import type { RequestEvent } from '@sveltejs/kit';
import type { SessionUser } from '../auth/session-user';
import { ProcedureRevision } from '../models';
import { NotFoundError, RefusedError } from '../people/errors';
import { readVariables } from '../procedures/find';
import { recordContinuity, type RecordedUse } from '../welders/continuity';
import { localDay } from '../welders/dates';
import type { BoothStatus } from './resolve';

export const NO_WELDER =
	'Your account is not linked to a welder record, so there is nothing to log. Ask an engineer or admin to link it on the welder’s page.';

/** `queued`: a tap the phone kept while offline, with the id it made and when it was made. */
export async function tapContinuity(
	user: SessionUser,
	status: BoothStatus,
	event: RequestEvent | null,
	queued?: { clientId: string; madeAt: Date }
): Promise<RecordedUse> {
	if (status.link.revoked) throw new RefusedError('This link has been withdrawn.');
	if (status.state !== 'approved')
		throw new RefusedError(
			'This revision is not the one in force. Open the current revision and log your use there.'
		);
	const revision = await ProcedureRevision.findOne({
		where: { id: status.revisionId, shopId: user.shopId },
		rejectOnEmpty: true
	});
	const { variables } = readVariables(revision);
	try {
		return await recordContinuity({
			shopId: user.shopId,
			userId: user.id,
			process: variables.process,
			source: 'booth',
			actor: { id: user.id, name: user.name },
			event,
			...(queued && {
				date: localDay(queued.madeAt, user.timeZone),
				tap: { ...queued, linkId: status.link.id }
			})
		});
	} catch (e) {
		if (e instanceof NotFoundError) throw new RefusedError(NO_WELDER);
		throw e;
	}
}
