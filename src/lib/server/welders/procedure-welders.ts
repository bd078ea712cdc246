// The server side of the procedure page's "who can weld this" panel.
import type { SessionUser } from '../auth/session-user';
import { localDay } from './dates';
import { matchWelders, type ProcedureDescription, type WelderMatch } from './procedure-match';
import { loadWelders } from './read';

export async function weldersForProcedure(
	actor: Pick<SessionUser, 'shopId'>,
	procedure: ProcedureDescription,
	now: Date = new Date()
): Promise<{ asOf: string; matches: WelderMatch[] }> {
	const today = localDay(now);
	const welders = await loadWelders(actor.shopId, today, { activeOnly: true });
	return { asOf: today, matches: matchWelders(procedure, welders) };
}
