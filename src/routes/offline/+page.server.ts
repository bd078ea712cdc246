import type { PageServerLoad } from './$types';

// No JavaScript: the service worker keeps this page (fetched signed out, so it names nobody)
// and shows it offline for any page the phone has no copy of.
export const csr = false;

export const load: PageServerLoad = () => ({});
