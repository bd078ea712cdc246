import js from '@eslint/js';
import svelte from 'eslint-plugin-svelte';
import globals from 'globals';
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
		// SvelteKit keeps the service worker out of the app's tsconfig (it runs with the webworker
		// library, not the DOM): it has a tsconfig of its own.
		files: ['src/service-worker.ts'],
		languageOptions: {
			parserOptions: { projectService: false, project: './tsconfig.worker.json' }
		}
	}
);
