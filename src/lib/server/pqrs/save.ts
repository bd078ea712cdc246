// PQRs: create and edit while a draft, certify (which freezes it and stores the digest that
// revisions citing it will sign), and addenda for corrections after that, each audited.
import type { RequestEvent } from '@sveltejs/kit';
import { col, fn, Op, where, type Transaction } from 'sequelize';
import type { PqrForm } from '$lib/schemas/pqr';
import { formToPqr, qualifiedRanges } from '$lib/procedures/pqr-values';
import { pqrCodeFor } from '$lib/procedures/default-code';
import { shopDefaultCode } from '../people/shop-settings';
import { audit } from '../audit';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import { lockShop } from '../db/locks';
import { Pqr, PqrAddendum } from '../models';
import { NotFoundError, RefusedError } from '../people/errors';
import { actingMember, actorOf, AUTHOR_ROLES, CERTIFY_ROLES } from '../procedures/access';
import { pqrDigest } from '../procedures/digest';

export const CERTIFIED_MESSAGE =
	'This PQR is certified and frozen; it can no longer be edited. Add an addendum to record a correction.';

export async function findPqr(
	actor: Pick<SessionUser, 'shopId'>,
	id: number,
	t?: Transaction
): Promise<Pqr> {
	const p = await Pqr.findOne({ where: { id, shopId: actor.shopId }, transaction: t });
	if (!p) throw new NotFoundError('No such PQR in your shop.');
	return p;
}

async function refuseClash(shopId: number, number: string, id: number | null, t: Transaction) {
	// Numbers are unique per shop whatever their case: one check-and-write at a time.
	await lockShop(shopId, t);
	const clash = await Pqr.findOne({
		where: {
			shopId,
			...(id ? { id: { [Op.ne]: id } } : {}),
			[Op.and]: [where(fn('lower', col('number')), number.toLowerCase())]
		},
		transaction: t
	});
	if (clash) throw new RefusedError(`${number} is already a PQR of your shop.`, 'number');
}

function columns(form: PqrForm) {
	const { values, tests } = formToPqr(form);
	const qualified = qualifiedRanges(values);
	return {
		number: form.number,
		title: form.title,
		process: values.process,
		actualValues: JSON.stringify(values),
		tests: JSON.stringify(tests),
		qualified: JSON.stringify(qualified),
		snapshot: { number: form.number, title: form.title, values, tests }
	};
}

const snapshotOf = (p: Pqr) => ({
	number: p.number,
	title: p.title,
	values: JSON.parse(p.actualValues) as unknown,
	tests: JSON.parse(p.tests) as unknown
});

export async function createPqr(
	actor: SessionUser,
	form: PqrForm,
	event: RequestEvent | null = null
): Promise<{ id: number }> {
	const c = columns(form);
	return write(async (t) => {
		const me = await actingMember(actor, AUTHOR_ROLES, t);
		await refuseClash(actor.shopId, form.number, null, t);
		const { snapshot, ...cols } = c;
		const code = form.code ?? pqrCodeFor(await shopDefaultCode(actor.shopId, t));
		const pqr = await Pqr.create(
			{ ...cols, code, shopId: actor.shopId, state: 'draft', authorId: me.id },
			{ transaction: t }
		);
		await audit(
			{
				shopId: actor.shopId,
				actor: actorOf(me),
				action: 'pqr.created',
				objectType: 'pqr',
				objectId: pqr.id,
				after: { ...snapshot, code }
			},
			event,
			t
		);
		return { id: pqr.id };
	});
}

export async function updatePqr(
	actor: SessionUser,
	id: number,
	form: PqrForm,
	event: RequestEvent | null = null
): Promise<void> {
	const c = columns(form);
	await write(async (t) => {
		const me = await actingMember(actor, AUTHOR_ROLES, t);
		const pqr = await findPqr(actor, id, t);
		if (pqr.state !== 'draft') throw new RefusedError(CERTIFIED_MESSAGE);
		await refuseClash(actor.shopId, form.number, id, t);
		const before = snapshotOf(pqr);
		const { snapshot, ...cols } = c;
		const [n] = await Pqr.update(form.code ? { ...cols, code: form.code } : cols, {
			where: { id, shopId: actor.shopId, state: 'draft' },
			transaction: t
		});
		if (n !== 1) throw new RefusedError(CERTIFIED_MESSAGE);
		await audit(
			{
				shopId: actor.shopId,
				actor: actorOf(me),
				action: 'pqr.updated',
				objectType: 'pqr',
				objectId: id,
				before: { ...before, code: pqr.code },
				after: { ...snapshot, code: form.code ?? pqr.code }
			},
			event,
			t
		);
	});
}

export async function certifyPqr(
	actor: SessionUser,
	id: number,
	event: RequestEvent | null = null
): Promise<{ digest: string }> {
	return write(async (t) => {
		const me = await actingMember(actor, CERTIFY_ROLES, t);
		const pqr = await findPqr(actor, id, t);
		if (pqr.state !== 'draft') throw new RefusedError('This PQR is already certified.');
		const digest = await pqrDigest(pqr, t);
		const now = new Date();
		const [n] = await Pqr.update(
			{
				state: 'certified',
				certifiedById: me.id,
				certifiedName: me.name,
				certifiedAt: now,
				certifiedDigest: digest
			},
			{ where: { id, shopId: actor.shopId, state: 'draft' }, transaction: t }
		);
		if (n !== 1) throw new RefusedError('This PQR is already certified.');
		await audit(
			{
				shopId: actor.shopId,
				actor: actorOf(me),
				action: 'pqr.certified',
				objectType: 'pqr',
				objectId: id,
				before: { state: 'draft' },
				after: { state: 'certified', certifiedBy: me.name, certifiedAt: now.toISOString(), digest }
			},
			event,
			t
		);
		return { digest };
	});
}

export async function addAddendum(
	actor: SessionUser,
	id: number,
	body: string,
	event: RequestEvent | null = null
): Promise<{ id: number }> {
	return write(async (t) => {
		const me = await actingMember(actor, AUTHOR_ROLES, t);
		const pqr = await findPqr(actor, id, t);
		if (pqr.state !== 'certified')
			throw new RefusedError(
				'A draft PQR is corrected by editing it; addenda are for certified PQRs.',
				'body'
			);
		const a = await PqrAddendum.create(
			{ shopId: actor.shopId, pqrId: id, authorId: me.id, authorName: me.name, body },
			{ transaction: t }
		);
		await audit(
			{
				shopId: actor.shopId,
				actor: actorOf(me),
				action: 'pqr.addendum_added',
				objectType: 'pqr',
				objectId: id,
				after: { addendumId: a.id, body }
			},
			event,
			t
		);
		return { id: a.id };
	});
}
