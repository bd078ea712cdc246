// Why the server would refuse a weld log, in the shop's words: the joint's revision is not the
// one in force, or the welder is not qualified for it (process, positions, thickness, F-Number)
// or their qualification lapsed (no use of the process for six months). Read outside the write
// (loadWelders reads without a transaction); the weld log's own write decides the rest.
import type { RevisionVariables } from '$lib/schemas/procedure';
import { Procedure, ProcedureRevision, type JobJoint, type Welder } from '../models';
import type { WeldPass } from '../models/weld-log';
import { readVariables } from '../procedures/find';
import { matchWelders } from '../welders/procedure-match';
import { describeRevision } from '../welders/procedure-welders';
import { loadWelders } from '../welders/read';

export interface WeldCheck {
	/** Plain words for the welder; null when the log may go ahead. */
	refusal: string | null;
	/** 'revision' refusals cannot be overridden: the engineer must move the joint first. */
	kind: 'ok' | 'revision' | 'qualification';
	process: RevisionVariables['process'];
	procedureLabel: string;
	/** The passes the procedure has: a single-pass procedure has only the one (logged as root). */
	passes: WeldPass[];
}

export function passesOf(v: RevisionVariables): WeldPass[] {
	return v.technique.passes === 'single' ? ['root'] : ['root', 'fill', 'cap'];
}

const STATE_WORDS: Record<string, string> = {
	draft: 'still a draft',
	'in-review': 'still in review',
	superseded: 'superseded by a newer revision',
	withdrawn: 'withdrawn'
};

export async function checkWeld(
	shopId: number,
	joint: Pick<JobJoint, 'mark' | 'position' | 'jointType' | 'revisionId'>,
	welder: Pick<Welder, 'id' | 'name'>,
	today: string
): Promise<WeldCheck> {
	const revision = await ProcedureRevision.findOne({
		where: { id: joint.revisionId, shopId },
		rejectOnEmpty: true
	});
	const procedure = await Procedure.findByPk(revision.procedureId, { rejectOnEmpty: true });
	const label = `${procedure.number} rev ${revision.rev}`;
	const { variables } = readVariables(revision);
	const base = { process: variables.process, procedureLabel: label, passes: passesOf(variables) };
	if (revision.state !== 'approved')
		return {
			...base,
			kind: 'revision',
			refusal: `${joint.mark} is to be welded to ${label}, which is ${STATE_WORDS[revision.state] ?? revision.state}: it is not in force. Ask the engineer to move the joint to the revision in force; nothing was logged.`
		};
	// The welder must hold the joint's own position (not every position the procedure allows).
	const described = {
		...describeRevision(variables),
		positions: [joint.position],
		joint: /F$/.test(joint.position) ? ('fillet' as const) : ('groove' as const)
	};
	const [view] = await loadWelders(shopId, today, { ids: [welder.id] });
	const [match] = view ? matchWelders(described, [view]) : [];
	if (!view || !view.active || !match)
		return {
			...base,
			kind: 'qualification',
			refusal: `${welder.name} is not an active welder of your shop.`
		};
	if (match.qualified) return { ...base, kind: 'ok', refusal: null };
	const failed = match.checks.filter((c) => !c.ok);
	const lapsed = failed.find((c) => c.what === 'status');
	const why = lapsed
		? `the ${variables.process} qualification has lapsed (${lapsed.message}): no logged use of the process in six months`
		: failed.map((c) => c.message).join('; ');
	return {
		...base,
		kind: 'qualification',
		refusal: `${welder.name} may not weld ${joint.mark} to ${label}: ${why}. An inspector can record an override with a reason; nothing was logged.`
	};
}
