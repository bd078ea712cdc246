// Reading a PDF the way a person would, for tests: its text (pdfjs-dist legacy build, the one
// that runs on Node 20) and the QR code on a page, rendered with @napi-rs/canvas and decoded
// with jsqr.
import { createCanvas } from '@napi-rs/canvas';
import jsQR from 'jsqr';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';

async function open(bytes: Uint8Array) {
	// pdfjs takes ownership of the buffer it is given: pass a copy.
	return getDocument({ data: new Uint8Array(bytes), useSystemFonts: false, isEvalSupported: false })
		.promise;
}

/** The text of every page, pages joined by a blank line. */
export async function pdfText(bytes: Uint8Array): Promise<string> {
	const doc = await open(bytes);
	const pages: string[] = [];
	for (let i = 1; i <= doc.numPages; i++) {
		const content = await (await doc.getPage(i)).getTextContent();
		pages.push(content.items.map((it) => ('str' in it ? it.str : '')).join(' '));
	}
	await doc.destroy();
	return pages.join('\n\n');
}

/** The text of the first QR code found on the page (1-based), rendered at `scale`. */
export async function pdfQr(bytes: Uint8Array, pageNumber = 1, scale = 4): Promise<string | null> {
	const doc = await open(bytes);
	const page = await doc.getPage(pageNumber);
	const viewport = page.getViewport({ scale });
	const canvas = createCanvas(Math.ceil(viewport.width), Math.ceil(viewport.height));
	const ctx = canvas.getContext('2d');
	await page.render({ canvas: canvas as never, canvasContext: ctx as never, viewport }).promise;
	const img = ctx.getImageData(0, 0, canvas.width, canvas.height);
	await doc.destroy();
	return jsQR(new Uint8ClampedArray(img.data), img.width, img.height)?.data ?? null;
}
