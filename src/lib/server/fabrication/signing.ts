// The inspector's e-signature on jobs, the same as on procedures (procedures/decide.ts): the
// password asked again (wrong ones count with sign-in failures and are audited), then who (id,
// printed name and role at that moment), when (server UTC), the SHA-256 of the canonical content
// signed, and a seal binding all of them. Overrides and inspections carry these columns.
import type { RequestEvent } from '@sveltejs/kit';
import { ROLE_LABELS } from '$lib/roles';
import { audit } from '../audit';
import { clearFailures, isLockedOut, recordFailure } from '../auth/failed-sign-ins';
import { verifyPassword } from '../auth/password';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import type { Signed } from '../models/weld-log';
import { User } from '../models';
import { ForbiddenError, RefusedError } from '../people/errors';
import { canonicalJson, digestOf, sha256Text } from '../procedures/canonical';
import { TOO_MANY_PASSWORDS, WRONG_PASSWORD } from '../procedures/decide';
import { actorOf } from '../procedures/access';
import { INSPECT_ROLES } from './access';
import { findJoint, type OnJob } from './weld-log';

/**
 * The joint an inspector's signed step is about, after the role check (pages guard too; this
 * is the service's own). A joint of another job than the one named is refused (`findJoint`).
 */
export async function inspectorsJoint(
	actor: SessionUser,
	input: { jointId: number } & OnJob,
	forbidden: string
) {
	if (!INSPECT_ROLES.includes(actor.role)) throw new ForbiddenError(forbidden);
	return findJoint(actor.shopId, input.jointId, input.jobId);
}

/**
 * Checks the password before any write (bcrypt is slow on purpose); refuses in words. A wrong
 * one is audited against the joint being signed for.
 */
export async function checkSignature(
	actor: SessionUser,
	password: string,
	jointId: number,
	event: RequestEvent | null
): Promise<void> {
	if (await isLockedOut(actor.email)) throw new RefusedError(TOO_MANY_PASSWORDS, 'password');
	const me = await User.findOne({ where: { id: actor.id, shopId: actor.shopId, active: true } });
	if (await verifyPassword(password, me?.passwordHash)) {
		await clearFailures(actor.email);
		return;
	}
	const locked = await recordFailure(actor.email);
	await write((t) =>
		audit(
			{
				shopId: actor.shopId,
				actor: actorOf(actor),
				action: 'job.signature_refused',
				objectType: 'job_joint',
				objectId: jointId,
				after: { reason: 'wrong password' }
			},
			event,
			t
		)
	);
	throw new RefusedError(locked ? TOO_MANY_PASSWORDS : WRONG_PASSWORD, 'password');
}

/** The signature columns for `content`, signed by `me` now. */
export function sign(
	me: Pick<User, 'id' | 'name' | 'role'>,
	content: unknown,
	now: Date = new Date()
): Signed {
	const canonical = canonicalJson(content);
	const digest = sha256Text(canonical);
	const manifest = {
		signedById: me.id,
		printedName: me.name,
		role: ROLE_LABELS[me.role],
		signedAt: now,
		digest
	};
	return { ...manifest, canonical, seal: sealOf(manifest) };
}

export function sealOf(s: Omit<Signed, 'canonical' | 'seal'>): string {
	// Named fields only: a model instance spread would carry Sequelize's own properties.
	return digestOf({
		signedById: s.signedById,
		printedName: s.printedName,
		role: s.role,
		signedAt: s.signedAt.toISOString(),
		digest: s.digest
	});
}

/** Whether a stored signature still matches what it says it signed. */
export function signatureHolds(s: Signed): boolean {
	return sha256Text(s.canonical) === s.digest && sealOf(s) === s.seal;
}
