// Demo welders of the invented shop, with qualifications in every state relative to the day the
// seed runs: current, lapsing within a week (Priya Venn's GMAW, for the reminder job), lapsed,
// withdrawn (Jun Halloran's SMAW) and an ISO 9606-1 one kept current by a six-monthly
// confirmation (Arlo Brandt's GMAW). Idempotent: a welder whose stamp exists is left as it is;
// the two extras are added once each by their own key, also to welders seeded before them.
import type { InferCreationAttributes } from 'sequelize';
import { addCalendarMonths, formatDate, parseDate } from '$lib/weld/continuity';
import { write } from '../db/write-queue';
import { ContinuityEntry, Qualification, User, Welder, type Shop } from '../models';
import { recordConfirmation } from '../welders/continuity';
import { addDays, localDay } from '../welders/dates';
import { withdrawQualification } from '../welders/qualifications';

type Q = Omit<
	InferCreationAttributes<Qualification>,
	| 'id'
	| 'shopId'
	| 'welderId'
	| 'createdById'
	| 'recordKey'
	| 'recordName'
	| 'withdrawnAt'
	| 'createdAt'
	| 'updatedAt'
>;

interface DemoWelder {
	name: string;
	stamp: string;
	email?: string;
	/** The demo account to link, by e-mail. */
	account?: string;
	qualifications: Q[];
	/** [process, days ago] of logged uses. */
	uses: [string, number][];
}

const IN = 25.4;
/** The test date whose six months end `days` from today (clamped month ends land earlier). */
function lapsingIn(today: string, days: number): string {
	const target = parseDate(addDays(today, days))!;
	return formatDate(addCalendarMonths(target, -6));
}

const plate = (
	process: 'GTAW' | 'GMAW' | 'FCAW' | 'SMAW',
	positions: string,
	testDate: string,
	extra: Partial<Q> = {}
): Q => ({
	process,
	code: 'ASME IX',
	testDate,
	wpsRef: process === 'GTAW' ? 'WPS-GT-01' : 'WPS-GM-03',
	testPositions: positions,
	couponType: 'plate',
	couponDiameterMm: null,
	couponThicknessMm: 0.375 * IN,
	depositThicknessMm: 0.375 * IN,
	depositLayers: 3,
	lengthUnit: 'in',
	fNumber: 6,
	fillerClass: process === 'SMAW' ? 'E7018' : 'ER70S-6',
	backing: 'with',
	currentType: process === 'GTAW' ? 'DCEN' : 'DCEP',
	results: 'Visual acceptable; 2 face and 2 root bends acceptable',
	witnessedBy: 'Mirela Sand',
	...extra
});

function demo(today: string): DemoWelder[] {
	return [
		{
			name: 'Tomas Whitlow',
			stamp: 'LTR-07',
			account: 'tomas@larkspur.example',
			qualifications: [
				plate('GTAW', '3G', addDays(today, -400)),
				plate('GMAW', '2G', addDays(today, -90))
			],
			uses: [
				['GTAW', 12],
				['GTAW', 60],
				['GMAW', 20]
			]
		},
		{
			name: 'Priya Venn',
			stamp: 'LTR-11',
			account: 'priya@larkspur.example',
			qualifications: [
				plate('GMAW', '3G', lapsingIn(today, 5)),
				plate('GTAW', '2G', addDays(today, -30))
			],
			uses: []
		},
		{
			name: 'Arlo Brandt',
			stamp: 'LTR-14',
			email: 'arlo.brandt@larkspur.example',
			qualifications: [
				plate('SMAW', '4G', addDays(today, -300), { fNumber: 4 }),
				plate('FCAW', '3G', addDays(today, -250), { fillerClass: 'E71T-1C' })
			],
			uses: [['SMAW', 210]]
		},
		{
			name: 'Jun Halloran',
			stamp: 'LTR-19',
			qualifications: [
				{
					...plate('GTAW', '6G', addDays(today, -45)),
					couponType: 'pipe',
					couponDiameterMm: 2.375 * IN,
					couponThicknessMm: 0.154 * IN,
					depositThicknessMm: 0.154 * IN,
					depositLayers: 2,
					wpsRef: 'WPS-GT-04'
				}
			],
			uses: [['GTAW', 3]]
		}
	];
}

/**
 * The two states the app reaches only through an action, made through the services so the
 * audit trail says what the app would: a withdrawn SMAW (a failed production weld) and an
 * ISO 9606-1 GMAW whose six months run from its confirmation. Each is added once, keyed by the
 * welder's stamp and the process and code.
 */
const EXTRAS = (today: string) => [
	{
		stamp: 'LTR-19',
		qualification: plate('SMAW', '2G', addDays(today, -120), {
			fNumber: 4,
			wpsRef: 'WPS-SM-02'
		}),
		withdraw: 'Demo: a production weld failed visual inspection; to be retested'
	},
	{
		stamp: 'LTR-14',
		qualification: plate('GMAW', '3G', addDays(today, -250), {
			code: 'ISO 9606-1',
			lengthUnit: 'mm',
			couponThicknessMm: 10,
			depositThicknessMm: 10,
			results: 'Visual and macro acceptable; fracture test acceptable',
			wpsRef: 'WPS-GM-07'
		}),
		// Within the first six months, so the qualification never lapsed (ISO 9606-1 9.2).
		confirmedOn: addDays(today, -70)
	}
];

async function seedExtras(shop: Shop, admin: User, today: string): Promise<void> {
	const actor = {
		id: admin.id,
		shopId: shop.id,
		shopName: shop.name,
		name: admin.name,
		email: admin.email,
		role: admin.role,
		unitSystem: 'imperial' as const,
		timeZone: shop.timeZone
	};
	for (const x of EXTRAS(today)) {
		const created = await write(async (t) => {
			const w = await Welder.findOne({
				where: { shopId: shop.id, stamp: x.stamp },
				transaction: t
			});
			if (!w) return null;
			const { process, code } = x.qualification;
			const where = { shopId: shop.id, welderId: w.id, process, code };
			if (await Qualification.findOne({ where, transaction: t })) return null;
			const q = await Qualification.create(
				{ ...x.qualification, shopId: shop.id, welderId: w.id, createdById: admin.id },
				{ transaction: t }
			);
			return { welderId: w.id, qualificationId: q.id };
		});
		if (!created) continue;
		if (x.withdraw)
			await withdrawQualification(actor, created.welderId, {
				qualificationId: created.qualificationId,
				reason: x.withdraw
			});
		if (x.confirmedOn)
			await recordConfirmation(actor, created.welderId, {
				qualificationId: created.qualificationId,
				confirmedOn: x.confirmedOn,
				responsiblePerson: 'Reuben Castell',
				note: 'Demo: production welds reviewed'
			});
	}
}

export async function seedWelders(shop: Shop, now: Date = new Date()): Promise<void> {
	const today = localDay(now, shop.timeZone);
	const admin = await User.findOne({
		where: { shopId: shop.id, role: 'admin' },
		order: [['createdAt', 'ASC']]
	});
	if (!admin) return;
	await write(async (t) => {
		for (const d of demo(today)) {
			if (await Welder.findOne({ where: { shopId: shop.id, stamp: d.stamp }, transaction: t }))
				continue;
			const user = d.account
				? await User.findOne({ where: { email: d.account, shopId: shop.id }, transaction: t })
				: null;
			const w = await Welder.create(
				{
					shopId: shop.id,
					name: d.name,
					stamp: d.stamp,
					email: d.email ?? null,
					userId: user?.id ?? null
				},
				{ transaction: t }
			);
			for (const q of d.qualifications)
				await Qualification.create(
					{ ...q, shopId: shop.id, welderId: w.id, createdById: admin.id },
					{ transaction: t }
				);
			for (const [process, ago] of d.uses)
				await ContinuityEntry.create(
					{
						shopId: shop.id,
						welderId: w.id,
						process: process as Q['process'],
						usedOn: addDays(today, -ago),
						source: 'manual',
						note: 'Demo: shop floor job',
						recordedById: admin.id,
						recordedByName: admin.name
					},
					{ transaction: t }
				);
		}
	});
	await seedExtras(shop, admin, today);
}
