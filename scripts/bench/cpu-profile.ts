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
	samples: number[];
	timeDeltas: number[];
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
		.replace(/^file:\/\/.*\/build\//, 'build/');
	return `${frame.functionName || '(anonymous)'} ${file ? `${file}:${frame.lineNumber + 1}` : ''}`;
}

export function topCosts(p: CpuProfile, n: number, by: 'function' | 'package' = 'function') {
	const byId = new Map(p.nodes.map((x) => [x.id, x]));
	const ms = new Map<string, number>();
	let total = 0;
	p.samples.forEach((id, i) => {
		const dt = (p.timeDeltas[i] ?? 0) / 1000;
		total += dt;
		const frame = byId.get(id)?.callFrame;
		if (!frame || frame.functionName === '(idle)') return;
		const key = label(frame, by);
		ms.set(key, (ms.get(key) ?? 0) + dt);
	});
	return [...ms]
		.sort((a, b) => b[1] - a[1])
		.slice(0, n)
		.map(
			([k, v]) =>
				`${((v / total) * 100).toFixed(1).padStart(5)} %  ${Math.round(v).toString().padStart(6)} ms  ${k}`
		);
}
