// A form action posted with XMLHttpRequest, the one browser API that reports upload progress.
// superforms' customRequest hands over SvelteKit's submit input and takes the answer back.
import type { ActionResult } from '@sveltejs/kit';

export interface SubmitInput {
	action: URL;
	formData: FormData;
}

const failed = (status: number, message: string): ActionResult => ({
	type: 'error',
	status,
	error: { message }
});

/** Resolves with the XHR when the action answered, or an error result the form can show. */
export function uploadWithProgress(
	input: SubmitInput,
	onProgress: (fraction: number) => void
): Promise<XMLHttpRequest | ActionResult> {
	return new Promise((resolve) => {
		const xhr = new XMLHttpRequest();
		xhr.upload.onprogress = (e) => {
			if (e.lengthComputable && e.total > 0) onProgress(e.loaded / e.total);
		};
		xhr.onload = () => {
			if ((xhr.getResponseHeader('content-type') ?? '').includes('application/json'))
				return resolve(xhr);
			// Not an action's answer: a proxy or the server's body limit refused the request.
			resolve(
				failed(
					xhr.status,
					xhr.status === 413
						? 'The photos are more than the server accepts in one go. Try fewer at a time.'
						: `The server answered ${xhr.status} to the upload.`
				)
			);
		};
		xhr.onerror = () => resolve(failed(0, 'The upload did not reach the server.'));
		xhr.onabort = () => resolve(failed(0, 'The upload was stopped.'));
		xhr.open('POST', input.action.href);
		// What SvelteKit's enhance sends, so the action answers with a JSON ActionResult.
		xhr.setRequestHeader('accept', 'application/json');
		xhr.setRequestHeader('x-sveltekit-action', 'true');
		xhr.send(input.formData);
	});
}
