// A form action posted with XMLHttpRequest, the one browser API that reports upload progress.
// superforms' customRequest hands over SvelteKit's submit input and takes the XHR back.

export interface SubmitInput {
	action: URL;
	formData: FormData;
}

export function uploadWithProgress(
	input: SubmitInput,
	onProgress: (fraction: number) => void
): Promise<XMLHttpRequest> {
	return new Promise((resolve, reject) => {
		const xhr = new XMLHttpRequest();
		xhr.upload.onprogress = (e) => {
			if (e.lengthComputable && e.total > 0) onProgress(e.loaded / e.total);
		};
		xhr.onload = () => resolve(xhr);
		xhr.onerror = () => reject(new Error('The upload did not reach the server.'));
		xhr.onabort = () => reject(new Error('The upload was stopped.'));
		xhr.open('POST', input.action.href);
		// What SvelteKit's enhance sends, so the action answers with a JSON ActionResult.
		xhr.setRequestHeader('accept', 'application/json');
		xhr.setRequestHeader('x-sveltekit-action', 'true');
		xhr.send(input.formData);
	});
}
