// Helpers for the procedure journeys: drafts made through the API, and the test's own door to
// the SQLite file, for changing a row behind the app's back.
import { expect, type APIRequestContext } from '@playwright/test';
import { join } from 'node:path';
import sqlite3 from 'sqlite3';

let seq = 0;
export const uniqueNumber = (label: string) =>
	`E2E-${label}-${process.pid}-${Date.now().toString(36)}-${++seq}`.slice(0, 40);

export const DRAFT = {
	units: 'imperial',
	title: 'GTAW A36 fillet, e2e',
	code: 'aws-d1.1',
	process: 'GTAW',
	currentType: 'DCEN',
	ampsMin: '115',
	ampsMax: '135',
	thicknessMin: '1/8',
	thicknessMax: '1/4',
	baseMetalSpecs: 'A36',
	fillerClasses: 'ER70S-6',
	positions: ['2F']
};

/** A procedure whose revision 1 is in review, made by the signed-in engineer of `request`. */
export async function draftInReview(request: APIRequestContext, label: string) {
	const number = uniqueNumber(label);
	const created = await request.post('/api/v1/procedures', {
		data: { number, title: DRAFT.title, code: 'aws-d1.1', process: 'GTAW' }
	});
	expect(created.status()).toBe(201);
	const { id } = (await created.json()) as { id: number };
	expect(
		(await request.put(`/api/v1/procedures/${id}/revisions/1`, { data: DRAFT })).status()
	).toBe(200);
	expect(
		(await request.post(`/api/v1/procedures/${id}/revisions/1/submit`, { data: {} })).status()
	).toBe(200);
	return { id, number };
}

/** Runs statements on the e2e server's database file directly. */
export async function sql(statement: string, params: unknown[] = []): Promise<number> {
	const file = join(process.env.E2E_DATA_DIR ?? '', 'beadline.sqlite');
	const db = new sqlite3.Database(file);
	try {
		db.configure('busyTimeout', 5000);
		return await new Promise<number>((resolve, reject) =>
			db.run(statement, params, function (this: { changes: number }, err: Error | null) {
				if (err) reject(err);
				else resolve(this.changes);
			})
		);
	} finally {
		await new Promise<void>((resolve) => db.close(() => resolve()));
	}
}

export async function sqlGet<T>(statement: string, params: unknown[] = []): Promise<T | undefined> {
	const file = join(process.env.E2E_DATA_DIR ?? '', 'beadline.sqlite');
	const db = new sqlite3.Database(file);
	try {
		db.configure('busyTimeout', 5000);
		return await new Promise<T | undefined>((resolve, reject) =>
			db.get(statement, params, (err: Error | null, row: T) => (err ? reject(err) : resolve(row)))
		);
	} finally {
		await new Promise<void>((resolve) => db.close(() => resolve()));
	}
}
