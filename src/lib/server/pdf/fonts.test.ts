import { PDFDocument } from 'pdf-lib';
import { describe, expect, it } from 'vitest';
import { embedFonts, fontFiles } from './fonts';

describe('PDF fonts', () => {
	it('ships real TrueType files (not WOFF2) and reuses them', () => {
		const f = fontFiles();
		// TrueType files start with the sfnt version 0x00010000.
		expect([...f.regular.slice(0, 4)]).toEqual([0, 1, 0, 0]);
		expect(fontFiles()).toBe(f);
	});

	it('embeds the signs procedures print', async () => {
		const doc = await PDFDocument.create();
		const fonts = await embedFonts(doc);
		const page = doc.addPage();
		page.drawText('115–135 A · 3/32 in ≈ 2.4 mm · ≤ 32 °F · ±25 %', {
			font: fonts.regular,
			size: 12,
			x: 20,
			y: 700
		});
		expect((await doc.save()).length).toBeGreaterThan(1000);
	});
});
