import { error, fail } from '@sveltejs/kit';
import { DataBook } from '$lib/server/models';
import { checkCopy, CopyRefused } from '$lib/server/fabrication/data-book/check-copy';
import { checkDataBook } from '$lib/server/fabrication/data-book/verify';
import { postedForm } from '$lib/server/forms/posted-form';
import { verifyLimiter } from '$lib/server/welders/verify-limit';
import type { Actions, PageServerLoad } from './$types';

const UNKNOWN = 'This data book link is unknown. Ask the shop that compiled the data book.';
/** A data book's ZIP is PDFs and reports: 200 MB is far more than one holds. */
const MAX_COPY = 200 * 1024 * 1024;

// Public by design: whoever holds the data book may check it against the shop's records. Shows
// what its cover shows (job, part, drawing, when, by whom) and whether the records still match.
export const load: PageServerLoad = async (event) => {
	event.setHeaders({ 'cache-control': 'private, no-store' });
	if (await verifyLimiter.isLimited(event))
		error(429, { message: 'Too many checks from here. Wait a minute and scan again.' });
	const check = await checkDataBook(event.params.token);
	if (!check) error(404, { message: UNKNOWN });
	return { check };
};

export const actions: Actions = {
	// A copy (the ZIP or its manifest.json) checked against the manifest the shop stored.
	copy: async (event) => {
		if (await verifyLimiter.isLimited(event))
			error(429, { message: 'Too many checks from here. Wait a minute and try again.' });
		const book = /^[A-Za-z0-9_-]{16,64}$/.test(event.params.token)
			? await DataBook.findOne({ where: { token: event.params.token } })
			: null;
		if (!book) error(404, { message: UNKNOWN });
		const file = (await postedForm(event.request)).get('copy');
		if (!(file instanceof File) || file.size === 0)
			return fail(400, { copyError: 'Choose the data book ZIP or its manifest.json.' });
		if (file.size > MAX_COPY)
			return fail(400, { copyError: 'That file is larger than any data book; choose its ZIP.' });
		try {
			const result = await checkCopy(Buffer.from(await file.arrayBuffer()), book);
			return { copy: { ...result, name: file.name.slice(0, 200) } };
		} catch (e) {
			if (e instanceof CopyRefused) return fail(400, { copyError: e.message });
			throw e;
		}
	}
};
