import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { config } from '../config';

let cached: string | undefined;

/** AUTH_SECRET from the environment, or one made at first start and kept in the data folder. */
export function authSecret(): string {
	if (cached) return cached;
	if (process.env.AUTH_SECRET) return (cached = process.env.AUTH_SECRET);
	const file = join(config.dataDir, 'auth-secret');
	if (!existsSync(file)) {
		mkdirSync(config.dataDir, { recursive: true });
		writeFileSync(file, randomBytes(32).toString('base64url'), { mode: 0o600 });
	}
	return (cached = readFileSync(file, 'utf8').trim());
}
