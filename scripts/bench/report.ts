// Prints the bench's figures as plain tables and writes the same figures as JSON.
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { PageJs } from './client-js';
import type { GoalRow } from './goals';
import type { PageAudit } from './lighthouse';
import type { LoadResult } from './load';
import type { MultiRow } from './multi';
import type { Timing } from './http';
import type { SheetFigures } from './sheets';

export interface GrowthRow {
	records: number;
	list: Timing;
	filtered: Timing;
}

export interface BenchFigures {
	at: string;
	/** The machine's load average (1, 5, 15 min) at the end: other work shares the cores. */
	load: number[];
	machine: { node: string; cores: number; platform: string };
	settings: { seconds: number; connections: number };
	/** Which database the servers ran on (`--db`). */
	database: 'sqlite' | 'postgres';
	data: Record<string, number>;
	/** The bare SvelteKit probe app: every route's share is of this. */
	probe: LoadResult;
	routes: LoadResult[];
	growth: GrowthRow[];
	/** Left out by `--only`. */
	mixed?: {
		requests: number;
		non2xx: number;
		errors: number;
		rss: { afterMb: number; peakMb: number };
	};
	js?: PageJs[];
	goals: GoalRow[];
	sheets?: SheetFigures;
	lighthouse?: PageAudit[];
	rss: { afterMb: number; peakMb: number };
	/** The filtered list with 1 and with 3 processes behind a round-robin proxy. */
	multi?: MultiRow[];
	notes: string[];
}

const pad = (s: unknown, n: number) => String(s).padEnd(n);
const lpad = (s: unknown, n: number) => String(s).padStart(n);

export function printFigures(f: BenchFigures): void {
	const line = (cells: [unknown, number, boolean?][]) =>
		console.log(cells.map(([c, n, left]) => (left ? pad(c, n) : lpad(c, n))).join('  '));
	console.log(
		`\nBeadline bench ${f.at} — Node ${f.machine.node}, ${f.machine.cores} cores, load average ${f.load.join(' / ')}`
	);
	console.log(
		`Each route: ${f.settings.seconds} s with ${f.settings.connections} connections (autocannon), one server, one run, on ${f.database === 'postgres' ? 'PostgreSQL (a throw-away cluster)' : 'SQLite'}.`
	);
	console.log(
		`Data: ${Object.entries(f.data)
			.map(([k, v]) => `${k} ${v.toLocaleString('en-US')}`)
			.join(', ')}\n`
	);
	line([
		['route', 44, true],
		['req/s', 7],
		['p50 ms', 7],
		['p99 ms', 7],
		['errors', 7],
		['non-2xx', 7],
		['vs probe', 8]
	]);
	for (const r of [f.probe, ...f.routes])
		line([
			[`${r.method} ${r.name}`, 44, true],
			[r.reqPerSec, 7],
			[r.p50Ms, 7],
			[r.p99Ms, 7],
			[r.errors, 7],
			[r.non2xx, 7],
			[`${((r.ratioToBare ?? 1) * 100).toFixed(1)} %`, 8]
		]);

	if (f.growth.length) {
		console.log(
			'\nList latency as a shop’s records grow (one request at a time; median / p95 / p99 ms)'
		);
		line([
			['records in shop', 16, true],
			['/records', 20],
			['/records?filter', 20]
		]);
		const t = (x: Timing) => `${x.medianMs} / ${x.p95Ms} / ${x.p99Ms}`;
		for (const g of f.growth)
			line([
				[g.records.toLocaleString('en-US'), 16, true],
				[t(g.list), 20],
				[t(g.filtered), 20]
			]);
	}

	const m = f.mixed;
	if (m)
		console.log(
			`\n${m.requests.toLocaleString('en-US')} mixed requests (every route above in turn): ${m.non2xx} non-2xx, ${m.errors} errors; RSS after ${m.rss.afterMb} MB`
		);
	if (f.js?.length) {
		console.log('\nJavaScript each page loads in Chromium (compressed bytes as served)');
		line([
			['page', 22, true],
			['path', 40, true],
			['files', 6],
			['KB', 7],
			['QR decoder', 11]
		]);
		for (const p of f.js)
			line([
				[p.name, 22, true],
				[p.path.length > 40 ? p.path.slice(0, 37) + '…' : p.path, 40, true],
				[p.files, 6],
				[p.kb, 7],
				[p.qrDecoder ? 'yes' : 'no', 11]
			]);
	}

	if (f.sheets)
		console.log(
			`\nProcedure sheet PDF: median ${f.sheets.medianMs} ms (p95 ${f.sheets.p95Ms}), ${f.sheets.batch.sheetsPerSec} sheets/s in a batch of ${f.sheets.batch.sheets}` +
				(f.sheets.http ? `; download median ${f.sheets.http.medianMs} ms` : '')
		);
	if (f.lighthouse?.length) {
		console.log('\nLighthouse 12 (mobile emulation, default throttling)');
		line([
			['page', 30, true],
			['perf', 5],
			['a11y', 5],
			['best', 5],
			['FCP ms', 7],
			['LCP ms', 7],
			['TBT ms', 7],
			['CLS', 6],
			['KB', 7],
			['reqs', 5]
		]);
		for (const a of f.lighthouse)
			line([
				[a.name, 30, true],
				[a.scores.performance ?? '-', 5],
				[a.scores.accessibility ?? '-', 5],
				[a.scores['best-practices'] ?? '-', 5],
				[a.fcpMs, 7],
				[a.lcpMs, 7],
				[a.tbtMs, 7],
				[a.cls, 6],
				[a.totalKb, 7],
				[a.requests, 5]
			]);
		for (const a of f.lighthouse.filter((x) => x.error)) console.log(`  ${a.name}: ${a.error}`);
	}
	if (f.multi?.length) {
		console.log(
			`\nFiltered records list behind a round-robin proxy (os.cpus().length = ${f.multi[0]!.cores})`
		);
		line([
			['processes', 10, true],
			['req/s', 7],
			['p50 ms', 7],
			['p99 ms', 7],
			['errors', 7],
			['non-2xx', 7]
		]);
		for (const m of f.multi)
			line([
				[m.processes, 10, true],
				[m.result.reqPerSec, 7],
				[m.result.p50Ms, 7],
				[m.result.p99Ms, 7],
				[m.result.errors, 7],
				[m.result.non2xx, 7]
			]);
	}
	console.log(`\nServer RSS after the run: ${f.rss.afterMb} MB (peak ${f.rss.peakMb} MB)`);
	for (const n of f.notes) console.log(`Note: ${n}`);
}

export function writeFigures(f: BenchFigures, dir = 'bench-results'): string {
	mkdirSync(dir, { recursive: true });
	const file = join(dir, `bench-${f.at.replace(/[:.]/g, '-')}.json`);
	const text = JSON.stringify(f, null, '\t') + '\n';
	writeFileSync(file, text);
	writeFileSync(join(dir, 'latest.json'), text);
	return file;
}
