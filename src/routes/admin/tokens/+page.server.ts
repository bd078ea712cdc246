import { fail, message, superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { createApiToken, listApiTokens, revokeApiToken } from '$lib/server/api/api-tokens';
import { requireRole } from '$lib/server/auth/guards';
import { apiTokenSchema, tokenIdSchema } from '$lib/schemas/account';
import type { Actions, PageServerLoad } from './$types';
import { postedForm } from '$lib/server/forms/posted-form';

export const load: PageServerLoad = async (event) => {
	const admin = requireRole(event, 'admin');
	const tokens = await listApiTokens(admin.shopId);
	return {
		form: await superValidate(zod4(apiTokenSchema), { defaults: { name: '', role: 'engineer' } }),
		tokens: tokens.map((t) => ({
			id: t.id,
			name: t.name,
			role: t.role,
			prefix: t.prefix,
			createdBy: (t as typeof t & { createdBy?: { name: string } }).createdBy?.name ?? '',
			createdAt: t.createdAt.toISOString(),
			lastUsedAt: t.lastUsedAt?.toISOString() ?? null,
			revokedAt: t.revokedAt?.toISOString() ?? null
		}))
	};
};

export const actions: Actions = {
	create: async (event) => {
		const admin = requireRole(event, 'admin');
		const form = await superValidate(await postedForm(event.request), zod4(apiTokenSchema));
		if (!form.valid) return fail(400, { form });
		const { secret } = await createApiToken(admin, form.data, event);
		// The secret goes back once in this answer and is never readable again.
		return message(form, { secret, name: form.data.name });
	},
	revoke: async (event) => {
		const admin = requireRole(event, 'admin');
		const parsed = tokenIdSchema.safeParse(Object.fromEntries(await postedForm(event.request)));
		if (!parsed.success) return fail(400, { revokeError: 'Unknown token.' });
		const ok = await revokeApiToken(admin, parsed.data.tokenId, event);
		if (!ok) return fail(404, { revokeError: 'That token is unknown or already revoked.' });
		return { revoked: parsed.data.tokenId };
	}
};
