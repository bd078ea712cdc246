// The data book's weld map and weld log: a cover (the job, the customer, part and drawing with its
// revision, the governing code, who compiled it when, and a QR code to the public check), the
// joints at a glance, then each joint's story in order: procedure revision with its digest,
// welder and qualification for each pass, inspections, repairs and overrides. The words come
// ready from the data book's content (data-book/content.ts); this file only lays them out.
import { PDFDocument, type PDFFont, type PDFPage, type RGB } from 'pdf-lib';
import { embedSharedFonts } from './font-cache';
import type { PdfFonts } from './fonts';
import { drawQr, fit, GREY, INK, PAPER, RULE, STOP, wrap } from './layout';
import { useNativeDeflate } from './native-deflate';
import { drawTextLine, widthOf } from './pdf-text';
import { utcText } from './sheet-content';

useNativeDeflate();

export interface WeldMapLine {
	label: string;
	text: string;
	/** Drawn in the stop colour: a refusal overridden, a rejection, a digest that no longer holds. */
	stop?: boolean;
}

export interface WeldMapJoint {
	heading: string;
	status: string;
	lines: WeldMapLine[];
}

export interface WeldMapInput {
	shopName: string;
	paper: 'a4' | 'letter';
	/** The public verification page the cover's QR code opens. */
	url: string;
	compiledAt: Date;
	compiledBy: string;
	jobNumber: string;
	cover: [string, string][];
	/** One row a joint: mark, what, procedure, welders, status. */
	map: string[][];
	joints: WeldMapJoint[];
	/** The other files of the data book, one line each. */
	contents: string[];
}

const M = 40;
const FOOT = 30;
export const VERIFY_CAPTION = 'Scan to check this data book against the shop’s records';
const DEFER =
	'Beadline records and compiles; the governing code, the engineer of record and the inspector decide whether the work is acceptable. Check this book against the live records with the code above.';

class Pages {
	readonly pages: PDFPage[] = [];
	page!: PDFPage;
	y = 0;
	readonly w: number;
	readonly h: number;
	readonly cw: number;

	constructor(
		private doc: PDFDocument,
		readonly f: PdfFonts,
		readonly s: WeldMapInput
	) {
		[this.w, this.h] = PAPER[s.paper];
		this.cw = this.w - 2 * M;
	}

	text(t: string, x: number, y: number, size: number, font: PDFFont, color: RGB = INK) {
		drawTextLine(this.page, t, x, y, size, font, color);
	}

	addPage() {
		this.page = this.doc.addPage(PAPER[this.s.paper]);
		this.pages.push(this.page);
		this.y = this.h - M;
		if (this.pages.length > 1) {
			const head = `${this.s.shopName} · data book of job ${this.s.jobNumber}`;
			this.text(fit(head, this.f.bold, 9, this.cw), M, this.y - 9, 9, this.f.bold, GREY);
			this.y -= 24;
		}
	}

	need(height: number) {
		if (this.y - height < M + FOOT) this.addPage();
	}

	heading(t: string) {
		this.need(44);
		this.text(t, M, this.y - 13, 14, this.f.bold);
		this.page.drawLine({
			start: { x: M, y: this.y - 19 },
			end: { x: M + this.cw, y: this.y - 19 },
			thickness: 1,
			color: RULE
		});
		this.y -= 30;
	}

	paragraph(t: string, size: number, font: PDFFont, color: RGB = INK, indent = 0) {
		for (const line of wrap(t, font, size, this.cw - indent)) {
			this.need(size + 4);
			this.text(line, M + indent, this.y - size, size, font, color);
			this.y -= size + 3.5;
		}
	}

	cover() {
		const { f, s } = this;
		this.addPage();
		const qr = 150;
		const top = this.h - M;
		drawQr(this.page, s.url, this.w - M - qr, top - qr, qr);
		// The caption under the code, right-aligned, on as many lines as it takes.
		let capY = top - qr - 11;
		for (const line of wrap(VERIFY_CAPTION, f.bold, 8, qr + 20)) {
			this.text(line, this.w - M - widthOf(f.bold, line, 8), capY, 8, f.bold, GREY);
			capY -= 10;
		}
		const url = fit(s.url, f.mono, 6.5, qr + 90);
		this.text(url, this.w - M - widthOf(f.mono, url, 6.5), capY, 6.5, f.mono, GREY);
		const tw = this.cw - qr - 16;
		let y = top - 12;
		this.text(fit(s.shopName, f.bold, 12, tw), M, y, 12, f.bold, GREY);
		y -= 16;
		this.text('Data book: weld map and weld log', M, y, 11, f.regular, GREY);
		y -= 36;
		this.text(fit(`Job ${s.jobNumber}`, f.bold, 28, tw), M, y, 28, f.bold);
		y -= 30;
		for (const [label, value] of s.cover) {
			this.text(fit(label, f.regular, 9, 96), M, y, 9, f.regular, GREY);
			this.text(fit(value, f.bold, 11, tw - 100), M + 100, y, 11, f.bold);
			y -= 16;
		}
		this.y = Math.min(y, capY - 12) - 10;
		this.heading('In this data book');
		for (const line of s.contents) this.paragraph(`• ${line}`, 9.5, f.regular);
		this.y -= 8;
		this.paragraph(DEFER, 9, f.regular, GREY);
		this.y -= 10;
	}

	/** The joints at a glance, one row each, columns cut to fit. */
	map() {
		const { f, s } = this;
		this.heading('Weld map: the joints at a glance');
		const widths = [0.1, 0.3, 0.2, 0.25, 0.15].map((x) => x * this.cw);
		const row = (cells: string[], font: PDFFont, color: RGB = INK) => {
			this.need(15);
			let x = M;
			cells.forEach((c, i) => {
				this.text(fit(c, font, 8.5, widths[i]! - 6), x, this.y - 9, 8.5, font, color);
				x += widths[i]!;
			});
			this.y -= 14;
		};
		row(['Joint', 'Joint, size, position', 'Procedure', 'Welded by', 'Status'], f.bold, GREY);
		for (const r of s.map) row(r, f.regular);
		if (!s.map.length) this.paragraph('This job lists no joints yet.', 10, f.regular);
		this.y -= 10;
	}

	joints() {
		const { f } = this;
		this.heading('Weld log, joint by joint');
		const labelW = 92;
		for (const j of this.s.joints) {
			this.need(60);
			this.text(fit(j.heading, f.bold, 12, this.cw - 110), M, this.y - 12, 12, f.bold);
			const st = fit(j.status, f.bold, 10, 105);
			this.text(st, M + this.cw - widthOf(f.bold, st, 10), this.y - 12, 10, f.bold);
			this.y -= 20;
			for (const l of j.lines) {
				const lines = wrap(l.text, f.regular, 9, this.cw - labelW);
				this.need(Math.min(lines.length, 3) * 11.5 + 2);
				this.text(fit(l.label, f.regular, 8.5, labelW - 6), M, this.y - 9, 8.5, f.regular, GREY);
				for (const line of lines) {
					this.need(12);
					this.text(line, M + labelW, this.y - 9, 9, f.regular, l.stop ? STOP : INK);
					this.y -= 11.5;
				}
				this.y -= 2;
			}
			this.page.drawLine({
				start: { x: M, y: this.y - 3 },
				end: { x: M + this.cw, y: this.y - 3 },
				thickness: 0.5,
				color: RULE
			});
			this.y -= 12;
		}
	}

	footers() {
		const { f } = this;
		const n = this.pages.length;
		const left = `Compiled ${utcText(this.s.compiledAt)} by ${this.s.compiledBy}`;
		this.pages.forEach((p, i) => {
			const size = 8;
			drawTextLine(p, fit(left, f.regular, size, this.cw - 80), M, M, size, f.regular, GREY);
			const right = `page ${i + 1} of ${n}`;
			drawTextLine(
				p,
				right,
				this.w - M - widthOf(f.regular, right, size),
				M,
				size,
				f.regular,
				GREY
			);
		});
	}
}

export async function weldMapPdf(input: WeldMapInput): Promise<Uint8Array> {
	const doc = await PDFDocument.create();
	doc.setTitle(`Data book of job ${input.jobNumber} — weld map and weld log`);
	doc.setProducer('Beadline');
	doc.setCreator('Beadline');
	doc.setCreationDate(input.compiledAt);
	doc.setModificationDate(input.compiledAt);
	const fonts = await embedSharedFonts(doc);
	const pages = new Pages(doc, fonts, input);
	pages.cover();
	pages.map();
	pages.joints();
	pages.footers();
	return doc.save({ objectsPerTick: Infinity });
}
