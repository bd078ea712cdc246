// Uploads: what is accepted (content sniffing, size limits), how images are re-encoded (sharp),
// and the random names they are stored under. Where the bytes go is the back end's business
// (select.ts: a local folder by default, an S3 bucket with STORAGE=s3); every object is stored
// whole or not at all.
import { randomBytes } from 'node:crypto';
import { Readable } from 'node:stream';
import type { OutputInfo } from 'sharp';
import { KEY, objectName, readAll } from './backend';
import { storage } from './select';
import { EXTENSIONS, sniff, type UploadKind } from './sniff';

export { sniff, type UploadKind };

export const MAX_IMAGE_BYTES = 10 * 1024 * 1024;
const THUMB_PX = 360;
const MAX_EDGE_PX = 4096;

/** A refusal worded for the person who sent the file; the caller shows it at the field. */
export class UploadRefused extends Error {
	constructor(message: string) {
		super(message);
		this.name = 'UploadRefused';
	}
}

async function put(key: string, bytes: Uint8Array): Promise<void> {
	await (await storage()).put(objectName(key), bytes);
}

export interface StoredUpload {
	key: string;
	mime: UploadKind;
	bytes: number;
	/** Images only. */
	thumbKey?: string;
	width?: number;
	height?: number;
}

export interface SaveOptions {
	accept: readonly UploadKind[];
	maxBytes: number;
	/** The name as sent, for messages only. */
	name?: string;
}

const LABEL: Record<UploadKind, string> = {
	'image/jpeg': 'JPEG',
	'image/png': 'PNG',
	'application/pdf': 'PDF'
};

/**
 * Checks the content, re-encodes images (orientation applied, metadata stripped, a thumbnail
 * made) and stores the result under a random name. Throws UploadRefused for a file to refuse.
 */
export async function saveUpload(bytes: Uint8Array, options: SaveOptions): Promise<StoredUpload> {
	const name = options.name ? `“${options.name}”` : 'The file';
	const accepted = options.accept.map((k) => LABEL[k]).join(' or ');
	if (bytes.length === 0) throw new UploadRefused(`${name} is empty.`);
	if (bytes.length > options.maxBytes)
		throw new UploadRefused(
			`${name} is ${(bytes.length / 1048576).toFixed(1)} MB; the limit is ${options.maxBytes / 1048576} MB.`
		);
	const kind = sniff(bytes);
	if (!kind || !options.accept.includes(kind))
		throw new UploadRefused(`${name} is not a ${accepted} file (checked by its content).`);
	const id = randomBytes(16).toString('hex');
	const ext = EXTENSIONS[kind];
	if (kind === 'application/pdf') {
		await put(`${id}.${ext}`, bytes);
		return { key: `${id}.${ext}`, mime: kind, bytes: bytes.length };
	}
	let image: { data: Buffer; info: OutputInfo };
	let thumb: Buffer;
	// sharp (libvips: tens of MB resident) loads at the first image, not at start-up.
	const { default: sharp } = await import('sharp');
	try {
		const base = sharp(bytes, { failOn: 'error', limitInputPixels: 80_000_000 })
			.rotate()
			.resize({ width: MAX_EDGE_PX, height: MAX_EDGE_PX, fit: 'inside', withoutEnlargement: true });
		const encoded = kind === 'image/png' ? base.png() : base.jpeg({ quality: 85, mozjpeg: true });
		image = await encoded.toBuffer({ resolveWithObject: true });
		thumb = await sharp(image.data)
			.resize({ width: THUMB_PX, height: THUMB_PX, fit: 'inside', withoutEnlargement: true })
			.jpeg({ quality: 75 })
			.toBuffer();
	} catch {
		throw new UploadRefused(`${name} looks like a ${LABEL[kind]} but cannot be read as an image.`);
	}
	const key = `${id}.${ext}`;
	const thumbKey = `${id}-t.jpg`;
	await put(key, image.data);
	await put(thumbKey, thumb);
	return {
		key,
		thumbKey,
		mime: kind,
		bytes: image.data.length,
		width: image.info.width,
		height: image.info.height
	};
}

/** The stored object as a stream with its size, or null when the key is unknown. */
export async function openUploadStream(
	key: string
): Promise<{ body: Readable; bytes: number } | null> {
	// Keys are ours (random hex); anything else never reaches the store.
	// A store that cannot be reached is an error (a 500 with its reference), not a missing file.
	if (!KEY.test(key)) return null;
	return (await storage()).get(objectName(key));
}

/** The stored bytes, or null when the key is unknown. */
export async function openUpload(key: string): Promise<Buffer | null> {
	const found = await openUploadStream(key);
	return found && readAll(found.body);
}

export async function uploadExists(key: string): Promise<boolean> {
	return KEY.test(key) && (await (await storage()).exists(objectName(key)));
}

/** Removes stored files, e.g. after the transaction that would have referenced them failed. */
export async function discardUploads(keys: readonly (string | undefined)[]): Promise<void> {
	const store = await storage();
	await Promise.all(
		keys.filter((k): k is string => !!k && KEY.test(k)).map((k) => store.delete(objectName(k)))
	);
}

/** A stored object's stream as a Response body. */
export function webStream(body: Readable): ReadableStream<Uint8Array> {
	return Readable.toWeb(body) as ReadableStream<Uint8Array>;
}
