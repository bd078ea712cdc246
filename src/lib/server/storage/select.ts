// The back end this process uses, chosen once from STORAGE. The AWS SDK is imported only when
// STORAGE=s3, so the default path's start-up time and memory are what they were.
import { config } from '../config';
import { ConfigError } from '../config-error';
import type { StorageBackend } from './backend';
import { LocalStorage } from './local';

let chosen: { signature: string; backend: Promise<StorageBackend> } | null = null;

/** A back end from the environment as it is now (tests change it between files). */
export async function backendFromEnv(): Promise<StorageBackend> {
	const kind = config.storage;
	if (kind === 'local') return new LocalStorage(config.uploadsDir);
	if (kind === 's3') {
		const { s3FromEnv } = await import('./s3');
		return s3FromEnv();
	}
	throw new ConfigError(`STORAGE is "${kind}"; it must be "local" (the default) or "s3".`);
}

/** The process's back end (one client, reused). */
export function storage(): Promise<StorageBackend> {
	const signature = JSON.stringify([config.storage, config.uploadsDir, config.s3]);
	if (chosen?.signature !== signature) {
		const backend = backendFromEnv();
		chosen = { signature, backend };
		// A failed choice is not kept: the next call reports it again.
		backend.catch(() => {
			if (chosen?.backend === backend) chosen = null;
		});
	}
	return chosen.backend;
}

/** At start-up (server init, scripts): the store is reachable and writable, or ConfigError. */
export async function checkStorage(): Promise<StorageBackend> {
	const backend = await storage();
	await backend.check();
	return backend;
}

/** Lets go of the process's back end (scripts, before they end); the next use makes a new one. */
export async function closeStorage(): Promise<void> {
	const current = chosen;
	chosen = null;
	if (current) await (await current.backend.catch(() => null))?.close();
}
