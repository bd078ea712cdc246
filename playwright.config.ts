import { defineConfig, devices } from '@playwright/test';
import { execFileSync } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

// Workers re-read this file: values chosen here go into process.env so every worker sees the same.
function freePort(): string {
	const probe =
		"const s=require('net').createServer().listen(0,'127.0.0.1',()=>{console.log(s.address().port);s.close()})";
	return execFileSync(process.execPath, ['-e', probe]).toString().trim();
}
process.env.E2E_PORT ??= freePort();
process.env.E2E_SMTP_PORT ??= freePort();
process.env.E2E_DATA_DIR ??= mkdtempSync(join(tmpdir(), 'beadline-e2e-'));

const baseURL = `http://localhost:${process.env.E2E_PORT}`;

export default defineConfig({
	testDir: 'tests',
	outputDir: process.env.PW_OUTPUT_DIR ?? 'test-results',
	fullyParallel: false,
	workers: 2,
	retries: process.env.CI ? 1 : 0,
	timeout: 30_000,
	reporter: process.env.CI ? [['list']] : [['list'], ['html', { open: 'never' }]],
	use: {
		baseURL,
		trace: 'retain-on-failure',
		launchOptions: {
			executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
			args: [
				'--no-sandbox',
				'--disable-gpu',
				'--disable-background-networking',
				'--disable-component-update',
				'--disable-sync',
				'--no-first-run'
			]
		}
	},
	projects: [
		{ name: 'desktop', use: { ...devices['Desktop Chrome'] }, testIgnore: /\.phone\.test\.ts$/ },
		{ name: 'phone', use: { ...devices['Pixel 7'] }, testMatch: /\.phone\.test\.ts$/ }
	],
	webServer: {
		command: 'node --import tsx scripts/e2e-server.ts',
		url: `${baseURL}/signin`,
		reuseExistingServer: false,
		timeout: 120_000,
		stdout: 'pipe',
		stderr: 'pipe'
	}
});
