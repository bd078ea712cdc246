// The demo shop's procedures and PQRs, in every state: approved and superseded (GTAW carbon
// steel fillet), approved with a newer revision in review (GMAW T-joint), a draft returned with
// comments (GTAW 304 tube), and withdrawn (GTAW 6061). Made through the services, so digests,
// sign-offs and the audit trail are what the app itself would write. Invented data.
import { Op } from 'sequelize';
import { pqrFormSchema } from '$lib/schemas/pqr';
import { revisionFormSchema } from '$lib/schemas/procedure';
import type { SessionUser } from '../auth/session-user';
import { Procedure, SettingsRecord, type Shop, User } from '../models';
import * as P from '../procedures';
import { certifyPqr, createPqr } from '../pqrs';
import { DEMO_PEOPLE } from './demo-people';
import { GTAW_CS, PQRS, REVISIONS, TESTS } from './seed-procedures-data';

const quiet = { notify: false };

export async function member(email: string, shop: Shop): Promise<SessionUser | null> {
	const u = await User.findOne({ where: { email, shopId: shop.id } });
	return u
		? {
				id: u.id,
				shopId: shop.id,
				shopName: shop.name,
				name: u.name,
				email: u.email,
				role: u.role,
				unitSystem: 'imperial',
				timeZone: shop.timeZone
			}
		: null;
}

export async function seedProcedures(shop: Shop): Promise<number> {
	if ((await Procedure.count({ where: { shopId: shop.id } })) > 0) return 0;
	const reuben = await member('reuben@larkspur.example', shop);
	const mirela = await member('mirela@larkspur.example', shop);
	const password = DEMO_PEOPLE.find((p) => p.email === 'mirela@larkspur.example')?.password;
	if (!reuben || !mirela || !password) return 0;

	const pqr: Record<string, number> = {};
	for (const p of PQRS) {
		const { id } = await createPqr(reuben, pqrFormSchema.parse({ ...p, ...TESTS }));
		await certifyPqr(reuben, id);
		pqr[p.number] = id;
	}
	// Bench records of the same work, when the records seed has made them.
	const cite = async (process: string, spec: string, amps: [number, number]) =>
		(
			await SettingsRecord.findAll({
				where: {
					shopId: shop.id,
					process,
					baseMetalSpec: spec,
					amps: { [Op.between]: amps },
					outcomeKind: 'sound'
				},
				order: [['id', 'ASC']],
				limit: 3
			})
		)
			.map((r) => r.id)
			.join(', ');

	const make = async (
		number: string,
		form: Record<string, unknown>,
		pqrIds: number[],
		records: string
	) => {
		const f = revisionFormSchema.parse({ units: 'imperial', ...form, pqrIds, recordIds: records });
		const { id } = await P.createProcedure(reuben, {
			number,
			title: f.title,
			code: f.code,
			process: f.process,
			recordIds: []
		});
		await P.updateDraft(reuben, id, 1, f);
		return { id, f };
	};
	const approve = (id: number, rev: number, comment = '') =>
		P.approveRevision(mirela, id, rev, { password, comment }, null, quiet);
	const submit = (id: number, rev: number) => P.submitRevision(reuben, id, rev, null, quiet);

	// WPS-001: revision 1 approved, then superseded by revision 2 (amps moved up 5 A).
	const one = await make(
		'WPS-001',
		GTAW_CS,
		[pqr['PQR-001']!],
		await cite('GTAW', 'A36', [110, 135])
	);
	await submit(one.id, 1);
	await approve(one.id, 1, 'Matches PQR-001.');
	await P.startRevision(reuben, one.id);
	await P.updateDraft(
		reuben,
		one.id,
		2,
		revisionFormSchema.parse({
			...one.f,
			...REVISIONS.gtawCs,
			units: 'imperial',
			recordIds: one.f.recordIds
		})
	);
	await submit(one.id, 2);
	await approve(one.id, 2, 'Range moved to what the bench runs; still within 25 % of PQR-001.');

	// WPS-002: revision 1 approved; revision 2 (wider volts) waits in review.
	const two = await make(
		'WPS-002',
		REVISIONS.gmaw,
		[pqr['PQR-002']!],
		await cite('GMAW', 'A36', [170, 190])
	);
	await submit(two.id, 1);
	await approve(two.id, 1);
	await P.startRevision(reuben, two.id);
	await P.updateDraft(
		reuben,
		two.id,
		2,
		revisionFormSchema.parse({ ...two.f, voltsMin: '18', voltsMax: '22', units: 'imperial' })
	);
	await submit(two.id, 2);

	// WPS-003: a draft, returned once with the inspector's comments.
	const three = await make(
		'WPS-003',
		REVISIONS.gtawSs,
		[pqr['PQR-003']!],
		await cite('GTAW', '304', [50, 65])
	);
	await submit(three.id, 1);
	await P.returnRevision(
		mirela,
		three.id,
		1,
		{ comment: 'Give the purge flow and the travel speed range before I sign.' },
		null,
		quiet
	);

	// WPS-004: approved, then withdrawn.
	const four = await make('WPS-004', REVISIONS.gtawAl, [pqr['PQR-004']!], '');
	await submit(four.id, 1);
	await approve(four.id, 1);
	await P.withdrawRevision(reuben, four.id, 1, 'The ramp job moved to a bought-in part.');
	return 4;
}
