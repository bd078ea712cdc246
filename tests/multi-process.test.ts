// Many processes: three app processes on one database and one upload store behind a round-robin
// proxy (tests/support/app-cluster.ts; MULTI_DATABASE and MULTI_STORAGE choose the stores). What
// one process guaranteed with its write queue and its memory must hold across processes: one
// signature for 50 racing approvals, one look-up row and one continuity entry for 50 racing
// booth taps, each due reminder mailed once, a lockout everywhere, nothing acknowledged lost when
// one process is SIGKILLed under writes (and no 5xx from the other two), a photo written by one
// process served by another.
import { createHash } from 'node:crypto';
import { expect, test } from '@playwright/test';
import sharp from 'sharp';
import { signInCookie } from '../scripts/bench/http';
import { LOOKUP_WINDOW_MS } from '../src/lib/server/booth/lookup-window';
import { startCluster, type Cluster } from './support/app-cluster';
import { engineer, inspector, otherAdmin, welder } from './support/people';
import { clusterHttp, until } from './support/cluster-http';
import { answered, serverErrors } from './support/round-robin-proxy';
import { verifyAcked } from './support/verify-acked';
import {
	newAcked,
	photoWriter,
	recordWriter,
	signOffWriter,
	type WriterContext
} from './support/writers';

const PARALLEL = 50;

test.describe.configure({ mode: 'serial' });

let c: Cluster;
const cookies: Record<string, string> = {};

const { postJson, postForm } = clusterHttp(() => c);

/** Requests each backend answered so far, by name, for the tag lines. */
const spread = () => c.apps.map((a) => `${a.name} ${answered(a.backend)}`).join(', ');

test.beforeAll(async () => {
	test.setTimeout(180_000);
	const t = Date.now();
	c = await startCluster(3);
	for (const p of [engineer, inspector, welder])
		cookies[p.email] = await signInCookie(c.proxy.origin, p.email, p.password);
	console.log(`[multi] configuration: ${c.configuration}; up in ${Date.now() - t} ms`);
});

test.afterAll(async () => {
	test.setTimeout(60_000);
	await c?.dispose();
});

test('50 parallel approvals of one revision across processes: exactly one signs', async () => {
	test.setTimeout(120_000);
	const eng = cookies[engineer.email]!;
	const insp = cookies[inspector.email]!;
	const created = await postJson('/api/v1/procedures', eng, {
		title: 'Race across processes',
		code: 'aws-d1.1',
		process: 'GTAW'
	});
	expect(created.status).toBe(201);
	const { id } = (await created.json()) as { id: number };
	expect((await postJson(`/api/v1/procedures/${id}/revisions/1/submit`, eng, {})).status).toBe(200);
	const answers = await Promise.all(
		Array.from({ length: PARALLEL }, (_, i) =>
			i % 2
				? postJson(`/api/v1/procedures/${id}/revisions/1/approve`, insp, {
						password: inspector.password,
						comment: `race ${i}`
					})
				: postForm(`/procedures/${id}/revisions/1/review?/approve`, insp, {
						password: inspector.password,
						comment: `race ${i}`
					})
		)
	);
	const statuses = answers.map((r) => r.status);
	expect(
		statuses.filter((s) => s >= 500),
		statuses.join(',')
	).toEqual([]);
	const won = answers.filter(
		(r) => (r.status === 200 && r.headers.get('content-type')?.includes('json')) || r.status === 303
	).length;
	expect(won, statuses.join(',')).toBe(1);
	const rows = await c.db.all<{ meaning: string }>(
		`SELECT s.meaning FROM sign_offs s JOIN procedure_revisions r ON r.id = s.revision_id
		 WHERE r.procedure_id = ? AND r.rev = 1`,
		[id]
	);
	expect(rows).toEqual([{ meaning: 'approved' }]);
	console.log(
		`[multi] ${PARALLEL} parallel approvals over 3 processes: 1 signed, ${PARALLEL - 1} refused (${[...new Set(statuses)].join('/')}), 0 errors`
	);
});

test('50 parallel booth taps across processes: the look-up logged once, one continuity entry', async () => {
	test.setTimeout(120_000);
	const link = await c.db.one<{ id: number; token: string; process: string }>(
		`SELECT b.id, b.token, p.process FROM booth_links b
		 JOIN procedures p ON p.id = b.procedure_id
		 JOIN procedure_revisions r ON r.id = b.revision_id
		 JOIN shops s ON s.id = b.shop_id
		 WHERE s.name = 'Larkspur Trailer & Rail' AND b.revoked_at IS NULL AND r.state = 'approved'
		   AND p.process IN ('GTAW', 'GMAW') ORDER BY b.id LIMIT 1`
	);
	expect(
		link,
		'a live booth link to an approved GTAW or GMAW revision in the demo data'
	).toBeTruthy();
	const w = await c.db.one<{ id: number }>(
		'SELECT w.id FROM welders w JOIN users u ON u.id = w.user_id WHERE u.email = ?',
		[welder.email]
	);
	// The demo's weld log (seeded job) is continuity from the booth too, on an earlier day.
	const boothEntries = () =>
		c.db.all<{ used_on: string }>(
			'SELECT used_on FROM continuity_entries WHERE welder_id = ? AND process = ? AND source = ?',
			[w!.id, link!.process, 'booth']
		);
	const before = (await boothEntries()).length;
	const t0 = Date.now();
	const answers = await Promise.all(
		Array.from({ length: PARALLEL }, () =>
			postForm(`/b/${link!.token}?/used`, cookies[welder.email]!, {})
		)
	);
	const t1 = Date.now();
	const statuses = answers.map((r) => r.status);
	expect(
		statuses.filter((s) => s !== 200),
		statuses.join(',')
	).toEqual([]);

	// Every answer showed the page, so every one was a look-up: 50 counted, in one row per window.
	const since = Math.floor(t0 / LOOKUP_WINDOW_MS) * LOOKUP_WINDOW_MS;
	const rows = await until('the look-ups to be written', async () => {
		const r = await c.db.all<{ window_start: number | string; hits: number }>(
			`SELECT window_start, hits FROM booth_lookups WHERE link_id = ? AND window_start >= ?`,
			[link!.id, since]
		);
		return r.reduce((n, x) => n + Number(x.hits), 0) >= PARALLEL ? r : null;
	});
	const windows = Math.floor(t1 / LOOKUP_WINDOW_MS) - Math.floor(t0 / LOOKUP_WINDOW_MS) + 1;
	expect(rows.reduce((n, x) => n + Number(x.hits), 0)).toBe(PARALLEL);
	expect(new Set(rows.map((r) => Number(r.window_start))).size).toBe(rows.length);
	expect(rows.length).toBeLessThanOrEqual(windows);

	const entries = await boothEntries();
	const added = entries.length - before;
	expect(added, JSON.stringify(entries)).toBe(1);
	console.log(
		`[multi] ${PARALLEL} parallel booth taps over 3 processes: ${rows.length} look-up row (hits ${PARALLEL}, ${windows} window${windows > 1 ? 's' : ''} spanned), ${added} continuity entry, 0 errors`
	);
});

test('due reminders: each notice mailed exactly once while every process runs the job', async () => {
	test.setTimeout(120_000);
	const lapseMail = async () =>
		(await c.mail()).filter((m) => /^(30-day notice|7-day notice|Lapsed):/.test(m.subject));
	await until('the due notice to be mailed', async () => (await lapseMail()).length > 0, 30_000);
	// Then let the job run again and again, taken by whichever process gets the lease first.
	const runs = async () =>
		Number(
			(
				await c.db.one<{ runs: number }>(
					"SELECT runs FROM job_leases WHERE name = 'lapse-reminders'"
				)
			)?.runs ?? 0
		);
	const holders = new Set<string>();
	const r0 = await runs();
	await until(
		'six more runs of the reminder job',
		async () => {
			const h = await c.db.one<{ holder: string }>(
				"SELECT holder FROM job_leases WHERE name = 'lapse-reminders'"
			);
			if (h?.holder) holders.add(h.holder);
			return (await runs()) >= r0 + 6;
		},
		30_000
	);
	const notices = await c.db.all<{ recipients: string; sent_at: unknown }>(
		'SELECT recipients, sent_at FROM lapse_notices'
	);
	expect(notices.length).toBeGreaterThan(0);
	expect(notices.filter((n) => !n.sent_at)).toEqual([]);
	const mails = await lapseMail();
	const pairs = mails.map((m) => `${m.to} | ${m.subject}`);
	expect(pairs.length, pairs.join('\n')).toBe(new Set(pairs).size);
	const expected = notices.reduce((n, x) => n + x.recipients.split(', ').filter(Boolean).length, 0);
	expect(mails).toHaveLength(expected);
	console.log(
		`[multi] reminders: ${notices.length} due notice(s), ${mails.length} mail(s), each sent once over ${(await runs()) - r0 + 1}+ job runs in 3 processes (lease seen with ${holders.size} holder(s))`
	);
});

test('a lockout earned through one process holds on every other', async () => {
	const who = otherAdmin;
	const attempt = (base: string, password: string) =>
		postForm('/signin?/password', '', { email: who.email, password, redirectTo: '/' }, base);
	// Ten wrong passwords, spread over the processes by the proxy.
	for (let i = 0; i < 10; i++)
		expect((await attempt(c.proxy.origin, 'not the password')).status).toBe(400);
	for (const app of c.apps) {
		const res = await attempt(app.direct, who.password);
		expect(res.status, app.name).toBe(429);
		expect(res.headers.getSetCookie().some((x) => x.startsWith('authjs.session-token='))).toBe(
			false
		);
		expect(await res.text()).toContain('Too many attempts');
	}
	console.log(
		`[multi] lockout: 10 failures through the proxy lock the account on all 3 processes (429 on each, right password refused)`
	);
});

test('a photo uploaded through one process is served by the others', async () => {
	const [a, b, d] = c.apps;
	const png = await sharp({ create: { width: 64, height: 48, channels: 3, background: '#b4501e' } })
		.png()
		.toBuffer();
	const form = new FormData();
	form.set('process', 'GMAW');
	form.set('weldedOn', '2025-05-07');
	form.append('photos', new Blob([new Uint8Array(png)], { type: 'image/png' }), 'bead.png');
	const saved = await postForm('/records/new?/save', cookies[engineer.email]!, form, a!.direct);
	expect(saved.status).toBe(303);
	const recordId = Number(/\/records\/(\d+)/.exec(saved.headers.get('location') ?? '')?.[1]);
	const photo = await c.db.one<{ id: number; bytes: number }>(
		'SELECT id, bytes FROM settings_photos WHERE record_id = ?',
		[recordId]
	);
	const digests = new Set<string>();
	for (const app of [b!, d!]) {
		const res = await fetch(`${app.direct}/records/${recordId}/photos/${photo!.id}`, {
			headers: { cookie: cookies[engineer.email]! }
		});
		expect(res.status, app.name).toBe(200);
		const bytes = Buffer.from(await res.arrayBuffer());
		expect(bytes.length).toBe(Number(photo!.bytes));
		expect((await sharp(bytes).metadata()).width).toBe(64);
		digests.add(createHash('sha256').update(bytes).digest('hex'));
	}
	expect(digests.size).toBe(1);
	console.log(
		`[multi] photo: written by ${a!.name}, served byte for byte by ${b!.name} and ${d!.name}`
	);
});

test('SIGKILL of one process under writes: nothing acknowledged lost, the other two serve with 0 5xx', async () => {
	test.setTimeout(150_000);
	const ctx: WriterContext = {
		origin: c.proxy.origin,
		engineer: cookies[engineer.email]!,
		inspector: { cookie: cookies[inspector.email]!, password: inspector.password },
		stop: { now: false },
		acked: newAcked()
	};
	const kinds = () => [
		ctx.acked.records.length,
		ctx.acked.photos.length,
		ctx.acked.signOffs.length
	];
	const writers = [
		recordWriter(ctx, 'm-a'),
		recordWriter(ctx, 'm-b'),
		photoWriter(ctx, 'm-p'),
		signOffWriter(ctx, 'm-s')
	];
	const victim = c.apps[1]!;
	const survivors = c.apps.filter((a) => a !== victim);
	try {
		await until(
			'every kind of write acknowledged',
			async () => kinds().every((n) => n >= 2),
			60_000
		);
		const atKill = kinds();
		const servedAtKill = survivors.map((s) => answered(s.backend));
		await c.kill(victim);
		await until(
			'three more of every kind after the kill',
			async () => kinds().every((n, i) => n >= atKill[i]! + 3),
			60_000
		);
		const servedAfter = survivors.map((s, i) => answered(s.backend) - servedAtKill[i]!);
		for (const n of servedAfter) expect(n).toBeGreaterThan(0);
		console.log(
			`[multi] after SIGKILL of ${victim.name}: ${survivors.map((s, i) => `${s.name} answered ${servedAfter[i]}`).join(', ')}`
		);
	} finally {
		ctx.stop.now = true;
		await Promise.all(writers);
	}

	const a = ctx.acked;
	const problems = await verifyAcked(c.db, a, survivors[0]!.direct, ctx.engineer);
	expect(problems, a.reasons.join('\n')).toEqual([]);
	const errors = survivors.map((s) => serverErrors(s.backend));
	expect(errors).toEqual([0, 0]);
	console.log(
		`[multi] SIGKILL of ${victim.name} under writes: acknowledged and found ${a.records.length} records, ${a.photos.length} with photos, ${a.signOffs.length} sign-offs; ${a.unacknowledged} cut off (${victim.backend.cutOff} in flight at the kill); integrity holds; 5xx from the other two: ${errors.join(' + ')}`
	);
	console.log(`[multi] requests per process over the run: ${spread()}`);
});
