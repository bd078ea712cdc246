// Mail about reviews, sent after the change has committed. A mail server that refuses does not
// undo the change: the caller learns `false` and says so on the page.
import { Op } from 'sequelize';
import { config } from '../config';
import { sendMail } from '../mail/send';
import { reviewRequestedMail, revisionDecidedMail } from '../mail/templates';
import { User } from '../models';

export const revisionPath = (procedureId: number, rev: number) =>
	`/procedures/${procedureId}/revisions/${rev}`;
const link = (path: string) => new URL(path, config.origin).toString();

async function send(mail: Parameters<typeof sendMail>[0]): Promise<boolean> {
	if (Array.isArray(mail.to) && mail.to.length === 0) return true;
	try {
		await sendMail(mail);
		return true;
	} catch (e) {
		console.warn('[procedures] mail not sent:', (e as Error).message);
		return false;
	}
}

export async function notifyReviewRequested(p: {
	shopId: number;
	procedureId: number;
	number: string;
	rev: number;
	title: string;
	submittedBy: { id: string; name: string };
}): Promise<boolean> {
	const inspectors = await User.findAll({
		where: { shopId: p.shopId, role: 'inspector', active: true, id: { [Op.ne]: p.submittedBy.id } },
		attributes: ['email']
	});
	return send(
		reviewRequestedMail({
			to: inspectors.map((u) => u.email),
			number: p.number,
			rev: p.rev,
			title: p.title,
			submittedBy: p.submittedBy.name,
			link: link(`${revisionPath(p.procedureId, p.rev)}/review`)
		})
	);
}

export async function notifyDecision(p: {
	shopId: number;
	procedureId: number;
	number: string;
	rev: number;
	title: string;
	recipients: (string | null)[];
	meaning: 'approved' | 'returned';
	decidedBy: string;
	comment: string | null;
}): Promise<boolean> {
	const ids = [...new Set(p.recipients.filter((x): x is string => !!x))];
	const people = await User.findAll({
		where: { shopId: p.shopId, id: { [Op.in]: ids }, active: true },
		attributes: ['email']
	});
	return send(
		revisionDecidedMail({
			to: people.map((u) => u.email),
			number: p.number,
			rev: p.rev,
			title: p.title,
			meaning: p.meaning,
			decidedBy: p.decidedBy,
			comment: p.comment,
			link: link(revisionPath(p.procedureId, p.rev))
		})
	);
}
