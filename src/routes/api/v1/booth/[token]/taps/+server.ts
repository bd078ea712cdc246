import { json } from '@sveltejs/kit';
import { api, apiMember, readBody } from '$lib/server/api/respond';
import { memberKey } from '$lib/server/auth/member-key';
import { receiveTap } from '$lib/server/booth';
import { boothTapSchema } from '$lib/schemas/booth-tap';

/**
 * A continuity tap from the phone's offline queue. Each id is taken once per person: 201 when it
 * logged a use, 200 when it changed nothing (the day was logged, or the id had arrived before),
 * 422 with the reason when it was refused (the phone shows it to the welder), 409 when the phone
 * queued it for another person than the one signed in now (it stays queued for them).
 */
export const POST = api(async (event) => {
	const user = await apiMember(event);
	const body = await readBody(event, boothTapSchema);
	if (body.member && body.member !== memberKey(user.id))
		return json(
			{ outcome: 'other-member', message: 'This tap was made by someone else on this phone.' },
			{ status: 409 }
		);
	const r = await receiveTap(
		user,
		String(event.params.token),
		{ id: body.id, madeAt: new Date(body.madeAt) },
		event
	);
	const status = r.outcome === 'refused' ? 422 : r.outcome === 'logged' && !r.repeat ? 201 : 200;
	return json(r, { status });
});
