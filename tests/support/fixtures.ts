// Objects the demo seed does not make but some routes serve: a record photo, a PQR lab report, a
// welder's verification link and a job's data book (whose token the verification page takes). Made through the app as an engineer would, before the params of
// the routes are read (demo-params.ts).
import sharp from 'sharp';
import { openSqlite } from '../../scripts/lib/sqlite-file';
import { DEMO_SHOP } from './demo-params';

export const TINY_PDF = Buffer.from(
	'%PDF-1.4\n1 0 obj<</Type/Catalog>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n'
);

export async function makeFixtures(origin: string, engineerCookie: string, databaseFile: string) {
	const post = (path: string, body: FormData) =>
		fetch(origin + path, {
			method: 'POST',
			redirect: 'manual',
			headers: { cookie: engineerCookie, origin, accept: 'text/html' },
			body
		});
	const png = await sharp({ create: { width: 64, height: 48, channels: 3, background: '#a52' } })
		.png()
		.toBuffer();
	const record = new FormData();
	for (const [k, v] of Object.entries({
		process: 'GTAW',
		weldedOn: '2025-02-03',
		notes: 'fixture'
	}))
		record.set(k, v);
	record.append('photos', new Blob([png], { type: 'image/png' }), 'fixture.png');
	const made = await post('/records/new?/save', record);
	if (made.status !== 303) throw new Error(`fixture record: ${made.status}`);

	const db = await openSqlite(databaseFile, { readonly: true });
	const ids: { pqr?: { id: number }; welder?: { id: number }; job?: { id: number } } =
		await (async () => {
			try {
				const shop = `(SELECT id FROM shops WHERE name = '${DEMO_SHOP.replace(/'/g, "''")}')`;
				return {
					pqr: await db.get<{ id: number }>(
						`SELECT id FROM pqrs WHERE shop_id = ${shop} AND state = 'draft' ORDER BY id LIMIT 1`
					),
					welder: await db.get<{ id: number }>(
						`SELECT id FROM welders WHERE shop_id = ${shop} ORDER BY id LIMIT 1`
					),
					job: await db.get<{ id: number }>(
						`SELECT id FROM jobs WHERE shop_id = ${shop} ORDER BY id LIMIT 1`
					)
				};
			} finally {
				await db.close();
			}
		})();
	const draft = await fetch(`${origin}/api/v1/pqrs`, {
		method: 'POST',
		headers: { cookie: engineerCookie, origin, 'content-type': 'application/json' },
		body: JSON.stringify({ number: `PQR-FIXTURE-${Date.now()}`, title: 'Fixture with a report' })
	}).then((r) => r.json() as Promise<{ id?: number }>);
	if (draft.id) ids.pqr = { id: draft.id };
	if (ids.pqr) {
		const report = new FormData();
		report.append('report', new Blob([TINY_PDF], { type: 'application/pdf' }), 'lab-report.pdf');
		const r = await post(`/pqrs/${ids.pqr.id}?/upload`, report);
		if (r.status >= 500) throw new Error(`fixture report: ${r.status}`);
	}
	if (ids.welder)
		await fetch(`${origin}/welders/${ids.welder.id}/card`, {
			headers: { cookie: engineerCookie }
		}).then((r) => r.arrayBuffer());
	if (ids.job) {
		const book = await post(`/jobs/${ids.job.id}/data-book`, new FormData());
		if (book.status !== 200) throw new Error(`fixture data book: ${book.status}`);
		await book.arrayBuffer();
	}
}
