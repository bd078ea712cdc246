// One record as its pages show it: values, findings, photos, who wrote it, its trail.
import { actionWords } from '$lib/audit/action-labels';
import { fieldOf, inSentence } from '$lib/audit/field-labels';
import type { Finding } from '$lib/weld';
import type { StoredValues } from '$lib/records/display';
import type { SessionUser } from '../auth/session-user';
import { AuditEvent, SettingsPhoto, User } from '../models';
import { canEdit, isFrozen } from './access';
import { findOwn } from './save';

export interface PhotoView {
	id: number;
	name: string;
	width: number;
	height: number;
}

export interface RecordView {
	id: number;
	values: StoredValues;
	entered: { units?: 'imperial' | 'metric'; fields?: Record<string, string> };
	findings: Finding[];
	derived: Record<string, unknown>;
	cautionCount: number;
	author: { id: string; name: string };
	photos: PhotoView[];
	frozen: boolean;
	frozenAt: string | null;
	citedByProcedureId: number | null;
	canEdit: boolean;
	createdAt: string;
	updatedAt: string;
}

function parse<T>(json: string, fallback: T): T {
	try {
		return JSON.parse(json) as T;
	} catch {
		return fallback;
	}
}

export function storedValues(r: StoredValues): StoredValues {
	return {
		process: r.process,
		currentType: r.currentType,
		transfer: r.transfer,
		amps: r.amps,
		volts: r.volts,
		wireFeedMmPerS: r.wireFeedMmPerS,
		travelSpeedMmPerS: r.travelSpeedMmPerS,
		fillerClass: r.fillerClass,
		fillerDiameterMm: r.fillerDiameterMm,
		tungstenClass: r.tungstenClass,
		tungstenDiameterMm: r.tungstenDiameterMm,
		gasName: r.gasName,
		gasFlowLPerMin: r.gasFlowLPerMin,
		baseMetalSpec: r.baseMetalSpec,
		baseMetalFamily: r.baseMetalFamily,
		pNumber: r.pNumber,
		thicknessMm: r.thicknessMm,
		jointType: r.jointType,
		position: r.position,
		preheatC: r.preheatC,
		interpassC: r.interpassC,
		machine: r.machine,
		jobRef: r.jobRef,
		outcome: r.outcome,
		outcomeKind: r.outcomeKind,
		defects: r.defects,
		notes: r.notes,
		weldedOn: r.weldedOn
	};
}

export async function getRecord(actor: SessionUser, id: number): Promise<RecordView> {
	const r = await findOwn(actor, id);
	const [author, photos] = await Promise.all([
		User.findOne({ where: { id: r.authorId, shopId: actor.shopId }, attributes: ['id', 'name'] }),
		SettingsPhoto.findAll({
			where: { recordId: r.id, shopId: actor.shopId, removedAt: null },
			order: [['id', 'ASC']]
		})
	]);
	return {
		id: r.id,
		values: storedValues(r),
		entered: parse(r.entered, {}),
		findings: parse<Finding[]>(r.findings, []),
		derived: parse(r.derived, {}),
		cautionCount: r.cautionCount,
		author: { id: r.authorId, name: author?.name ?? 'former member' },
		photos: photos.map((p) => ({
			id: p.id,
			name: p.originalName,
			width: p.width,
			height: p.height
		})),
		frozen: isFrozen(r),
		frozenAt: r.frozenAt?.toISOString() ?? null,
		citedByProcedureId: r.citedByProcedureId ?? null,
		canEdit: canEdit(actor, r),
		createdAt: r.createdAt.toISOString(),
		updatedAt: r.updatedAt.toISOString()
	};
}

export interface HistoryEntry {
	at: string;
	actor: string;
	action: string;
	changed: string[];
}

/** The record's audit trail, newest first, with the fields each change touched. */
export async function recordHistory(actor: SessionUser, id: number): Promise<HistoryEntry[]> {
	await findOwn(actor, id);
	const events = await AuditEvent.findAll({
		where: { shopId: actor.shopId, objectType: 'settings_record', objectId: String(id) },
		order: [['id', 'DESC']],
		limit: 100
	});
	return events.map((e) => {
		const before = parse<Record<string, unknown>>(e.before ?? '{}', {});
		const after = parse<Record<string, unknown>>(e.after ?? '{}', {});
		const changed =
			e.action === 'settings_record.updated'
				? Object.keys({ ...before, ...after }).filter(
						(k) => JSON.stringify(before[k] ?? null) !== JSON.stringify(after[k] ?? null)
					)
				: [];
		return {
			at: e.at.toISOString(),
			actor: e.actorName,
			// The trail's one table of words: the event's label and each changed field's label.
			action: actionWords(e.action).label,
			changed: changed.map((k) => inSentence(fieldOf(k).label))
		};
	});
}
