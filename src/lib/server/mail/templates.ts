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
