// The pages of a procedure sheet: the header with the QR code on every page (a page torn off
// still leads to the live revision), the stop banner of a stale sheet, flowing text, footers.
import type { PDFDocument, PDFFont, PDFPage, RGB } from 'pdf-lib';
import type { PdfFonts } from './fonts';
import { drawTextLine, widthOf } from './pdf-text';
import { drawQr, fit, GREY, INK, PAPER, RULE, STOP, WHITE, wrap } from './layout';
import { stateBadge, stopLine, UNCONTROLLED, utcText, type SheetInput } from './sheet-content';

export const M = 36;
export const FOOT = 30;

export class SheetPages {
	readonly pages: PDFPage[] = [];
	page!: PDFPage;
	y = 0;
	readonly w: number;
	readonly h: number;
	readonly cw: number;
	private readonly stopped: boolean;

	constructor(
		protected doc: PDFDocument,
		readonly f: PdfFonts,
		readonly s: SheetInput
	) {
		[this.w, this.h] = PAPER[s.paper];
		this.cw = this.w - 2 * M;
		this.stopped = s.state !== 'approved' || !s.intact;
	}

	text(t: string, x: number, y: number, size: number, font: PDFFont, color: RGB = INK) {
		drawTextLine(this.page, t, x, y, size, font, color);
	}

	/** A new page: the full header on the first, a compact one with a smaller QR after it. */
	addPage() {
		this.page = this.doc.addPage(PAPER[this.s.paper]);
		this.pages.push(this.page);
		const first = this.pages.length === 1;
		const { f, s } = this;
		const qr = first ? 140 : 84;
		const top = this.h - M;
		drawQr(this.page, s.url, this.w - M - qr, top - qr, qr);
		const tw = this.cw - qr - 14;
		let y = top - 12;
		this.text(fit(s.shopName, f.bold, 12, tw), M, y, 12, f.bold, GREY);
		if (first) {
			y -= 14;
			this.text('Welding procedure specification', M, y, 10, f.regular, GREY);
			y -= 32;
			const number = fit(s.number, f.bold, 30, tw);
			const rev = `Revision ${s.rev}`;
			const nw = widthOf(f.bold, number, 30) + 16;
			this.text(number, M, y, 30, f.bold);
			// The revision beside the number when both fit, else under it.
			if (nw + widthOf(f.bold, rev, 22) <= tw) this.text(rev, M + nw, y, 22, f.bold);
			else this.text(rev, M, (y -= 28), 22, f.bold);
			y -= 30;
			this.badge(M, y, tw);
			y -= 22;
			for (const line of wrap(s.variables.title, f.bold, 13, tw).slice(0, 2)) {
				this.text(line, M, y, 13, f.bold);
				y -= 16;
			}
			const edition = s.variables.codeEdition ? `, edition ${s.variables.codeEdition}` : '';
			this.text(
				fit(`Code claimed: ${codeLabel(s)}${edition}`, f.regular, 11, tw),
				M,
				y,
				11,
				f.regular
			);
		} else {
			y -= 24;
			this.text(fit(`${s.number} · Revision ${s.rev}`, f.bold, 18, tw), M, y, 18, f.bold);
			y -= 24;
			this.badge(M, y, tw, 11);
		}
		const capY = top - qr - 11;
		const cap = 'Scan to check the current revision';
		this.text(cap, this.w - M - widthOf(f.bold, cap, 8), capY, 8, f.bold, GREY);
		const url = fit(s.url, f.mono, 6.5, Math.max(qr + 40, 200));
		this.text(url, this.w - M - widthOf(f.mono, url, 6.5), capY - 9, 6.5, f.mono, GREY);
		this.y = Math.min(y, capY - 9) - 14;
		this.banner();
	}

	badge(x: number, y: number, width: number, size = 13) {
		const t = fit(stateBadge(this.s), this.f.bold, size, width - 12);
		const bw = widthOf(this.f.bold, t, size) + 14;
		this.page.drawRectangle({
			x,
			y: y - size * 0.45,
			width: bw,
			height: size * 1.7,
			color: this.stopped ? STOP : INK
		});
		this.text(t, x + 7, y, size, this.f.bold, WHITE);
	}

	banner() {
		const size = 12;
		this.page.drawRectangle({
			x: M,
			y: this.y - 22,
			width: this.cw,
			height: 26,
			borderColor: INK,
			borderWidth: 2
		});
		this.text(
			fit(UNCONTROLLED, this.f.bold, size, this.cw - 16),
			M + 8,
			this.y - 14,
			size,
			this.f.bold
		);
		this.y -= 30;
		const stop = stopLine(this.s);
		if (stop) {
			// Full width on every page: a stale sheet must not pass for a current one.
			const lines = wrap(stop, this.f.bold, 15, this.cw - 20);
			const h = lines.length * 19 + 12;
			this.page.drawRectangle({ x: M, y: this.y - h, width: this.cw, height: h, color: STOP });
			lines.forEach((l, i) => this.text(l, M + 10, this.y - 21 - i * 19, 15, this.f.bold, WHITE));
			this.y -= h + 8;
		}
		this.y -= 10;
	}

	/** Room for `height` more points on this page, or a new page. */
	need(height: number) {
		if (this.y - height < M + FOOT) this.addPage();
	}

	heading(t: string) {
		this.need(40);
		this.text(t, M, this.y - 12, 13, this.f.bold);
		this.page.drawLine({
			start: { x: M, y: this.y - 17 },
			end: { x: M + this.cw, y: this.y - 17 },
			thickness: 1,
			color: RULE
		});
		this.y -= 26;
	}

	paragraph(t: string, size: number, font: PDFFont, color: RGB = INK, indent = 0) {
		for (const line of wrap(t, font, size, this.cw - indent)) {
			this.need(size + 4);
			this.text(line, M + indent, this.y - size, size, font, color);
			this.y -= size + 3.5;
		}
	}

	/** Footers go on last, when the page count is known. */
	footers() {
		const { f } = this;
		const n = this.pages.length;
		const size = 8;
		const printed = `Printed ${utcText(this.s.printedAt)}`;
		this.pages.forEach((p, i) => {
			const line = (t: string, y: number, font: PDFFont, right = false) =>
				drawTextLine(p, t, right ? this.w - M - widthOf(font, t, size) : M, y, size, font, GREY);
			p.drawLine({
				start: { x: M, y: M + 22 },
				end: { x: this.w - M, y: M + 22 },
				thickness: 0.75,
				color: RULE
			});
			line(fit(UNCONTROLLED, f.bold, size, this.cw - 160), M + 11, f.bold);
			line(printed, M, f.regular);
			line(
				fit(`${this.s.number} rev ${this.s.rev}`, f.regular, size, 150),
				M + 11,
				f.regular,
				true
			);
			line(`page ${i + 1} of ${n}`, M, f.regular, true);
		});
	}
}

function codeLabel(s: SheetInput): string {
	const labels: Record<string, string> = {
		'asme-ix': 'ASME Section IX',
		'aws-d1.1': 'AWS D1.1',
		'iso-15609-1': 'ISO 15609-1',
		shop: 'shop practice (no code)'
	};
	return labels[s.variables.code] ?? s.variables.code;
}
