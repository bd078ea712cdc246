// The bench's starting data, made through the app's own services (so it is what the product
// writes): migrations, the demo shops, a draft procedure to clone, an approved revision for the
// booth view and the sheet, and an API token for the checks API. Import after DATABASE_FILE is set.
import { DEMO_PEOPLE } from '../../src/lib/server/seed/demo-people';
import type { SessionUser } from '../../src/lib/server/auth/session-user';

export interface BenchFixture {
	shopId: number;
	token: string;
	template: { procedureId: number };
	approved: { procedureId: number; rev: number };
}

export const benchPerson = (role: string) => {
	const p = DEMO_PEOPLE.find((x) => x.role === role);
	if (!p) throw new Error(`No demo ${role}`);
	return p;
};

export async function prepareBench(): Promise<BenchFixture> {
	const { migrate, sequelize } = await import('../../src/lib/server/db');
	const { seedDemo } = await import('../../src/lib/server/seed/seed-demo');
	const { Shop, User, SettingsRecord } = await import('../../src/lib/server/models');
	const procedures = await import('../../src/lib/server/procedures');
	const { createApiToken } = await import('../../src/lib/server/api/api-tokens');

	await migrate();
	const { shop } = await seedDemo();
	const as = async (role: string): Promise<SessionUser> => {
		const u = await User.findOne({
			where: { email: benchPerson(role).email },
			rejectOnEmpty: true
		});
		const s = await Shop.findByPk(u.shopId, { rejectOnEmpty: true });
		return {
			id: u.id,
			shopId: s.id,
			shopName: s.name,
			name: u.name,
			email: u.email,
			role: u.role,
			unitSystem: u.unitSystem ?? s.unitSystem,
			timeZone: s.timeZone
		};
	};
	const [admin, engineer, inspector] = await Promise.all(
		['admin', 'engineer', 'inspector'].map(as)
	);
	const records = await SettingsRecord.findAll({
		where: { shopId: shop.id, process: 'GTAW' },
		limit: 3,
		order: [['id', 'ASC']]
	});
	const draft = await procedures.createProcedure(engineer!, {
		number: 'BENCH-TEMPLATE',
		title: 'GTAW 1/8 in carbon steel fillet (bench template)',
		code: 'aws-d1.1',
		process: 'GTAW',
		recordIds: records.map((r) => r.id)
	});
	const signed = await procedures.createProcedure(engineer!, {
		number: 'BENCH-BOOTH',
		title: 'GTAW 1/8 in carbon steel fillet 2F (bench booth)',
		code: 'aws-d1.1',
		process: 'GTAW',
		recordIds: records.map((r) => r.id)
	});
	await procedures.submitRevision(engineer!, signed.id, 1, null, { notify: false });
	await procedures.approveRevision(
		inspector!,
		signed.id,
		1,
		{ password: benchPerson('inspector').password, comment: 'Bench sign-off' },
		null,
		{ notify: false }
	);
	const { secret } = await createApiToken(admin!, { name: 'bench', role: 'engineer' }, null);
	await sequelize.close();
	return {
		shopId: shop.id,
		token: secret,
		template: { procedureId: draft.id },
		approved: { procedureId: signed.id, rev: 1 }
	};
}
