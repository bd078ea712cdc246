// A realistic procedure sheet's input (the brief's GTAW 1/8 in carbon-steel fillet), for the
// sheet's tests and the bench. Invented data; values in SI as the revision document stores them.
import { emptyVariables } from '$lib/procedures/variables';
import type { RevisionVariables } from '$lib/schemas/procedure';
import type { SheetInput } from './sheet-content';

const IN = 25.4;
const CFH = 0.471947;

export function fixtureVariables(): RevisionVariables {
	const v = emptyVariables({
		title: 'GTAW carbon steel fillet, 2F',
		code: 'aws-d1.1',
		process: 'GTAW'
	});
	v.codeEdition = '2020';
	v.scope = 'Fillet welds on A36 plate and angle for trailer frames, 1/8 to 1/4 in.';
	v.joints = { types: ['tee', 'lap'], design: 'Fillet, 90° tee, no root opening', backing: '' };
	v.baseMetals = {
		specs: ['A36', 'A500 B'],
		family: 'carbon-steel',
		pNumbers: ['1'],
		thicknessMm: { min: 0.125 * IN, max: 0.25 * IN }
	};
	v.fillerMetals = {
		classifications: ['ER70S-6'],
		fNumbers: [6],
		aNumbers: [1],
		diameterMm: { min: (3 / 32) * IN, max: (3 / 32) * IN }
	};
	v.positions = { allowed: ['1F', '2F'], progression: '' };
	v.preheat = { minC: 10, interpassMaxC: 260 };
	v.gas = { shielding: 'Argon 100 %', flowLPerMin: { min: 15 * CFH, max: 20 * CFH }, backing: '' };
	v.electrical = {
		currentType: 'DCEN',
		transfer: null,
		amps: { min: 115, max: 135 },
		volts: { min: 11, max: 13 },
		wireFeedMmPerS: { min: null, max: null },
		tungstenClass: 'EWLa-1.5',
		tungstenDiameterMm: { min: (3 / 32) * IN, max: (3 / 32) * IN },
		heatInputMaxJPerMm: 1400
	};
	v.technique = {
		travelSpeedMmPerS: { min: (4 * IN) / 60, max: (6 * IN) / 60 },
		bead: 'stringer',
		passes: 'single',
		cleaning: 'Wire brush mill scale off 1 in each side; acetone wipe.',
		notes: 'Keep the arc short; add filler at the leading edge of the puddle.'
	};
	return v;
}

export function fixtureSheet(over: Partial<SheetInput> = {}): SheetInput {
	return {
		shopName: 'Larkspur Trailer & Rail',
		number: 'WPS-GT-01',
		rev: 2,
		state: 'approved',
		supersededByRev: null,
		variables: fixtureVariables(),
		units: 'imperial',
		pqrs: [{ number: 'PQR-014', title: 'GTAW A36 3/8 in coupon, 3G' }],
		signOff: {
			printedName: 'Mirela Sand',
			role: 'Inspector',
			meaning: 'approved',
			signedAt: new Date('2025-03-04T14:05:09Z'),
			digest: '3f2a9c1e55d0aa12b7c4e9f00112233445566778899aabbccddeeff001122334'
		},
		intact: true,
		url: 'http://localhost:5173/b/AbCdEfGhIjKlMnOpQrStUvWx',
		printedAt: new Date('2025-03-10T08:30:00Z'),
		paper: 'letter',
		...over
	};
}
