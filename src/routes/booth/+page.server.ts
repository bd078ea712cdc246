import { requireMember } from '$lib/server/auth/guards';
import { currentBoothLinks } from '$lib/server/booth';
import type { PageServerLoad } from './$types';

// No JavaScript of its own: a list of links. The offline agent (service worker, queued taps,
// update prompt) still comes with the shell as its own small script (AppShell.svelte).
export const csr = false;

// Every member may stand at a booth: any role reads a posted procedure.
export const load: PageServerLoad = async (event) => {
	const user = requireMember(event);
	return { current: await currentBoothLinks(user.shopId) };
};
