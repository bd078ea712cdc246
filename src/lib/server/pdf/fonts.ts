import fontkit from '@pdf-lib/fontkit';
import type { PDFDocument, PDFFont } from 'pdf-lib';
import boldUrl from './fonts/DejaVuSans-Bold.ttf?inline';
import monoUrl from './fonts/DejaVuSansMono-Bold.ttf?inline';
import regularUrl from './fonts/DejaVuSans.ttf?inline';

// TTF shipped inside the server bundle (WOFF2 renders wrong glyphs in pdf-lib); DejaVu covers °,
// ±, ≤ and the other signs a procedure prints. Decoded once per process; each document embeds
// only the glyphs it uses.
export interface PdfFonts {
	regular: PDFFont;
	bold: PDFFont;
	mono: PDFFont;
}

type Files = { regular: Uint8Array; bold: Uint8Array; mono: Uint8Array };
let files: Files | undefined;

function decode(dataUrl: string): Uint8Array {
	return Buffer.from(dataUrl.slice(dataUrl.indexOf(',') + 1), 'base64');
}

export function fontFiles(): Files {
	files ??= { regular: decode(regularUrl), bold: decode(boldUrl), mono: decode(monoUrl) };
	return files;
}

/** What pdf-lib takes as its font parser; font-cache.ts passes one that parses each file once. */
export type Fontkit = Parameters<PDFDocument['registerFontkit']>[0];

export async function embedFonts(doc: PDFDocument, kit: Fontkit = fontkit): Promise<PdfFonts> {
	doc.registerFontkit(kit);
	const f = fontFiles();
	const [regular, bold, mono] = await Promise.all([
		doc.embedFont(f.regular, { subset: true }),
		doc.embedFont(f.bold, { subset: true }),
		doc.embedFont(f.mono, { subset: true })
	]);
	return { regular, bold, mono };
}
