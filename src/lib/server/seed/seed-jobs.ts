// The demo job (issue #17): an invented trailer hitch frame for an invented customer, half done.
// Its drawing is attached with every joint marked. Its joints are welded to the demo shop's procedures in force; Tomas Whitlow welded W1 to W3
// two days before the seed ran (not today: a demo welder's booth tap today must still count) and Mirela Sand accepted W1 on sight (her record attached); W4 to W6 wait for the welder. Idempotent: a job
// whose number exists is left as it is.
import {
	attachDrawing,
	createJob,
	importJoints,
	jobView,
	logWeld,
	placeMarker,
	recordInspection
} from '../fabrication';
import { DEMO_MARKERS, demoDrawingPng, demoReportPdf } from './demo-drawing';
import { Job, type Shop } from '../models';
import { DEMO_PEOPLE } from './demo-people';
import { member } from './seed-procedures';

export const DEMO_JOB = 'JOB-2026-014';

const JOINTS = `mark,type,size,base metals,position,procedure
W1,tee,6 mm fillet,A36 to A36,2F,WPS-001
W2,tee,6 mm fillet,A36 to A36,2F,WPS-001
W3,tee,8 mm fillet,A36 to A36,1F,WPS-001
W4,tee,5 mm fillet,A36 to A36,2F,WPS-002
W5,tee,5 mm fillet,A36 to A36,3F,WPS-002
W6,lap,5 mm fillet,A36 to A36,2F,WPS-002`;

export async function seedJobs(shop: Shop): Promise<number | null> {
	if (await Job.findOne({ where: { shopId: shop.id, number: DEMO_JOB } })) return null;
	const reuben = await member('reuben@larkspur.example', shop);
	if (!reuben) return null;
	const { id } = await createJob(reuben, {
		number: DEMO_JOB,
		customer: 'Brackwater Agricultural Works',
		part: 'Hitch frame weldment, 3.5 t',
		drawing: 'BAW-HF-220',
		drawingRev: 'C',
		code: 'aws-d1.1',
		dueOn: ''
	});
	await importJoints(reuben, id, JOINTS);
	await attachDrawing(reuben, id, { bytes: await demoDrawingPng(), name: 'BAW-HF-220-C.png' });
	for (const j of (await jobView(reuben, id)).joints) {
		const at = DEMO_MARKERS[j.mark];
		if (at) await placeMarker(reuben, id, { jointId: j.id, ...at });
	}
	const tomas = await member('tomas@larkspur.example', shop);
	const mirela = await member('mirela@larkspur.example', shop);
	const password = DEMO_PEOPLE.find((p) => p.email === 'mirela@larkspur.example')?.password;
	if (!tomas || !mirela || !password) return id;
	const joints = (await jobView(reuben, id)).joints;
	const weldedAt = new Date(Date.now() - 2 * 86_400_000);
	for (const j of joints.filter((x) => ['W1', 'W2', 'W3'].includes(x.mark)))
		await logWeld(tomas, { jointId: j.id, passes: j.passes }, null, weldedAt);
	const w1 = joints.find((x) => x.mark === 'W1');
	if (w1)
		await recordInspection(mirela, {
			jointId: w1.id,
			method: 'VT',
			extent: '100 %',
			result: 'accept',
			note: 'Fillet size and profile to the drawing.',
			password,
			report: { bytes: await demoReportPdf(), name: 'W1-visual-record.pdf' }
		});
	return id;
}
