// The key a phone's service worker files kept pages and queued taps under, sent with every answer
// to a signed-in member (the x-beadline-member header). A digest of the account id, so the worker
// can tell one person from another on a shared phone without holding the id itself; an answer
// without it means nobody is signed in.
import { createHash } from 'node:crypto';

export const MEMBER_HEADER = 'x-beadline-member';

export function memberKey(userId: string): string {
	return createHash('sha256').update(`beadline-member:${userId}`).digest('hex').slice(0, 32);
}
