// Reading welders with their qualifications, status (computed for `today`) and ranges.
import { Op } from 'sequelize';
import { ContinuityEntry, Qualification, QualificationConfirmation, User, Welder } from '../models';
import type { QualificationCode } from '../models/qualification';
import { NotFoundError } from '../people/errors';
import { qualifiedRanges, splitPositions, type QualifiedRanges } from './ranges';
import { qualificationStatus, type QualificationStatus } from './status';
import { summary, type WelderSummary } from './welders';

export interface QualificationView {
	id: number;
	process: Qualification['process'];
	code: QualificationCode;
	testDate: string;
	wpsRef: string | null;
	testPositions: string[];
	couponType: 'plate' | 'pipe';
	couponDiameterMm: number | null;
	couponThicknessMm: number;
	depositThicknessMm: number;
	depositLayers: number | null;
	fNumber: number | null;
	fillerClass: string | null;
	backing: string | null;
	currentType: string | null;
	results: string | null;
	witnessedBy: string | null;
	recordName: string | null;
	status: QualificationStatus;
	ranges: QualifiedRanges;
	confirmations: { confirmedOn: string; responsiblePerson: string; note: string | null }[];
}

export interface UseView {
	id: number;
	process: string;
	usedOn: string;
	source: string;
	note: string | null;
	recordedByName: string;
}

export interface WelderView extends WelderSummary {
	/** Where lapse notices go: the linked account's address, else the welder's own. */
	noticeEmail: string | null;
	qualifications: QualificationView[];
	uses: UseView[];
}

function qualificationView(
	q: Qualification,
	uses: readonly string[],
	confirmations: QualificationConfirmation[],
	today: string
): QualificationView {
	const confirmedOn = confirmations.map((c) => c.confirmedOn);
	return {
		id: q.id,
		process: q.process,
		code: q.code,
		testDate: q.testDate,
		wpsRef: q.wpsRef,
		testPositions: splitPositions(q.testPositions),
		couponType: q.couponType,
		couponDiameterMm: q.couponDiameterMm,
		couponThicknessMm: q.couponThicknessMm,
		depositThicknessMm: q.depositThicknessMm,
		depositLayers: q.depositLayers,
		fNumber: q.fNumber,
		fillerClass: q.fillerClass,
		backing: q.backing,
		currentType: q.currentType,
		results: q.results,
		witnessedBy: q.witnessedBy,
		recordName: q.recordKey ? (q.recordName ?? 'test-record.pdf') : null,
		status: qualificationStatus(
			{
				code: q.code,
				testDate: q.testDate,
				withdrawnAt: q.withdrawnAt,
				uses,
				confirmations: confirmedOn
			},
			today
		),
		ranges: qualifiedRanges(q),
		confirmations: confirmations
			.map((c) => ({
				confirmedOn: c.confirmedOn,
				responsiblePerson: c.responsiblePerson,
				note: c.note
			}))
			.sort((a, b) => b.confirmedOn.localeCompare(a.confirmedOn))
	};
}

/** Every welder of the shop (or the given ones) with qualifications and log, in one pass. */
export async function loadWelders(
	shopId: number,
	today: string,
	opts: { ids?: number[]; activeOnly?: boolean } = {}
): Promise<WelderView[]> {
	const where: Record<string, unknown> = { shopId };
	if (opts.ids) where.id = { [Op.in]: opts.ids };
	if (opts.activeOnly) where.active = true;
	const welders = await Welder.findAll({
		where,
		order: [
			['name', 'ASC'],
			['id', 'ASC']
		]
	});
	if (welders.length === 0) return [];
	const ids = welders.map((w) => w.id);
	const [quals, uses, users] = await Promise.all([
		Qualification.findAll({
			where: { shopId, welderId: { [Op.in]: ids } },
			order: [
				['testDate', 'DESC'],
				['id', 'DESC']
			]
		}),
		ContinuityEntry.findAll({
			where: { shopId, welderId: { [Op.in]: ids } },
			order: [
				['usedOn', 'DESC'],
				['id', 'DESC']
			]
		}),
		User.findAll({
			where: {
				shopId,
				id: { [Op.in]: welders.map((w) => w.userId).filter((u): u is string => !!u) }
			}
		})
	]);
	const confirmations = quals.length
		? await QualificationConfirmation.findAll({
				where: { shopId, qualificationId: { [Op.in]: quals.map((q) => q.id) } }
			})
		: [];
	const userById = new Map(users.map((u) => [u.id, u]));
	return welders.map((w) => {
		const mine = uses.filter((u) => u.welderId === w.id);
		const user = w.userId ? userById.get(w.userId) : undefined;
		return {
			...summary(w, user?.name ?? null),
			noticeEmail: user?.active ? user.email : (w.email ?? null),
			qualifications: quals
				.filter((q) => q.welderId === w.id)
				.map((q) =>
					qualificationView(
						q,
						mine.filter((u) => u.process === q.process).map((u) => u.usedOn),
						confirmations.filter((c) => c.qualificationId === q.id),
						today
					)
				),
			uses: mine.map((u) => ({
				id: u.id,
				process: u.process,
				usedOn: u.usedOn,
				source: u.source,
				note: u.note,
				recordedByName: u.recordedByName
			}))
		};
	});
}

export async function welderView(shopId: number, id: number, today: string): Promise<WelderView> {
	const [w] = await loadWelders(shopId, today, { ids: [id] });
	if (!w) throw new NotFoundError('No such welder in your shop.');
	return w;
}
