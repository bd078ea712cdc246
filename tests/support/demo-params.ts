// Values for the [params] of every route, read from a server's seeded demo data: one object of
// each kind in the demo shop (Larkspur), chosen so that its children belong to it (a revision
// of that procedure, a photo of that record). Another shop's member gets the same values.
import { openSqlite, type SqliteFile } from '../../scripts/lib/sqlite-file';

export const DEMO_SHOP = 'Larkspur Trailer & Rail';

export type Params = Record<string, string | number>;

/** What each first path segment's [id] means, and how to find one (plus its children). */
const BY_AREA: [RegExp, (db: SqliteFile, shop: number) => Promise<Params | undefined>][] = [
	[
		/^\/(api\/v1\/settings|records)\b/,
		async (db, shop) => {
			const withPhoto = await db.get<{ id: number; photo: number }>(
				`SELECT r.id, p.id AS photo FROM settings_records r JOIN settings_photos p ON p.record_id = r.id
				 WHERE r.shop_id = ? AND p.removed_at IS NULL ORDER BY r.id DESC LIMIT 1`,
				[shop]
			);
			if (withPhoto) return withPhoto;
			return db.get(
				'SELECT id FROM settings_records WHERE shop_id = ? AND frozen_at IS NULL ORDER BY id DESC LIMIT 1',
				[shop]
			);
		}
	],
	[
		/^\/(api\/v1\/)?procedures\b/,
		(db, shop) =>
			db.get(
				`SELECT p.id, r.rev FROM procedures p JOIN procedure_revisions r ON r.procedure_id = p.id
				 WHERE p.shop_id = ? ORDER BY (r.state = 'in-review') DESC, r.id DESC LIMIT 1`,
				[shop]
			)
	],
	[
		/^\/(api\/v1\/)?pqrs\b/,
		async (db, shop) =>
			(await db.get(
				`SELECT q.id, r.id AS report FROM pqrs q JOIN pqr_reports r ON r.pqr_id = q.id
				 WHERE q.shop_id = ? AND r.removed_at IS NULL LIMIT 1`,
				[shop]
			)) ?? db.get('SELECT id FROM pqrs WHERE shop_id = ? ORDER BY id LIMIT 1', [shop])
	],
	[
		/^\/(api\/v1\/)?welders\b/,
		async (db, shop) =>
			(await db.get(
				`SELECT w.id, q.id AS qid FROM welders w JOIN qualifications q ON q.welder_id = w.id
				 WHERE w.shop_id = ? ORDER BY (q.record_key IS NOT NULL) DESC, q.id LIMIT 1`,
				[shop]
			)) ?? db.get('SELECT id FROM welders WHERE shop_id = ? LIMIT 1', [shop])
	],
	[
		/^\/admin\/people\b/,
		// A welder's account: the actions on it (disable, role) harm no test that signs in.
		(db, shop) =>
			db.get("SELECT id FROM users WHERE shop_id = ? AND email = 'priya@larkspur.example'", [shop])
	],
	[
		/^\/q\b/,
		(db, shop) =>
			db.get(
				'SELECT token FROM verification_links WHERE shop_id = ? AND revoked_at IS NULL LIMIT 1',
				[shop]
			)
	],
	[
		/^\/(api\/v1\/booth|b)\b/,
		(db, shop) =>
			db.get(
				'SELECT token FROM booth_links WHERE shop_id = ? AND revoked_at IS NULL ORDER BY id DESC LIMIT 1',
				[shop]
			)
	],
	[
		/^\/(api\/v1\/)?jobs\b/,
		// The demo job has a drawing and W1's inspection a report (seed-jobs.ts).
		async (db, shop) => {
			const job = await db.get<{ id: number; joint: number }>(
				`SELECT j.id, x.id AS joint FROM jobs j LEFT JOIN job_joints x ON x.job_id = j.id
				 WHERE j.shop_id = ? ORDER BY (j.drawing_key IS NOT NULL) DESC, j.id, x.id LIMIT 1`,
				[shop]
			);
			const report = await db.get<{ inspection: number }>(
				`SELECT i.id AS inspection FROM joint_inspections i JOIN job_joints x ON x.id = i.joint_id
				 WHERE x.job_id = ? AND i.report_key IS NOT NULL LIMIT 1`,
				[job?.id ?? 0]
			);
			return job && { ...job, ...report };
		}
	],
	[
		/^\/verify\b/,
		(db, shop) =>
			db.get('SELECT token FROM data_books WHERE shop_id = ? ORDER BY id DESC LIMIT 1', [shop])
	],
	// Invite tokens are stored hashed: no live one can be read back, so a made-up one is used.
	[/^\/invite\b/, async () => ({ token: 'no-such-invite-token-0000000000000000' })]
];

/** Reads every area's values once; `paramsFor(pattern)` then fills a route. */
export async function demoParams(databaseFile: string): Promise<(pattern: string) => Params> {
	const db = await openSqlite(databaseFile, { readonly: true });
	const found: [RegExp, Params | undefined][] = [];
	try {
		const shop = await db.get<{ id: number }>('SELECT id FROM shops WHERE name = ?', [DEMO_SHOP]);
		if (!shop) throw new Error(`No ${DEMO_SHOP} in ${databaseFile}`);
		for (const [re, find] of BY_AREA) found.push([re, await find(db, shop.id)]);
	} finally {
		await db.close();
	}
	return (pattern) => found.find(([re]) => re.test(pattern))?.[1] ?? {};
}
