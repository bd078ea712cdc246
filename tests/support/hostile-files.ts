// A corpus of hostile files, built in the test (no binaries in git): wrong magic bytes, a JPEG
// carrying HTML and script after its end, a pixel flood, an SVG with script, a PDF with
// JavaScript, an HTML page dressed as a PDF, oversize files and path-traversal names.
import { deflateSync } from 'node:zlib';
import sharp from 'sharp';

export interface HostileFile {
	label: string;
	name: string;
	type: string;
	bytes: Buffer;
	/** refused: the upload must fail; neutralised: it may be stored, but harmless as served. */
	expect: 'refused' | 'neutralised';
}

export const SCRIPT_MARK = '<script>alert("beadline-xss")</script>';

const CRC_TABLE = Array.from({ length: 256 }, (_, n) => {
	let c = n;
	for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
	return c >>> 0;
});
function crc32(buf: Buffer): number {
	let c = 0xffffffff;
	for (const b of buf) c = CRC_TABLE[(c ^ b) & 0xff]! ^ (c >>> 8);
	return (c ^ 0xffffffff) >>> 0;
}
function chunk(type: string, data: Buffer): Buffer {
	const len = Buffer.alloc(4);
	len.writeUInt32BE(data.length);
	const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
	const crc = Buffer.alloc(4);
	crc.writeUInt32BE(crc32(body));
	return Buffer.concat([len, body, crc]);
}

/** A valid-looking PNG of 60 000 × 60 000 pixels in about a hundred bytes. */
export function pixelFlood(): Buffer {
	const ihdr = Buffer.alloc(13);
	ihdr.writeUInt32BE(60_000, 0);
	ihdr.writeUInt32BE(60_000, 4);
	ihdr.set([8, 2, 0, 0, 0], 8); // 8-bit RGB
	return Buffer.concat([
		Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
		chunk('IHDR', ihdr),
		chunk('IDAT', deflateSync(Buffer.alloc(1024))),
		chunk('IEND', Buffer.alloc(0))
	]);
}

const PDF_WITH_JS = `%PDF-1.4
1 0 obj << /Type /Catalog /Pages 2 0 R /OpenAction 4 0 R >> endobj
2 0 obj << /Type /Pages /Kids [3 0 R] /Count 1 >> endobj
3 0 obj << /Type /Page /Parent 2 0 R /MediaBox [0 0 612 792] >> endobj
4 0 obj << /S /JavaScript /JS (app.alert('beadline-pdf-js');) >> endobj
trailer << /Root 1 0 R >>
%%EOF
`;

export async function photoCorpus(): Promise<HostileFile[]> {
	const jpeg = await sharp({ create: { width: 48, height: 32, channels: 3, background: '#357' } })
		.jpeg()
		.withExif({ IFD0: { Copyright: 'beadline-exif-secret', ImageDescription: 'GPS here' } })
		.toBuffer();
	const png = await sharp({ create: { width: 16, height: 16, channels: 3, background: '#999' } })
		.png()
		.toBuffer();
	const html = Buffer.from(`<!doctype html><html><body>${SCRIPT_MARK}</body></html>`);
	return [
		{
			label: 'text with a .jpg name',
			name: 'bead.jpg',
			type: 'image/jpeg',
			bytes: html,
			expect: 'refused'
		},
		{
			label: 'Windows executable named .png',
			name: 'bead.png',
			type: 'image/png',
			bytes: Buffer.concat([Buffer.from('MZ\x90\x00'), Buffer.alloc(600)]),
			expect: 'refused'
		},
		{
			label: 'PNG signature, then garbage',
			name: 'broken.png',
			type: 'image/png',
			bytes: Buffer.concat([png.subarray(0, 8), Buffer.from('not a png at all')]),
			expect: 'refused'
		},
		{
			label: 'pixel flood (60 000 × 60 000 PNG)',
			name: 'flood.png',
			type: 'image/png',
			bytes: pixelFlood(),
			expect: 'refused'
		},
		{
			label: 'SVG with script',
			name: 'logo.svg',
			type: 'image/svg+xml',
			bytes: Buffer.from(`<svg xmlns="http://www.w3.org/2000/svg">${SCRIPT_MARK}</svg>`),
			expect: 'refused'
		},
		{
			label: 'PDF where a photo goes',
			name: 'report.png',
			type: 'image/png',
			bytes: Buffer.from(PDF_WITH_JS),
			expect: 'refused'
		},
		{
			label: 'oversize JPEG (11 MB)',
			name: 'huge.jpg',
			type: 'image/jpeg',
			bytes: Buffer.concat([jpeg, Buffer.alloc(11 * 1024 * 1024)]),
			expect: 'refused'
		},
		{
			label: 'JPEG + HTML polyglot (script after the image)',
			name: 'poly.jpg',
			type: 'image/jpeg',
			bytes: Buffer.concat([jpeg, html]),
			expect: 'neutralised'
		},
		{
			label: 'JPEG with EXIF metadata',
			name: 'exif.jpg',
			type: 'image/jpeg',
			bytes: jpeg,
			expect: 'neutralised'
		},
		{
			label: 'path traversal in the name',
			name: '../../../../tmp/beadline-traversal.png',
			type: 'image/png',
			bytes: png,
			expect: 'neutralised'
		}
	];
}

export function reportCorpus(): HostileFile[] {
	return [
		{
			label: 'PDF with JavaScript',
			name: 'lab.pdf',
			type: 'application/pdf',
			bytes: Buffer.from(PDF_WITH_JS),
			expect: 'neutralised'
		},
		{
			label: 'HTML page with a PDF header inside',
			name: 'lab.html',
			type: 'text/html',
			bytes: Buffer.from(`<html>${SCRIPT_MARK}\n%PDF-1.4\n%%EOF`),
			expect: 'neutralised'
		},
		{
			label: 'HTML named .pdf',
			name: 'lab.pdf',
			type: 'application/pdf',
			bytes: Buffer.from(SCRIPT_MARK),
			expect: 'refused'
		},
		{
			label: 'PNG where a PDF goes',
			name: 'scan.pdf',
			type: 'application/pdf',
			bytes: pixelFlood(),
			expect: 'refused'
		},
		{
			label: 'path traversal and header characters in the name',
			name: '../../etc/"lab"\r\nX-Injected: 1.pdf',
			type: 'application/pdf',
			bytes: Buffer.from(PDF_WITH_JS),
			expect: 'neutralised'
		}
	];
}
