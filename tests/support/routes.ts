// Every route of the app, read from src/routes the way SvelteKit reads it: pages (GET), the named
// form actions of each +page.server.ts (POST ?/name), and the methods each +server.ts exports.
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join, relative, sep } from 'node:path';

export interface AppRoute {
	/** The route id, e.g. /records/[id=id]. */
	pattern: string;
	kind: 'page' | 'action' | 'endpoint';
	method: string;
	action?: string;
	/** `METHOD /pattern` or `POST /pattern?/action`: the key of the access rules. */
	key: string;
}

const METHODS = ['GET', 'HEAD', 'POST', 'PUT', 'PATCH', 'DELETE', 'OPTIONS', 'fallback'];

/** The keys at depth one of the object literal after `export const actions`. */
export function actionNames(source: string): string[] {
	const at = source.search(/export\s+const\s+actions\b/);
	if (at < 0) return [];
	const open = source.indexOf('{', source.indexOf('=', at));
	const names: string[] = [];
	let depth = 0;
	let token = '';
	let quote = '';
	for (let i = open; i < source.length; i++) {
		const c = source[i]!;
		if (quote) {
			if (c === quote && source[i - 1] !== '\\') quote = '';
			else if (depth === 1) token += c;
			continue;
		}
		if (c === '"' || c === "'" || c === '`') {
			quote = c;
			continue;
		}
		if (c === '/' && source[i + 1] === '/') {
			i = source.indexOf('\n', i);
			continue;
		}
		if (c === '/' && source[i + 1] === '*') {
			i = source.indexOf('*/', i) + 1;
			continue;
		}
		if (c === '{' || c === '(' || c === '[') depth++;
		else if (c === '}' || c === ')' || c === ']') {
			if (depth === 1 && token.trim()) names.push(token.trim()); // shorthand `{ save }`
			depth--;
			if (depth === 0) break;
		} else if (depth === 1 && (c === ':' || c === ',')) {
			if (c === ':' || token.trim()) names.push(token.trim());
			token = '';
			// skip the value up to the next comma at depth one
			if (c === ':') {
				let d = 0;
				for (i++; i < source.length; i++) {
					const v = source[i]!;
					if (v === '{' || v === '(' || v === '[') d++;
					else if (v === '}' || v === ')' || v === ']') {
						if (d === 0) {
							i--;
							break;
						}
						d--;
					} else if (v === ',' && d === 0) break;
				}
			}
		} else if (depth === 1) token += c;
	}
	return [...new Set(names.filter((n) => /^[\w-]+$/.test(n)))];
}

export function endpointMethods(source: string): string[] {
	const found = new Set<string>();
	const re = /export\s+(?:const|async\s+function|function)\s+([A-Za-z]+)\b/g;
	for (const m of source.matchAll(re)) if (METHODS.includes(m[1]!)) found.add(m[1]!);
	for (const m of source.matchAll(/export\s*\{([^}]*)\}/g))
		for (const part of m[1]!.split(',')) {
			const name = part
				.trim()
				.split(/\s+as\s+/)
				.pop()!;
			if (METHODS.includes(name)) found.add(name);
		}
	return [...found];
}

export function discoverRoutes(root = 'src/routes'): AppRoute[] {
	const out: AppRoute[] = [];
	const walk = (dir: string) => {
		const files = readdirSync(dir, { withFileTypes: true });
		const rel = relative(root, dir).split(sep).filter(Boolean);
		// Groups like (app) do not appear in the URL.
		const pattern = '/' + rel.filter((p) => !/^\(.*\)$/.test(p)).join('/');
		const has = (f: string) => existsSync(join(dir, f));
		if (has('+page.svelte') || has('+page.server.ts'))
			out.push({ pattern, kind: 'page', method: 'GET', key: `GET ${pattern}` });
		if (has('+page.server.ts'))
			for (const action of actionNames(readFileSync(join(dir, '+page.server.ts'), 'utf8'))) {
				const suffix = action === 'default' ? '' : `?/${action}`;
				out.push({
					pattern,
					kind: 'action',
					method: 'POST',
					action,
					key: `POST ${pattern}${suffix}`
				});
			}
		if (has('+server.ts'))
			for (const method of endpointMethods(readFileSync(join(dir, '+server.ts'), 'utf8')))
				out.push({ pattern, kind: 'endpoint', method, key: `${method} ${pattern}` });
		for (const f of files) if (f.isDirectory()) walk(join(dir, f.name));
	};
	walk(root);
	return out.sort((a, b) => a.key.localeCompare(b.key));
}

/** Fills [name] and [name=matcher] segments from `params`; a missing one throws. */
export function fillPath(pattern: string, params: Record<string, string | number>): string {
	return pattern.replace(/\[(?:\.\.\.)?(\w+)(?:=\w+)?\]/g, (_, name: string) => {
		const v = params[name];
		if (v === undefined) throw new Error(`No value for [${name}] in ${pattern}`);
		return encodeURIComponent(String(v));
	});
}
