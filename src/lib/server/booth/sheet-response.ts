// The sheet downloads: the paper from ?paper= (else the shop's default), a PDF answer with a
// clean file name, and refusals as plain 4xx messages.
import { error, type RequestEvent } from '@sveltejs/kit';
import { NotFoundError, RefusedError } from '../people/errors';
import { PAPERS, type Paper } from './sheet-data';

export function paperOf(event: RequestEvent): Paper | null {
	const p = event.url.searchParams.get('paper');
	if (p === null || p === '') return null;
	if (!PAPERS.includes(p as Paper)) error(400, { message: 'Pick paper=letter or paper=a4.' });
	return p as Paper;
}

/** Letters, digits and dashes only: nothing a header or a file system could trip on. */
export const fileSafe = (s: string): string =>
	s
		.normalize('NFKD')
		.replace(/[^A-Za-z0-9]+/g, '-')
		.replace(/^-+|-+$/g, '')
		.slice(0, 60) || 'sheet';

export function pdfResponse(bytes: Uint8Array, fileName: string): Response {
	return new Response(bytes as BodyInit, {
		headers: {
			'Content-Type': 'application/pdf',
			'Content-Disposition': `attachment; filename="${fileName}"`,
			'Content-Length': String(bytes.length),
			'Cache-Control': 'private, no-store',
			'X-Content-Type-Options': 'nosniff'
		}
	});
}

export function rethrowSheet(e: unknown): never {
	if (e instanceof NotFoundError) error(404, { message: e.message });
	if (e instanceof RefusedError) error(409, { message: e.message });
	throw e;
}
