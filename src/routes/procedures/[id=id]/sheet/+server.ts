import { error } from '@sveltejs/kit';
import { requireRole } from '$lib/server/auth/guards';
import { sheetFor } from '$lib/server/booth';
import { fileSafe, paperOf, pdfResponse, rethrowSheet } from '$lib/server/booth/sheet-response';
import { procedureSheetPdf } from '$lib/server/pdf/procedure-sheet';
import { VIEW_ROLES } from '$lib/server/procedures/access';
import { recordedOrRefused, recordSheetDownload } from '$lib/server/procedures/sheet-audit';
import type { RequestHandler } from './$types';

// GET /procedures/<id>/sheet[?rev=N][&paper=letter|a4]: the revision in force, or any signed one.
export const GET: RequestHandler = async (event) => {
	const user = requireRole(event, ...VIEW_ROLES);
	const rawRev = event.url.searchParams.get('rev');
	const rev = rawRev === null || rawRev === '' ? null : Number(rawRev);
	if (rev !== null && !(Number.isInteger(rev) && rev > 0 && rev < 100000))
		error(400, { message: 'rev must be a revision number, e.g. rev=2.' });
	const paper = paperOf(event);
	const input = await sheetFor(user.shopId, Number(event.params.id), { rev, paper }).catch(
		rethrowSheet
	);
	const bytes = await procedureSheetPdf(input);
	await recordedOrRefused(() => recordSheetDownload(user, input, event));
	return pdfResponse(bytes, `${fileSafe(input.number)}-rev${input.rev}-${input.paper}.pdf`);
};
