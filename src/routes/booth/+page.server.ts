import { requireMember } from '$lib/server/auth/guards';
import { currentBoothLinks } from '$lib/server/booth';
import type { PageServerLoad } from './$types';

// Every member may stand at a booth: any role reads a posted procedure.
export const load: PageServerLoad = async (event) => {
	const user = requireMember(event);
	return { current: await currentBoothLinks(user.shopId) };
};
