// What a file is, read from its first bytes; the name and the browser's type are never trusted.
// Only three kinds are accepted anywhere in Beadline, so the few signatures are checked here
// (file-type@22 needs Node 22).

export type UploadKind = 'image/jpeg' | 'image/png' | 'application/pdf';

const starts = (bytes: Uint8Array, sig: readonly number[], at = 0): boolean =>
	bytes.length >= at + sig.length && sig.every((b, i) => bytes[at + i] === b);

const JPEG = [0xff, 0xd8, 0xff] as const;
const PNG = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a] as const;
const PDF = [0x25, 0x50, 0x44, 0x46, 0x2d] as const; // "%PDF-"

export function sniff(bytes: Uint8Array): UploadKind | null {
	if (starts(bytes, JPEG)) return 'image/jpeg';
	if (starts(bytes, PNG)) return 'image/png';
	// A PDF header may follow a little junk; the spec allows it within the first 1024 bytes.
	const head = bytes.subarray(0, 1024);
	for (let i = 0; i + PDF.length <= head.length; i++)
		if (starts(head, PDF, i)) return 'application/pdf';
	return null;
}

export const EXTENSIONS: Record<UploadKind, string> = {
	'image/jpeg': 'jpg',
	'image/png': 'png',
	'application/pdf': 'pdf'
};
