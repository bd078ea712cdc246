// The procedure sheet's bench: median time to make one realistic sheet (the brief's GTAW fillet,
// two pages) and sheets per second in a batch PDF, fonts parsed once and reused. Called from
// scripts/bench.ts; on its own: node --import tsx scripts/bench/sheets.ts
// With an origin, a signed-in cookie and a procedure, it also times the download endpoint.
import { cpus, loadavg } from 'node:os';
import { pathToFileURL } from 'node:url';
import { viteLoader } from './vite-load';

type Entry = typeof import('./sheet-entry');

export interface SheetFigures {
	/** Median and 95th percentile of one sheet, made one after another. */
	medianMs: number;
	p95Ms: number;
	/** CPU time of this process per sheet (user + system): steadier than the wall clock on a busy machine. */
	cpuMedianMs: number;
	/** The machine's one-minute load average while timing. */
	loadAverage: number;
	runs: number;
	pages: number;
	bytes: number;
	batch: { sheets: number; ms: number; sheetsPerSec: number };
	/** The welder qualification card (same text path as the sheet): median of one, by size. */
	card: { walletMs: number; sheetMs: number };
	/** Font files parsed in the whole run: 3 means parsed once and reused. */
	fontParses: number;
	/** The download endpoint, when the bench gave a running server. */
	http?: { medianMs: number; status: number };
	targetMs: number;
}

export interface SheetBenchOptions {
	runs?: number;
	batch?: number;
	origin?: string;
	cookie?: string;
	procedureId?: number;
	rev?: number;
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] ?? NaN;
const p95 = (xs: number[]) =>
	[...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.floor(xs.length * 0.95))] ?? NaN;
const round = (x: number) => Math.round(x * 10) / 10;

async function timeHttp(o: SheetBenchOptions, n = 20) {
	const url = `${o.origin}/procedures/${o.procedureId}/sheet${o.rev ? `?rev=${o.rev}` : ''}`;
	const ms: number[] = [];
	let status = 0;
	for (let i = -2; i < n; i++) {
		const t = performance.now();
		const res = await fetch(url, { headers: { cookie: o.cookie ?? '' }, redirect: 'manual' });
		await res.arrayBuffer();
		status = res.status;
		if (i >= 0) ms.push(performance.now() - t);
	}
	return { medianMs: round(median(ms)), status };
}

export async function benchSheets(options: SheetBenchOptions = {}): Promise<SheetFigures> {
	const runs = options.runs ?? 60;
	const batchSize = options.batch ?? 50;
	const vite = await viteLoader();
	try {
		const sheet = await vite.load<Entry>('/scripts/bench/sheet-entry.ts');
		const { fixtureSheet, fontParses } = sheet;
		const { PDFDocument } = await import('pdf-lib');
		const input = (i: number) =>
			fixtureSheet({ number: `WPS-GT-${String(i).padStart(3, '0')}`, printedAt: new Date() });

		for (let i = 0; i < 10; i++) await sheet.procedureSheetPdf(input(i)); // warm up the JIT
		const ms: number[] = [];
		const cpu: number[] = [];
		let last: Uint8Array = new Uint8Array();
		for (let i = 0; i < runs; i++) {
			const c = process.cpuUsage();
			const t = performance.now();
			last = await sheet.procedureSheetPdf(input(i));
			ms.push(performance.now() - t);
			const used = process.cpuUsage(c);
			cpu.push((used.user + used.system) / 1000);
		}
		const pages = (await PDFDocument.load(last)).getPageCount();

		const inputs = Array.from({ length: batchSize }, (_, i) => input(i));
		const t = performance.now();
		await sheet.procedureSheetsPdf('Bench batch', inputs);
		const batchMs = performance.now() - t;

		const card = async (size: 'wallet' | 'a4') => {
			const times: number[] = [];
			for (let i = -5; i < runs; i++) {
				const t0 = performance.now();
				await sheet.qualificationCardPdf(sheet.fixtureCard(size));
				if (i >= 0) times.push(performance.now() - t0);
			}
			return round(median(times));
		};
		const cardFigures = { walletMs: await card('wallet'), sheetMs: await card('a4') };

		const figures: SheetFigures = {
			medianMs: round(median(ms)),
			p95Ms: round(p95(ms)),
			cpuMedianMs: round(median(cpu)),
			loadAverage: round(loadavg()[0] ?? 0),
			runs,
			pages,
			bytes: last.length,
			batch: {
				sheets: batchSize,
				ms: Math.round(batchMs),
				sheetsPerSec: round((batchSize * 1000) / batchMs)
			},
			card: cardFigures,
			fontParses: fontParses(),
			targetMs: 20
		};
		if (options.origin && options.cookie && options.procedureId)
			figures.http = await timeHttp(options);
		printSheetFigures(figures);
		return figures;
	} finally {
		await vite.close();
	}
}

export function printSheetFigures(f: SheetFigures): void {
	console.log(`\nProcedure sheet (${f.pages} pages, ${Math.round(f.bytes / 1024)} KB)`);
	console.log(
		`  one sheet: median ${f.medianMs} ms, p95 ${f.p95Ms} ms over ${f.runs} runs (target ≤ ${f.targetMs} ms)`
	);
	console.log(
		`  CPU time per sheet: median ${f.cpuMedianMs} ms (load average ${f.loadAverage} on ${cpus().length} cores)`
	);
	console.log(
		`  batch: ${f.batch.sheets} sheets in one PDF in ${f.batch.ms} ms = ${f.batch.sheetsPerSec} sheets/s`
	);
	console.log(
		`  qualification card: median ${f.card.walletMs} ms wallet, ${f.card.sheetMs} ms A4 sheet`
	);
	console.log(`  font files parsed: ${f.fontParses} (3 = once each, reused)`);
	if (f.http)
		console.log(`  GET /procedures/…/sheet: median ${f.http.medianMs} ms (HTTP ${f.http.status})`);
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
	await benchSheets();
	process.exit(0);
}
