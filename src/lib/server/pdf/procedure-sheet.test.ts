import { PDFDocument } from 'pdf-lib';
import { describe, expect, it } from 'vitest';
import { pdfQr, pdfText } from '../../../../tests/support/pdf';
import { fontParses } from './font-cache';
import { procedureSheetPdf, procedureSheetsPdf } from './procedure-sheet';
import { fixtureSheet, fixtureVariables } from './sheet-fixture';

// The sheet is read back with libraries of its own (pdfjs-dist for text, jsqr for the QR code).
const squash = (s: string) => s.replace(/\s+/g, ' ');

describe('the procedure sheet', () => {
	it('prints number, revision, state, code, values in both systems, PQRs, the signature, shade and cautions', async () => {
		const text = squash(await pdfText(await procedureSheetPdf(fixtureSheet())));
		expect(text).toContain('Larkspur Trailer & Rail');
		expect(text).toContain('WPS-GT-01');
		expect(text).toContain('Revision 2');
		expect(text).toContain('APPROVED');
		expect(text).toContain('Code claimed: AWS D1.1, edition 2020');
		expect(text).toContain('115–135 A');
		expect(text).toContain('3/32 in');
		expect(text).toContain('2.4 mm'); // the other system in small type
		expect(text).toContain('15–20 CFH');
		expect(text).toContain('PQR-014');
		expect(text).toContain('Mirela Sand');
		expect(text).toContain('Inspector');
		expect(text).toContain('Approved');
		expect(text).toContain('2025-03-04 14:05 UTC');
		expect(text).toContain('3f2a 9c1e 55d0 aa12');
		// OSHA 29 CFR 1910.133(a)(5): GTAW 50–150 A minimum 8; ANSI Z49.1 suggests 12.
		expect(text).toContain('Lens shade at least 8, suggested 12');
		for (const c of ['Arc radiation', 'Fumes', 'Electric shock', 'Fire', 'Gas cylinders'])
			expect(text).toContain(c);
		expect(text).toContain('ANSI Z49.1 and OSHA 29 CFR 1910 Subpart Q');
		expect(text).toContain('the engineer of record, the inspector and certified welders decide');
		expect(text).toContain('Uncontrolled when printed: scan to check the current revision.');
		expect(text).toContain('Printed 2025-03-10 08:30 UTC');
	});

	it('carries a QR code that decodes to exactly the booth link', async () => {
		const input = fixtureSheet();
		expect(await pdfQr(await procedureSheetPdf(input), 1, 2)).toBe(input.url);
	});

	it('is Letter for imperial shops and A4 on request', async () => {
		const size = async (paper: 'a4' | 'letter') => {
			const doc = await PDFDocument.load(await procedureSheetPdf(fixtureSheet({ paper })));
			const { width, height } = doc.getPage(0).getSize();
			return [Math.round(width), Math.round(height)];
		};
		expect(await size('letter')).toEqual([612, 792]);
		expect(await size('a4')).toEqual([595, 842]);
	});

	it('says so loudly when superseded or no longer matching its signature', async () => {
		const superseded = squash(
			await pdfText(
				await procedureSheetPdf(fixtureSheet({ state: 'superseded', supersededByRev: 3 }))
			)
		);
		expect(superseded).toContain('SUPERSEDED by revision 3: do not weld to this sheet');
		const tampered = squash(
			await pdfText(await procedureSheetPdf(fixtureSheet({ intact: false })))
		);
		expect(tampered).toContain('DO NOT USE');
	});

	it('runs onto more pages when the content needs it, with the QR code on each', async () => {
		const variables = fixtureVariables();
		variables.technique.notes = 'Keep the arc short and steady. '.repeat(30);
		variables.scope = 'Trailer frames and railings. '.repeat(15);
		const input = fixtureSheet({
			variables,
			pqrs: Array.from({ length: 40 }, (_, i) => ({
				number: `PQR-${100 + i}`,
				title: 'GTAW coupon'
			}))
		});
		const bytes = await procedureSheetPdf(input);
		const doc = await PDFDocument.load(bytes);
		expect(doc.getPageCount()).toBeGreaterThan(1);
		const text = squash(await pdfText(bytes));
		expect(text).toContain(`page ${doc.getPageCount()} of ${doc.getPageCount()}`);
		expect(text).toContain('PQR-139');
		expect(await pdfQr(bytes, 2, 2)).toBe(input.url);
	});

	it('puts many sheets in one file, each from a new page, and parses the fonts once', async () => {
		const a = fixtureSheet({
			number: 'WPS-A',
			url: 'http://localhost:5173/b/aaaaaaaaaaaaaaaaaaaaaaaa'
		});
		const b = fixtureSheet({
			number: 'WPS-B',
			url: 'http://localhost:5173/b/bbbbbbbbbbbbbbbbbbbbbbbb'
		});
		const bytes = await procedureSheetsPdf('All current sheets', [a, b]);
		const doc = await PDFDocument.load(bytes);
		expect(doc.getPageCount()).toBe(4);
		expect(await pdfQr(bytes, 3, 2)).toBe(b.url);
		expect(fontParses()).toBe(3);
	});
});
