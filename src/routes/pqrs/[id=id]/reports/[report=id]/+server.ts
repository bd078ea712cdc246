import { error } from '@sveltejs/kit';
import { requireRole } from '$lib/server/auth/guards';
import { RefusedError } from '$lib/server/people/errors';
import { VIEW_ROLES } from '$lib/server/procedures';
import { rethrowAsHttp } from '$lib/server/procedures/form-errors';
import { openReport } from '$lib/server/pqrs';
import type { RequestHandler } from './$types';

// Served to members of the owning shop only, never cached, never sniffed, always as a download.
export const GET: RequestHandler = async (event) => {
	const user = requireRole(event, ...VIEW_ROLES);
	try {
		const { bytes, name } = await openReport(
			user,
			Number(event.params.id),
			Number(event.params.report),
			event
		);
		const ascii = name.replace(/[^\x20-\x7e]/g, '_');
		return new Response(new Uint8Array(bytes), {
			headers: {
				'Content-Type': 'application/pdf',
				'Content-Length': String(bytes.length),
				'Content-Disposition': `attachment; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(name)}`,
				'X-Content-Type-Options': 'nosniff',
				'Cache-Control': 'private, no-store'
			}
		});
	} catch (e) {
		if (e instanceof RefusedError) error(409, { message: e.message });
		rethrowAsHttp(e);
	}
};
