import { requireRole } from '$lib/server/auth/guards';
import { DATA_BOOK_ROLES } from '$lib/server/fabrication/data-book/access';
import { compileDataBook } from '$lib/server/fabrication/data-book/compile';
import { rethrowAsHttp } from '$lib/server/people/form-errors';
import { webStream } from '$lib/server/storage';
import type { RequestHandler } from './$types';

// POST /jobs/<id>/data-book: compiles the job's data book and sends it as one ZIP, streamed. A
// POST (the job page's form, which works before JavaScript loads): each compile is recorded.
export const POST: RequestHandler = async (event) => {
	const user = requireRole(event, ...DATA_BOOK_ROLES);
	const book = await compileDataBook(user, Number(event.params.id), event).catch(rethrowAsHttp);
	return new Response(webStream(book.zip()), {
		headers: {
			'Content-Type': 'application/zip',
			'Content-Disposition': `attachment; filename="${book.fileName}"`,
			'Cache-Control': 'private, no-store',
			'X-Content-Type-Options': 'nosniff',
			'X-Beadline-Data-Book': book.token
		}
	});
};
