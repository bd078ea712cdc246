// The daily lapse warning: 30 and 7 days before a qualification lapses, and on the day, to the
// shop's admins and the welder (if they have an address). A pure function of `now` and the
// database, so tests pass a date. Each notice is claimed in the database before it is sent:
// a second run, a restart or another process never sends it twice. A claim whose mail was never
// marked sent is released after STALE_CLAIM_MS (the process died between claim and send): that
// notice goes out again, possibly twice if the mail had left before the crash, which beats a
// lapse warning that never comes.
import { Op } from 'sequelize';
import { config } from '../config';
import { write } from '../db';
import { lapseNoticeMail } from '../mail/templates';
import { sendMail, type OutgoingMail } from '../mail/send';
import { LapseNotice, Shop, User } from '../models';
import type { LapseNoticeKind } from '../models/lapse-notice';
import { localDay } from '../welders/dates';
import { loadWelders } from '../welders/read';

/** Days a missed run may catch up on an "on the day" notice (the server was down that day). */
const DAY_NOTICE_GRACE = 3;

export function noticeKind(daysLeft: number): LapseNoticeKind | null {
	if (daysLeft > 30) return null;
	if (daysLeft > 7) return '30-day';
	if (daysLeft > 0) return '7-day';
	return daysLeft > -DAY_NOTICE_GRACE ? 'day' : null;
}

export interface ReminderRun {
	today: string;
	checked: number;
	sent: { qualificationId: number; kind: LapseNoticeKind; lapsesOn: string; to: string[] }[];
	failed: { qualificationId: number; kind: LapseNoticeKind; error: string }[];
}

/** Longer than any run under its lease (jobs/timer.ts LEASE_MS), so no live run loses its claims. */
export const STALE_CLAIM_MS = 15 * 60_000;

/** Releases claims left unsent by a process that stopped between claiming and sending. */
async function releaseStaleClaims(): Promise<number> {
	// The real clock, not the run's `now` (tests run as of another day).
	const before = new Date(Date.now() - STALE_CLAIM_MS);
	return write((t) =>
		LapseNotice.destroy({
			where: { sentAt: null, updatedAt: { [Op.lt]: before } },
			transaction: t
		})
	);
}

/** True when this run took the notice; false when an earlier run (or process) already had. */
async function claim(
	shopId: number,
	qualificationId: number,
	lapsesOn: string,
	kind: LapseNoticeKind
) {
	return write(async (t) => {
		const [, created] = await LapseNotice.findOrCreate({
			where: { qualificationId, lapsesOn, kind },
			defaults: { shopId, qualificationId, lapsesOn, kind },
			transaction: t
		});
		return created;
	});
}

export async function runLapseReminders(
	now: Date = new Date(),
	send: (mail: OutgoingMail) => Promise<void> = sendMail
): Promise<ReminderRun> {
	const today = localDay(now);
	const run: ReminderRun = { today, checked: 0, sent: [], failed: [] };
	await releaseStaleClaims();
	const origin = new URL(config.origin).origin;
	for (const shop of await Shop.findAll({ order: [['id', 'ASC']] })) {
		const admins = await User.findAll({
			where: { shopId: shop.id, role: 'admin', active: true, email: { [Op.ne]: '' } }
		});
		// Each shop's own day: a qualification lapses at midnight where the shop is.
		const day = localDay(now, shop.timeZone);
		for (const w of await loadWelders(shop.id, day, { activeOnly: true })) {
			for (const q of w.qualifications) {
				run.checked++;
				if (q.status.state === 'withdrawn') continue;
				const kind = noticeKind(q.status.daysLeft);
				if (!kind) continue;
				if (!(await claim(shop.id, q.id, q.status.lapsesOn, kind))) continue;
				const base = {
					welderName: w.name,
					stamp: w.stamp,
					process: q.process,
					code: q.code,
					lapsesOn: q.status.lapsesOn,
					daysLeft: Math.max(q.status.daysLeft, 0),
					basis: q.status.basis,
					kind
				};
				const mails = admins.map((a) =>
					lapseNoticeMail({
						...base,
						to: a.email,
						forWelder: false,
						link: `${origin}/welders/${w.id}`
					})
				);
				if (w.noticeEmail && !admins.some((a) => a.email === w.noticeEmail))
					mails.push(
						lapseNoticeMail({
							...base,
							to: w.noticeEmail,
							forWelder: true,
							link: `${origin}/welders/${w.userId ? 'me' : w.id}`
						})
					);
				const to = mails.map((m) => String(m.to));
				try {
					for (const m of mails) await send(m);
					await write((t) =>
						LapseNotice.update(
							{ sentAt: new Date(), recipients: to.join(', ') },
							{
								where: { qualificationId: q.id, lapsesOn: q.status.lapsesOn, kind },
								transaction: t
							}
						)
					);
					run.sent.push({ qualificationId: q.id, kind, lapsesOn: q.status.lapsesOn, to });
				} catch (e) {
					// Release the claim so the next run tries again; a partly sent set may repeat then.
					await write((t) =>
						LapseNotice.destroy({
							where: { qualificationId: q.id, lapsesOn: q.status.lapsesOn, kind },
							transaction: t
						})
					);
					run.failed.push({
						qualificationId: q.id,
						kind,
						error: String((e as Error).message ?? e)
					});
				}
			}
		}
	}
	return run;
}
