import type { RequestEvent } from '@sveltejs/kit';
import { Shop, User } from '../models';
import type { SessionUser } from './session-user';

const SESSION_COOKIES = ['authjs.session-token', '__Secure-authjs.session-token'];

/**
 * Re-reads the member behind the Auth.js token on every request: a disabled member, or a token
 * older than the member's session version ("sign out everywhere"), is signed out right here.
 */
export async function currentMember(event: RequestEvent): Promise<SessionUser | null> {
	const session = (await event.locals.auth()) as { uid?: string; sv?: number } | null;
	if (!session?.uid) return null;
	const user = await User.findByPk(session.uid, { include: [Shop] });
	const shop = (user as (User & { Shop?: Shop }) | null)?.Shop;
	if (!user || !shop || !user.active || user.sessionVersion !== session.sv) {
		for (const name of SESSION_COOKIES) event.cookies.delete(name, { path: '/' });
		return null;
	}
	return {
		id: user.id,
		shopId: shop.id,
		shopName: shop.name,
		name: user.name,
		email: user.email,
		role: user.role,
		unitSystem: user.unitSystem ?? shop.unitSystem
	};
}
