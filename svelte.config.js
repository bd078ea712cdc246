import adapter from '@sveltejs/adapter-node';
import { vitePreprocess } from '@sveltejs/vite-plugin-svelte';

/**
 * adapter-node bundles Kit's already-bundled output again with rollup, which reports a chunk
 * that tree-shakes to nothing (Kit's `$env` stub when no page reads public variables; a shared
 * chunk whose exports all moved into its importers). Those notices are the adapter's re-bundling,
 * not the app's code; every other warning still prints, and `npm test` fails on it.
 * @param {import('@sveltejs/kit').Adapter} inner
 * @returns {import('@sveltejs/kit').Adapter}
 */
function withoutEmptyChunkNotices(inner) {
	return {
		...inner,
		async adapt(builder) {
			const warn = console.warn;
			console.warn = (...args) => {
				if (/^Generated an empty chunk: "[\w./-]+"\.?$/.test(String(args[0]))) return;
				warn(...args);
			};
			try {
				return await inner.adapt(builder);
			} finally {
				console.warn = warn;
			}
		}
	};
}

/** @type {import('@sveltejs/kit').Config} */
const config = {
	preprocess: vitePreprocess(),
	compilerOptions: {
		// Runes everywhere in our code; libraries compile their own way.
		runes: ({ filename }) => (filename.split(/[/\\]/).includes('node_modules') ? undefined : true)
	},
	kit: {
		// BUILD_DIR / KIT_OUT_DIR let parallel work trees build side by side without clobbering.
		adapter: withoutEmptyChunkNotices(adapter({ out: process.env.BUILD_DIR ?? 'build' })),
		outDir: process.env.KIT_OUT_DIR ?? '.svelte-kit',
		typescript: {
			// Type-check the reference tables, scripts and tool configs with the app's settings.
			config: (tsconfig) => {
				tsconfig.include.push('../reference/**/*.ts', '../scripts/**/*.ts', '../*.config.ts');
			}
		},
		// Registered by the app shell for signed-in members only (src/lib/components/AppShell.svelte).
		serviceWorker: { register: false },
		alias: {
			$reference: 'reference',
			// One adapter by its own path (see src/lib/forms/zod4.ts).
			'$superforms-zod4': 'node_modules/sveltekit-superforms/dist/adapters/zod4'
		},
		csp: {
			mode: 'auto',
			directives: {
				'default-src': ['self'],
				'script-src': ['self'],
				'style-src': ['self', 'unsafe-inline'],
				'img-src': ['self', 'data:', 'blob:'],
				'font-src': ['self'],
				'connect-src': ['self'],
				'worker-src': ['self'],
				'manifest-src': ['self'],
				'media-src': ['self', 'blob:'],
				'object-src': ['none'],
				'base-uri': ['self'],
				'form-action': ['self'],
				'frame-ancestors': ['none']
			}
		}
	}
};

export default config;
