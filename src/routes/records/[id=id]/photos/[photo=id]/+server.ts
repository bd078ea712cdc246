import { error } from '@sveltejs/kit';
import { requireMember } from '$lib/server/auth/guards';
import { SettingsPhoto } from '$lib/server/models';
import { openUploadStream, webStream } from '$lib/server/storage';
import type { RequestHandler } from './$types';

// Any member of the owning shop may see a record's photos; nobody else learns they exist.
export const GET: RequestHandler = async (event) => {
	const user = requireMember(event);
	const photo = await SettingsPhoto.findOne({
		where: {
			id: Number(event.params.photo),
			recordId: Number(event.params.id),
			shopId: user.shopId,
			removedAt: null
		}
	});
	if (!photo) error(404, { message: 'No such photo.' });
	const thumb = event.url.searchParams.get('size') === 'thumb';
	const found = await openUploadStream(thumb ? photo.thumbKey : photo.storageKey);
	if (!found) error(404, { message: 'The photo file is missing from storage.' });
	const type = thumb ? 'image/jpeg' : photo.mime;
	const ext = type === 'image/png' ? 'png' : 'jpg';
	// Streamed from the store through this check: the bucket is never exposed to the browser.
	return new Response(webStream(found.body), {
		headers: {
			'Content-Type': type,
			'Content-Length': String(found.bytes),
			// Inline so it shows in the page; the name is ours, never the uploaded one.
			'Content-Disposition': `inline; filename="record-${photo.recordId}-photo-${photo.id}${thumb ? '-thumb' : ''}.${ext}"`,
			'X-Content-Type-Options': 'nosniff',
			'Cache-Control': 'private, no-store'
		}
	});
};
