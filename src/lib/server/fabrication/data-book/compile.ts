// "Compile data book": what the customer receives for a job, as one ZIP. The PDFs are made first
// (each a few hundred kB at most), each stored report is hashed by streaming it once, and the
// manifest of every file's SHA-256 and size is stored with a random token before the first byte
// of the ZIP is sent; the ZIP itself is then streamed (zip.ts), reports piped from the store.
import type { RequestEvent } from '@sveltejs/kit';
import { createHash, randomBytes } from 'node:crypto';
import type { Readable } from 'node:stream';
import { audit } from '../../audit';
import type { SessionUser } from '../../auth/session-user';
import { sheetFor } from '../../booth/sheet-data';
import { config } from '../../config';
import { write } from '../../db';
import { DataBook } from '../../models';
import { ForbiddenError, NotFoundError, RefusedError } from '../../people/errors';
import { procedureSheetPdf } from '../../pdf/procedure-sheet';
import { qualificationCardPdf } from '../../pdf/qualification-card';
import { weldMapPdf } from '../../pdf/weld-map';
import { actingMember, actorOf } from '../../procedures/access';
import { openUploadStream } from '../../storage';
import { localDay } from '../../welders/dates';
import { loadWelders, type WelderView } from '../../welders/read';
import { liveLink, verifyUrl } from '../../welders/verification';
import { DATA_BOOK_ROLES } from './access';
import { weldMapContent, type WeldDayWelders } from './content';
import {
	manifestText,
	sha256Hex,
	uniqueNames,
	zipName,
	type FileKind,
	type Manifest,
	type ManifestFile
} from './manifest';
import { bookRecords, recordDigests, recordSections, type BookRecords } from './records';
import { zipStream, type ZipEntry } from './zip';

/** 192 random bits, URL-safe: the verification page's address cannot be guessed. */
export const newBookToken = (): string => randomBytes(24).toString('base64url');
export const BOOK_TOKEN = /^[A-Za-z0-9_-]{32}$/;

export const dataBookUrl = (token: string): string =>
	`${new URL(config.origin).origin}/verify/${encodeURIComponent(token)}`;

export interface CompiledBook {
	id: number;
	token: string;
	fileName: string;
	manifest: Manifest;
	manifestText: string;
	manifestDigest: string;
	/** The ZIP, streamed as it is read; call once. */
	zip: () => Readable;
}

type Pending = ZipEntry & { kind: FileKind; sha256: string; size: number };

const pdfEntry = (name: string, kind: FileKind, bytes: Uint8Array): Pending => ({
	name,
	kind,
	bytes,
	sha256: sha256Hex(bytes),
	size: bytes.length
});

/** SHA-256 and size of a stored upload, read as a stream; null when the store lacks it. */
async function hashUpload(key: string): Promise<{ sha256: string; bytes: number } | null> {
	const found = await openUploadStream(key);
	if (!found) return null;
	const hash = createHash('sha256');
	let bytes = 0;
	for await (const chunk of found.body as AsyncIterable<Buffer>) {
		hash.update(chunk);
		bytes += chunk.length;
	}
	return { sha256: hash.digest('hex'), bytes };
}

/** Each welder as of each day they welded on the job (their qualification on that day). */
async function weldDayWelders(shopId: number, records: BookRecords): Promise<WeldDayWelders> {
	const byDay = new Map<string, Set<number>>();
	for (const j of records.job.joints)
		for (const l of j.history.logs) {
			const ids = byDay.get(l.weldedOn) ?? new Set<number>();
			ids.add(l.welderId);
			byDay.set(l.weldedOn, ids);
		}
	const out = new Map<string, WelderView>();
	for (const [day, ids] of byDay)
		for (const w of await loadWelders(shopId, day, { ids: [...ids] })) out.set(`${day}|${w.id}`, w);
	return out;
}

async function procedureSheets(actor: SessionUser, records: BookRecords, at: Date) {
	const files: Pending[] = [];
	const notes: string[] = [];
	for (const r of records.revisions) {
		try {
			const input = await sheetFor(actor.shopId, r.procedureId, { rev: r.rev, printedAt: at });
			const bytes = await procedureSheetPdf(input);
			files.push(
				pdfEntry(zipName('procedures', `${r.number}-rev${r.rev}`, 'pdf'), 'procedure-sheet', bytes)
			);
		} catch (e) {
			if (!(e instanceof RefusedError || e instanceof NotFoundError)) throw e;
			notes.push(`${r.number} rev ${r.rev} was never signed: there is no procedure sheet for it.`);
		}
	}
	return { files, notes };
}

async function welderCards(
	actor: SessionUser,
	records: BookRecords,
	today: string,
	event: RequestEvent | null
) {
	const files: Pending[] = [];
	for (const w of records.welders) {
		const { token } = await liveLink(actor, w.id, event);
		const bytes = await qualificationCardPdf({
			shopName: records.shopName,
			welder: w,
			url: verifyUrl(token),
			printedOn: today,
			units: records.units,
			size: records.units === 'imperial' ? 'letter' : 'a4'
		});
		files.push(pdfEntry(zipName('welders', `${w.name}-${w.stamp}`, 'pdf'), 'welder-card', bytes));
	}
	return files;
}

async function reports(records: BookRecords) {
	const files: Pending[] = [];
	const notes: string[] = [];
	for (const p of records.reports) {
		const joint = records.job.joints.find((j) => j.id === p.jointId);
		const found = await hashUpload(p.key);
		if (!found) {
			notes.push(
				`The report ${p.name} of ${joint?.mark ?? 'a joint'} is missing from the file store.`
			);
			continue;
		}
		if (p.sha256 && p.sha256 !== found.sha256)
			notes.push(
				`The report ${p.name} of ${joint?.mark ?? 'a joint'} no longer matches the digest taken at upload.`
			);
		const dot = p.name.lastIndexOf('.');
		const ext =
			dot > 0
				? p.name
						.slice(dot + 1)
						.replace(/[^A-Za-z0-9]/g, '')
						.slice(0, 8) || 'bin'
				: 'bin';
		const base = `${joint?.mark ?? 'joint'}-${p.inspectionId}-${dot > 0 ? p.name.slice(0, dot) : p.name}`;
		files.push({
			name: zipName('inspection-reports', base, ext),
			kind: 'inspection-report',
			sha256: found.sha256,
			size: found.bytes,
			open: async () => {
				const again = await openUploadStream(p.key);
				if (!again) throw new Error(`${p.name} left the file store while the data book was made.`);
				return again.body;
			}
		});
	}
	return { files, notes };
}

export async function compileDataBook(
	actor: SessionUser,
	jobId: number,
	event: RequestEvent | null = null,
	now: Date = new Date()
): Promise<CompiledBook> {
	if (!DATA_BOOK_ROLES.includes(actor.role))
		throw new ForbiddenError('Engineers, inspectors and admins compile a job’s data book.');
	const today = localDay(now, actor.timeZone);
	const records = await bookRecords(actor, jobId, today);
	const token = newBookToken();
	const url = dataBookUrl(token);
	const sheets = await procedureSheets(actor, records, now);
	const cards = await welderCards(actor, records, today, event);
	const stored = await reports(records);
	const others = [...sheets.files, ...cards, ...stored.files];
	const contents = [
		'This weld map and weld log (the joints, the procedure revision each was welded to with its digest, the welder and qualification for each pass, inspections, repairs and overrides)',
		`${sheets.files.length} signed procedure sheet${sheets.files.length === 1 ? '' : 's'} (procedures/)`,
		`${cards.length} welder qualification card${cards.length === 1 ? '' : 's'} (welders/)`,
		`${stored.files.length} inspection report${stored.files.length === 1 ? '' : 's'} (inspection-reports/)`,
		'manifest.json: every file with its SHA-256 and size, and the digests of the records',
		...sheets.notes,
		...stored.notes
	];
	const map = await weldMapPdf(
		weldMapContent(records, await weldDayWelders(actor.shopId, records), {
			url,
			compiledAt: now,
			compiledBy: actor.name,
			contents
		})
	);
	const entries: Pending[] = [
		pdfEntry(zipName('', `weld-map-and-log-${records.job.number}`, 'pdf'), 'weld-log', map),
		...others
	];
	const names = uniqueNames(entries.map((e) => e.name));
	entries.forEach((e, i) => (e.name = names[i]!));
	const files: ManifestFile[] = entries.map((e) => ({
		name: e.name,
		kind: e.kind,
		sha256: e.sha256,
		bytes: e.size
	}));
	const job = records.job;
	const manifest: Manifest = {
		kind: 'beadline-data-book',
		v: 1,
		token,
		verifyUrl: url,
		shop: records.shopName,
		job: {
			number: job.number,
			customer: job.customer,
			part: job.part,
			drawing: job.drawing,
			drawingRev: job.drawingRev,
			code: job.code
		},
		compiledAt: now.toISOString(),
		compiledBy: actor.name,
		records: recordDigests(recordSections(records)),
		files,
		note: 'Each file’s SHA-256 is over its bytes as stored in this ZIP. manifest.json itself is not listed; its SHA-256 is shown on the verification page.'
	};
	const text = manifestText(manifest);
	const digest = sha256Hex(text);
	const id = await write(async (t) => {
		const me = await actingMember(actor, DATA_BOOK_ROLES, t);
		const row = await DataBook.create(
			{
				shopId: actor.shopId,
				jobId: job.id,
				token,
				manifest: text,
				manifestDigest: digest,
				madeById: me.id,
				madeAt: now
			},
			{ transaction: t }
		);
		await audit(
			{
				shopId: actor.shopId,
				actor: actorOf(me),
				action: 'data-book.compiled',
				objectType: 'job',
				objectId: job.id,
				after: {
					dataBookId: row.id,
					manifestDigest: digest,
					recordsDigest: manifest.records.digest,
					files: files.length
				}
			},
			event,
			t
		);
		return row.id;
	});
	return {
		id,
		token,
		fileName: zipName('', `data-book-${job.number}-${today}`, 'zip'),
		manifest,
		manifestText: text,
		manifestDigest: digest,
		zip: () => zipStream(entries, text, now)
	};
}
