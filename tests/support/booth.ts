// Helpers for the booth journeys: the seeded procedures' booth tokens read from the e2e server's
// database, the lapse date a use sets, and a Y4M video of a QR code for Chromium's fake camera.
import { writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import QRCode from 'qrcode';
import { sqlGet } from './procedures';

/** The live booth token of revision `rev` of the seeded procedure `number` (Larkspur). */
export async function boothToken(number: string, rev: number): Promise<string> {
	const row = await sqlGet<{ token: string }>(
		`SELECT l.token FROM booth_links l
		 JOIN procedures p ON p.id = l.procedure_id
		 JOIN procedure_revisions r ON r.id = l.revision_id
		 WHERE p.number = ? AND r.rev = ? AND l.revoked_at IS NULL
		 ORDER BY l.id DESC LIMIT 1`,
		[number, rev]
	);
	if (!row) throw new Error(`No live booth link for ${number} rev ${rev}: is the demo seeded?`);
	return row.token;
}

export async function procedureId(number: string): Promise<number> {
	const row = await sqlGet<{ id: number }>('SELECT id FROM procedures WHERE number = ?', [number]);
	if (!row) throw new Error(`No procedure ${number}`);
	return row.id;
}

export async function usesToday(email: string, process: string, day: string): Promise<number> {
	const row = await sqlGet<{ n: number }>(
		`SELECT count(*) AS n FROM continuity_entries c
		 JOIN welders w ON w.id = c.welder_id JOIN users u ON u.id = w.user_id
		 WHERE u.email = ? AND c.process = ? AND c.used_on = ?`,
		[email, process, day]
	);
	return row?.n ?? 0;
}

const pad = (n: number) => String(n).padStart(2, '0');
/** A local calendar day as YYYY-MM-DD (the server's `localDay`). */
export const isoDay = (d: Date) =>
	`${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`;

/** Six calendar months later, clamped to a shorter month's end (ASME IX QW-322.1, our rule). */
export function sixMonthsAfter(day: string): string {
	const [y, m, d] = day.split('-').map(Number) as [number, number, number];
	const last = new Date(y, m - 1 + 6 + 1, 0).getDate();
	return isoDay(new Date(y, m - 1 + 6, Math.min(d, last)));
}

/**
 * A few frames of a QR code encoding `text`, black on white in the middle of a 640 × 480 grey
 * picture, as a Y4M file (4:2:0, what Chromium's --use-file-for-fake-video-capture reads).
 */
export function qrVideo(text: string): string {
	const W = 640;
	const H = 480;
	const qr = QRCode.create(text, { errorCorrectionLevel: 'Q' });
	const n = qr.modules.size;
	const cell = Math.floor(360 / (n + 8));
	const side = cell * (n + 8);
	const x0 = Math.floor((W - side) / 2);
	const y0 = Math.floor((H - side) / 2);
	const y = Buffer.alloc(W * H, 140);
	for (let py = 0; py < side; py++)
		for (let px = 0; px < side; px++) {
			const r = Math.floor(py / cell) - 4;
			const c = Math.floor(px / cell) - 4;
			const dark = r >= 0 && c >= 0 && r < n && c < n && qr.modules.get(r, c);
			y[(y0 + py) * W + x0 + px] = dark ? 16 : 235;
		}
	const chroma = Buffer.alloc((W / 2) * (H / 2) * 2, 128);
	const frame = Buffer.concat([Buffer.from('FRAME\n'), y, chroma]);
	const file = join(tmpdir(), `beadline-qr-${process.pid}-${Date.now()}.y4m`);
	writeFileSync(
		file,
		Buffer.concat([
			Buffer.from(`YUV4MPEG2 W${W} H${H} F10:1 Ip A1:1 C420jpeg\n`),
			frame,
			frame,
			frame
		])
	);
	return file;
}
