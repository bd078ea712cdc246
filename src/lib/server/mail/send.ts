import nodemailer, { type Transporter } from 'nodemailer';
import { config } from '../config';

export interface OutgoingMail {
	to: string | string[];
	subject: string;
	text: string;
	html?: string;
}

let transport: Transporter | undefined;

function transporter(): Transporter {
	transport ??= nodemailer.createTransport(config.smtpUrl);
	return transport;
}

/** Sends one message through SMTP_URL. Throws when the server refuses it: callers decide. */
export async function sendMail(mail: OutgoingMail): Promise<void> {
	await transporter().sendMail({ from: config.mailFrom, ...mail });
}
