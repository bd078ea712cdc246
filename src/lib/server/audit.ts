import type { RequestEvent } from '@sveltejs/kit';
import type { Transaction } from 'sequelize';
import { AuditEvent } from './models';

export interface AuditEntry {
	shopId: number | null;
	actor: { id: string; name: string } | null;
	action: string;
	objectType: string;
	objectId?: string | number | null;
	before?: unknown;
	after?: unknown;
}

function json(value: unknown): string | null {
	return value === undefined ? null : JSON.stringify(value);
}

/** Appends one event; pass the transaction that made the change so both commit or neither does. */
export async function audit(
	entry: AuditEntry,
	event: RequestEvent | null,
	transaction?: Transaction
): Promise<void> {
	let ip: string | null = null;
	try {
		ip = event?.getClientAddress() ?? null;
	} catch {
		ip = null;
	}
	await AuditEvent.create(
		{
			shopId: entry.shopId,
			actorId: entry.actor?.id ?? null,
			actorName: entry.actor?.name ?? 'system',
			action: entry.action,
			objectType: entry.objectType,
			objectId: entry.objectId == null ? null : String(entry.objectId),
			before: json(entry.before),
			after: json(entry.after),
			ip,
			userAgent: event?.request.headers.get('user-agent')?.slice(0, 300) ?? null
		},
		{ transaction }
	);
}
