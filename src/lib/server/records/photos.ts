// Photos of a record: checked and stored before the write transaction (image work is slow and
// must not hold the database lock), referenced inside it, discarded if the write fails.
import {
	discardUploads,
	MAX_IMAGE_BYTES,
	saveUpload,
	UploadRefused,
	type StoredUpload
} from '../storage';
import { RefusedError } from '../people/errors';

export const MAX_PHOTOS = 6;

export interface IncomingPhoto {
	name: string;
	bytes: Uint8Array;
}

export interface StoredPhoto extends StoredUpload {
	thumbKey: string;
	width: number;
	height: number;
	originalName: string;
}

/** The non-empty files of a form field. */
export async function photosFrom(data: FormData, field = 'photos'): Promise<IncomingPhoto[]> {
	const files = data.getAll(field).filter((f): f is File => f instanceof File && f.size > 0);
	return Promise.all(
		files.map(async (f) => ({
			name: f.name.slice(0, 200),
			bytes: new Uint8Array(await f.arrayBuffer())
		}))
	);
}

/** Stores every photo or none: the first refusal removes what was stored and says which file. */
export async function storePhotos(
	photos: IncomingPhoto[],
	already: number
): Promise<StoredPhoto[]> {
	if (already + photos.length > MAX_PHOTOS)
		throw new RefusedError(
			`A record holds up to ${MAX_PHOTOS} photos${already ? ` (it has ${already})` : ''}.`,
			'photos'
		);
	const stored: StoredPhoto[] = [];
	try {
		for (const p of photos) {
			const s = await saveUpload(p.bytes, {
				accept: ['image/jpeg', 'image/png'],
				maxBytes: MAX_IMAGE_BYTES,
				name: p.name
			});
			stored.push({
				...s,
				thumbKey: s.thumbKey ?? s.key,
				width: s.width ?? 0,
				height: s.height ?? 0,
				originalName: p.name || 'photo'
			});
		}
		return stored;
	} catch (e) {
		await discardPhotos(stored);
		if (e instanceof UploadRefused)
			throw new RefusedError(
				`${e.message} Photos must be JPEG or PNG, up to 10 MB each.`,
				'photos'
			);
		throw e;
	}
}

export const discardPhotos = (stored: StoredPhoto[]) =>
	discardUploads(stored.flatMap((s) => [s.key, s.thumbKey]));
