// The procedure sheet posted at the booth: a layout of our own for Letter and A4. The values at
// the arc come first in type readable from a metre away, then the safety cautions, every other
// variable, the PQRs and the signature; sheet-page.ts draws what every page repeats.
import { PDFDocument } from 'pdf-lib';
import { splitColumns } from './columns';
import { embedSharedFonts } from './font-cache';
import type { PdfFonts } from './fonts';
import { useNativeDeflate } from './native-deflate';
import { fit, GREY, STOP, wrap } from './layout';
import { widthOf } from './pdf-text';
import {
	ARC_KEYS,
	atTheArc,
	safetyText,
	signOffLines,
	valueGroups,
	type SheetInput
} from './sheet-content';
import { FOOT, M, SheetPages } from './sheet-page';

export type { SheetInput } from './sheet-content';
export { splitColumns } from './columns';

useNativeDeflate();

/** Rows the header and "At the arc" already show. */
const SHOWN_ABOVE: ReadonlySet<string> = new Set([...ARC_KEYS, 'title', 'code', 'codeEdition']);

class ProcedureSheet extends SheetPages {
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
				if (widthOf(f.bold, value, size) <= colW) return { size, lines: [value] };
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
			const tw = widthOf(f.bold, `${title} `, size);
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
}

function drawSheet(doc: PDFDocument, fonts: PdfFonts, input: SheetInput): void {
	const sheet = new ProcedureSheet(doc, fonts, input);
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
