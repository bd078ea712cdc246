// The demo shop qualifies to ISO as well as ASME (issue 15): one invented ISO 15614-1 coupon,
// GMAW (135) on 10 mm S355-like plate in PF with impact tests, so its PQR page shows the ISO
// result set beside the ASME one, and the ISO WPS it backs (WPS-ISO-01, approved, with its booth
// link). Each idempotent by its number, also for shops seeded before it.
// Made through the services (create with its code, certify).
import { pqrFormSchema } from '$lib/schemas/pqr';
import { revisionFormSchema } from '$lib/schemas/procedure';
import { Pqr, Procedure, type Shop } from '../models';
import * as P from '../procedures';
import { certifyPqr, createPqr } from '../pqrs';
import { DEMO_PEOPLE } from './demo-people';
import { member } from './seed-procedures';

export const ISO_PQR_NUMBER = 'PQR-ISO-01';

const ISO_COUPON = {
	number: ISO_PQR_NUMBER,
	title: 'GMAW (135) 10 mm plate, multi-run, PF, ISO 15614-1 level 2',
	code: 'iso-15614-1',
	process: 'GMAW',
	currentType: 'DCEP',
	transfer: 'spray',
	amps: '230',
	volts: '26',
	travelSpeed: '12',
	fillerClass: 'ER70S-6',
	fillerDiameter: '0.045',
	gasName: '82/18 argon/CO2 (ISO 14175 M21)',
	gasFlow: '35',
	baseMetalSpec: 'A572-50',
	couponThickness: '3/8',
	testPosition: '3G',
	jointType: 'butt',
	preheat: '50',
	interpass: '400',
	weldedOn: '2025-09-15',
	welder: 'Arlo Brandt',
	lab: 'Marrow Test Labs (invented)',
	visualResult: 'pass',
	bendResult: 'pass',
	bendNotes: '2 face, 2 root bends, no open defects',
	tensileResult: 'pass',
	tensile1: '78200',
	tensile2: '77900',
	macroResult: 'pass',
	impactResult: 'pass',
	impactNotes: 'Charpy V at -4 °F (-20 °C), weld and HAZ',
	impactEnergy: '45'
};

export async function seedIsoPqr(shop: Shop): Promise<number> {
	if (await Pqr.findOne({ where: { shopId: shop.id, number: ISO_PQR_NUMBER } })) return 0;
	const reuben = await member('reuben@larkspur.example', shop);
	if (!reuben) return 0;
	const { id } = await createPqr(reuben, pqrFormSchema.parse(ISO_COUPON));
	await certifyPqr(reuben, id);
	return 1;
}

export const ISO_WPS_NUMBER = 'WPS-ISO-01';

// The WPS the coupon backs (ISO 15609-1 format, qualified by ISO 15614-1): inside what the
// coupon qualifies, so its review is clean but for the variables Beadline has no ISO rule for.
const ISO_WPS = {
	title: 'GMAW (135) 3/8 in plate butt, PF, spray, to ISO 15609-1',
	code: 'iso-15609-1',
	codeEdition: 'ISO 15614-1:2017+A1:2019, level 2',
	scope: 'Export work to the ISO customer; the ASME IX procedures stay for pressure work.',
	process: 'GMAW',
	currentType: 'DCEP',
	transfer: 'spray',
	ampsMin: '215',
	ampsMax: '245',
	voltsMin: '25',
	voltsMax: '27',
	jointTypes: ['butt'],
	jointDesign: 'Single V, 60° included, 1/16 in root face and gap',
	baseMetalSpecs: 'A572-50',
	thicknessMin: '3/16',
	thicknessMax: '3/4',
	fillerClasses: 'ER70S-6',
	fillerDiameterMin: '0.045',
	fillerDiameterMax: '0.045',
	positions: ['3G'],
	progression: 'uphill',
	gasName: '80 % argon / 20 % CO2',
	gasFlowMin: '30',
	gasFlowMax: '35',
	travelSpeedMin: '10',
	travelSpeedMax: '14',
	preheatMin: '50',
	interpassMax: '400',
	heatInputMax: '1.3 kJ/mm',
	bead: 'stringer',
	passes: 'multiple',
	cleaning: 'Grind each start and stop; wire brush between runs'
};

/**
 * WPS-ISO-01, backed by PQR-ISO-01, approved (which issues its booth link). Idempotent by its
 * number; needs the ISO coupon and the demo people, so a shop without them is left alone.
 */
export async function seedIsoProcedure(shop: Shop): Promise<number> {
	if (await Procedure.findOne({ where: { shopId: shop.id, number: ISO_WPS_NUMBER } })) return 0;
	const coupon = await Pqr.findOne({ where: { shopId: shop.id, number: ISO_PQR_NUMBER } });
	const reuben = await member('reuben@larkspur.example', shop);
	const mirela = await member('mirela@larkspur.example', shop);
	const password = DEMO_PEOPLE.find((p) => p.email === 'mirela@larkspur.example')?.password;
	if (!coupon || coupon.state !== 'certified' || !reuben || !mirela || !password) return 0;
	const f = revisionFormSchema.parse({ units: 'imperial', ...ISO_WPS, pqrIds: [coupon.id] });
	const { id } = await P.createProcedure(reuben, {
		number: ISO_WPS_NUMBER,
		title: f.title,
		code: f.code,
		process: f.process,
		recordIds: []
	});
	await P.updateDraft(reuben, id, 1, f);
	await P.submitRevision(reuben, id, 1, null, { notify: false });
	await P.approveRevision(
		mirela,
		id,
		1,
		{ password, comment: 'Within what PQR-ISO-01 qualifies by ISO 15614-1 (level 2).' },
		null,
		{ notify: false }
	);
	return 1;
}
