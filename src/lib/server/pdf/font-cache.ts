// The sheet's fonts, parsed once per process and shared by every document. pdf-lib asks its
// fontkit to parse the font bytes again for each document, and lays out every string with
// OpenType shaping (GSUB/GPOS), which for DejaVu costs far more than the drawing itself. A sheet
// prints Latin text, signs and digits: a plain character-to-glyph map (no kerning, no
// ligatures) draws the same letters, and the subset still covers only the glyphs used.
import { EventEmitter } from 'node:events';
import fontkit from '@pdf-lib/fontkit';
import type { PDFDocument } from 'pdf-lib';
import { embedFonts, type Fontkit, type PdfFonts } from './fonts';

type Font = ReturnType<typeof fontkit.create>;
type Glyph = ReturnType<Font['glyphForCodePoint']>;

const parsed = new Map<Uint8Array, Font>();
let parses = 0;

/** How many times a font file was parsed in this process (the bench and tests check it is 3). */
export const fontParses = () => parses;

function withPlainLayout(font: Font): Font {
	const glyphs = new Map<number, Glyph>();
	const glyphFor = (cp: number): Glyph => {
		let g = glyphs.get(cp);
		if (!g) {
			g = font.glyphForCodePoint(cp);
			glyphs.set(cp, g);
		}
		return g;
	};
	// pdf-lib reads only `glyphs` (ids and advance widths) from a layout.
	font.layout = ((text: string) => {
		const run: Glyph[] = [];
		for (const ch of text) run.push(glyphFor(ch.codePointAt(0) ?? 0x20));
		return { glyphs: run, positions: [] };
	}) as unknown as Font['layout'];
	// Subsetting decodes each glyph's outline again for every document only to see whether it
	// is composite; the font never changes, so each glyph is decoded once per process.
	type Decodable = Glyph & { _decode?: () => unknown; __once?: true };
	const getGlyph = font.getGlyph.bind(font);
	font.getGlyph = ((id: number, codePoints?: number[]) => {
		const g = getGlyph(id, codePoints) as Decodable;
		const decode = g._decode?.bind(g);
		if (decode && !g.__once) {
			let done = false;
			let value: unknown;
			g._decode = () => {
				if (!done) [value, done] = [decode(), true];
				return value;
			};
			g.__once = true;
		}
		return g;
	}) as Font['getGlyph'];
	font.createSubset = syncSubsets(font);
	return font;
}

type Subset = ReturnType<Font['createSubset']>;
type Encoder = { push: (chunk: Uint8Array | null) => boolean; end: () => void };

/**
 * Subsets whose bytes are ready at once. fontkit's bundle defers each subset's encoding and
 * every stream event with setTimeout (its stand-in for process.nextTick), so a save waited a
 * timer tick or more for each face; here the same encoder runs in place and its chunks are
 * handed over joined, on a microtask (pdf-lib listens for them right after the call).
 */
function syncSubsets(font: Font): Font['createSubset'] {
	const create = font.createSubset.bind(font);
	// The encoder's class, from one throwaway subset (its deferred encoding is harmless).
	const Stream = (create().encodeStream() as unknown as { constructor: new () => Encoder })
		.constructor;
	return () => {
		const subset = create() as Subset & { encode: (s: Encoder) => void };
		subset.encodeStream = () => {
			const out = new EventEmitter();
			const chunks: Uint8Array[] = [];
			let failure: unknown;
			try {
				const s = new Stream();
				s.push = (chunk) => (chunk && chunks.push(chunk), true);
				subset.encode(s);
				s.end();
			} catch (e) {
				failure = e;
			}
			queueMicrotask(() => {
				if (failure) out.emit('error', failure);
				else {
					out.emit('data', Buffer.concat(chunks));
					out.emit('end');
				}
			});
			return out as unknown as ReturnType<Subset['encodeStream']>;
		};
		return subset;
	};
}

const sharedFontkit = {
	create(data: Uint8Array): Font {
		let font = parsed.get(data);
		if (!font) {
			parses++;
			font = withPlainLayout(fontkit.create(data));
			parsed.set(data, font);
		}
		return font;
	}
};

/** The three faces of fonts.ts, subset into this document, parsed only the first time. */
export async function embedSharedFonts(doc: PDFDocument): Promise<PdfFonts> {
	return embedFonts(doc, sharedFontkit as unknown as Fontkit);
}
