// Uploads in a local folder outside static/ (UPLOADS_DIR). Each object is written to a temporary
// name and renamed, so a half-written file is never visible under its real name; a process killed
// in between leaves a `.part` file, which the start-up sweep moves aside.
import { randomBytes } from 'node:crypto';
import { createReadStream, createWriteStream } from 'node:fs';
import { mkdir, readdir, rename, rm, stat, writeFile } from 'node:fs/promises';
import { dirname, join, relative, sep } from 'node:path';
import type { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { ConfigError } from '../config-error';
import { assertName, type StorageBackend, type StoredObject } from './backend';

export class LocalStorage implements StorageBackend {
	readonly kind = 'local';
	constructor(readonly root: string) {}

	get where() {
		return this.root;
	}

	private path(name: string): string {
		assertName(name);
		return join(this.root, ...name.split('/'));
	}

	async put(name: string, body: Uint8Array | Readable): Promise<void> {
		const final = this.path(name);
		await mkdir(dirname(final), { recursive: true });
		const temp = `${final}.${randomBytes(4).toString('hex')}.part`;
		try {
			if (body instanceof Uint8Array) await writeFile(temp, body, { flag: 'wx' });
			else await pipeline(body, createWriteStream(temp, { flags: 'wx' }));
			await rename(temp, final);
		} catch (e) {
			await rm(temp, { force: true });
			throw e;
		}
	}

	async get(name: string): Promise<{ body: Readable; bytes: number } | null> {
		const path = this.path(name);
		try {
			const s = await stat(path);
			if (!s.isFile()) return null;
			return { body: createReadStream(path), bytes: s.size };
		} catch {
			return null;
		}
	}

	async exists(name: string): Promise<boolean> {
		try {
			return (await stat(this.path(name))).isFile();
		} catch {
			return false;
		}
	}

	async delete(name: string): Promise<void> {
		await rm(this.path(name), { force: true });
	}

	async *list(prefix = ''): AsyncIterable<StoredObject> {
		let entries;
		try {
			entries = await readdir(this.root, { recursive: true, withFileTypes: true });
		} catch {
			return; // no uploads yet
		}
		for (const e of entries) {
			if (!e.isFile()) continue;
			const full = join(e.parentPath, e.name);
			const name = relative(this.root, full).split(sep).join('/');
			if (!name.startsWith(prefix)) continue;
			const s = await stat(full).catch(() => null);
			if (s) yield { name, bytes: s.size, modified: s.mtime };
		}
	}

	async check(): Promise<void> {
		try {
			await mkdir(this.root, { recursive: true });
		} catch (e) {
			const why = (e as NodeJS.ErrnoException).code ?? 'error';
			throw new ConfigError(`UPLOADS_DIR (${this.root}) cannot be created (${why}).`);
		}
	}

	async close(): Promise<void> {}
}
