// What an error page may show: the framework's own message for 4xx (written for people), only a
// generic line and a reference for 5xx, whose detail goes to the server log under that reference.
import { randomBytes } from 'node:crypto';

export const GENERIC_SERVER_ERROR = 'Something went wrong on our side.';

export function publicError(
	error: unknown,
	status: number,
	message: string,
	log: (...args: unknown[]) => void = console.error
): { message: string; ref: string } {
	const ref = randomBytes(4).toString('hex');
	if (status >= 500) log(`[${ref}]`, error);
	return { message: status >= 500 ? GENERIC_SERVER_ERROR : message, ref };
}
