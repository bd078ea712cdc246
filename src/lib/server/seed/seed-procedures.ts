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
				unitSystem: 'imperial'
			}
		: null;
}

const PQRS = [
	{
		number: 'PQR-001',
		title: 'GTAW A36 1/4 in plate, 3G',
		process: 'GTAW',
		currentType: 'DCEN',
		amps: '125',
		volts: '12',
		travelSpeed: '4',
		fillerClass: 'ER70S-6',
		fillerDiameter: '3/32',
		tungstenClass: 'EWLa-1.5',
		tungstenDiameter: '3/32',
		gasName: 'argon',
		gasFlow: '20',
		baseMetalSpec: 'A36',
		couponThickness: '1/4',
		testPosition: '3G',
		jointType: 'butt',
		weldedOn: '2025-02-03',
		welder: 'Tomas Whitlow',
		lab: 'Marrow Test Labs (invented)'
	},
	{
		number: 'PQR-002',
		title: 'GMAW A36 3/8 in plate, short-circuit, 3G',
		// WPS-002 follows D1.1, and so does the coupon behind it (issue 15).
		code: 'aws-d1.1',
		process: 'GMAW',
		currentType: 'DCEP',
		transfer: 'short-circuit',
		amps: '180',
		volts: '19.5',
		travelSpeed: '14',
		wireFeed: '290',
		fillerClass: 'ER70S-6',
		fillerDiameter: '0.035',
		gasName: '75/25',
		gasFlow: '30',
		baseMetalSpec: 'A36',
		couponThickness: '3/8',
		testPosition: '3G',
		jointType: 'butt',
		weldedOn: '2025-02-10',
		welder: 'Priya Venn',
		lab: 'Marrow Test Labs (invented)'
	},
	{
		number: 'PQR-003',
		title: 'GTAW 304 tube 0.065 in wall, 2G',
		process: 'GTAW',
		currentType: 'DCEN',
		amps: '55',
		volts: '10',
		travelSpeed: '5',
		fillerClass: 'ER308L',
		fillerDiameter: '1/16',
		tungstenClass: 'EWCe-2',
		tungstenDiameter: '0.040',
		gasName: 'argon',
		gasFlow: '18',
		baseMetalSpec: '304',
		couponThickness: '0.065',
		testPosition: '2G',
		jointType: 'pipe',
		weldedOn: '2025-03-03',
		welder: 'Tomas Whitlow',
		lab: 'Marrow Test Labs (invented)'
	},
	{
		number: 'PQR-004',
		title: 'GTAW 6061 1/8 in plate, AC, 1G',
		process: 'GTAW',
		currentType: 'AC',
		amps: '150',
		volts: '14',
		travelSpeed: '6',
		fillerClass: 'ER4043',
		fillerDiameter: '1/8',
		tungstenClass: 'EWLa-1.5',
		tungstenDiameter: '3/32',
		gasName: 'argon',
		gasFlow: '22',
		baseMetalSpec: '6061',
		couponThickness: '1/8',
		testPosition: '1G',
		jointType: 'butt',
		weldedOn: '2025-03-17',
		welder: 'Priya Venn',
		lab: 'Marrow Test Labs (invented)'
	}
] as const;

const TESTS = {
	visualResult: 'pass',
	bendResult: 'pass',
	bendNotes: '2 face, 2 root bends, no open defects',
	tensileResult: 'pass',
	tensile1: '72500',
	tensile2: '71800',
	macroResult: 'pass'
};

const GTAW_CS = {
	title: 'GTAW 1/8 in carbon steel fillet, 2F',
	code: 'aws-d1.1',
	codeEdition: '2020',
	process: 'GTAW',
	currentType: 'DCEN',
	ampsMin: '110',
	ampsMax: '130',
	voltsMin: '11',
	voltsMax: '13',
	tungstenClass: 'EWLa-1.5',
	tungstenDiameterMin: '3/32',
	tungstenDiameterMax: '3/32',
	jointTypes: ['tee'],
	jointDesign: 'Fillet, 1/8 in leg',
	baseMetalSpecs: 'A36',
	thicknessMin: '1/8',
	thicknessMax: '1/4',
	fillerClasses: 'ER70S-6',
	fillerDiameterMin: '3/32',
	fillerDiameterMax: '3/32',
	positions: ['1F', '2F'],
	gasName: 'argon',
	gasFlowMin: '15',
	gasFlowMax: '25',
	travelSpeedMin: '3',
	travelSpeedMax: '5',
	bead: 'stringer',
	passes: 'single',
	cleaning: 'Wire brush; acetone wipe'
};

const REVISIONS = {
	gtawCs: { ...GTAW_CS, ampsMin: '115', ampsMax: '135' },
	gmaw: {
		title: 'GMAW 3/16 in A36 T-joint, 0.035 in ER70S-6, 75/25',
		code: 'aws-d1.1',
		codeEdition: '2020',
		process: 'GMAW',
		currentType: 'DCEP',
		transfer: 'short-circuit',
		ampsMin: '170',
		ampsMax: '190',
		voltsMin: '19',
		voltsMax: '20',
		wireFeedMin: '270',
		wireFeedMax: '300',
		jointTypes: ['tee'],
		jointDesign: 'Fillet, 3/16 in leg',
		baseMetalSpecs: 'A36',
		thicknessMin: '3/16',
		thicknessMax: '3/8',
		fillerClasses: 'ER70S-6',
		fillerDiameterMin: '0.035',
		fillerDiameterMax: '0.035',
		positions: ['1F', '2F', '3F'],
		progression: 'uphill',
		gasName: '75/25',
		gasFlowMin: '25',
		gasFlowMax: '35',
		travelSpeedMin: '12',
		travelSpeedMax: '16',
		bead: 'stringer',
		passes: 'both'
	},
	gtawSs: {
		title: 'GTAW 304 stainless 16 ga tube, ER308L',
		code: 'asme-ix',
		codeEdition: '2021',
		process: 'GTAW',
		currentType: 'DCEN',
		ampsMin: '50',
		ampsMax: '65',
		voltsMin: '9',
		voltsMax: '11',
		tungstenClass: 'EWCe-2',
		tungstenDiameterMin: '0.040',
		tungstenDiameterMax: '1/16',
		jointTypes: ['pipe'],
		baseMetalSpecs: '304',
		thicknessMin: '0.065',
		thicknessMax: '0.065',
		fillerClasses: 'ER308L',
		fillerDiameterMin: '1/16',
		fillerDiameterMax: '1/16',
		positions: ['1G', '2G'],
		gasName: 'argon',
		gasFlowMin: '15',
		gasFlowMax: '20',
		backingGas: 'argon purge',
		interpassMax: '350'
	},
	gtawAl: {
		title: 'GTAW 6061 aluminium 1/8 in, AC, ER4043',
		code: 'aws-d1.1',
		process: 'GTAW',
		currentType: 'AC',
		ampsMin: '140',
		ampsMax: '175',
		voltsMin: '13',
		voltsMax: '15',
		tungstenClass: 'EWLa-1.5',
		tungstenDiameterMin: '3/32',
		tungstenDiameterMax: '3/32',
		jointTypes: ['butt'],
		baseMetalSpecs: '6061',
		thicknessMin: '1/8',
		thicknessMax: '1/8',
		fillerClasses: 'ER4043',
		fillerDiameterMin: '1/8',
		fillerDiameterMax: '1/8',
		positions: ['1G'],
		gasName: 'argon',
		gasFlowMin: '20',
		gasFlowMax: '25'
	}
};

/** Idempotent: a shop that has any procedure already is left as it is. */
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
