// Writers for the fault and backup tests: each loops until told to stop and remembers only what
// the server acknowledged (a 2xx/303 answer that reached us). Requests cut off by a kill throw
// and are counted as unacknowledged, never as saved.
import sharp from 'sharp';

export interface Acked {
	records: { id: number; marker: string }[];
	photos: { id: number; marker: string }[];
	signOffs: { procedureId: number; signOffId: number; digest: string }[];
	unacknowledged: number;
	/** The first few reasons requests went unacknowledged, for the failure message. */
	reasons: string[];
}

export const newAcked = (): Acked => ({
	records: [],
	photos: [],
	signOffs: [],
	unacknowledged: 0,
	reasons: []
});

export interface WriterContext {
	origin: string;
	engineer: string;
	inspector: { cookie: string; password: string };
	stop: { now: boolean };
	acked: Acked;
}

let photo: Buffer | undefined;
/** A noisy PNG of some 60 KB, so a kill can land while it is being written. */
async function photoBytes(): Promise<Buffer> {
	if (photo) return photo;
	const raw = Buffer.alloc(160 * 120 * 3);
	for (let i = 0; i < raw.length; i++) raw[i] = (i * 2654435761) >>> 24;
	photo = await sharp(raw, { raw: { width: 160, height: 120, channels: 3 } })
		.png()
		.toBuffer();
	return photo;
}

const json = (ctx: WriterContext, cookie: string, body: unknown): RequestInit => ({
	method: 'POST',
	headers: { cookie, origin: ctx.origin, 'content-type': 'application/json' },
	body: JSON.stringify(body)
});

async function loop(ctx: WriterContext, once: (i: number) => Promise<void>): Promise<void> {
	for (let i = 0; !ctx.stop.now; i++) {
		try {
			await once(i);
		} catch (e) {
			ctx.acked.unacknowledged++;
			if (ctx.acked.reasons.length < 8) ctx.acked.reasons.push(String(e));
			await new Promise((r) => setTimeout(r, 50));
		}
	}
}

export function recordWriter(ctx: WriterContext, tag: string): Promise<void> {
	return loop(ctx, async (i) => {
		const marker = `${tag}-${i}`;
		const res = await fetch(
			`${ctx.origin}/api/v1/settings`,
			json(ctx, ctx.engineer, {
				process: 'GTAW',
				amps: '120',
				thickness: '1/8',
				baseMetalSpec: 'A36',
				outcome: 'sound',
				weldedOn: '2025-05-05',
				notes: marker
			})
		);
		const body = (await res.json()) as { id?: number };
		if (res.status !== 201 || !body.id) throw new Error(`record: ${res.status}`);
		ctx.acked.records.push({ id: body.id, marker });
	});
}

export function photoWriter(ctx: WriterContext, tag: string): Promise<void> {
	return loop(ctx, async (i) => {
		const marker = `${tag}-${i}`;
		const form = new FormData();
		for (const [k, v] of Object.entries({
			process: 'GMAW',
			amps: '180',
			weldedOn: '2025-05-06',
			notes: marker
		}))
			form.set(k, v);
		form.append(
			'photos',
			new Blob([new Uint8Array(await photoBytes())], { type: 'image/png' }),
			'bead.png'
		);
		const res = await fetch(`${ctx.origin}/records/new?/save`, {
			method: 'POST',
			redirect: 'manual',
			headers: { cookie: ctx.engineer, origin: ctx.origin, accept: 'text/html' },
			body: form
		});
		const id = Number(/\/records\/(\d+)/.exec(res.headers.get('location') ?? '')?.[1]);
		if (res.status !== 303 || !id) throw new Error(`photo record: ${res.status}`);
		ctx.acked.photos.push({ id, marker });
	});
}

/** Create, submit and sign: the signature is the write that counts. */
export function signOffWriter(ctx: WriterContext, tag: string): Promise<void> {
	return loop(ctx, async (i) => {
		const created = await fetch(
			`${ctx.origin}/api/v1/procedures`,
			json(ctx, ctx.engineer, { title: `Fault ${tag}-${i}`, code: 'aws-d1.1', process: 'GTAW' })
		);
		const { id } = (await created.json()) as { id?: number };
		if (created.status !== 201 || !id) throw new Error(`procedure: ${created.status}`);
		const base = `${ctx.origin}/api/v1/procedures/${id}/revisions/1`;
		const submitted = await fetch(`${base}/submit`, json(ctx, ctx.engineer, {}));
		if (!submitted.ok) throw new Error(`submit: ${submitted.status}`);
		const signed = await fetch(
			`${base}/approve`,
			json(ctx, ctx.inspector.cookie, { password: ctx.inspector.password, comment: '' })
		);
		const s = (await signed.json()) as { signOffId?: number; digest?: string };
		if (signed.status !== 200 || !s.signOffId || !s.digest)
			throw new Error(`approve: ${signed.status}`);
		ctx.acked.signOffs.push({ procedureId: id, signOffId: s.signOffId, digest: s.digest });
	});
}
