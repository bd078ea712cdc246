// The demo job's drawing and W1's visual inspection record, drawn here (invented, no real
// drawing): a hitch frame outline as SVG rendered to PNG by sharp, and a one-page PDF by
// pdf-lib. The joints' positions are fractions of the drawing's width and height.
export const DEMO_MARKERS: Record<string, { x: number; y: number }> = {
	W1: { x: 0.2, y: 0.3 },
	W2: { x: 0.8, y: 0.3 },
	W3: { x: 0.5, y: 0.5 },
	W4: { x: 0.2, y: 0.7 },
	W5: { x: 0.8, y: 0.7 },
	W6: { x: 0.5, y: 0.85 }
};

const SVG = `<svg xmlns="http://www.w3.org/2000/svg" width="1200" height="800" viewBox="0 0 1200 800">
<rect width="1200" height="800" fill="#ffffff"/>
<g fill="none" stroke="#1f2933" stroke-width="6">
<rect x="180" y="200" width="840" height="400"/>
<line x1="600" y1="200" x2="600" y2="600"/>
<line x1="180" y1="400" x2="1020" y2="400"/>
<path d="M520 680 L600 760 L680 680 Z"/>
</g>
<g font-family="sans-serif" font-size="28" fill="#1f2933">
<text x="40" y="60">BAW-HF-220 rev C · Hitch frame weldment (invented demo drawing)</text>
<text x="40" y="780">Scale: none. Dimensions on the customer's drawing govern.</text>
</g>
</svg>`;

export async function demoDrawingPng(): Promise<Uint8Array> {
	const { default: sharp } = await import('sharp');
	return new Uint8Array(await sharp(Buffer.from(SVG)).png().toBuffer());
}

export async function demoReportPdf(): Promise<Uint8Array> {
	const { PDFDocument, StandardFonts } = await import('pdf-lib');
	const doc = await PDFDocument.create();
	const page = doc.addPage([595, 842]);
	const font = await doc.embedFont(StandardFonts.Helvetica);
	const lines = [
		'Visual examination record (invented demo)',
		'Job JOB-2026-014, joint W1, 6 mm fillet, 100 % visual.',
		'Size and profile to the drawing; no cracks, undercut within limits.',
		'Result: accept. The governing code decides the acceptance criteria.'
	];
	lines.forEach((t, i) => page.drawText(t, { x: 50, y: 780 - i * 24, size: 12, font }));
	return doc.save();
}
