// The data books compiled for a job, newest first, for the job page: when, by whom, and the
// public check each one's QR code opens.
import { Op } from 'sequelize';
import type { DataBookRow } from '$lib/jobs/data-book';
import { DataBook, User } from '../../models';
import { parseManifest } from './manifest';

export type { DataBookRow };

export async function dataBooksOf(shopId: number, jobId: number): Promise<DataBookRow[]> {
	const books = await DataBook.findAll({
		where: { shopId, jobId },
		order: [['id', 'DESC']],
		limit: 20
	});
	const ids = [...new Set(books.map((b) => b.madeById))];
	const users = ids.length
		? await User.findAll({ where: { id: { [Op.in]: ids } }, attributes: ['id', 'name'] })
		: [];
	return books.map((b) => ({
		id: b.id,
		token: b.token,
		madeAt: b.madeAt.toISOString(),
		madeBy: users.find((u) => u.id === b.madeById)?.name ?? '(unknown)',
		files: parseManifest(b.manifest)?.files.length ?? 0,
		manifestDigest: b.manifestDigest
	}));
}
