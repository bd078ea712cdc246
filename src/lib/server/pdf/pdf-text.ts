// Text measured and drawn for the sheet without pdf-lib's per-call overheads, which cost a sheet
// more than its layout: page.drawText checks every option and adds the font to the page's
// resources again at each call (a new /F key every time), and widthOfTextAtSize lays the string
// out again although a sheet measures the same labels and cautions on every print.
import {
	popGraphicsState,
	pushGraphicsState,
	PDFOperator,
	PDFOperatorNames as Op,
	type PDFFont,
	type PDFName,
	type PDFPage,
	type RGB
} from 'pdf-lib';

/** Widths at 1000 pt by face (the font name without its subset tag) and string. */
const widths = new Map<string, Map<string, number>>();
const faceOf = new WeakMap<PDFFont, Map<string, number>>();
const MAX_WIDTHS = 20_000;

/** The same number as font.widthOfTextAtSize(text, size), remembered per face and string. */
export function widthOf(font: PDFFont, text: string, size: number): number {
	let face = faceOf.get(font);
	if (!face) {
		const name = font.name.slice(font.name.indexOf('+') + 1);
		face = widths.get(name) ?? new Map<string, number>();
		widths.set(name, face);
		faceOf.set(font, face);
	}
	let w = face.get(text);
	if (w === undefined) {
		if (face.size >= MAX_WIDTHS) face.clear();
		w = font.widthOfTextAtSize(text, 1000);
		face.set(text, w);
	}
	return w * (size / 1000);
}

/** Content-stream numbers to a thousandth of a point (pdf-lib writes every float digit). */
const num = (n: number) => String(Math.round(n * 1000) / 1000);

const keys = new WeakMap<PDFPage, Map<PDFFont, PDFName>>();

/** One line of text at (x, y), the operators page.drawText writes, each font keyed once a page. */
export function drawTextLine(
	page: PDFPage,
	text: string,
	x: number,
	y: number,
	size: number,
	font: PDFFont,
	color: RGB
): void {
	let fonts = keys.get(page);
	if (!fonts) keys.set(page, (fonts = new Map()));
	let key = fonts.get(font);
	if (!key) {
		key = page.node.newFontDictionary(font.name, font.ref);
		fonts.set(font, key);
	}
	page.pushOperators(
		pushGraphicsState(),
		PDFOperator.of(Op.BeginText),
		PDFOperator.of(Op.NonStrokingColorRgb, [num(color.red), num(color.green), num(color.blue)]),
		PDFOperator.of(Op.SetFontAndSize, [key, num(size)]),
		PDFOperator.of(Op.MoveText, [num(x), num(y)]),
		PDFOperator.of(Op.ShowText, [font.encodeText(text)]),
		PDFOperator.of(Op.EndText),
		popGraphicsState()
	);
}
