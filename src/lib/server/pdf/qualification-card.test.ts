import { describe, expect, it } from 'vitest';
import { pdfQr, pdfText } from '../../../../tests/support/pdf';
import type { WelderView } from '../welders/read';
import { qualifiedRanges } from '../welders/ranges';
import { qualificationStatus } from '../welders/status';
import { qualificationCardPdf } from './qualification-card';

const IN = 25.4;
const facts = {
	code: 'ASME IX',
	testPositions: '3G',
	couponType: 'plate' as const,
	couponDiameterMm: null,
	couponThicknessMm: 0.375 * IN,
	depositThicknessMm: 0.375 * IN,
	depositLayers: null,
	lengthUnit: 'in' as const,
	fNumber: 6
};
const welder: WelderView = {
	id: 1,
	name: 'Nell Carver',
	stamp: 'LTR-31',
	email: null,
	userId: null,
	userName: null,
	active: true,
	noticeEmail: null,
	uses: [],
	qualifications: [
		{
			...facts,
			id: 1,
			process: 'GTAW',
			code: 'ASME IX',
			testDate: '2025-03-10',
			wpsRef: 'WPS-GT-01',
			testPositions: ['3G'],
			fillerClass: 'ER70S-2',
			backing: 'with',
			currentType: 'DCEN',
			results: null,
			witnessedBy: null,
			recordName: null,
			confirmations: [],
			ranges: qualifiedRanges(facts),
			status: qualificationStatus(
				{ code: 'ASME IX', testDate: '2025-03-10', uses: [], confirmations: [] },
				'2025-04-01'
			)
		}
	]
};
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
