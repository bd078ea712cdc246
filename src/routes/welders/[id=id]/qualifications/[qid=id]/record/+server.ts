import { error } from '@sveltejs/kit';
import { requireRole } from '$lib/server/auth/guards';
import { openUploadStream, webStream } from '$lib/server/storage';
import { VIEW_ROLES } from '$lib/server/welders/access';
import { qualificationRecord } from '$lib/server/welders/qualifications';
import type { RequestHandler } from './$types';

// The uploaded test record, to members of the owning shop only.
export const GET: RequestHandler = async (event) => {
	const user = requireRole(event, ...VIEW_ROLES);
	const rec = await qualificationRecord(
		user.shopId,
		Number(event.params.id),
		Number(event.params.qid)
	);
	const found = rec && (await openUploadStream(rec.key));
	if (!rec || !found) error(404, { message: 'No test record here.' });
	const name = rec.name.replace(/[^A-Za-z0-9._-]+/g, '-').slice(0, 100) || 'test-record.pdf';
	return new Response(webStream(found.body), {
		headers: {
			'Content-Type': 'application/pdf',
			'Content-Length': String(found.bytes),
			'Content-Disposition': `attachment; filename="${name}"`,
			'X-Content-Type-Options': 'nosniff',
			'Cache-Control': 'private, no-store'
		}
	});
};
