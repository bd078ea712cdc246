// Gathers what a procedure sheet prints from the rows as they are now: the shop, the revision and
// its variables, the PQRs it cites, the approving signature and whether it still matches, and
// the revision's booth link (issued now if it has none).
import { Op } from 'sequelize';
import type { RevisionStateId } from '$lib/procedures/options';
import { Pqr, Procedure, ProcedureRevision, RevisionPqr, Shop, SignOff } from '../models';
import { NotFoundError, RefusedError } from '../people/errors';
import type { SheetInput } from '../pdf/procedure-sheet';
import { checkIntegrity } from '../procedures/digest';
import { readVariables } from '../procedures/find';
import { boothUrl, ensureBoothLink } from './links';

export type Paper = SheetInput['paper'];

export const PAPERS: readonly Paper[] = ['letter', 'a4'];

/** Letter for shops that work in inches, A4 for metric shops, unless the request names one. */
export const defaultPaper = (units: 'imperial' | 'metric'): Paper =>
	units === 'imperial' ? 'letter' : 'a4';

async function inputFor(
	shop: Shop,
	procedure: Procedure,
	revision: ProcedureRevision,
	paper: Paper | null,
	printedAt: Date
): Promise<SheetInput> {
	const link = await ensureBoothLink(shop.id, revision.id);
	if (!link)
		throw new RefusedError(`Revision ${revision.rev} was never approved: it has no sheet.`);
	const [pqrLinks, signOff, integrity] = await Promise.all([
		RevisionPqr.findAll({ where: { revisionId: revision.id, shopId: shop.id } }),
		SignOff.findOne({
			where: { revisionId: revision.id, shopId: shop.id, meaning: 'approved' },
			order: [['id', 'DESC']]
		}),
		checkIntegrity(revision.id)
	]);
	const pqrs = pqrLinks.length
		? await Pqr.findAll({
				where: { shopId: shop.id, id: { [Op.in]: pqrLinks.map((l) => l.pqrId) } },
				order: [['number', 'ASC']]
			})
		: [];
	return {
		shopName: shop.name,
		number: procedure.number,
		rev: revision.rev,
		state: revision.state as RevisionStateId,
		supersededByRev: revision.supersededByRev ?? null,
		variables: readVariables(revision).variables,
		units: shop.unitSystem,
		pqrs: pqrs.map((p) => ({ number: p.number, title: p.title })),
		signOff: signOff
			? {
					printedName: signOff.printedName,
					role: signOff.role,
					meaning: signOff.meaning,
					signedAt: signOff.signedAt,
					digest: signOff.digest
				}
			: null,
		intact: integrity.ok,
		url: boothUrl(link.token),
		printedAt,
		paper: paper ?? defaultPaper(shop.unitSystem)
	};
}

/**
 * One revision's sheet input: `rev` when given (any signed revision), else the revision in force.
 * Another shop's procedure is "not found".
 */
export async function sheetFor(
	shopId: number,
	procedureId: number,
	opts: { rev?: number | null; paper?: Paper | null; printedAt?: Date } = {}
): Promise<SheetInput> {
	const [shop, procedure] = await Promise.all([
		Shop.findByPk(shopId),
		Procedure.findOne({ where: { id: procedureId, shopId } })
	]);
	if (!shop || !procedure) throw new NotFoundError('No such procedure in your shop.');
	const revision = await ProcedureRevision.findOne({
		where: {
			procedureId,
			shopId,
			...(opts.rev ? { rev: opts.rev } : { state: 'approved' })
		},
		order: [['rev', 'DESC']]
	});
	if (!revision)
		throw opts.rev
			? new NotFoundError('No such revision of this procedure.')
			: new RefusedError(
					'No revision of this procedure is in force, so there is no sheet to print.'
				);
	return inputFor(shop, procedure, revision, opts.paper ?? null, opts.printedAt ?? new Date());
}

/** Every revision in force in the shop, by procedure number: the batch of current sheets. */
export async function currentSheets(
	shopId: number,
	opts: { paper?: Paper | null; printedAt?: Date } = {}
): Promise<{ shopName: string; sheets: SheetInput[] }> {
	const shop = await Shop.findByPk(shopId);
	if (!shop) throw new NotFoundError('No such shop.');
	const revisions = await ProcedureRevision.findAll({ where: { shopId, state: 'approved' } });
	const procedures = revisions.length
		? await Procedure.findAll({
				where: { shopId, id: { [Op.in]: revisions.map((r) => r.procedureId) } }
			})
		: [];
	const printedAt = opts.printedAt ?? new Date();
	const pairs = revisions
		.map((r) => ({ r, p: procedures.find((p) => p.id === r.procedureId) }))
		.filter((x): x is { r: ProcedureRevision; p: Procedure } => !!x.p)
		.sort((a, b) => a.p.number.localeCompare(b.p.number, 'en', { numeric: true }));
	const sheets: SheetInput[] = [];
	for (const { r, p } of pairs)
		sheets.push(await inputFor(shop, p, r, opts.paper ?? null, printedAt));
	return { shopName: shop.name, sheets };
}
