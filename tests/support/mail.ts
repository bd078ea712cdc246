import { simpleParser } from 'mailparser';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';

const dir = () => join(process.env.E2E_DATA_DIR ?? '', 'mail');

/** The newest caught message to `to`, waiting for it to arrive; text is decoded (quoted-printable). */
export async function waitForMail(to: string, opts: { subject?: RegExp; after?: number } = {}) {
	const until = Date.now() + 15_000;
	while (Date.now() < until) {
		let files: string[] = [];
		try {
			files = readdirSync(dir()).filter((f) => f.endsWith('.eml'));
		} catch {
			files = [];
		}
		for (const file of files.sort().reverse()) {
			if (opts.after && Number(file.split('-')[0]) < opts.after) continue;
			const mail = await simpleParser(readFileSync(join(dir(), file)));
			const rcpt = Array.isArray(mail.to)
				? mail.to.map((a) => a.text).join(',')
				: (mail.to?.text ?? '');
			if (rcpt.includes(to) && (!opts.subject || opts.subject.test(mail.subject ?? ''))) {
				return { subject: mail.subject ?? '', text: mail.text ?? '' };
			}
		}
		await new Promise((r) => setTimeout(r, 200));
	}
	throw new Error(`No mail to ${to} arrived`);
}

export function firstLink(text: string): string {
	const m = text.match(/https?:\/\/\S+/);
	if (!m) throw new Error('No link in mail');
	return m[0];
}

/** How many caught messages are addressed to `to`, without waiting (for "no mail was sent"). */
export async function countMail(to: string): Promise<number> {
	let files: string[] = [];
	try {
		files = readdirSync(dir()).filter((f) => f.endsWith('.eml'));
	} catch {
		return 0;
	}
	let n = 0;
	for (const file of files) {
		const mail = await simpleParser(readFileSync(join(dir(), file)));
		const rcpt = Array.isArray(mail.to)
			? mail.to.map((a) => a.text).join(',')
			: (mail.to?.text ?? '');
		if (rcpt.includes(to)) n++;
	}
	return n;
}
