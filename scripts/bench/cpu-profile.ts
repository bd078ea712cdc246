// Sums a V8 .cpuprofile (what `node --cpu-prof` writes) by function or by package, self time
// only, so the top of the list is where the CPU actually went.
interface CallFrame {
	functionName: string;
	url: string;
	lineNumber: number;
}
interface ProfileNode {
	id: number;
	callFrame: CallFrame;
}
export interface CpuProfile {
	nodes: ProfileNode[];
	startTime: number;
	samples: number[];
	timeDeltas: number[];
}

/** A span of CLOCK_MONOTONIC in µs (process.hrtime in any process, V8's profile clock too). */
export interface Window {
	fromUs: number;
	toUs: number;
}

export const nowUs = () => Number(process.hrtime.bigint() / 1000n);

/** Each sample with its time (µs, monotonic) and frame, optionally held to a window. */
function samplesOf(p: CpuProfile, w?: Window) {
	const byId = new Map(p.nodes.map((x) => [x.id, x]));
	const out: { dtMs: number; frame: CallFrame | undefined }[] = [];
	let t = p.startTime;
	p.samples.forEach((id, i) => {
		const delta = p.timeDeltas[i] ?? 0;
		t += delta;
		if (w && (t < w.fromUs || t > w.toUs)) return;
		out.push({ dtMs: delta / 1000, frame: byId.get(id)?.callFrame });
	});
	return out;
}

/** CPU the server spent in a window (everything but idle), in ms. */
export function busyMs(p: CpuProfile, w: Window): number {
	return samplesOf(p, w).reduce(
		(sum, s) => (!s.frame || s.frame.functionName === '(idle)' ? sum : sum + s.dtMs),
		0
	);
}

/** `node_modules/@auth/core/…` → `@auth/core`; the app's own bundle → `app`; Node's → `node`. */
export function packageOf(url: string): string {
	const m = /node_modules\/((?:@[^/]+\/)?[^/]+)/.exec(url);
	if (m) return m[1]!;
	if (!url) return '(native / gc / idle)';
	if (url.startsWith('node:')) return 'node';
	return 'app';
}

function label(frame: CallFrame, by: 'function' | 'package'): string {
	if (by === 'package') return packageOf(frame.url);
	const file = frame.url
		.replace(/^.*node_modules\//, '')
		.replace(/^file:\/\/.*\/(build[^/]*)\//, '$1/');
	return `${frame.functionName || '(anonymous)'} ${file ? `${file}:${frame.lineNumber + 1}` : ''}`;
}

export function topCosts(
	p: CpuProfile,
	n: number,
	by: 'function' | 'package' = 'function',
	w?: Window
) {
	const ms = new Map<string, number>();
	let total = 0;
	for (const { dtMs: dt, frame } of samplesOf(p, w)) {
		total += dt;
		if (!frame || frame.functionName === '(idle)') continue;
		const key = label(frame, by);
		ms.set(key, (ms.get(key) ?? 0) + dt);
	}
	return [...ms]
		.sort((a, b) => b[1] - a[1])
		.slice(0, n)
		.map(
			([k, v]) =>
				`${((v / total) * 100).toFixed(1).padStart(5)} %  ${Math.round(v).toString().padStart(6)} ms  ${k}`
		);
}
