// Invented bench records for the demo shop: the jobs of the brief's scenario, mostly sound, a
// few with cautions (too hot for the rod, a thoriated tungsten, a small wire run hot).
import { settingsRecordSchema } from '$lib/schemas/settings-record';
import type { SessionUser } from '../auth/session-user';
import { SettingsRecord, type Shop, User } from '../models';
import { createRecord } from '../records';

type Template = Record<string, string>;

const GTAW_CS: Template = {
	process: 'GTAW',
	currentType: 'DCEN',
	fillerClass: 'ER70S-6',
	fillerDiameter: '3/32',
	tungstenClass: 'EWLa-1.5',
	tungstenDiameter: '1/16',
	gasName: 'argon',
	gasFlow: '20',
	baseMetalSpec: 'A36',
	thickness: '1/8',
	jointType: 'tee',
	position: '2F',
	volts: '12',
	travelSpeed: '4',
	machine: 'TIG 2 (bay B)'
};
const GMAW_CS: Template = {
	process: 'GMAW',
	currentType: 'DCEP',
	transfer: 'short-circuit',
	fillerClass: 'ER70S-6',
	fillerDiameter: '0.035',
	gasName: '75/25',
	gasFlow: '30',
	baseMetalSpec: 'A36',
	thickness: '3/16',
	jointType: 'tee',
	position: '2F',
	travelSpeed: '14',
	machine: 'MIG 1 (trailer line)'
};
const GTAW_SS: Template = {
	process: 'GTAW',
	currentType: 'DCEN',
	fillerClass: 'ER308L',
	fillerDiameter: '1/16',
	tungstenClass: 'EWCe-2',
	tungstenDiameter: '0.040',
	gasName: 'argon',
	gasFlow: '18',
	baseMetalSpec: '304',
	thickness: '0.065',
	jointType: 'butt',
	position: '1G',
	volts: '10',
	travelSpeed: '5',
	machine: 'TIG 1 (rail bench)'
};
const GTAW_AL: Template = {
	process: 'GTAW',
	currentType: 'AC',
	fillerClass: 'ER4043',
	fillerDiameter: '1/8',
	tungstenClass: 'EWLa-1.5',
	tungstenDiameter: '3/32',
	gasName: 'argon',
	gasFlow: '22',
	baseMetalSpec: '6061',
	thickness: '1/8',
	jointType: 'butt',
	position: '1G',
	volts: '14',
	travelSpeed: '6',
	machine: 'TIG 2 (bay B)'
};
const SMAW_CS: Template = {
	process: 'SMAW',
	currentType: 'DCEP',
	fillerClass: 'E7018',
	fillerDiameter: '1/8',
	baseMetalSpec: 'A36',
	thickness: '3/8',
	jointType: 'butt',
	position: '3G',
	volts: '23',
	travelSpeed: '5',
	machine: 'Stick 1 (yard)'
};

// [template, changes, outcome, defects]: 36 records over the demo year.
const ROWS: [Template, Template, string, string?][] = [
	...[115, 120, 125, 125, 130, 135, 120, 128].map((a, i): [Template, Template, string] => [
		GTAW_CS,
		{ amps: String(a), fillerDiameter: a > 115 ? '1/8' : '3/32', jobRef: `Railing RL-${210 + i}` },
		'sound'
	]),
	[GTAW_CS, { amps: '165', jobRef: 'Railing RL-219' }, 'needs rework', 'undercut on the toe'],
	[GTAW_CS, { amps: '125', tungstenClass: 'EWTh-2', jobRef: 'Railing RL-220' }, 'sound'],
	[
		GTAW_CS,
		{ amps: '95', thickness: '3/32', fillerDiameter: '1/16', jobRef: 'Bracket BK-12' },
		'sound'
	],
	...[170, 175, 180, 185, 190, 180].map((a, i): [Template, Template, string] => [
		GMAW_CS,
		{
			amps: String(a),
			volts: String(19 + (i % 2)),
			wireFeed: String(Math.round(a * 1.6)),
			jobRef: `Trailer TR-${400 + i}`
		},
		'sound'
	]),
	[
		GMAW_CS,
		{ amps: '205', volts: '21', wireFeed: '330', position: '3F', jobRef: 'Trailer TR-406' },
		'needs rework',
		'cold lap at the start'
	],
	[
		GMAW_CS,
		{
			amps: '250',
			volts: '24',
			fillerDiameter: '0.030',
			wireFeed: '500',
			jobRef: 'Trailer TR-407'
		},
		'rejected',
		'burn-through and spatter'
	],
	[
		GMAW_CS,
		{ amps: '150', thickness: '1/8', volts: '18', wireFeed: '240', jobRef: 'Fender FD-3' },
		'sound'
	],
	[
		GMAW_CS,
		{
			amps: '220',
			thickness: '1/4',
			transfer: 'spray',
			volts: '25',
			wireFeed: '350',
			jobRef: 'Tongue TG-8'
		},
		'sound'
	],
	...[50, 55, 60, 65, 58].map((a, i): [Template, Template, string] => [
		GTAW_SS,
		{ amps: String(a), jobRef: `Handrail HR-${30 + i}` },
		'sound'
	]),
	[GTAW_SS, { amps: '85', jobRef: 'Handrail HR-35' }, 'needs rework', 'sugaring on the back side'],
	...[150, 160, 165, 170, 175].map((a, i): [Template, Template, string] => [
		GTAW_AL,
		{ amps: String(a), jobRef: `Ramp RP-${5 + i}` },
		'sound'
	]),
	[GTAW_AL, { amps: '120', jobRef: 'Ramp RP-10' }, 'rejected', 'lack of fusion'],
	...[115, 125, 135].map((a, i): [Template, Template, string] => [
		SMAW_CS,
		{ amps: String(a), jobRef: `Hitch HT-${70 + i}` },
		'sound'
	]),
	[SMAW_CS, { amps: '160', jobRef: 'Hitch HT-73' }, 'needs rework', 'slag inclusions']
];

function dateFor(i: number): string {
	// One or two records a week through 2025, invented.
	const d = new Date(Date.UTC(2025, 0, 6) + i * 9 * 86_400_000);
	return d.toISOString().slice(0, 10);
}

async function asMember(email: string, shop: Shop): Promise<SessionUser | null> {
	const u = await User.findOne({ where: { email, shopId: shop.id } });
	if (!u) return null;
	return {
		id: u.id,
		shopId: shop.id,
		shopName: shop.name,
		name: u.name,
		email: u.email,
		role: u.role,
		unitSystem: 'imperial',
		timeZone: shop.timeZone
	};
}

/** Idempotent: a shop that has any record already is left as it is. */
export async function seedRecords(shop: Shop): Promise<number> {
	if ((await SettingsRecord.count({ where: { shopId: shop.id } })) > 0) return 0;
	const engineer = await asMember('reuben@larkspur.example', shop);
	const admin = await asMember('dana@larkspur.example', shop);
	if (!engineer) return 0;
	for (const [i, [template, changes, outcome, defects]] of ROWS.entries()) {
		const form = settingsRecordSchema.parse({
			...template,
			...changes,
			outcome,
			defects: defects ?? '',
			weldedOn: dateFor(i)
		});
		await createRecord(i % 5 === 4 && admin ? admin : engineer, form);
	}
	return ROWS.length;
}
