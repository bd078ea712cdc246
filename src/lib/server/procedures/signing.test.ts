import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

const dir = mkdtempSync(join(tmpdir(), 'beadline-signing-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const { sequelize } = await import('../db');
const { AuditEvent, ProcedureRevision, SignOff, User } = await import('../models');
const { ForbiddenError } = await import('../people/errors');
const svc = await import('./index');
const T = await import('./test-support');
const { clearFailures } = await import('../auth/failed-sign-ins');

type People = Awaited<ReturnType<typeof T.shopWithPeople>>;
let a: People;
const quiet = { notify: false };

beforeAll(async () => {
	a = await T.shopWithPeople('Signing Shop');
});

const inReview = (people = a) => T.procedureInReview(people);
const state = T.revisionState;

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
		await clearFailures(a.inspector.email);
		try {
			for (let i = 0; i < 9; i++) await expect(wrong()).rejects.toThrow(svc.WRONG_PASSWORD);
			// The tenth is the last one the limit takes (the same ten as at sign-in).
			await expect(wrong()).rejects.toThrow(svc.TOO_MANY_PASSWORDS);
			await expect(
				svc.approveRevision(a.inspector, id, 1, { password: T.PASSWORD, comment: '' }, null, quiet)
			).rejects.toThrow(svc.TOO_MANY_PASSWORDS);
			expect(await state(id, 1)).toBe('in-review');
		} finally {
			await clearFailures(a.inspector.email);
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
		const tamperEvents = await T.tamperWithRevision(row!.id);
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
