import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

const dir = mkdtempSync(join(tmpdir(), 'beadline-welders-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const { newShop, addMember } = await import('../people/test-support');
const { qualificationSchema } = await import('$lib/schemas/welder');
const { createWelder, updateWelder } = await import('./welders');
const { addQualification, withdrawQualification } = await import('./qualifications');
const { AuditEvent } = await import('../models');
const { recordContinuity, recordConfirmation } = await import('./continuity');
const { welderView } = await import('./read');
const { overviewRows, overviewCsv } = await import('./overview');
const { liveLink, revokeLinks, resolveToken } = await import('./verification');
const { matchWelders } = await import('./procedure-match');
const { localDay, addDays } = await import('./dates');

type Shop = Awaited<ReturnType<typeof newShop>>;
let shop: Shop;
let other: Shop;
let engineer: Awaited<ReturnType<typeof addMember>>;
let welderUser: Awaited<ReturnType<typeof addMember>>;
const today = localDay();

const qual = (over: Record<string, unknown> = {}) =>
	qualificationSchema.parse({
		process: 'GTAW',
		code: 'ASME IX',
		testDate: addDays(today, -30),
		testPositions: ['3G'],
		couponType: 'plate',
		couponThickness: '3/8',
		depositThickness: '3/8',
		fillerClass: 'ER70S-2',
		...over
	});

beforeAll(async () => {
	shop = await newShop('Welder Test Works');
	other = await newShop('Other Test Works');
	engineer = await addMember(shop.shopId, 'engineer');
	welderUser = await addMember(shop.shopId, 'welder', 'Nell Carver');
});

describe('welders', () => {
	it('keeps the stamp unique in the shop, not across shops', async () => {
		await createWelder(shop.admin, {
			name: 'A',
			stamp: 'S-1',
			email: '',
			userId: '',
			active: true
		});
		await expect(
			createWelder(shop.admin, { name: 'B', stamp: 'S-1', email: '', userId: '', active: true })
		).rejects.toMatchObject({ field: 'stamp' });
		await expect(
			createWelder(other.admin, { name: 'B', stamp: 'S-1', email: '', userId: '', active: true })
		).resolves.toMatchObject({ stamp: 'S-1' });
	});
	it('links one account to one welder, and only an account of the shop', async () => {
		const w = await createWelder(shop.admin, {
			name: 'Nell Carver',
			stamp: 'S-2',
			email: '',
			userId: welderUser.id,
			active: true
		});
		expect(w.userId).toBe(welderUser.id);
		await expect(
			createWelder(shop.admin, {
				name: 'X',
				stamp: 'S-3',
				email: '',
				userId: welderUser.id,
				active: true
			})
		).rejects.toMatchObject({ field: 'userId' });
		await expect(
			createWelder(other.admin, {
				name: 'X',
				stamp: 'S-4',
				email: '',
				userId: welderUser.id,
				active: true
			})
		).rejects.toMatchObject({ field: 'userId' });
	});
	it("another shop's welder is not found", async () => {
		const w = await createWelder(shop.admin, {
			name: 'C',
			stamp: 'S-5',
			email: '',
			userId: '',
			active: true
		});
		await expect(welderView(other.shopId, w.id, today)).rejects.toMatchObject({
			name: 'NotFoundError'
		});
		await expect(
			updateWelder(other.admin, w.id, {
				name: 'Z',
				stamp: 'Z',
				email: '',
				userId: '',
				active: true
			})
		).rejects.toMatchObject({ name: 'NotFoundError' });
	});
});

describe('qualifications and continuity', () => {
	it('stores the test, derives the F-Number from the filler and computes ranges', async () => {
		const w = await createWelder(engineer, {
			name: 'D',
			stamp: 'S-6',
			email: '',
			userId: '',
			active: true
		});
		await addQualification(engineer, w.id, qual(), null);
		const v = await welderView(shop.shopId, w.id, today);
		const q = v.qualifications[0]!;
		expect(q.fNumber).toBe(6); // ASME IX QW-432: A5.18 ER70S-x is F-6
		expect(q.ranges.groove).toEqual(['F', 'V']); // ASME IX QW-461.9, 3G
		expect(q.ranges.fillet).toEqual(['F', 'H', 'V']); // ASME IX QW-461.9, 3G
		expect(q.ranges.depositMaxMm! / 25.4).toBeCloseTo(0.75, 9); // ASME IX QW-452.1(b): 2t
		expect(q.status.state).toBe('current');
	});
	it('refuses a test record that is not a PDF, by content', async () => {
		const w = await createWelder(engineer, {
			name: 'E',
			stamp: 'S-7',
			email: '',
			userId: '',
			active: true
		});
		await expect(
			addQualification(engineer, w.id, qual(), {
				name: 'x.pdf',
				bytes: new TextEncoder().encode('hello')
			})
		).rejects.toMatchObject({ field: 'record' });
		const pdf = new TextEncoder().encode('%PDF-1.4\n%%EOF\n');
		await expect(
			addQualification(engineer, w.id, qual(), { name: 'test.pdf', bytes: pdf })
		).resolves.toMatchObject({ id: expect.any(Number) });
	});
	it('recordContinuity: once a day, moves the lapse date, booth only for the welder', async () => {
		const w = await createWelder(shop.admin, {
			name: 'F',
			stamp: 'S-8',
			email: '',
			userId: (await addMember(shop.shopId, 'welder', 'F')).id,
			active: true
		});
		const testDate = addDays(today, -40);
		await addQualification(shop.admin, w.id, qual({ testDate }), null);
		const before = (await welderView(shop.shopId, w.id, today)).qualifications[0]!.status;
		const tap = {
			shopId: shop.shopId,
			userId: w.userId!,
			process: 'GTAW' as const,
			source: 'booth' as const,
			actor: { id: w.userId! }
		};
		const [a, b] = await Promise.all([recordContinuity(tap), recordContinuity(tap)]);
		expect([a.created, b.created].sort()).toEqual([false, true]);
		expect(a.id).toBe(b.id);
		const after = (await welderView(shop.shopId, w.id, today)).qualifications[0]!.status;
		expect(after.lastActivity).toBe(today);
		expect(after.lapsesOn > before.lapsesOn).toBe(true);
		// someone else cannot tap for this welder; manual needs an engineer or admin and a note
		await expect(recordContinuity({ ...tap, actor: { id: engineer.id } })).rejects.toMatchObject({
			name: 'ForbiddenError'
		});
		const manual = {
			shopId: shop.shopId,
			welderId: w.id,
			process: 'GTAW' as const,
			source: 'manual' as const
		};
		await expect(
			recordContinuity({
				...manual,
				date: addDays(today, -2),
				actor: { id: w.userId! },
				note: 'job 12'
			})
		).rejects.toMatchObject({ name: 'ForbiddenError' });
		await expect(
			recordContinuity({ ...manual, date: addDays(today, -2), actor: { id: engineer.id } })
		).rejects.toMatchObject({ field: 'note' });
		await expect(
			recordContinuity({
				...manual,
				date: addDays(today, 2),
				actor: { id: engineer.id },
				note: 'x'
			})
		).rejects.toMatchObject({ field: 'usedOn' });
		await expect(
			recordContinuity({
				...manual,
				shopId: other.shopId,
				actor: { id: other.admin.id },
				note: 'x'
			})
		).rejects.toMatchObject({ name: 'NotFoundError' });
		const m = await recordContinuity({
			...manual,
			date: addDays(today, -2),
			actor: { id: engineer.id },
			note: 'job 12'
		});
		expect(m).toMatchObject({ created: true, source: 'manual' });
	});
	it('ISO 9606-1 confirmations restart the six months for ISO qualifications only', async () => {
		const w = await createWelder(shop.admin, {
			name: 'G',
			stamp: 'S-9',
			email: '',
			userId: '',
			active: true
		});
		const { id } = await addQualification(
			shop.admin,
			w.id,
			qual({ code: 'ISO 9606-1', testDate: addDays(today, -100) }),
			null
		);
		const on = addDays(today, -1);
		await recordConfirmation(shop.admin, w.id, {
			qualificationId: id,
			confirmedOn: on,
			responsiblePerson: 'Dana Okafor',
			note: ''
		});
		const q = (await welderView(shop.shopId, w.id, today)).qualifications[0]!;
		expect(q.status).toMatchObject({ basis: 'confirmation', lastActivity: on });
		const asme = await addQualification(shop.admin, w.id, qual(), null);
		await expect(
			recordConfirmation(shop.admin, w.id, {
				qualificationId: asme.id,
				confirmedOn: on,
				responsiblePerson: 'Dana',
				note: ''
			})
		).rejects.toMatchObject({ field: 'qualificationId' });
	});
});

describe('withdrawing a qualification', () => {
	it('shows it withdrawn, audits the reason, refuses twice, welders and other shops', async () => {
		const w = await createWelder(engineer, {
			name: 'H',
			stamp: 'S-WD1',
			email: '',
			userId: '',
			active: true
		});
		const { id } = await addQualification(engineer, w.id, qual(), null);
		const input = { qualificationId: id, reason: 'Failed the bend retest.' };
		await expect(withdrawQualification(welderUser, w.id, input)).rejects.toMatchObject({
			name: 'ForbiddenError'
		});
		await expect(withdrawQualification(other.admin, w.id, input)).rejects.toMatchObject({
			name: 'NotFoundError'
		});
		await withdrawQualification(engineer, w.id, input);
		const q = (await welderView(shop.shopId, w.id, today)).qualifications[0]!;
		expect(q.status.state).toBe('withdrawn');
		const trail = await AuditEvent.findOne({
			where: { action: 'qualification.withdrawn', objectId: String(id) }
		});
		expect(JSON.parse(String(trail!.after))).toMatchObject({ reason: 'Failed the bend retest.' });
		await expect(withdrawQualification(engineer, w.id, input)).rejects.toMatchObject({
			field: 'qualificationId'
		});
	});
});

describe('overview, links and procedure match', () => {
	it('sorts by soonest lapse, filters and exports CSV', async () => {
		const w = await createWelder(shop.admin, {
			name: 'Soon',
			stamp: 'S-10',
			email: '',
			userId: '',
			active: true
		});
		await addQualification(
			shop.admin,
			w.id,
			qual({ process: 'SMAW', testDate: addDays(today, -175) }),
			null
		);
		const rows = await overviewRows(shop.shopId, today, { q: '', process: '', status: '' });
		expect(rows[0]).toMatchObject({ name: 'Soon', process: 'SMAW', state: 'current' });
		expect(rows[0]!.daysLeft).toBeLessThan(10);
		const smaw = await overviewRows(shop.shopId, today, {
			q: 's-10',
			process: 'SMAW',
			status: 'due'
		});
		expect(smaw).toHaveLength(1);
		const csv = overviewCsv(smaw);
		expect(csv.split('\r\n')[1]).toMatch(/^Soon,S-10,SMAW,ASME IX,3G,/);
	});
	it('verification links are unguessable, stable until revoked, and reissued after', async () => {
		const w = await createWelder(shop.admin, {
			name: 'H',
			stamp: 'S-11',
			email: '',
			userId: '',
			active: true
		});
		const a = await liveLink(shop.admin, w.id);
		expect(a.token).toMatch(/^[A-Za-z0-9_-]{24}$/); // 18 random bytes = 144 bits
		expect((await liveLink(shop.admin, w.id)).token).toBe(a.token);
		expect(await revokeLinks(shop.admin, w.id)).toBe(1);
		expect((await resolveToken(a.token))?.revokedAt).toBeInstanceOf(Date);
		const b = await liveLink(shop.admin, w.id);
		expect(b.token).not.toBe(a.token);
		expect(await resolveToken('not-a-token')).toBeNull();
		await expect(revokeLinks(other.admin, w.id)).rejects.toMatchObject({ name: 'NotFoundError' });
	});
	it('matches welders to a procedure by status, positions, thickness and F-Number', async () => {
		const w = await createWelder(shop.admin, {
			name: 'Match',
			stamp: 'S-12',
			email: '',
			userId: '',
			active: true
		});
		await addQualification(
			shop.admin,
			w.id,
			qual({ process: 'FCAW', fillerClass: 'E71T-1C' }),
			null
		);
		const v = await welderView(shop.shopId, w.id, today);
		const base = { process: 'FCAW', positions: ['3G'], thicknessMm: { max: 12 }, fNumber: 6 };
		expect(matchWelders(base, [v])[0]).toMatchObject({ qualified: true });
		expect(matchWelders({ ...base, positions: ['4G'] }, [v])[0]!.qualified).toBe(false); // QW-461.9: 3G has no O
		expect(matchWelders({ ...base, thicknessMm: { max: 25 } }, [v])[0]!.qualified).toBe(false); // QW-452.1(b): 2t = 19 mm
		expect(matchWelders({ ...base, joint: 'fillet', positions: ['2F'] }, [v])[0]!.qualified).toBe(
			true
		);
		expect(matchWelders({ ...base, process: 'GMAW' }, [v])[0]!.checks[0]!.what).toBe('process');
		// A WPS listing fillet and groove positions: each is checked against its own range.
		expect(matchWelders({ ...base, positions: ['2F', '3G'] }, [v])[0]!.qualified).toBe(true); // QW-461.9: 3G fillet F, H, V
		expect(matchWelders({ ...base, positions: ['4F'] }, [v])[0]!.qualified).toBe(false); // QW-461.9: 3G has no fillet O
	});
});
