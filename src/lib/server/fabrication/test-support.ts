// Helpers for the job services' tests only. Import after DATABASE_FILE is set.
import { approveRevision } from '../procedures';
import * as P from '../procedures/test-support';
import { createJob } from './jobs';

export type People = Awaited<ReturnType<typeof P.shopWithPeople>>;

/** A GTAW procedure with revision 1 approved and signed; its number. */
export async function approvedProcedure(people: People): Promise<{ id: number; number: string }> {
	const id = await P.procedureInReview(people);
	await approveRevision(people.inspector, id, 1, { password: P.PASSWORD, comment: '' }, null, {
		notify: false
	});
	const { Procedure } = await import('../models');
	const p = await Procedure.findByPk(id, { rejectOnEmpty: true });
	return { id, number: p.number };
}

let n = 0;
export async function newJob(people: People, over: Record<string, string> = {}) {
	return createJob(people.engineer, {
		number: `J-${process.pid}-${++n}`,
		customer: 'Invented Customer Ltd',
		part: 'Frame weldment',
		drawing: 'D-100',
		drawingRev: 'B',
		code: 'aws-d1.1',
		dueOn: '',
		...over
	} as never);
}

/** A welder record linked to `account`, holding one GTAW plate qualification. */
export async function linkedWelder(
	people: People,
	account: { id: string; name: string },
	over: Record<string, unknown> = {},
	stamp = `S-${Math.random().toString(36).slice(2, 7)}`
) {
	const { createWelder } = await import('../welders/welders');
	const { addQualification } = await import('../welders/qualifications');
	const { qualificationSchema } = await import('$lib/schemas/welder');
	const { addDays, localDay } = await import('../welders/dates');
	const w = await createWelder(people.admin, {
		name: account.name,
		stamp,
		email: '',
		userId: account.id,
		active: true
	});
	await addQualification(
		people.admin,
		w.id,
		qualificationSchema.parse({
			process: 'GTAW',
			code: 'ASME IX',
			testDate: addDays(localDay(), -30),
			testPositions: ['3G'],
			couponType: 'plate',
			couponThickness: '3/8',
			depositThickness: '3/8',
			fillerClass: 'ER70S-6',
			fNumber: '6',
			...over
		}),
		null
	);
	return w;
}
