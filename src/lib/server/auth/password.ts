import bcrypt from 'bcryptjs';

// OWASP's floor for bcrypt; sign-in checks twice (our action, then Auth.js), so keep it at that.
const COST = 10;
export const MIN_PASSWORD_LENGTH = 10;

export function hashPassword(plain: string): Promise<string> {
	return bcrypt.hash(plain, COST);
}

// Compared against when the e-mail is unknown, so a wrong e-mail costs the same time as a wrong
// password and timing does not tell which e-mails have accounts.
let decoy: Promise<string> | undefined;

export async function verifyPassword(plain: string, hash: string | null | undefined) {
	if (!hash) {
		await bcrypt.compare(plain, await (decoy ??= bcrypt.hash('not-a-password', COST)));
		return false;
	}
	return bcrypt.compare(plain, hash);
}
