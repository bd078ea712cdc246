// The files a job carries: the drawing and inspection reports. Both go through the storage
// module as PQR lab reports and record photos do: the content sniffed (PDF, JPEG or PNG; never
// the name or the browser's type), images re-encoded (metadata and trailing bytes gone), a size
// limit, a random name, and the SHA-256 of the bytes stored, checked again on every download.
import { createHash } from 'node:crypto';
import { NotFoundError, RefusedError } from '../people/errors';
import { discardUploads, openUpload, saveUpload, UploadRefused, type UploadKind } from '../storage';

export const MAX_JOB_FILE_BYTES = 20 * 1024 * 1024;
export const JOB_FILE_KINDS: readonly UploadKind[] = ['application/pdf', 'image/jpeg', 'image/png'];

const sha256 = (b: Uint8Array) => createHash('sha256').update(b).digest('hex');
const cleanName = (name: string, fallback: string) =>
	(name.replace(/[\\/\r\n"]/g, '_').trim() || fallback).slice(0, 200);

export interface PostedFile {
	bytes: Uint8Array;
	name: string;
}

export interface StoredJobFile {
	key: string;
	name: string;
	sha256: string;
	mime: UploadKind;
	width: number | null;
	height: number | null;
}

/**
 * Stores a posted file; a file to refuse is a RefusedError at `field`. The caller writes its row
 * and, when that fails, calls `discardUploads([stored.key])`.
 */
export async function storeJobFile(
	file: PostedFile,
	field: string,
	fallbackName: string
): Promise<StoredJobFile> {
	const name = cleanName(file.name, fallbackName);
	let stored;
	try {
		stored = await saveUpload(file.bytes, {
			accept: JOB_FILE_KINDS,
			maxBytes: MAX_JOB_FILE_BYTES,
			name
		});
	} catch (e) {
		if (e instanceof UploadRefused) throw new RefusedError(e.message, field);
		throw e;
	}
	// No row names the thumbnail; it is not kept (the sweep would only move it aside later).
	if (stored.thumbKey) await discardUploads([stored.thumbKey]);
	// Images are re-encoded: the digest is of the bytes kept, which downloads are checked against.
	const kept = stored.mime === 'application/pdf' ? file.bytes : await openUpload(stored.key);
	if (!kept) throw new Error('An upload just stored cannot be read back.');
	return {
		key: stored.key,
		name,
		sha256: sha256(kept),
		mime: stored.mime,
		width: stored.width ?? null,
		height: stored.height ?? null
	};
}

export const mimeOfKey = (key: string): UploadKind =>
	key.endsWith('.pdf') ? 'application/pdf' : key.endsWith('.png') ? 'image/png' : 'image/jpeg';

/** The stored bytes, refused (not sent) when they no longer match their digest. */
export async function openJobFile(
	key: string,
	digest: string
): Promise<{ bytes: Buffer; intact: boolean; found: string }> {
	const bytes = await openUpload(key);
	if (!bytes) throw new NotFoundError('The file is missing from storage.');
	const found = sha256(bytes);
	return { bytes, intact: found === digest, found };
}

/**
 * The download: its real type, never sniffed, never cached, with a Content-Disposition of our
 * own. A PDF is always a download (its viewer never runs script in our origin); an image, which
 * was re-encoded, may show inline (the drawing is shown on the job page).
 */
export function fileResponse(bytes: Buffer, key: string, name: string): Response {
	const mime = mimeOfKey(key);
	const ascii = name.replace(/[^\x20-\x7e]/g, '_');
	const how = mime === 'application/pdf' ? 'attachment' : 'inline';
	return new Response(new Uint8Array(bytes), {
		headers: {
			'Content-Type': mime,
			'Content-Length': String(bytes.length),
			'Content-Disposition': `${how}; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(name)}`,
			'Content-Security-Policy': "default-src 'none'",
			'X-Content-Type-Options': 'nosniff',
			'Cache-Control': 'private, no-store'
		}
	});
}
