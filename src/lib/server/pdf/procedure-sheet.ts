// The procedure sheet posted at the booth: a layout of our own for Letter and A4. The values at
// the arc come first in type readable from a metre away, then every variable, the PQRs, the
// signature and the safety cautions; continuation pages repeat the number, state and QR code
// (error correction Q, vector) so any page torn off still leads to the live revision.
import { PDFDocument, type PDFFont, type PDFPage, type RGB } from 'pdf-lib';
import { embedSharedFonts } from './font-cache';
import type { PdfFonts } from './fonts';
import { useNativeDeflate } from './native-deflate';
import { drawQr, fit, GREY, INK, PAPER, RULE, STOP, WHITE, wrap } from './layout';
import {
	ARC_KEYS,
	atTheArc,
	safetyText,
	signOffLines,
	stateBadge,
	stopLine,
	UNCONTROLLED,
	utcText,
	valueGroups,
	type SheetInput
} from './sheet-content';

export type { SheetInput } from './sheet-content';

useNativeDeflate();

const M = 36;
/** Rows the header and "At the arc" already show. */
const SHOWN_ABOVE: ReadonlySet<string> = new Set([...ARC_KEYS, 'title', 'code', 'codeEdition']);
const FOOT = 30;

class Sheet {
	readonly pages: PDFPage[] = [];
	page!: PDFPage;
	y = 0;
	readonly w: number;
	readonly h: number;
	readonly cw: number;
	private readonly stopped: boolean;

	constructor(
		private doc: PDFDocument,
		readonly f: PdfFonts,
		readonly s: SheetInput
	) {
		[this.w, this.h] = PAPER[s.paper];
		this.cw = this.w - 2 * M;
		this.stopped = s.state !== 'approved' || !s.intact;
	}

	text(t: string, x: number, y: number, size: number, font: PDFFont, color: RGB = INK) {
		this.page.drawText(t, { x, y, size, font, color });
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
			const nw = f.bold.widthOfTextAtSize(number, 30) + 16;
			this.text(number, M, y, 30, f.bold);
			// The revision beside the number when both fit, else under it.
			if (nw + f.bold.widthOfTextAtSize(rev, 22) <= tw) this.text(rev, M + nw, y, 22, f.bold);
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
		this.text(cap, this.w - M - f.bold.widthOfTextAtSize(cap, 8), capY, 8, f.bold, GREY);
		const url = fit(s.url, f.mono, 6.5, Math.max(qr + 40, 200));
		this.text(url, this.w - M - f.mono.widthOfTextAtSize(url, 6.5), capY - 9, 6.5, f.mono, GREY);
		this.y = Math.min(y, capY - 9) - 14;
		this.banner();
	}

	badge(x: number, y: number, width: number, size = 13) {
		const t = fit(stateBadge(this.s), this.f.bold, size, width - 12);
		const bw = this.f.bold.widthOfTextAtSize(t, size) + 14;
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

	/** The values at the arc: three to a row, 20 pt bold, down to 15 pt on two lines. */
	arcValues() {
		const { f } = this;
		const items = atTheArc(this.s.variables, this.s.units);
		if (!items.length) return;
		this.heading('At the arc');
		const cols = 3;
		const gap = 12;
		const colW = (this.cw - (cols - 1) * gap) / cols;
		const layout = (value: string) => {
			for (let size = 20; size >= 15; size--)
				if (f.bold.widthOfTextAtSize(value, size) <= colW) return { size, lines: [value] };
			return { size: 15, lines: wrap(value, f.bold, 15, colW).slice(0, 2) };
		};
		for (let i = 0; i < items.length; i += cols) {
			const row = items.slice(i, i + cols).map((it) => ({ it, ...layout(it.value) }));
			const h =
				Math.max(...row.map((r) => 14 + r.lines.length * (r.size + 3) + (r.it.other ? 11 : 0))) + 8;
			this.need(h);
			row.forEach(({ it, size, lines }, k) => {
				const x = M + k * (colW + gap);
				this.text(fit(it.label.toUpperCase(), f.bold, 8.5, colW), x, this.y - 9, 8.5, f.bold, GREY);
				let y = this.y - 13;
				for (const line of lines) {
					y -= size;
					this.text(line, x, y, size, f.bold);
					y -= 3;
				}
				if (it.other)
					this.text(fit(it.other, f.regular, 8.5, colW), x, y - 9, 8.5, f.regular, GREY);
			});
			this.y -= h;
		}
		this.y -= 4;
	}

	/** The rest of the variables by group, in two balanced columns that flow onto more pages. */
	allValues() {
		const blocks = this.valueBlocks();
		if (!blocks.length) return;
		this.need(40 + blocks[0]!.h);
		this.heading('The other variables');
		const gap = 18;
		const colW = (this.cw - gap) / 2;
		let i = 0;
		while (i < blocks.length) {
			const avail = this.y - (M + FOOT);
			const rest = blocks.slice(i);
			const k = splitColumns(
				rest.map((b) => b.h),
				avail
			);
			const placed = rest.slice(0, k.left + k.right);
			if (!placed.length) {
				this.addPage();
				continue;
			}
			let y = this.y;
			placed.forEach((b, n) => {
				if (n === k.left) y = this.y;
				b.draw(M + (n < k.left ? 0 : colW + gap), y);
				y -= b.h;
			});
			this.y -= k.height;
			i += placed.length;
			if (i < blocks.length) this.addPage();
		}
		this.y -= 8;
	}

	/** One block a row (a group's title rides with its first row), measured before drawing. */
	private valueBlocks(): { h: number; draw: (x: number, y: number) => void }[] {
		const { f } = this;
		const colW = (this.cw - 18) / 2;
		const labelW = 92;
		const vw = colW - labelW - 6;
		const groups = valueGroups(this.s.variables, this.s.units)
			.map((g) => ({ ...g, rows: g.rows.filter((r) => !SHOWN_ABOVE.has(r.key ?? '')) }))
			.filter((g) => g.rows.length > 0);
		return groups.flatMap((g) =>
			g.rows.map((r, n) => {
				const label = wrap(r.label, f.regular, 8.5, labelW);
				const value = wrap(r.value, f.bold, 10.5, vw);
				const other = r.other ? wrap(r.other, f.regular, 8, vw) : [];
				const head = n === 0 ? 19 : 0;
				const h = head + Math.max(label.length * 10, value.length * 13 + other.length * 10) + 5;
				const draw = (x: number, top: number) => {
					if (head) this.text(g.title, x, top - 12, 10, f.bold, GREY);
					const y = top - head;
					const vx = x + labelW + 6;
					label.forEach((l, i) => this.text(l, x, y - 9 - i * 10, 8.5, f.regular, GREY));
					value.forEach((l, i) => this.text(l, vx, y - 10 - i * 13, 10.5, f.bold));
					const oy = y - 7 - value.length * 13;
					other.forEach((l, i) => this.text(l, vx, oy - i * 10, 8, f.regular, GREY));
				};
				return { h, draw };
			})
		);
	}

	paragraph(t: string, size: number, font: PDFFont, color: RGB = INK, indent = 0) {
		for (const line of wrap(t, font, size, this.cw - indent)) {
			this.need(size + 4);
			this.text(line, M + indent, this.y - size, size, font, color);
			this.y -= size + 3.5;
		}
	}

	pqrs() {
		this.heading('Supporting PQRs');
		const list = this.s.pqrs.map((p) => `${p.number}${p.title ? ` (${p.title})` : ''}`);
		this.paragraph(list.length ? list.join('; ') : 'None cited.', 10.5, this.f.regular);
		this.y -= 8;
	}

	signOff() {
		this.heading('Signature');
		const s = this.s.signOff;
		if (!this.s.intact)
			this.paragraph(
				'DO NOT USE: the revision as stored no longer matches what was signed. Ask the shop’s quality manager.',
				12,
				this.f.bold,
				STOP
			);
		if (!s) {
			this.paragraph('Not signed.', 12, this.f.bold, STOP);
			return;
		}
		const lines = signOffLines(s);
		this.need(lines.length * 16 + 8);
		for (const [label, value] of lines) {
			this.text(label, M, this.y - 11, 9, this.f.regular, GREY);
			const font = label.startsWith('Digest') ? this.f.mono : this.f.bold;
			this.text(fit(value, font, 12, this.cw - 120), M + 120, this.y - 11, 12, font);
			this.y -= 16;
		}
		this.y -= 8;
	}

	/** The shade and the cautions, kept on one page. */
	safety() {
		const { f } = this;
		const t = safetyText(this.s.variables);
		const size = 9.5;
		const width = this.cw - 12;
		const cautions = t.cautions.map((c) => {
			const title = `${c.title}:`;
			const tw = f.bold.widthOfTextAtSize(`${title} `, size);
			return { title, tw, lines: wrap(c.text, f.regular, size, width, width - tw) };
		});
		const lines = cautions.reduce((n, c) => n + c.lines.length, 0);
		this.need(Math.min(26 + 22 + lines * 12.5 + 52, this.h - 2 * M - FOOT - 260));
		this.heading('Safety at the arc');
		this.paragraph(t.shade, 15, f.bold);
		this.y -= 3;
		for (const c of cautions) {
			this.need(c.lines.length * 12.5);
			this.text('•', M, this.y - size, size, f.bold);
			this.text(c.title, M + 12, this.y - size, size, f.bold);
			c.lines.forEach((l, i) => {
				this.text(l, M + 12 + (i === 0 ? c.tw : 0), this.y - size, size, f.regular);
				this.y -= 12.5;
			});
		}
		this.y -= 3;
		this.paragraph(t.practice, size, f.regular, GREY);
		this.paragraph(t.advisory, 10.5, f.bold);
		this.y -= 10;
	}

	/** Footers go on last, when the page count is known. */
	footers() {
		const { f } = this;
		const n = this.pages.length;
		const size = 8;
		const printed = `Printed ${utcText(this.s.printedAt)}`;
		this.pages.forEach((p, i) => {
			const line = (t: string, y: number, font: PDFFont, right = false) =>
				p.drawText(t, {
					x: right ? this.w - M - font.widthOfTextAtSize(t, size) : M,
					y,
					size,
					font,
					color: GREY
				});
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

/**
 * How many of `heights` go in the left and right column of a page with `avail` points: both
 * columns as even as they can be when everything fits, else each filled to the bottom.
 */
export function splitColumns(
	heights: number[],
	avail: number
): { left: number; right: number; height: number } {
	const fill = (from: number) => {
		let h = 0;
		let n = 0;
		while (from + n < heights.length && h + heights[from + n]! <= avail) h += heights[from + n++]!;
		return { n, h };
	};
	const total = heights.reduce((a, b) => a + b, 0);
	let best: { left: number; right: number; height: number } | null = null;
	if (total <= 2 * avail) {
		let left = 0;
		for (let k = 0; k <= heights.length; k++) {
			const right = total - left;
			const height = Math.max(left, right);
			if (left <= avail && right <= avail && (!best || height < best.height))
				best = { left: k, right: heights.length - k, height };
			left += heights[k] ?? 0;
		}
	}
	if (best) return best;
	const l = fill(0);
	const r = fill(l.n);
	return { left: l.n, right: r.n, height: Math.max(l.h, r.h) };
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

function drawSheet(doc: PDFDocument, fonts: PdfFonts, input: SheetInput): void {
	const sheet = new Sheet(doc, fonts, input);
	sheet.addPage();
	sheet.arcValues();
	sheet.safety();
	sheet.allValues();
	sheet.pqrs();
	sheet.signOff();
	sheet.footers();
}

async function newDocument(title: string) {
	const doc = await PDFDocument.create();
	doc.setTitle(title);
	doc.setProducer('Beadline');
	doc.setCreator('Beadline');
	doc.setCreationDate(new Date());
	return { doc, fonts: await embedSharedFonts(doc) };
}

/** One revision's sheet. */
export async function procedureSheetPdf(input: SheetInput): Promise<Uint8Array> {
	const { doc, fonts } = await newDocument(
		`${input.number} revision ${input.rev} — procedure sheet`
	);
	drawSheet(doc, fonts, input);
	return doc.save({ objectsPerTick: Infinity });
}

/** Many sheets in one PDF, each from a new page; the fonts are subset once for all of them. */
export async function procedureSheetsPdf(title: string, inputs: SheetInput[]): Promise<Uint8Array> {
	const { doc, fonts } = await newDocument(title);
	for (const input of inputs) drawSheet(doc, fonts, input);
	return doc.save();
}
