// An invented welder with one current GTAW qualification, for the card's test and the bench.
import type { WelderView } from '../welders/read';
import { qualifiedRanges } from '../welders/ranges';
import { qualificationStatus } from '../welders/status';
import type { CardInput, CardSize } from './qualification-card';

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
export const welder: WelderView = {
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
export const cardUrl = 'http://localhost:4173/q/AbCdEfGhIjKlMnOpQrStUvWx';

export const fixtureCard = (size: CardSize): CardInput => ({
	shopName: 'Larkspur Trailer & Rail',
	welder,
	url: cardUrl,
	printedOn: '2025-04-01',
	units: 'imperial',
	size
});
