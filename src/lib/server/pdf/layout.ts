// Small drawing helpers for Beadline's PDFs: text cut or wrapped to a width, and a QR code drawn
// as one vector path (sharp at any print size, a few hundred bytes, cheap to draw).
import {
	concatTransformationMatrix,
	PDFOperator,
	PDFOperatorNames,
	popGraphicsState,
	pushGraphicsState,
	rgb,
	setFillingRgbColor,
	type PDFFont,
	type PDFPage,
	type RGB
} from 'pdf-lib';
import QRCode from 'qrcode';
import { widthOf } from './pdf-text';

export const MM = 72 / 25.4;
export const PAPER: Record<'a4' | 'letter', [number, number]> = {
	a4: [595.28, 841.89],
	letter: [612, 792]
};

export const INK = rgb(0.08, 0.09, 0.11);
export const GREY = rgb(0.3, 0.32, 0.37);
export const RULE = rgb(0.75, 0.77, 0.8);
export const STOP = rgb(0.62, 0.1, 0.08);
export const WHITE = rgb(1, 1, 1);

/** Cuts text to a width with an ellipsis, so a long value never runs off the page. */
export function fit(text: string, font: PDFFont, size: number, width: number): string {
	if (widthOf(font, text, size) <= width) return text;
	let t = text;
	while (t.length > 1 && widthOf(font, `${t}…`, size) > width) t = t.slice(0, -1);
	return `${t}…`;
}

/**
 * Splits text into lines no wider than `width` (the first line `first` wide, for text after a
 * bold lead-in); a word longer than a line is cut to fit.
 */
export function wrap(
	text: string,
	font: PDFFont,
	size: number,
	width: number,
	first = width
): string[] {
	const lines: string[] = [];
	const room = () => (lines.length === 0 ? first : width);
	for (const para of text.split(/\r?\n/)) {
		let line = '';
		for (const word of para.split(/\s+/).filter(Boolean)) {
			const next = line ? `${line} ${word}` : word;
			if (widthOf(font, next, size) <= room()) line = next;
			else {
				if (line) lines.push(line);
				const w = room();
				line = widthOf(font, word, size) <= w ? word : fit(word, font, size, w);
			}
		}
		lines.push(line);
	}
	return lines.length ? lines : [''];
}

/** A QR code's dark modules as horizontal runs [row, column, length], in module units. */
export function qrRuns(text: string): { runs: [number, number, number][]; size: number } {
	const qr = QRCode.create(text, { errorCorrectionLevel: 'Q' });
	const n = qr.modules.size;
	const runs: [number, number, number][] = [];
	for (let r = 0; r < n; r++) {
		let c = 0;
		while (c < n) {
			if (!qr.modules.get(r, c)) {
				c++;
				continue;
			}
			const start = c;
			while (c < n && qr.modules.get(r, c)) c++;
			runs.push([r, start, c - start]);
		}
	}
	return { runs, size: n };
}

/** The runs as one path of `re` operators in module units, kept for the URLs drawn lately. */
const bodies = new Map<string, { body: string; size: number }>();
function qrBody(text: string): { body: string; size: number } {
	let hit = bodies.get(text);
	if (!hit) {
		const { runs, size } = qrRuns(text);
		hit = { body: runs.map(([r, c, len]) => `${c} ${r} ${len} 1 re`).join('\n'), size };
		if (bodies.size >= 256) bodies.delete(bodies.keys().next().value as string);
		bodies.set(text, hit);
	}
	return hit;
}

/**
 * Draws a QR code (error correction Q) with its four-module quiet zone as a `side`-wide square
 * whose lower-left corner is (x, y). The modules are drawn as one filled path in module units
 * under a scaling matrix, so a page carries a few hundred short integers, not floats.
 */
export function drawQr(
	page: PDFPage,
	text: string,
	x: number,
	y: number,
	side: number,
	color: RGB = rgb(0, 0, 0)
): void {
	const { body, size } = qrBody(text);
	const quiet = 4;
	const cell = side / (size + 2 * quiet);
	page.drawRectangle({ x, y, width: side, height: side, color: WHITE });
	page.pushOperators(
		pushGraphicsState(),
		setFillingRgbColor(color.red, color.green, color.blue),
		// Module (c, r) maps to x + (quiet + c) * cell, counted down from the top edge.
		concatTransformationMatrix(cell, 0, 0, -cell, x + quiet * cell, y + side - quiet * cell),
		PDFOperator.of(PDFOperatorNames.FillNonZero, [body]),
		popGraphicsState()
	);
}
