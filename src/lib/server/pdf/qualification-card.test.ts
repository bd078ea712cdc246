import { describe, expect, it } from 'vitest';
import { pdfQr, pdfText } from '../../../../tests/support/pdf';
import { welder } from './card-fixture';
import { qualificationCardPdf } from './qualification-card';

const url = 'http://localhost:4173/q/AbCdEfGhIjKlMnOpQrStUvWx';

describe('qualification card PDF', () => {
	it.each(['wallet', 'a4', 'letter'] as const)('%s: text and a readable QR code', async (size) => {
		const bytes = await qualificationCardPdf({
			shopName: 'Larkspur Trailer & Rail',
			welder,
			url,
			printedOn: '2025-04-01',
			units: 'imperial',
			size
		});
		const text = await pdfText(bytes);
		expect(text).toContain('Nell Carver');
		expect(text).toContain('LTR-31');
		expect(text).toContain('current until 2025-09-10'); // ASME IX QW-322.1: six months
		expect(text).toMatch(/Groove F, V .*fillet F, H, V/); // ASME IX QW-461.9, 3G
		expect(await pdfQr(bytes, 1, size === 'wallet' ? 8 : 3)).toBe(url);
	});
});
