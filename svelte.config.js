import adapter from '@sveltejs/adapter-node';
import { vitePreprocess } from '@sveltejs/vite-plugin-svelte';

/** @type {import('@sveltejs/kit').Config} */
const config = {
	preprocess: vitePreprocess(),
	compilerOptions: {
		// Runes everywhere in our code; libraries compile their own way.
		runes: ({ filename }) => (filename.split(/[/\\]/).includes('node_modules') ? undefined : true)
	},
	kit: {
		// BUILD_DIR / KIT_OUT_DIR let parallel work trees build side by side without clobbering.
		adapter: adapter({ out: process.env.BUILD_DIR ?? 'build' }),
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
			$reference: 'reference'
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
