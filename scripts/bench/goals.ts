// The goals of issue 13, each as a share of the bare probe measured in the same run (absolute
// figures move with the machine's load; the ratio to Kit alone on the same cores does not, much).
import type { PageJs } from './client-js';
import type { LoadResult } from './load';
import type { GrowthRow } from './report';

export interface GoalRow {
	goal: string;
	target: string;
	measured: string;
	met: boolean;
}

interface Inputs {
	probe: LoadResult;
	routes: LoadResult[];
	growth: GrowthRow[];
	rssAfterMixedMb?: number;
	js?: PageJs[];
}

const SHARE_GOALS: [id: string, goal: string, share: number, p99Ms?: number][] = [
	['health', 'health', 0.7],
	['checks-token', 'checks API, API token', 0.4],
	['checks-session', 'checks API, session', 0.3],
	['booth-out', 'booth page, signed out', 0.3],
	['booth-welder', 'booth page, welder', 0.15],
	['procedures', 'procedure list (10k procedures)', 0.15, 25],
	['records-filter', 'filtered records (100k seeded)', 0.1]
];

const JS_GOALS: [id: string, goal: string, maxKb: number][] = [
	['signin', 'sign-in page JS', 30],
	['booth-list', 'welder’s booth list JS', 30],
	['record-form', 'record form JS', 70],
	['booth-view', 'booth page behind the QR JS', 0]
];

const pct = (x: number) => `${(x * 100).toFixed(1)} %`;

export function goalRows(f: Inputs): GoalRow[] {
	const rows: GoalRow[] = [];
	for (const [id, goal, share, p99] of SHARE_GOALS) {
		const r = f.routes.find((x) => x.id === id);
		if (!r) continue;
		const ratio = r.reqPerSec / f.probe.reqPerSec;
		const shareMet = ratio >= share && r.errors === 0 && r.non2xx === 0;
		rows.push({
			goal,
			target: `≥ ${pct(share)}${p99 ? `, p99 ≤ ${p99} ms` : ''}`,
			measured: `${pct(ratio)}${p99 ? `, p99 ${r.p99Ms} ms` : ''}`,
			met: shareMet && (p99 === undefined || r.p99Ms <= p99)
		});
	}
	const first = f.growth[0];
	const last = f.growth.at(-1);
	if (first && last && first !== last) {
		for (const key of ['list', 'filtered'] as const) {
			const x = last[key].p99Ms / first[key].p99Ms;
			rows.push({
				goal: `${key === 'list' ? '/records' : '/records?filter'} p99, ${first.records.toLocaleString('en-US')} → ${last.records.toLocaleString('en-US')} records`,
				target: '≤ 1.5×',
				measured: `${x.toFixed(2)}× (${first[key].p99Ms} → ${last[key].p99Ms} ms)`,
				met: x <= 1.5
			});
		}
	}
	if (f.rssAfterMixedMb !== undefined)
		rows.push({
			goal: 'resident memory after 10,000 mixed requests',
			target: '≤ 150 MB',
			measured: `${f.rssAfterMixedMb} MB`,
			met: f.rssAfterMixedMb <= 150
		});
	for (const [id, goal, maxKb] of JS_GOALS) {
		const p = f.js?.find((x) => x.name === id);
		if (!p) continue;
		rows.push({
			goal,
			target: maxKb ? `≤ ${maxKb} KB` : 'none',
			measured: `${p.kb} KB in ${p.files} files`,
			met: p.kb <= maxKb
		});
	}
	const decoderElsewhere = f.js?.filter((p) => p.qrDecoder && p.name !== 'scan') ?? [];
	if (f.js?.length)
		rows.push({
			goal: 'QR decoder only on the scan page',
			target: 'no other page',
			measured: decoderElsewhere.length ? decoderElsewhere.map((p) => p.name).join(', ') : 'none',
			met: decoderElsewhere.length === 0
		});
	return rows;
}

export function printGoals(rows: GoalRow[]): void {
	console.log('\nGoals (issue 13), shares of the bare probe in this run');
	console.log(`${'goal'.padEnd(46)}  ${'target'.padEnd(22)}  ${'measured'.padEnd(28)}  result`);
	for (const r of rows)
		console.log(
			`${r.goal.padEnd(46)}  ${r.target.padEnd(22)}  ${r.measured.padEnd(28)}  ${r.met ? 'met' : 'SHORT'}`
		);
}
