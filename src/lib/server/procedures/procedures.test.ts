import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

const dir = mkdtempSync(join(tmpdir(), 'beadline-procedures-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const { sequelize } = await import('../db');
const { AuditEvent, Procedure, ProcedureRevision, SettingsRecord, SignOff, User } =
	await import('../models');
const { ForbiddenError, NotFoundError, RefusedError } = await import('../people/errors');
const { settingsRecordSchema } = await import('$lib/schemas/settings-record');
const { createRecord } = await import('../records/save');
const { certifyPqr, createPqr } = await import('../pqrs');
const svc = await import('./index');
const T = await import('./test-support');
const { clearFailures } = await import('../auth/failed-sign-ins');

type People = Awaited<ReturnType<typeof T.shopWithPeople>>;
let a: People, b: People;
const quiet = { notify: false };

beforeAll(async () => {
	a = await T.shopWithPeople('Procedure Shop');
	b = await T.shopWithPeople('Other Procedure Shop');
});

async function draft(people = a, n = Math.random().toString(36).slice(2, 7)) {
	const { id } = await svc.createProcedure(people.engineer, {
		number: `WPS-${n}`,
		title: 'GTAW fillet',
		code: 'aws-d1.1',
		process: 'GTAW',
		recordIds: []
	});
	await svc.updateDraft(people.engineer, id, 1, T.revisionForm());
	return id;
}

async function inReview(people = a) {
	const id = await draft(people);
	await svc.submitRevision(people.engineer, id, 1, null, quiet);
	return id;
}

const state = async (procedureId: number, rev: number) =>
	(await ProcedureRevision.findOne({ where: { procedureId, rev } }))?.state;

describe('the revision life', () => {
	it('goes draft → in review → returned with a comment → resubmitted → approved, frozen once signed', async () => {
		const id = await inReview();
		await expect(svc.updateDraft(a.engineer, id, 1, T.revisionForm())).rejects.toThrow(/in review/);
		await expect(
			svc.returnRevision(a.inspector, id, 1, { comment: '  ' }, null, quiet)
		).rejects.toThrow(RefusedError);
		await svc.returnRevision(
			a.inspector,
			id,
			1,
			{ comment: 'Give the travel speed.' },
			null,
			quiet
		);
		expect(await state(id, 1)).toBe('draft');
		expect(
			(await ProcedureRevision.findOne({ where: { procedureId: id, rev: 1 } }))?.returnComment
		).toBe('Give the travel speed.');
		await svc.updateDraft(
			a.engineer,
			id,
			1,
			T.revisionForm({ travelSpeedMin: '4', travelSpeedMax: '6' })
		);
		await svc.submitRevision(a.engineer, id, 1, null, quiet);
		const signed = await svc.approveRevision(
			a.inspector,
			id,
			1,
			{ password: T.PASSWORD, comment: 'Fine.' },
			null,
			quiet
		);
		expect(signed.digest).toMatch(/^[0-9a-f]{64}$/);
		expect(await state(id, 1)).toBe('approved');
		await expect(svc.updateDraft(a.engineer, id, 1, T.revisionForm())).rejects.toThrow(
			/approved and signed; it can no longer be edited/
		);
		const s = await SignOff.findOne({ where: { id: signed.signOffId } });
		expect(s).toMatchObject({
			printedName: a.inspector.name,
			role: 'Inspector',
			meaning: 'approved',
			comment: 'Fine.'
		});
		expect(s?.userId).toBe(a.inspector.id);
		const actions = (await svc.procedureTrail(a.engineer, id)).map((e) => e.action);
		expect(actions).toEqual([
			'procedure.created',
			'procedure_revision.created',
			'procedure_revision.updated',
			'procedure_revision.submitted',
			'procedure_revision.returned',
			'procedure_revision.updated',
			'procedure_revision.submitted',
			'procedure_revision.approved'
		]);
		const update = (await svc.procedureTrail(a.engineer, id)).filter(
			(e) => e.action === 'procedure_revision.updated'
		)[1];
		expect(
			update?.changes.some(
				(c) => c.path === 'variables.technique.travelSpeedMmPerS.min' && c.before === ''
			)
		).toBe(true);
	});

	it('starts a new revision as a copy, and approving it supersedes the earlier one in the same step', async () => {
		const id = await inReview();
		await svc.approveRevision(
			a.inspector,
			id,
			1,
			{ password: T.PASSWORD, comment: '' },
			null,
			quiet
		);
		await expect(svc.submitRevision(a.engineer, id, 1, null, quiet)).rejects.toThrow();
		const { rev } = await svc.startRevision(a.engineer, id);
		expect(rev).toBe(2);
		await expect(svc.startRevision(a.engineer, id)).rejects.toThrow(/still a draft/);
		const [r1, r2] = await Promise.all(
			[1, 2].map((n) => ProcedureRevision.findOne({ where: { procedureId: id, rev: n } }))
		);
		expect(r2?.variables).toBe(r1?.variables);
		await svc.submitRevision(a.engineer, id, 2, null, quiet);
		await svc.approveRevision(
			a.inspector2,
			id,
			2,
			{ password: T.PASSWORD, comment: '' },
			null,
			quiet
		);
		const [s1, s2] = await Promise.all(
			[1, 2].map((n) => ProcedureRevision.findOne({ where: { procedureId: id, rev: n } }))
		);
		expect(s1?.state).toBe('superseded');
		expect(s1?.supersededByRev).toBe(2);
		expect(s2?.state).toBe('approved');
		// One `now` for the approval and the supersede: they were one transaction.
		expect(s1?.supersededAt?.getTime()).toBe(s2?.decidedAt?.getTime());
		expect((await Procedure.findByPk(id))?.approvedRev).toBe(2);
		expect(await svc.currentApprovedRevision(id, { shopId: a.shopId })).toMatchObject({ rev: 2 });
		expect(await svc.currentApprovedRevision(id, { shopId: b.shopId })).toBeNull();
		await svc.withdrawRevision(a.engineer, id, 2, 'Customer dropped the part.');
		expect(await state(id, 2)).toBe('withdrawn');
		expect((await Procedure.findByPk(id))?.approvedRev).toBeNull();
		expect(await svc.currentApprovedRevision(id)).toBeNull();
	});

	it('refuses a PQR that is not certified at submission', async () => {
		const id = await draft();
		const { id: pqrId } = await createPqr(a.engineer, T.pqrForm());
		const pqr = await svc.linksOf(0, a.shopId);
		expect(pqr.pqrIds).toEqual([]);
		await svc.updateDraft(a.engineer, id, 1, T.revisionForm({ pqrIds: [pqrId] }));
		await expect(svc.submitRevision(a.engineer, id, 1, null, quiet)).rejects.toThrow(/Certify/);
		await certifyPqr(a.engineer, pqrId);
		await svc.submitRevision(a.engineer, id, 1, null, quiet);
		expect(await state(id, 1)).toBe('in-review');
	});
});

describe('signing', () => {
	it('gives exactly one success to 20 concurrent approvals by two inspectors', async () => {
		const id = await inReview();
		const results = await Promise.allSettled(
			Array.from({ length: 20 }, (_, i) =>
				svc.approveRevision(
					i % 2 ? a.inspector : a.inspector2,
					id,
					1,
					{ password: T.PASSWORD, comment: '' },
					null,
					quiet
				)
			)
		);
		const ok = results.filter((r) => r.status === 'fulfilled');
		const refused = results.filter((r) => r.status === 'rejected') as PromiseRejectedResult[];
		expect(ok).toHaveLength(1);
		expect(refused.every((r) => r.reason instanceof svc.AlreadyDecidedError)).toBe(true);
		const rev = await ProcedureRevision.findOne({ where: { procedureId: id, rev: 1 } });
		expect(await SignOff.count({ where: { revisionId: rev!.id } })).toBe(1);
	});

	it('does not sign with a wrong password, and records the attempt', async () => {
		const id = await inReview();
		await expect(
			svc.approveRevision(a.inspector, id, 1, { password: 'not it', comment: '' }, null, quiet)
		).rejects.toThrow(svc.WRONG_PASSWORD);
		expect(await state(id, 1)).toBe('in-review');
		const rev = await ProcedureRevision.findOne({ where: { procedureId: id, rev: 1 } });
		expect(await SignOff.count({ where: { revisionId: rev!.id } })).toBe(0);
		expect(
			await AuditEvent.count({
				where: { objectId: String(rev!.id), action: 'procedure_revision.signature_refused' }
			})
		).toBe(1);
	});

	it('stops taking passwords after ten wrong ones, even the right one, and signs nothing', async () => {
		const id = await inReview();
		const wrong = () =>
			svc.approveRevision(a.inspector, id, 1, { password: 'not it', comment: '' }, null, quiet);
		clearFailures(a.inspector.email);
		try {
			for (let i = 0; i < 9; i++) await expect(wrong()).rejects.toThrow(svc.WRONG_PASSWORD);
			// The tenth is the last one the limit takes (the same ten as at sign-in).
			await expect(wrong()).rejects.toThrow(svc.TOO_MANY_PASSWORDS);
			await expect(
				svc.approveRevision(a.inspector, id, 1, { password: T.PASSWORD, comment: '' }, null, quiet)
			).rejects.toThrow(svc.TOO_MANY_PASSWORDS);
			expect(await state(id, 1)).toBe('in-review');
		} finally {
			clearFailures(a.inspector.email);
		}
	});

	it('lets neither a welder nor an engineer approve, nor an author given inspector rights by mistake', async () => {
		const id = await inReview();
		for (const who of [a.welder, a.engineer, a.admin])
			await expect(
				svc.approveRevision(who, id, 1, { password: T.PASSWORD, comment: '' }, null, quiet)
			).rejects.toThrow(ForbiddenError);
		await User.update({ role: 'inspector' }, { where: { id: a.engineer.id } });
		try {
			const asInspector = { ...a.engineer, role: 'inspector' as const };
			await expect(
				svc.approveRevision(asInspector, id, 1, { password: T.PASSWORD, comment: '' }, null, quiet)
			).rejects.toThrow(svc.OWN_WORK);
			expect((await svc.getRevision(asInspector, id, 1)).can.decide).toBe(false);
		} finally {
			await User.update({ role: 'engineer' }, { where: { id: a.engineer.id } });
		}
		expect(await state(id, 1)).toBe('in-review');
	});

	it('detects a signed revision changed behind the app, and writes it to the trail', async () => {
		const id = await inReview();
		await svc.approveRevision(
			a.inspector,
			id,
			1,
			{ password: T.PASSWORD, comment: '' },
			null,
			quiet
		);
		const view = await svc.getRevision(a.engineer, id, 1);
		expect(view.integrity).toMatchObject({ signed: true, ok: true });
		expect(await svc.revisionDigest(view.revision.id)).toMatchObject({ matches: true });
		const row = await ProcedureRevision.findByPk(view.revision.id);
		const doc = JSON.parse(row!.variables);
		doc.electrical.amps.max = 180;
		await sequelize.query('UPDATE procedure_revisions SET variables = ? WHERE id = ?', {
			replacements: [JSON.stringify(doc), view.revision.id]
		});
		const after = await svc.getRevision(a.engineer, id, 1);
		expect(after.integrity.ok).toBe(false);
		expect(after.integrity.computedDigest).not.toBe(after.integrity.signedDigest);
		expect(await svc.revisionDigest(view.revision.id)).toMatchObject({ matches: false });
		expect(
			await AuditEvent.count({
				where: { objectId: String(view.revision.id), action: 'procedure_revision.tamper_detected' }
			})
		).toBe(1);
		// The signature rows themselves cannot be rewritten (a trigger refuses it).
		await expect(
			sequelize.query("UPDATE sign_offs SET printed_name = 'Someone Else'")
		).rejects.toThrow();
		expect(await SignOff.count({ where: { printedName: 'Someone Else' } })).toBe(0);
	});

	it('checks each signed revision the diff shows, and writes a mismatch to the trail', async () => {
		const id = await inReview();
		await svc.approveRevision(
			a.inspector,
			id,
			1,
			{ password: T.PASSWORD, comment: '' },
			null,
			quiet
		);
		const { rev } = await svc.startRevision(a.engineer, id);
		const clean = await svc.diffRevisions(a.engineer, id, rev, 1);
		expect(clean.b).toMatchObject({ rev: 1, integrity: { signed: true, ok: true } });
		expect(clean.a.integrity.signed).toBe(false);
		const row = await ProcedureRevision.findOne({ where: { procedureId: id, rev: 1 } });
		await sequelize.query(
			'UPDATE procedure_revisions SET variables = replace(variables, \'"max":135\', \'"max":185\') WHERE id = ?',
			{ replacements: [row!.id] }
		);
		const tamperEvents = () =>
			AuditEvent.count({
				where: { objectId: String(row!.id), action: 'procedure_revision.tamper_detected' }
			});
		const seen = await svc.diffRevisions(a.engineer, id, rev, 1);
		expect(seen.b.integrity.ok).toBe(false);
		expect(seen.b.integrity.problems).toContain(
			'The revision as stored now differs from what was signed.'
		);
		expect(seen.a.integrity.ok).toBe(true);
		expect(await tamperEvents()).toBe(1);
		// Either side: revision 1 against itself is one view, one event.
		const same = await svc.diffRevisions(a.engineer, id, 1, 1);
		expect(same.a.integrity.ok).toBe(false);
		expect(await tamperEvents()).toBe(2);
	});
});

describe('scoping and records', () => {
	it("answers not found for another shop's procedure and refuses its PQRs and records", async () => {
		const id = await inReview();
		await expect(svc.getRevision(b.engineer, id, 1)).rejects.toThrow(NotFoundError);
		await expect(svc.updateDraft(b.engineer, id, 1, T.revisionForm())).rejects.toThrow(
			NotFoundError
		);
		await expect(
			svc.approveRevision(b.inspector, id, 1, { password: T.PASSWORD, comment: '' }, null, quiet)
		).rejects.toThrow(NotFoundError);
		const theirs = await createPqr(b.engineer, T.pqrForm());
		const mine = await draft();
		await expect(
			svc.updateDraft(a.engineer, mine, 1, T.revisionForm({ pqrIds: [theirs.id] }))
		).rejects.toThrow(/No PQR/);
		const listed = await svc.listProcedures(b.engineer, { page: 1 });
		expect(listed.rows.some((r) => r.id === id)).toBe(false);
	});

	it('builds a draft whose ranges span the chosen settings records, and freezes them', async () => {
		const rec = (amps: string, thickness: string, position: string) =>
			createRecord(
				a.engineer,
				settingsRecordSchema.parse({
					process: 'GTAW',
					currentType: 'DCEN',
					amps,
					thickness,
					position,
					baseMetalSpec: 'A36',
					fillerClass: 'ER70S-6',
					fillerDiameter: '3/32',
					gasName: 'argon',
					outcome: 'sound',
					weldedOn: '2025-03-04'
				})
			);
		const [r1, r2] = await Promise.all([rec('115', '1/8', '2F'), rec('135', '3/16', '1F')]);
		const { id } = await svc.createProcedure(a.engineer, {
			number: 'WPS-SPAN',
			title: 'From the bench',
			code: 'aws-d1.1',
			process: 'GTAW',
			recordIds: [r1.id, r2.id]
		});
		const view = await svc.getRevision(a.engineer, id, 1);
		expect(view.variables.electrical.amps).toEqual({ min: 115, max: 135 });
		expect(view.variables.baseMetals.thicknessMm.min).toBeCloseTo(3.175, 6);
		expect(view.variables.baseMetals.thicknessMm.max).toBeCloseTo(4.7625, 6);
		expect(view.variables.positions.allowed).toEqual(['1F', '2F']);
		expect(view.variables.fillerMetals).toMatchObject({
			classifications: ['ER70S-6'],
			fNumbers: [6]
		});
		expect(view.records.map((r) => r.id)).toEqual([r1.id, r2.id].sort((x, y) => x - y));
		const frozen = await SettingsRecord.findAll({ where: { id: [r1.id, r2.id] } });
		expect(frozen.every((r) => r.frozenAt !== null && r.citedByProcedureId === id)).toBe(true);
		await expect(
			svc.createProcedure(a.engineer, {
				number: 'wps-span',
				title: 'x',
				code: 'shop',
				process: 'GTAW',
				recordIds: []
			})
		).rejects.toThrow(/already a procedure/);
	});

	it('shows thickness outside the PQR and the D1.1 amperage trigger among the findings', async () => {
		const { id: pqrId } = await createPqr(
			a.engineer,
			T.pqrForm({ couponThickness: '1/8', amps: '100' })
		);
		await certifyPqr(a.engineer, pqrId);
		const id = await draft();
		await svc.updateDraft(
			a.engineer,
			id,
			1,
			T.revisionForm({
				pqrIds: [pqrId],
				thicknessMin: '1/8',
				thicknessMax: '1/2',
				ampsMin: '115',
				ampsMax: '135'
			})
		);
		const { findings } = await svc.getRevision(a.engineer, id, 1);
		const thick = findings.filter((f) => f.check === 'pqr-ranges');
		// QW-451.1: T = 1/8 in qualifies 1/16 in to 2T = 1/4 in.
		expect(thick.find((f) => f.end === 'high')?.status).toBe('outside');
		expect(thick.find((f) => f.end === 'low')?.status).toBe('ok');
		// AWS D1.1: GTAW amperage beyond 25 % of the PQR's 100 A needs requalification.
		expect(findings.find((f) => f.check === 'requalification' && f.field === 'amps')?.status).toBe(
			'outside'
		);
		expect(findings.find((f) => f.check === 'pqr-positions')?.status).toBe('ok');
	});
});
