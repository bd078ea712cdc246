import { hashPassword } from '../auth/password';
import { write } from '../db/write-queue';
import { Shop, User } from '../models';
import { DEMO_PEOPLE, DEMO_SHOP, OTHER_PEOPLE, OTHER_SHOP, type DemoPerson } from './demo-people';
import { seedWelders } from './seed-welders';
import { seedProcedures } from './seed-procedures';
import { seedIsoPqr, seedIsoProcedure } from './seed-iso';
import { seedRecords } from './seed-records';
import { seedJobs } from './seed-jobs';

async function seedShop(name: string, people: DemoPerson[]): Promise<Shop> {
	const hashes = await Promise.all(people.map((p) => hashPassword(p.password)));
	return write(async (t) => {
		const [shop] = await Shop.findOrCreate({ where: { name }, defaults: { name }, transaction: t });
		for (const [i, p] of people.entries()) {
			const existing = await User.findOne({ where: { email: p.email }, transaction: t });
			if (existing) continue;
			await User.create(
				{
					shopId: shop.id,
					name: p.name,
					email: p.email,
					role: p.role,
					passwordHash: hashes[i] ?? null,
					emailVerified: new Date()
				},
				{ transaction: t }
			);
		}
		return shop;
	});
}

/**
 * Idempotent: running it again adds what is missing and changes nothing already there. Later
 * features add their demo data through `extraSeeds`.
 */
export async function seedDemo(): Promise<{ shop: Shop; other: Shop }> {
	const shop = await seedShop(DEMO_SHOP, DEMO_PEOPLE);
	const other = await seedShop(OTHER_SHOP, OTHER_PEOPLE);
	await seedWelders(shop);
	await seedRecords(shop);
	await seedProcedures(shop);
	await seedIsoPqr(shop);
	await seedIsoProcedure(shop);
	await seedJobs(shop);
	return { shop, other };
}
