// The list's text search, from migration 0009's index: every word must appear somewhere in the
// record's search text, as a substring (what LIKE '%word%' gave, without reading every row).
import { Op, Sequelize, type WhereOptions } from 'sequelize';
import { isPostgres } from '../db/dialect';
import { sequelize } from '../db/sequelize';
import type { SettingsRecord } from '../models';

/** The trigram index finds words of three characters or more; shorter ones are matched by LIKE. */
const TRIGRAM = 3;

export function searchWords(q: string): string[] {
	return q.toLowerCase().replace(/%/g, '').split(/\s+/).filter(Boolean).slice(0, 5);
}

/** An FTS5 phrase: quoted, with any double quote doubled, so no word is read as syntax. */
const phrase = (w: string) => `"${w.replace(/"/g, '""')}"`;

export function searchTerms(q: string): WhereOptions<SettingsRecord>[] {
	const words = searchWords(q);
	if (isPostgres(sequelize)) {
		// pg_trgm's GIN index serves ILIKE (migration 0009).
		return words.map((w) => ({ searchText: { [Op.iLike]: `%${w}%` } }));
	}
	const long = words.filter((w) => w.length >= TRIGRAM);
	const short = words.filter((w) => w.length < TRIGRAM);
	const out: WhereOptions<SettingsRecord>[] = short.map((w) => ({
		searchText: { [Op.like]: `%${w}%` }
	}));
	if (long.length) {
		const match = sequelize.escape(long.map(phrase).join(' '));
		out.push({
			id: {
				[Op.in]: Sequelize.literal(
					`(SELECT rowid FROM settings_records_fts WHERE settings_records_fts MATCH ${match})`
				)
			}
		});
	}
	return out;
}
