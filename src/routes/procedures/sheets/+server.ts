import { error } from '@sveltejs/kit';
import { requireRole } from '$lib/server/auth/guards';
import { currentSheets } from '$lib/server/booth';
import { fileSafe, paperOf, pdfResponse, rethrowSheet } from '$lib/server/booth/sheet-response';
import { procedureSheetsPdf } from '$lib/server/pdf/procedure-sheet';
import { VIEW_ROLES } from '$lib/server/procedures/access';
import { recordedOrRefused, recordSheetBatchDownload } from '$lib/server/procedures/sheet-audit';
import type { RequestHandler } from './$types';

// GET /procedures/sheets[?paper=letter|a4]: one PDF with the sheet of every revision in force.
export const GET: RequestHandler = async (event) => {
	const user = requireRole(event, ...VIEW_ROLES);
	const paper = paperOf(event);
	const { shopName, sheets } = await currentSheets(user.shopId, { paper }).catch(rethrowSheet);
	if (!sheets.length)
		error(404, {
			message: 'No revision is in force in your shop, so there are no sheets to print.'
		});
	const day = new Date().toISOString().slice(0, 10);
	const bytes = await procedureSheetsPdf(`Current procedure sheets — ${shopName}, ${day}`, sheets);
	await recordedOrRefused(() => recordSheetBatchDownload(user, sheets, event));
	return pdfResponse(bytes, `current-sheets-${fileSafe(shopName)}-${day}.pdf`);
};
