import { isTimeZone } from '$lib/dates/time-zone';
import { z } from 'zod';
import { SHOP_CODES } from '$lib/procedures/default-code';
import { ROLES } from '$lib/roles';

// Shared by the forms (client and server) and the API: one definition of what is acceptable.
const MIN_PASSWORD = 10;

export const email = z
	.string()
	.trim()
	.toLowerCase()
	.min(1, 'Enter an e-mail address.')
	.max(254, 'That e-mail address is too long.')
	.pipe(z.email('Enter an e-mail address like name@example.com.'));

const personName = z
	.string()
	.trim()
	.min(1, 'Enter a name.')
	.max(120, 'Keep the name under 120 characters.');

const newPassword = z
	.string()
	.min(MIN_PASSWORD, `Use at least ${MIN_PASSWORD} characters.`)
	.max(200, 'Keep the password under 200 characters.');

export const signInSchema = z.object({
	email,
	password: z.string().min(1, 'Enter your password.').max(200, 'That password is too long.'),
	redirectTo: z.string().max(500).default('')
});

export const linkSignInSchema = z.object({ email });

export const signUpSchema = z
	.object({
		shopName: z
			.string()
			.trim()
			.min(2, 'Enter the shop\u2019s name.')
			.max(120, 'Keep it under 120 characters.'),
		name: personName,
		email,
		password: newPassword,
		confirm: z.string()
	})
	.refine((v) => v.password === v.confirm, {
		path: ['confirm'],
		message: 'The two passwords differ.'
	});

export const inviteSchema = z.object({
	name: personName,
	email,
	role: z.enum(ROLES, 'Pick a role.')
});

export const acceptInviteSchema = z
	.object({ password: newPassword, confirm: z.string() })
	.refine((v) => v.password === v.confirm, {
		path: ['confirm'],
		message: 'The two passwords differ.'
	});

export const changeRoleSchema = z.object({
	userId: z.uuid('Unknown person.'),
	role: z.enum(ROLES, 'Pick a role.')
});

export const personIdSchema = z.object({ userId: z.uuid('Unknown person.') });

export const shopSettingsSchema = z.object({
	name: z
		.string()
		.trim()
		.min(2, 'Enter the shop\u2019s name.')
		.max(120, 'Keep it under 120 characters.'),
	unitSystem: z.enum(['imperial', 'metric'], 'Pick imperial or metric.'),
	// Issue 15: what new procedures, PQRs and welder qualifications start from; each can differ.
	defaultCode: z.enum(SHOP_CODES, 'Pick the code the shop mostly works to.'),
	// Migration 0015: the shop's day for continuity and the clock its audit trail reads in.
	timeZone: z
		.string('Pick the shop\u2019s time zone.')
		.refine(isTimeZone, 'Pick the shop\u2019s time zone from the list.')
});

export const profileSchema = z.object({
	name: personName,
	unitSystem: z.enum(['shop', 'imperial', 'metric'], 'Pick a unit system.')
});

export const changePasswordSchema = z
	.object({
		current: z.string().min(1, 'Enter your current password.'),
		password: newPassword,
		confirm: z.string()
	})
	.refine((v) => v.password === v.confirm, {
		path: ['confirm'],
		message: 'The two passwords differ.'
	});

export const revokeInviteSchema = z.object({
	inviteId: z.coerce.number('Unknown invite.').int('Unknown invite.').positive('Unknown invite.')
});

export const apiTokenSchema = z.object({
	name: z
		.string()
		.trim()
		.min(2, 'Name the token after where it is used.')
		.max(80, 'Keep it under 80 characters.'),
	role: z.enum(['engineer', 'inspector', 'welder'], 'Pick the rights the token acts with.')
});

export const tokenIdSchema = z.object({
	tokenId: z.coerce.number().int().positive('Unknown token.')
});
