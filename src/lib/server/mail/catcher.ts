import { mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

// A local SMTP server for dev, demo and tests: accepts every message on 127.0.0.1 and keeps it
// as an .eml file, so nothing leaves the machine and tests can read what was "sent".
export function startMailCatcher(opts: { port: number; dir: string }): Promise<SMTPServer> {
	mkdirSync(opts.dir, { recursive: true });
	let seq = 0;
	const server = new SMTPServer({
		authOptional: true,
		disabledCommands: ['STARTTLS'],
		banner: 'Beadline mail catcher',
		size: 25 * 1024 * 1024,
		onData(stream, _session, callback) {
			const chunks: Buffer[] = [];
			stream.on('data', (c: Buffer) => chunks.push(c));
			stream.on('end', () => {
				const name = `${Date.now()}-${String(++seq).padStart(5, '0')}.eml`;
				writeFileSync(join(opts.dir, name), Buffer.concat(chunks));
				callback();
			});
		}
	});
	return new Promise((resolve, reject) => {
		server.once('error', reject);
		server.listen(opts.port, '127.0.0.1', () => resolve(server));
	});
}

export interface CaughtMail {
	id: string;
	to: string;
	from: string;
	subject: string;
	date: string;
	text: string;
}

/** Newest first. Parsing decodes quoted-printable, so links come out whole. */
export async function readCaughtMail(dir: string, limit = 200): Promise<CaughtMail[]> {
	let files: string[];
	try {
		files = readdirSync(dir).filter((f) => f.endsWith('.eml'));
	} catch {
		return [];
	}
	files.sort().reverse();
	return Promise.all(
		files.slice(0, limit).map(async (file) => {
			const parsed = await simpleParser(readFileSync(join(dir, file)));
			const to = Array.isArray(parsed.to)
				? parsed.to.map((a) => a.text).join(', ')
				: parsed.to?.text;
			return {
				id: file.replace(/\.eml$/, ''),
				to: to ?? '',
				from: parsed.from?.text ?? '',
				subject: parsed.subject ?? '',
				date: (parsed.date ?? new Date()).toISOString(),
				text: parsed.text ?? ''
			};
		})
	);
}
