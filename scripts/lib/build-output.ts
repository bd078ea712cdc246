// What a quiet `vite build --logLevel warn` may print: SvelteKit's and the adapter's progress
// lines, nothing else. Anything more is a warning (a circular import, a module externalized for
// the browser, an empty chunk…), and `npm test` fails on it so the build stays quiet.
const EXPECTED = [
	/^$/,
	/^> Using @sveltejs\/adapter-node$/,
	/^✔ done$/,
	/^Run npm run preview to preview your production build locally\.$/
];

// eslint-disable-next-line no-control-regex
const ANSI = /\x1b\[[0-9;]*m/g;

/** The lines of a build's output that are not one of its expected progress lines. */
export function unexpectedBuildLines(output: string): string[] {
	return output
		.replace(ANSI, '')
		.split(/\r?\n/)
		.map((l) => l.trim())
		.filter((l) => !EXPECTED.some((re) => re.test(l)));
}
