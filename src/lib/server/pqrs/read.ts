import { isoResultSet, type IsoResultSet } from '$lib/procedures/pqr-iso';
import { d11ResultSet, type D11Item } from '$lib/procedures/pqr-d11';
// PQRs as their pages and the API show them, with the certified digest re-verified on every view.
import type { RequestEvent } from '@sveltejs/kit';
import { Op, type WhereOptions } from 'sequelize';
import { pqrValuesSchema, testsSchema, type PqrValues, type TestResult } from '$lib/schemas/pqr';
import { qualifiedRanges, type PqrQualified } from '$lib/procedures/pqr-values';
import { audit } from '../audit';
import type { SessionUser } from '../auth/session-user';
import { sequelize, write } from '../db';
import { likeOp } from '../db/dialect';
import {
	Pqr,
	PqrAddendum,
	PqrReport,
	Procedure,
	ProcedureRevision,
	RevisionPqr,
	User
} from '../models';
import { AUTHOR_ROLES, CERTIFY_ROLES } from '../procedures/access';
import { pqrDigest } from '../procedures/digest';
import { findPqr } from './save';

export interface PqrView {
	id: number;
	number: string;
	title: string;
	process: string;
	state: 'draft' | 'certified';
	values: PqrValues;
	tests: TestResult[];
	qualified: PqrQualified;
	/** Governing code of the PQR (migration 0011); `asme-ix+iso` for one coupon to both. */
	code: string;
	/** The ISO 15614-1 result set, for an ISO PQR (shown beside the ASME one). */
	iso: IsoResultSet | null;
	/** The AWS D1.1 result set, for a D1.1 PQR (shown beside the ASME one). */
	d11: D11Item[] | null;
	author: string;
	certified: { by: string; at: string; digest: string } | null;
	/** False when the stored content no longer gives the certified digest. */
	intact: boolean;
	reports: { id: number; name: string; bytes: number; sha256: string; uploadedAt: string }[];
	addenda: { id: number; author: string; body: string; at: string }[];
	usedBy: { procedureId: number; number: string; rev: number; state: string }[];
	can: { edit: boolean; certify: boolean; addendum: boolean };
	updatedAt: string;
}

export function readPqr(p: Pqr): { values: PqrValues; tests: TestResult[] } {
	const values = pqrValuesSchema.safeParse(safe(p.actualValues));
	const tests = testsSchema.safeParse(safe(p.tests));
	return {
		values: values.success ? values.data : emptyValues(p.process),
		tests: tests.success ? tests.data : []
	};
}

const safe = (s: string): unknown => {
	try {
		return JSON.parse(s);
	} catch {
		return null;
	}
};

function emptyValues(process: string): PqrValues {
	return pqrValuesSchema.parse({
		v: 1,
		process: ['GTAW', 'GMAW', 'FCAW', 'SMAW'].includes(process) ? process : 'GTAW',
		currentType: null,
		transfer: null,
		amps: null,
		volts: null,
		travelSpeedMmPerS: null,
		wireFeedMmPerS: null,
		fillerClass: '',
		fillerDiameterMm: null,
		fNumber: null,
		aNumber: null,
		tungstenClass: '',
		tungstenDiameterMm: null,
		gasName: '',
		gasFlowLPerMin: null,
		baseMetalSpec: '',
		baseMetalFamily: null,
		pNumber: null,
		couponThicknessMm: null,
		couponUnit: 'in',
		depositedThicknessMm: null,
		testPosition: '',
		jointType: '',
		preheatC: null,
		interpassC: null,
		pwht: '',
		weldedOn: '',
		welder: '',
		lab: ''
	});
}

export async function getPqr(
	actor: SessionUser,
	id: number,
	event: RequestEvent | null = null
): Promise<PqrView> {
	const p = await findPqr(actor, id);
	const { values, tests } = readPqr(p);
	const [reports, addenda, author, links] = await Promise.all([
		PqrReport.findAll({
			where: { pqrId: id, shopId: actor.shopId, removedAt: null },
			order: [['id', 'ASC']]
		}),
		PqrAddendum.findAll({ where: { pqrId: id, shopId: actor.shopId }, order: [['id', 'ASC']] }),
		User.findOne({ where: { id: p.authorId, shopId: actor.shopId }, attributes: ['name'] }),
		RevisionPqr.findAll({ where: { pqrId: id, shopId: actor.shopId } })
	]);
	const revisions = links.length
		? await ProcedureRevision.findAll({
				where: { shopId: actor.shopId, id: { [Op.in]: links.map((l) => l.revisionId) } }
			})
		: [];
	const procedures = revisions.length
		? await Procedure.findAll({
				where: { shopId: actor.shopId, id: { [Op.in]: revisions.map((r) => r.procedureId) } }
			})
		: [];
	const intact = p.certifiedDigest ? (await pqrDigest(p)) === p.certifiedDigest : true;
	if (!intact)
		await write((t) =>
			audit(
				{
					shopId: actor.shopId,
					actor: { id: actor.id, name: actor.name },
					action: 'pqr.tamper_detected',
					objectType: 'pqr',
					objectId: id,
					before: { digest: p.certifiedDigest }
				},
				event,
				t
			)
		);
	const draft = p.state === 'draft';
	return {
		id: p.id,
		number: p.number,
		title: p.title,
		process: p.process,
		state: p.state,
		values,
		tests,
		// As stored (and, once certified, as signed); recomputed only if the stored one is unreadable.
		qualified: (safe(p.qualified) as PqrQualified | null) ?? qualifiedRanges(values),
		// Issue 15: an ISO 15614-1 PQR shows the ISO result set beside the ASME one (computed now).
		code: p.code,
		iso: ['iso-15614-1', 'asme-ix+iso'].includes(p.code) ? isoResultSet(values, tests) : null,
		d11: p.code === 'aws-d1.1' ? d11ResultSet(values, actor.unitSystem) : null,
		author: author?.name ?? 'former member',
		certified:
			p.certifiedAt && p.certifiedDigest
				? { by: p.certifiedName ?? '', at: p.certifiedAt.toISOString(), digest: p.certifiedDigest }
				: null,
		intact,
		reports: reports.map((r) => ({
			id: r.id,
			name: r.originalName,
			bytes: r.bytes,
			sha256: r.sha256,
			uploadedAt: r.createdAt.toISOString()
		})),
		addenda: addenda.map((a) => ({
			id: a.id,
			author: a.authorName,
			body: a.body,
			at: a.createdAt.toISOString()
		})),
		usedBy: revisions
			.map((r) => ({
				procedureId: r.procedureId,
				number: procedures.find((x) => x.id === r.procedureId)?.number ?? '?',
				rev: r.rev,
				state: r.state
			}))
			.sort((a, b) => a.number.localeCompare(b.number) || a.rev - b.rev),
		can: {
			edit: draft && AUTHOR_ROLES.includes(actor.role),
			certify: draft && CERTIFY_ROLES.includes(actor.role),
			addendum: !draft && AUTHOR_ROLES.includes(actor.role)
		},
		updatedAt: p.updatedAt.toISOString()
	};
}

export interface PqrRow {
	id: number;
	number: string;
	title: string;
	process: string;
	state: 'draft' | 'certified';
	certifiedAt: string | null;
}

export async function listPqrs(
	actor: SessionUser,
	f: { q?: string; process?: string; state?: string } = {}
): Promise<PqrRow[]> {
	const and: WhereOptions<Pqr>[] = [{ shopId: actor.shopId }];
	if (f.process) and.push({ process: f.process });
	if (f.state) and.push({ state: f.state });
	if (f.q) {
		const q = `%${f.q.replace(/%/g, '')}%`;
		and.push({
			[Op.or]: [{ number: { [likeOp(sequelize)]: q } }, { title: { [likeOp(sequelize)]: q } }]
		});
	}
	const rows = await Pqr.findAll({
		where: { [Op.and]: and },
		order: [['number', 'ASC']],
		limit: 500
	});
	return rows.map((p) => ({
		id: p.id,
		number: p.number,
		title: p.title,
		process: p.process,
		state: p.state,
		certifiedAt: p.certifiedAt?.toISOString() ?? null
	}));
}
