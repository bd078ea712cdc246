// Loads app modules the way the server bundle sees them, from a plain tsx script: through Vite's
// SSR loader, which understands `?inline` (the PDF fonts) and the $lib / $reference aliases.
// No SvelteKit plugin: the modules loaded here need neither $app nor $env.
import { resolve } from 'node:path';
import { createServer, type ViteDevServer } from 'vite';

export async function viteLoader(): Promise<{
	load: <T>(path: string) => Promise<T>;
	close: () => Promise<void>;
}> {
	const root = resolve('.');
	const server: ViteDevServer = await createServer({
		configFile: false,
		root,
		logLevel: 'error',
		appType: 'custom',
		server: { middlewareMode: true, hmr: false, ws: false, watch: null },
		optimizeDeps: { noDiscovery: true, include: [] },
		resolve: {
			alias: { $lib: resolve(root, 'src/lib'), $reference: resolve(root, 'reference') }
		}
	});
	return {
		load: async <T>(path: string) => (await server.ssrLoadModule(path)) as T,
		close: () => server.close()
	};
}
