// The server side of the procedure page's "who can weld this" panel.
import type { RevisionVariables } from '$lib/schemas/procedure';
import type { SessionUser } from '../auth/session-user';
import { localDay } from './dates';
import { matchWelders, type ProcedureDescription, type WelderMatch } from './procedure-match';
import { loadWelders } from './read';

export interface ProcedureWelders {
	asOf: string;
	matches: WelderMatch[];
}

/** A procedure revision's variables as the matcher reads them (SI, as stored). */
export function describeRevision(v: RevisionVariables): ProcedureDescription {
	const onlyFillet =
		v.joints.types.length > 0 && v.joints.types.every((t) => t === 'tee' || t === 'lap');
	return {
		process: v.process,
		positions: v.positions.allowed,
		joint: onlyFillet ? 'fillet' : 'groove',
		thicknessMm: v.baseMetals.thicknessMm,
		// Several F-Numbers on one WPS: the welder must hold the first listed (the main filler).
		fNumber: v.fillerMetals.fNumbers[0] ?? null,
		pipeOdMm: null
	};
}

export async function weldersForProcedure(
	actor: Pick<SessionUser, 'shopId' | 'timeZone'>,
	procedure: ProcedureDescription,
	now: Date = new Date()
): Promise<ProcedureWelders> {
	const today = localDay(now, actor.timeZone);
	const welders = await loadWelders(actor.shopId, today, { activeOnly: true });
	return { asOf: today, matches: matchWelders(procedure, welders) };
}
