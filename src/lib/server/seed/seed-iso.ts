// The demo shop qualifies to ISO as well as ASME (issue 15): one invented ISO 15614-1 coupon,
// GMAW (135) on 10 mm S355-like plate in PF with impact tests, so its PQR page shows the ISO
// result set beside the ASME one. Idempotent by its number, also for shops seeded before it.
// Made through the services (create with its code, certify).
import { pqrFormSchema } from '$lib/schemas/pqr';
import { Pqr, type Shop } from '../models';
import { certifyPqr, createPqr } from '../pqrs';
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
