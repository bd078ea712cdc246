// The public check behind a data book's QR code: which job, when and by whom it was compiled, and
// whether the shop's records still say what the book says. The records are read again and
// digested section by section exactly as at compile time (records.ts); any section whose digest
// moved is named. Nothing here needs an account, so nothing here shows more than the cover does.
import { DataBook, User } from '../../models';
import { shopDay } from '../../welders/shop-day';
import { parseManifest, sha256Hex, type ManifestFile } from './manifest';
import { bookRecords, recordDigests, recordSections } from './records';

export const SECTION_WORDS: Record<string, string> = {
	job: 'the job’s details',
	joints: 'the joint list',
	welds: 'the weld log',
	overrides: 'the overrides',
	inspections: 'the inspections',
	repairs: 'the repairs',
	procedures: 'the procedure revisions cited',
	welders: 'the welders'
};

export interface BookCheck {
	jobNumber: string;
	part: string;
	drawing: string;
	drawingRev: string;
	compiledAt: string;
	compiledBy: string;
	manifestDigest: string;
	/** The stored manifest still hashes to the digest kept beside it. */
	manifestIntact: boolean;
	/** The records today digest to what the manifest says. */
	matches: boolean;
	/** What moved since, in words (empty when it matches). */
	changed: string[];
	files: ManifestFile[];
}

export async function checkDataBook(token: string, now = new Date()): Promise<BookCheck | null> {
	if (!/^[A-Za-z0-9_-]{16,64}$/.test(token)) return null;
	const book = await DataBook.findOne({ where: { token } });
	if (!book) return null;
	const manifest = parseManifest(book.manifest);
	const maker = await User.findByPk(book.madeById, { attributes: ['name'] });
	const intact = !!manifest && sha256Hex(book.manifest) === book.manifestDigest;
	const base = {
		jobNumber: manifest?.job.number ?? '',
		part: manifest?.job.part ?? '',
		drawing: manifest?.job.drawing ?? '',
		drawingRev: manifest?.job.drawingRev ?? '',
		compiledAt: book.madeAt.toISOString(),
		compiledBy: maker?.name ?? manifest?.compiledBy ?? '(unknown)',
		manifestDigest: book.manifestDigest,
		manifestIntact: intact,
		files: manifest?.files ?? []
	};
	if (!manifest || !intact)
		return { ...base, matches: false, changed: ['the stored manifest itself'] };
	const now_ = recordDigests(
		recordSections(
			await bookRecords({ shopId: book.shopId }, book.jobId, await shopDay(book.shopId, now))
		)
	);
	const then = manifest.records;
	const changed = Object.keys({ ...then.sections, ...now_.sections })
		.filter((k) => then.sections[k] !== now_.sections[k])
		.map((k) => {
			const was = then.counts[k];
			const is = now_.counts[k];
			const words = SECTION_WORDS[k] ?? k;
			return was !== undefined && is !== undefined && was !== is
				? `${words} (${was} then, ${is} now)`
				: words;
		});
	return { ...base, matches: then.digest === now_.digest && !changed.length, changed };
}
