import js from '@eslint/js';
import svelte from 'eslint-plugin-svelte';
import globals from 'globals';
import { createNodeResolver, importX } from 'eslint-plugin-import-x';
import ts from 'typescript-eslint';
import svelteConfig from './svelte.config.js';

export default ts.config(
	{
		ignores: [
			'build/',
			'build-*/',
			'.svelte-kit/',
			'.svelte-kit-*/',
			'data/',
			'test-results*/',
			'playwright-report/'
		]
	},
	js.configs.recommended,
	...ts.configs.recommended,
	...svelte.configs.recommended,
	{
		languageOptions: { globals: { ...globals.browser, ...globals.node } },
		rules: {
			'no-undef': 'off',
			// Beadline is always served at the root (no `paths.base`), so plain hrefs are the resolved ones.
			'svelte/no-navigation-without-resolve': 'off'
		}
	},
	{
		files: ['**/*.ts', '**/*.svelte', '**/*.svelte.ts'],
		languageOptions: {
			parserOptions: {
				projectService: true,
				extraFileExtensions: ['.svelte'],
				parser: ts.parser,
				svelteConfig
			}
		},
		rules: {
			// A promise nobody awaits hides failed writes: the same rule SvelteKit's own repo keeps.
			'@typescript-eslint/no-floating-promises': 'error',
			'@typescript-eslint/no-unused-vars': [
				'error',
				{ argsIgnorePattern: '^_', varsIgnorePattern: '^_' }
			]
		}
	},
	{
		// The weld core is layered: types.ts at the bottom, checks above it, run-checks on top. A
		// circle would make the order of module initialisation matter and hide which layer owns what.
		files: ['src/lib/weld/**/*.ts'],
		plugins: { 'import-x': importX },
		settings: {
			'import-x/extensions': ['.ts', '.js'],
			// The files it follows are TypeScript: without the parser named here they are skipped silently.
			'import-x/parsers': { '@typescript-eslint/parser': ['.ts'] },
			'import-x/resolver-next': [createNodeResolver({ extensions: ['.ts', '.js'] })]
		},
		rules: { 'import-x/no-cycle': ['error', { ignoreExternal: true }] }
	},
	{
		// SvelteKit keeps the service worker out of the app's tsconfig (it runs with the webworker
		// library, not the DOM): it has a tsconfig of its own.
		files: ['src/service-worker.ts'],
		languageOptions: {
			parserOptions: { projectService: false, project: './tsconfig.worker.json' }
		}
	}
);
