// Helpers for the procedure and PQR services' tests only. Import after DATABASE_FILE is set.
import { hashPassword } from '../auth/password';
import { migrate } from '../db';
import { sequelize } from '../db/sequelize';
import { AuditEvent, ProcedureRevision, User } from '../models';
import { asSessionUser, newShop, uniqueEmail } from '../people/test-support';
import type { PqrForm } from '$lib/schemas/pqr';
import { pqrFormSchema } from '$lib/schemas/pqr';
import { revisionFormSchema, type RevisionForm } from '$lib/schemas/procedure';
import { createProcedure, submitRevision, updateDraft } from './index';

export const PASSWORD = 'signing password 42';

let hash: Promise<string> | undefined;

/** A member with a known password (PASSWORD). */
export async function member(
	shopId: number,
	role: 'engineer' | 'inspector' | 'welder' | 'admin',
	name?: string
) {
	const u = await User.create({
		shopId,
		name: name ?? `${role} ${Math.random().toString(36).slice(2, 6)}`,
		email: uniqueEmail(role),
		emailVerified: null,
		role,
		passwordHash: await (hash ??= hashPassword(PASSWORD))
	});
	return asSessionUser(u.id);
}

export async function shopWithPeople(name: string) {
	await migrate();
	const { admin, shopId } = await newShop(name);
	const [engineer, inspector, inspector2, welder] = await Promise.all([
		member(shopId, 'engineer', `${name} Engineer`),
		member(shopId, 'inspector', `${name} Inspector`),
		member(shopId, 'inspector', `${name} Second Inspector`),
		member(shopId, 'welder')
	]);
	return { shopId, admin, engineer, inspector, inspector2, welder };
}

export const revisionForm = (
	over: Partial<Record<keyof RevisionForm, unknown>> = {}
): RevisionForm =>
	revisionFormSchema.parse({
		title: 'GTAW carbon steel fillet',
		code: 'aws-d1.1',
		process: 'GTAW',
		currentType: 'DCEN',
		ampsMin: '115',
		ampsMax: '135',
		thicknessMin: '1/8',
		thicknessMax: '1/4',
		baseMetalSpecs: 'A36',
		fillerClasses: 'ER70S-6',
		fillerDiameterMin: '3/32',
		fillerDiameterMax: '3/32',
		positions: ['2F'],
		gasName: 'argon',
		gasFlowMin: '15',
		gasFlowMax: '20',
		...over
	});

export const pqrForm = (over: Partial<Record<keyof PqrForm, unknown>> = {}): PqrForm =>
	pqrFormSchema.parse({
		number: `PQR-${Math.random().toString(36).slice(2, 7)}`,
		title: 'GTAW A36 coupon',
		process: 'GTAW',
		currentType: 'DCEN',
		amps: '125',
		volts: '12',
		fillerClass: 'ER70S-6',
		fillerDiameter: '3/32',
		baseMetalSpec: 'A36',
		couponThickness: '1/4',
		testPosition: '3G',
		visualResult: 'pass',
		bendResult: 'pass',
		tensileResult: 'pass',
		tensile1: '72500',
		tensile2: '71800',
		...over
	});

type People = Awaited<ReturnType<typeof shopWithPeople>>;

/** A GTAW procedure of the shop with revision 1 filled in as a draft. */
export async function draftProcedure(people: People): Promise<number> {
	const { id } = await createProcedure(people.engineer, {
		number: `WPS-${Math.random().toString(36).slice(2, 7)}`,
		title: 'GTAW fillet',
		code: 'aws-d1.1',
		process: 'GTAW',
		recordIds: []
	});
	await updateDraft(people.engineer, id, 1, revisionForm());
	return id;
}

/** ... and submitted for review (no mail sent). */
export async function procedureInReview(people: People): Promise<number> {
	const id = await draftProcedure(people);
	await submitRevision(people.engineer, id, 1, null, { notify: false });
	return id;
}

export const revisionState = async (procedureId: number, rev: number) =>
	(await ProcedureRevision.findOne({ where: { procedureId, rev } }))?.state;

/**
 * Alters a stored revision behind the service's back (its amperage top 135 → 185), as a tamperer
 * with database access would, and counts the tamper events the trail then holds for it.
 */
export async function tamperWithRevision(revisionId: number) {
	await sequelize.query(
		`UPDATE procedure_revisions SET variables = replace(variables, '"max":135', '"max":185') WHERE id = ?`,
		{ replacements: [revisionId] }
	);
	return () =>
		AuditEvent.count({
			where: { objectId: String(revisionId), action: 'procedure_revision.tamper_detected' }
		});
}
