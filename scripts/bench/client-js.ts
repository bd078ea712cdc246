// What each page makes the browser download in JavaScript, measured in Chromium: the bytes as
// served (compressed; adapter-node serves precompressed files), file count, and whether the QR
// decoder came along. Pages are loaded as the role that uses them.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { chromium } from '@playwright/test';

export interface PageJs {
	name: string;
	path: string;
	files: number;
	kb: number;
	/** Whether the QR decoder's chunk was among them (it belongs on the scan page only). */
	qrDecoder: boolean;
	/** Each script it loaded and its bytes as served, biggest first (for working on the bundle). */
	scripts?: { url: string; bytes: number }[];
}

/** The client chunk that holds jsQR, from Vite's manifest of the client build. */
function qrDecoderChunk(kitOutDir: string): string | undefined {
	const file = join(kitOutDir, 'output/client/.vite/manifest.json');
	const manifest = JSON.parse(readFileSync(file, 'utf8')) as Record<string, { file: string }>;
	return Object.entries(manifest).find(([src]) => src.includes('node_modules/jsqr/'))?.[1].file;
}

/** The pages the bench measures, each as the role that uses it (the booth view only with a link). */
export function benchPages(who: { welder: string; engineer: string; booth?: string | null }) {
	const { welder, engineer, booth } = who;
	return [
		{ name: 'signin', path: '/signin' },
		{ name: 'booth-list', path: '/booth', cookie: welder },
		{ name: 'procedures', path: '/procedures', cookie: engineer },
		{ name: 'records', path: '/records', cookie: engineer },
		{ name: 'record-form', path: '/records/new', cookie: engineer },
		...(booth ? [{ name: 'booth-view', path: booth }] : []),
		...(booth ? [{ name: 'booth-view (welder)', path: booth, cookie: welder }] : []),
		{ name: 'scan', path: '/scan', cookie: welder }
	];
}

export async function measureClientJs(
	origin: string,
	pages: { name: string; path: string; cookie?: string }[],
	kitOutDir = process.env.KIT_OUT_DIR ?? '.svelte-kit'
): Promise<PageJs[]> {
	const qr = qrDecoderChunk(kitOutDir);
	const browser = await chromium.launch({
		executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
		args: ['--disable-background-networking', '--disable-component-update', '--no-first-run']
	});
	const out: PageJs[] = [];
	try {
		for (const p of pages) {
			const context = await browser.newContext();
			if (p.cookie) {
				const [name, ...value] = p.cookie.split('=');
				await context.addCookies([{ name: name!, value: value.join('='), url: origin }]);
			}
			const page = await context.newPage();
			const scripts: Promise<{ url: string; bytes: number }>[] = [];
			page.on('requestfinished', (req) => {
				if (req.resourceType() !== 'script') return;
				scripts.push(req.sizes().then((s) => ({ url: req.url(), bytes: s.responseBodySize })));
			});
			await page.goto(origin + p.path, { waitUntil: 'networkidle' });
			const got = await Promise.all(scripts);
			out.push({
				name: p.name,
				path: p.path,
				files: got.length,
				kb: Math.round(got.reduce((n, s) => n + s.bytes, 0) / 102.4) / 10,
				qrDecoder: !!qr && got.some((s) => s.url.endsWith(qr)),
				scripts: got.sort((a, b) => b.bytes - a.bytes)
			});
			await context.close();
		}
	} finally {
		await browser.close();
	}
	return out;
}
