// Lighthouse 12 (13 needs Node 22) on Debian's Chromium, started here with a debugging port so no
// launcher package is needed. Mobile emulation and throttling are Lighthouse's defaults: the
// booth view is read on a phone.
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import lighthouse from 'lighthouse';
import { waitFor } from './http';

export interface PageAudit {
	name: string;
	path: string;
	scores: Record<string, number | null>;
	fcpMs: number;
	lcpMs: number;
	tbtMs: number;
	cls: number;
	/** Page weight: every byte transferred for the page, and how many requests. */
	totalKb: number;
	requests: number;
	/** Lighthouse's own error for the page (e.g. it answered 4xx), when it had one. */
	error?: string;
}

const CATEGORIES = ['performance', 'accessibility', 'best-practices'];

export async function audit(
	origin: string,
	pages: { name: string; path: string; cookie?: string }[],
	port: number
): Promise<PageAudit[]> {
	const profile = mkdtempSync(join(tmpdir(), 'beadline-lh-'));
	const chrome = spawn(
		process.env.CHROME_PATH ?? '/usr/bin/chromium',
		[
			'--headless=new',
			'--no-sandbox',
			'--disable-gpu',
			'--disable-background-networking',
			'--disable-component-update',
			'--disable-sync',
			'--no-first-run',
			`--remote-debugging-port=${port}`,
			`--user-data-dir=${profile}`,
			'about:blank'
		],
		{ stdio: 'ignore' }
	);
	try {
		await waitFor(`http://127.0.0.1:${port}/json/version`, 30_000);
		const out: PageAudit[] = [];
		for (const p of pages) {
			const result = await lighthouse(
				origin + p.path,
				{
					port,
					output: 'json',
					logLevel: 'error',
					onlyCategories: CATEGORIES,
					...(p.cookie ? { extraHeaders: { Cookie: p.cookie } } : {})
				},
				undefined
			);
			if (!result) throw new Error(`Lighthouse gave no result for ${p.path}`);
			const lhr = result.lhr;
			const num = (id: string) => Math.round(Number(lhr.audits[id]?.numericValue ?? NaN));
			const items = (lhr.audits['network-requests']?.details as { items?: unknown[] } | undefined)
				?.items;
			out.push({
				name: p.name,
				path: p.path,
				scores: Object.fromEntries(
					CATEGORIES.map((c) => [
						c,
						lhr.categories[c]?.score == null ? null : Math.round(lhr.categories[c]!.score! * 100)
					])
				),
				fcpMs: num('first-contentful-paint'),
				lcpMs: num('largest-contentful-paint'),
				tbtMs: num('total-blocking-time'),
				cls: Number(Number(lhr.audits['cumulative-layout-shift']?.numericValue ?? 0).toFixed(3)),
				totalKb: Math.round(num('total-byte-weight') / 102.4) / 10,
				requests: items?.length ?? 0,
				...(lhr.runtimeError ? { error: lhr.runtimeError.message } : {})
			});
		}
		return out;
	} finally {
		if (chrome.exitCode === null) {
			const gone = new Promise((r) => chrome.once('exit', r));
			chrome.kill('SIGTERM');
			await gone;
		}
		rmSync(profile, { recursive: true, force: true });
	}
}
