// The bench's bare probe: a SvelteKit app with one JSON endpoint and nothing else, built with the
// same Kit and adapter-node as Beadline, so the bench can say how close each route comes to the
// framework's own ceiling on the same machine in the same run. Built into throw-away folders.
import adapter from '@sveltejs/adapter-node';

/** @type {import('@sveltejs/kit').Config} */
export default {
	kit: {
		// Under node_modules by default too, so no tool ever leaves Kit's files in the repository.
		adapter: adapter({
			out: process.env.PROBE_OUT ?? '../../../node_modules/.cache/beadline-probe/build'
		}),
		outDir: process.env.PROBE_KIT_DIR ?? '../../../node_modules/.cache/beadline-probe/kit'
	}
};
