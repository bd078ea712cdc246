import { PDFDocument } from 'pdf-lib';
import { describe, expect, it } from 'vitest';
import { pdfQr, pdfText } from '../../../../tests/support/pdf';
import { weldMapPdf, type WeldMapInput } from './weld-map';

const squash = (s: string) => s.replace(/\s+/g, ' ');

function input(joints: number): WeldMapInput {
	return {
		shopName: 'Invented Fabrication Shop',
		paper: 'letter',
		url: 'http://localhost:5173/verify/abcdefghijklmnopqrstuvwxyz012345',
		compiledAt: new Date('2026-12-03T09:30:00Z'),
		compiledBy: 'Ada Example',
		jobNumber: 'JOB-9',
		cover: [
			['Customer', 'Invented Customer'],
			['Drawing revision', 'C']
		],
		map: Array.from({ length: joints }, (_, i) => [
			`W${i + 1}`,
			'butt 1/2 in 1G',
			'WPS-1 rev 2',
			'Ada',
			'Accepted'
		]),
		joints: Array.from({ length: joints }, (_, i) => ({
			heading: `W${i + 1} · butt 1/2 in · A36 to A36 · 1G`,
			status: i % 2 ? 'REJECTED' : 'Accepted',
			lines: [
				{ label: 'Procedure', text: 'WPS-1 rev 2 (approved) · digest 3f2a 9c1e 55d0 aa12 …' },
				{
					label: 'Pass: root',
					text: '2026-12-01 · Ada (A-1) · GTAW ASME IX: current on 2026-12-01 '.repeat(3)
				},
				{ label: 'RT', text: '100 % · REJECTED · porosity', stop: i % 2 === 1 }
			]
		})),
		contents: ['This weld map and weld log', '2 signed procedure sheets (procedures/)']
	};
}

describe('the weld map and weld log PDF', () => {
	it('puts the job on the cover with a QR code to the verification page', async () => {
		const bytes = await weldMapPdf(input(2));
		const text = squash(await pdfText(bytes));
		for (const s of [
			'Invented Fabrication Shop',
			'Job JOB-9',
			'Invented Customer',
			'Scan to check this data book',
			'against the shop’s records',
			'W2 · butt',
			'REJECTED'
		])
			expect(text).toContain(s);
		expect(text).toContain('Compiled 2026-12-03 09:30 UTC by Ada Example');
		expect(await pdfQr(bytes, 1, 3)).toBe(input(2).url);
	});

	it('flows a long job onto more pages, numbered, every joint kept', async () => {
		const bytes = await weldMapPdf(input(60));
		const pages = (await PDFDocument.load(bytes)).getPageCount();
		expect(pages).toBeGreaterThan(3);
		const text = squash(await pdfText(bytes));
		expect(text).toContain(`page ${pages} of ${pages}`);
		expect(text).toContain('W60 · butt');
		expect(text).toContain('data book of job JOB-9');
	});
});
