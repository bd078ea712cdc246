import { createHash, randomBytes } from 'node:crypto';

// 32 random bytes in base64url: 43 characters, 256 bits, far past guessing.
const TOKEN_SHAPE = /^[A-Za-z0-9_-]{43}$/;

export function newInviteToken(): string {
	return randomBytes(32).toString('base64url');
}

/** Only this digest is stored, so a copy of the database holds no working invite link. */
export function hashInviteToken(token: string): string {
	return createHash('sha256').update(token).digest('hex');
}

export function looksLikeInviteToken(token: string): boolean {
	return TOKEN_SHAPE.test(token);
}
