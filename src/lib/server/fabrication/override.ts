// An inspector's override: lets one welder log one joint that the server refused them (not
// qualified, or lapsed), with the reason, signed with the inspector's e-signature. A revision
// not in force cannot be overridden: the engineer moves the joint to the revision in force.
import type { RequestEvent } from '@sveltejs/kit';
import type { OverrideForm } from '$lib/schemas/job';
import { audit } from '../audit';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import { WeldOverride, Welder } from '../models';
import { NotFoundError, RefusedError } from '../people/errors';
import { actingMember, actorOf } from '../procedures/access';
import { localDay } from '../welders/dates';
import { INSPECT_ROLES } from './access';
import { checkSignature, inspectorsJoint, sign } from './signing';
import { checkWeld } from './weld-check';
import type { OnJob } from './weld-log';

export async function recordOverride(
	actor: SessionUser,
	input: OverrideForm & OnJob,
	event: RequestEvent | null = null
): Promise<{ id: number; digest: string }> {
	const { joint, job } = await inspectorsJoint(
		actor,
		input,
		'Only an inspector can override a refused weld log.'
	);
	const welder = await Welder.findOne({ where: { id: input.welderId, shopId: actor.shopId } });
	if (!welder) throw new NotFoundError('No such welder in your shop.');
	const check = await checkWeld(actor.shopId, joint, welder, localDay(new Date(), actor.timeZone));
	if (check.kind === 'revision')
		throw new RefusedError(`An override cannot put a revision in force. ${check.refusal}`);
	if (!check.refusal)
		throw new RefusedError(
			`${welder.name} may weld ${joint.mark} already; no override is needed.`,
			'welderId'
		);
	await checkSignature(actor, input.password, joint.id, event);
	return write(async (t) => {
		const me = await actingMember(actor, INSPECT_ROLES, t);
		const content = {
			kind: 'weld-override',
			v: 1,
			job: { id: job.id, number: job.number },
			joint: { id: joint.id, mark: joint.mark, revisionId: joint.revisionId },
			welder: { id: welder.id, name: welder.name, stamp: welder.stamp },
			refusal: check.refusal,
			reason: input.reason
		};
		const signed = sign(me, content);
		const o = await WeldOverride.create(
			{
				shopId: actor.shopId,
				jointId: joint.id,
				welderId: welder.id,
				refusal: check.refusal!.slice(0, 500),
				reason: input.reason,
				...signed
			},
			{ transaction: t }
		);
		await audit(
			{
				shopId: actor.shopId,
				actor: actorOf(me),
				action: 'weld.override_signed',
				objectType: 'job_joint',
				objectId: joint.id,
				after: {
					overrideId: o.id,
					welderId: welder.id,
					reason: input.reason,
					digest: signed.digest
				}
			},
			event,
			t
		);
		return { id: o.id, digest: signed.digest };
	});
}
