// The welder's qualification card: wallet size (ISO/IEC 7810 ID-1, front and back) or a full
// A4 / Letter sheet. Status is as at print time; the QR code (error correction Q, drawn as
// vector squares so it stays sharp at any print size) opens the live check at /q/<token>.
import { PDFDocument, rgb, type PDFFont, type PDFPage } from 'pdf-lib';
import QRCode from 'qrcode';
import { formatLength, type UnitSystem } from '$lib/weld/units';
import type { QualificationView, WelderView } from '../welders/read';
import { embedFonts, type PdfFonts } from './fonts';

export type CardSize = 'wallet' | 'a4' | 'letter';

const MM = 72 / 25.4;
const SIZES: Record<CardSize, [number, number]> = {
	wallet: [85.6 * MM, 53.98 * MM],
	a4: [595.28, 841.89],
	letter: [612, 792]
};
const INK = rgb(0.08, 0.09, 0.11);
const GREY = rgb(0.3, 0.32, 0.37);
const STOP = rgb(0.55, 0.11, 0.09);
const SHORT_DEFER =
	'Beadline advises and records; the code, the inspector and certified welders decide.';
const DEFER =
	'Beadline advises and records; the governing code, the engineer of record, the inspector and certified welders decide.';

export interface CardInput {
	shopName: string;
	welder: WelderView;
	url: string;
	printedOn: string;
	units: UnitSystem;
	size: CardSize;
}

function drawQr(page: PDFPage, text: string, x: number, y: number, side: number): void {
	const qr = QRCode.create(text, { errorCorrectionLevel: 'Q' });
	const n = qr.modules.size;
	const quiet = 4;
	const cell = side / (n + 2 * quiet);
	page.drawRectangle({ x, y, width: side, height: side, color: rgb(1, 1, 1) });
	for (let r = 0; r < n; r++)
		for (let c = 0; c < n; c++)
			if (qr.modules.get(r, c))
				page.drawRectangle({
					x: x + (quiet + c) * cell,
					y: y + side - (quiet + r + 1) * cell,
					width: cell,
					height: cell,
					color: rgb(0, 0, 0)
				});
}

/** Cuts text to a width with an ellipsis, so a long name never runs off the card. */
function fit(text: string, font: PDFFont, size: number, width: number): string {
	if (font.widthOfTextAtSize(text, size) <= width) return text;
	let t = text;
	while (t.length > 1 && font.widthOfTextAtSize(`${t}…`, size) > width) t = t.slice(0, -1);
	return `${t}…`;
}

/** Splits text into lines no wider than `width`. */
function wrap(text: string, font: PDFFont, size: number, width: number): string[] {
	const lines: string[] = [];
	let line = '';
	for (const word of text.split(/\s+/)) {
		const next = line ? `${line} ${word}` : word;
		if (line && font.widthOfTextAtSize(next, size) > width) {
			lines.push(line);
			line = word;
		} else line = next;
	}
	if (line) lines.push(line);
	return lines;
}

const list = (p: readonly string[]) => (p.length ? p.join(', ') : 'none');

export function statusText(q: QualificationView): string {
	const s = q.status;
	if (s.state === 'current') return `current until ${s.lapsesOn}`;
	if (s.state === 'lapsed') return `lapsed since ${s.lapsesOn}`;
	return 'withdrawn';
}

export function rangeLines(q: QualificationView, units: UnitSystem): string[] {
	const r = q.ranges;
	const dep =
		r.depositMaxMm === null ? 'unlimited' : `up to ${formatLength(r.depositMaxMm, units)}`;
	const od =
		r.minDiameterMm === null
			? ''
			: r.minDiameterIsSizeWelded
				? `; pipe: the size welded (${formatLength(r.minDiameterMm, units)} OD)`
				: `; pipe from ${formatLength(r.minDiameterMm, units)} OD`;
	const asme = [
		`Groove ${list(r.groove)} (pipe ≤ 24 in: ${list(r.groovePipe)}); fillet ${list(r.fillet)} — QW-461.9`,
		`Deposit ${dep} — QW-452.1(b)${od}${r.fNumber != null ? `; F-${r.fNumber}` : ''}`
	];
	if (!r.iso) return asme;
	// An ISO 9606-1 qualification speaks ISO terms first; the ASME rows follow for comparison.
	return [
		`ISO 9606-1: ${r.iso.map((i) => `${i.variable.toLowerCase()} ${i.qualified} (${i.clause})`).join('; ')}`,
		...asme.map((l) => `ASME IX, for comparison: ${l}`)
	];
}

function qualLine(q: QualificationView): string {
	return `${q.process} · ${q.code} · tested ${q.testPositions.join('+')} ${q.couponType} on ${q.testDate}`;
}

function walletCard(doc: PDFDocument, f: PdfFonts, c: CardInput): void {
	const [w, h] = SIZES.wallet;
	const pad = 3.5 * MM;
	const front = doc.addPage([w, h]);
	const qrSide = 24 * MM;
	drawQr(front, c.url, w - pad - qrSide, pad, qrSide);
	const textW = w - 3 * pad - qrSide;
	let y = h - pad - 7;
	front.drawText(fit(c.shopName, f.bold, 7, w - 2 * pad), {
		x: pad,
		y,
		size: 7,
		font: f.bold,
		color: GREY
	});
	y -= 9;
	front.drawText('Welder qualification card', {
		x: pad,
		y,
		size: 6.5,
		font: f.regular,
		color: GREY
	});
	y -= 14;
	front.drawText(fit(c.welder.name, f.bold, 12, textW), {
		x: pad,
		y,
		size: 12,
		font: f.bold,
		color: INK
	});
	y -= 11;
	front.drawText(`ID ${c.welder.stamp}`, { x: pad, y, size: 9, font: f.mono, color: INK });
	y -= 12;
	for (const q of c.welder.qualifications.slice(0, 5)) {
		const color = q.status.state === 'current' ? INK : STOP;
		front.drawText(
			fit(`${q.process} ${q.testPositions.join('+')} — ${statusText(q)}`, f.regular, 6.5, textW),
			{
				x: pad,
				y,
				size: 6.5,
				font: f.regular,
				color
			}
		);
		y -= 8.5;
	}
	front.drawText(`Status as printed ${c.printedOn}. Scan for live status.`, {
		x: pad,
		y: pad,
		size: 5,
		font: f.regular,
		color: GREY
	});

	const back = doc.addPage([w, h]);
	y = h - pad - 6;
	back.drawText('Ranges qualified (ASME IX)', { x: pad, y, size: 6.5, font: f.bold, color: INK });
	y -= 8;
	for (const q of c.welder.qualifications.slice(0, 4)) {
		back.drawText(fit(qualLine(q), f.bold, 5.5, w - 2 * pad), {
			x: pad,
			y,
			size: 5.5,
			font: f.bold,
			color: INK
		});
		y -= 6.5;
		for (const line of rangeLines(q, c.units).flatMap((l) => wrap(l, f.regular, 5, w - 2 * pad))) {
			back.drawText(line, { x: pad, y, size: 5, font: f.regular, color: INK });
			y -= 6;
		}
		y -= 1.5;
	}
	back.drawText(fit(SHORT_DEFER, f.regular, 4.5, w - 2 * pad), {
		x: pad,
		y: pad,
		size: 4.5,
		font: f.regular,
		color: GREY
	});
	back.drawText(fit(c.url, f.mono, 4.5, w - 2 * pad), {
		x: pad,
		y: pad + 6,
		size: 4.5,
		font: f.mono,
		color: GREY
	});
}

function sheet(doc: PDFDocument, f: PdfFonts, c: CardInput): void {
	const [w, h] = SIZES[c.size];
	const m = 48;
	const page = doc.addPage([w, h]);
	const qrSide = 130;
	drawQr(page, c.url, w - m - qrSide, h - m - qrSide, qrSide);
	let y = h - m - 14;
	const textW = w - 2 * m - qrSide - 16;
	const text = (t: string, size: number, font: PDFFont, color = INK, x = m) =>
		page.drawText(t, { x, y, size, font, color });
	text(fit(c.shopName, f.bold, 12, textW), 12, f.bold, GREY);
	y -= 18;
	text('Welder qualification card', 11, f.regular, GREY);
	y -= 30;
	text(fit(c.welder.name, f.bold, 24, textW), 24, f.bold);
	y -= 20;
	text(`Welder ID ${c.welder.stamp}`, 13, f.mono);
	y -= 18;
	text(
		`Status as printed on ${c.printedOn}. Scan the code for the live status.`,
		9,
		f.regular,
		GREY
	);
	y = Math.min(y, h - m - qrSide) - 30;
	for (const q of c.welder.qualifications) {
		if (y < m + 80) break;
		const color = q.status.state === 'current' ? INK : STOP;
		text(qualLine(q), 11, f.bold);
		y -= 14;
		text(
			statusText(q) + (q.status.state === 'current' ? ` (${q.status.daysLeft} days left)` : ''),
			10,
			f.bold,
			color
		);
		y -= 13;
		for (const line of rangeLines(q, c.units).flatMap((l) => wrap(l, f.regular, 9.5, w - 2 * m))) {
			text(line, 9.5, f.regular);
			y -= 12;
		}
		if (q.ranges.codeNote) {
			text(fit(q.ranges.codeNote, f.regular, 8.5, w - 2 * m), 8.5, f.regular, GREY);
			y -= 11;
		}
		y -= 10;
	}
	y = m + 34;
	text(fit(c.url, f.mono, 8.5, w - 2 * m), 8.5, f.mono, GREY);
	y -= 14;
	for (const line of wrap(DEFER, f.regular, 8.5, w - 2 * m)) {
		text(line, 8.5, f.regular, GREY);
		y -= 11;
	}
}

export async function qualificationCardPdf(c: CardInput): Promise<Uint8Array> {
	const doc = await PDFDocument.create();
	doc.setTitle(`Qualification card — ${c.welder.name} (${c.welder.stamp})`);
	doc.setProducer('Beadline');
	doc.setCreationDate(new Date());
	const fonts = await embedFonts(doc);
	if (c.size === 'wallet') walletCard(doc, fonts, c);
	else sheet(doc, fonts, c);
	return doc.save();
}
