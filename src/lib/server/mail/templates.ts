import type { Role } from '$lib/roles';
import { ROLE_LABELS } from '$lib/roles';
import type { OutgoingMail } from './send';

const SIGNATURE = '\n\n— Beadline, for your shop\u2019s welding records and procedures';

export function inviteMail(p: {
	to: string;
	name: string;
	shopName: string;
	invitedBy: string;
	role: Role;
	link: string;
	expiresAt: Date;
}): OutgoingMail {
	return {
		to: p.to,
		subject: `You are invited to ${p.shopName} on Beadline`,
		text:
			`Hello ${p.name},\n\n${p.invitedBy} invited you to join ${p.shopName} on Beadline as ` +
			`${ROLE_LABELS[p.role].toLowerCase()}.\n\nSet your password here (the link works once, ` +
			`until ${p.expiresAt.toUTCString()}):\n${p.link}` +
			SIGNATURE
	};
}

export function signInLinkMail(p: { to: string; link: string }): OutgoingMail {
	return {
		to: p.to,
		subject: 'Your Beadline sign-in link',
		text:
			`Use this link to sign in to Beadline. It works once and expires in 24 hours:\n${p.link}\n\n` +
			'If you did not ask for it, ignore this message.' +
			SIGNATURE
	};
}

/** A welder qualification is about to lapse (30 or 7 days ahead) or lapsed today. */
export function lapseNoticeMail(p: {
	to: string;
	forWelder: boolean;
	welderName: string;
	stamp: string;
	process: string;
	code: string;
	lapsesOn: string;
	daysLeft: number;
	basis: 'use' | 'confirmation';
	kind: '30-day' | '7-day' | 'day';
	link: string;
}): OutgoingMail {
	const who = p.forWelder ? 'Your' : `${p.welderName}\u2019s (${p.stamp})`;
	const when =
		p.daysLeft > 0
			? `lapses in ${p.daysLeft} day${p.daysLeft === 1 ? '' : 's'}, on ${p.lapsesOn}`
			: `lapsed on ${p.lapsesOn}`;
	const keep =
		p.basis === 'confirmation'
			? 'The employer\u2019s responsible person confirms it (ISO 9606-1, every six months).'
			: `Welding with ${p.process} and logging it keeps it current (six months from the last use).`;
	const subject =
		p.kind === 'day'
			? `Lapsed: ${p.welderName}'s ${p.process} qualification (${p.lapsesOn})`
			: `${p.kind} notice: ${p.welderName}'s ${p.process} qualification lapses on ${p.lapsesOn}`;
	return {
		to: p.to,
		subject,
		text:
			`${who} ${p.process} qualification (${p.code}) ${when}.\n\n${keep}\n\n` +
			`See the qualification and its log:\n${p.link}` +
			SIGNATURE
	};
}

/** A procedure revision waits for review: to the shop's inspectors. */
export function reviewRequestedMail(p: {
	to: string[];
	number: string;
	rev: number;
	title: string;
	submittedBy: string;
	link: string;
}): OutgoingMail {
	return {
		to: p.to,
		subject: `Review requested: ${p.number} revision ${p.rev}`,
		text:
			`${p.submittedBy} sent ${p.number} revision ${p.rev} (${p.title}) for review.\n\n` +
			`Read it with the check findings beside each value, then approve with your signature or ` +
			`return it with comments:\n${p.link}` +
			SIGNATURE
	};
}

/** An inspector approved or returned a revision: to its author. */
export function revisionDecidedMail(p: {
	to: string[];
	number: string;
	rev: number;
	title: string;
	meaning: 'approved' | 'returned';
	decidedBy: string;
	comment: string | null;
	link: string;
}): OutgoingMail {
	const approved = p.meaning === 'approved';
	const comment = p.comment ? `\n\nComment from ${p.decidedBy}:\n${p.comment}` : '';
	return {
		to: p.to,
		subject: approved
			? `Approved: ${p.number} revision ${p.rev}`
			: `Returned with comments: ${p.number} revision ${p.rev}`,
		text:
			(approved
				? `${p.decidedBy} approved and signed ${p.number} revision ${p.rev} (${p.title}). It is now the revision in force.`
				: `${p.decidedBy} returned ${p.number} revision ${p.rev} (${p.title}) to draft.`) +
			comment +
			`\n\nOpen the revision:\n${p.link}` +
			SIGNATURE
	};
}
