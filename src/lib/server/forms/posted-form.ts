// Reading a posted form. A body that is not the form it claims to be (a broken client, a hand-made
// request) is the sender's mistake: 400, never a 500. Anything else (the body-size limit's 413)
// goes on as it was.
import { error } from '@sveltejs/kit';

export const UNREADABLE_FORM = 'The form could not be read. Reload the page and send it again.';

export async function postedForm(request: Request): Promise<FormData> {
	try {
		return await request.formData();
	} catch (e) {
		if (e instanceof TypeError) error(400, { message: UNREADABLE_FORM });
		throw e;
	}
}
