// What holds a V8 heap snapshot: self size by kind and constructor (as DevTools' Summary view
// groups it), and the JavaScript source kept per package (each module's Script and its source
// text), so "which modules are loaded and how much do they hold" has a figure.
import { readFileSync } from 'node:fs';

interface Snapshot {
	snapshot: {
		meta: {
			node_fields: string[];
			node_types: [string[]];
			edge_fields: string[];
			edge_types: [string[]];
		};
	};
	nodes: number[];
	edges: number[];
	strings: string[];
}

const mb = (b: number) => (b / 1024 / 1024).toFixed(1).padStart(6);

function packageOf(url: string): string {
	const nm = /node_modules\/((?:@[^/]+\/)?[^/]+)/.exec(url);
	if (nm) return nm[1]!;
	if (/\/build\/server\/|\/\.svelte-kit|\/build\//.test(url)) return '(app build)';
	if (url.startsWith('node:')) return '(node core)';
	return url.slice(0, 60) || '(anonymous)';
}

export function summariseSnapshot(file: string): void {
	const s = JSON.parse(readFileSync(file, 'utf8')) as Snapshot;
	const m = s.snapshot.meta;
	const nf = m.node_fields.length;
	const ef = m.edge_fields.length;
	const types = m.node_types[0];
	const edgeTypes = m.edge_types[0];
	const iType = m.node_fields.indexOf('type');
	const iName = m.node_fields.indexOf('name');
	const iSize = m.node_fields.indexOf('self_size');
	const iEdges = m.node_fields.indexOf('edge_count');
	const eType = m.edge_fields.indexOf('type');
	const eName = m.edge_fields.indexOf('name_or_index');
	const eTo = m.edge_fields.indexOf('to_node');
	const n = s.nodes.length / nf;
	const byKind = new Map<string, { size: number; count: number }>();
	const add = (k: string, size: number) => {
		const e = byKind.get(k) ?? { size: 0, count: 0 };
		e.size += size;
		e.count++;
		byKind.set(k, e);
	};
	let total = 0;
	const firstEdge = new Uint32Array(n + 1);
	for (let i = 0, e = 0; i < n; i++) {
		firstEdge[i] = e;
		e += s.nodes[i * nf + iEdges]! * ef;
		if (i === n - 1) firstEdge[n] = e;
	}
	const source = new Map<string, { size: number; scripts: number }>();
	for (let i = 0; i < n; i++) {
		const type = types[s.nodes[i * nf + iType]!]!;
		const name = s.strings[s.nodes[i * nf + iName]!]!;
		const size = s.nodes[i * nf + iSize]!;
		total += size;
		const kind =
			type === 'object' || type === 'native'
				? name.length > 50
					? name.slice(0, 50) + '…'
					: name
				: type === 'code' || type === 'closure' || type === 'hidden' || type === 'array'
					? `(${type}) ${name.startsWith('system /') ? name : ''}`.trim()
					: `(${type})`;
		add(kind, size);
		if (type === 'code' && name !== '' && !name.startsWith('system /')) {
			const url = name;
			let src = 0;
			for (let e = firstEdge[i]!; e < firstEdge[i + 1]!; e += ef) {
				if (
					edgeTypes[s.edges[e + eType]!] !== 'internal' &&
					edgeTypes[s.edges[e + eType]!] !== 'property'
				)
					continue;
				const en = s.strings[s.edges[e + eName]!];
				const to = s.edges[e + eTo]! / nf;
				if (en === 'source') src = s.nodes[to * nf + iSize]!;
			}
			if (!src) continue;
			const p = packageOf(url);
			const entry = source.get(p) ?? { size: 0, scripts: 0 };
			entry.size += src;
			entry.scripts++;
			source.set(p, entry);
		}
	}
	console.log(`\n  heap snapshot: ${n} objects, ${mb(total).trim()} MB self size in all`);
	console.log('  biggest kinds by self size (MB, count):');
	for (const [k, v] of [...byKind].sort((a, b) => b[1].size - a[1].size).slice(0, 25))
		console.log(`   ${mb(v.size)}  ${String(v.count).padStart(8)}  ${k}`);
	console.log('  JavaScript source held, by package (MB of source text, scripts):');
	for (const [k, v] of [...source].sort((a, b) => b[1].size - a[1].size).slice(0, 25))
		console.log(`   ${mb(v.size)}  ${String(v.scripts).padStart(5)}  ${k}`);
}

if (import.meta.url === `file://${process.argv[1]}`) summariseSnapshot(process.argv[2]!);
