// Reading a pasted joint list. csv-parse does the quoting; this maps the header to fields and
// validates each row with the joint schema, so every problem is named by its row.
import { parse } from 'csv-parse/sync';
import { JOINT_CSV_MAX_ROWS, jointSchema, type JointForm } from '$lib/schemas/job';

export interface RowProblem {
	/** 1-based line of the pasted text (the header is line 1). */
	row: number;
	mark: string;
	message: string;
}

export interface ParsedJoints {
	rows: Array<JointForm & { row: number }>;
	problems: RowProblem[];
}

/** Header words the shop may use for each field (lower case, spaces and _ removed). */
const HEADERS: Record<string, keyof JointForm> = {
	mark: 'mark',
	joint: 'mark',
	weld: 'mark',
	type: 'jointType',
	jointtype: 'jointType',
	size: 'size',
	basemetals: 'baseMetals',
	basemetal: 'baseMetals',
	material: 'baseMetals',
	position: 'position',
	procedure: 'procedure',
	wps: 'procedure',
	rev: 'rev',
	revision: 'rev'
};
const NEEDED: Array<keyof JointForm> = ['mark', 'jointType', 'position', 'procedure'];
const LABELS: Record<keyof JointForm, string> = {
	mark: 'mark',
	jointType: 'type',
	size: 'size',
	baseMetals: 'base metals',
	position: 'position',
	procedure: 'procedure',
	rev: 'rev'
};

export const CSV_EXAMPLE =
	'mark,type,size,base metals,position,procedure,rev\nW1,butt,10 mm,A36 to A36,1G,WPS-001,';

export function parseJointCsv(text: string): ParsedJoints {
	let records: string[][];
	try {
		records = parse(text, {
			skip_empty_lines: true,
			trim: true,
			relax_column_count: true,
			bom: true
		}) as string[][];
	} catch (e) {
		const line = (e as { lines?: number }).lines;
		return {
			rows: [],
			problems: [
				{
					row: line ?? 0,
					mark: '',
					message: 'The list cannot be read as CSV (check the quotes on this line).'
				}
			]
		};
	}
	const [header, ...body] = records;
	if (!header) return { rows: [], problems: [{ row: 1, mark: '', message: 'The list is empty.' }] };
	const columns = header.map((h) => HEADERS[h.toLowerCase().replace(/[\s_]/g, '')] ?? null);
	const missing = NEEDED.filter((f) => !columns.includes(f));
	if (missing.length)
		return {
			rows: [],
			problems: [
				{
					row: 1,
					mark: '',
					message: `The first line must name the columns; missing: ${missing.map((m) => LABELS[m]).join(', ')}. Example: ${CSV_EXAMPLE.split('\n')[0]}`
				}
			]
		};
	if (body.length > JOINT_CSV_MAX_ROWS)
		return {
			rows: [],
			problems: [{ row: 1, mark: '', message: `At most ${JOINT_CSV_MAX_ROWS} joints at a time.` }]
		};
	if (!body.length)
		return {
			rows: [],
			problems: [{ row: 2, mark: '', message: 'No joints under the first line.' }]
		};
	const rows: ParsedJoints['rows'] = [];
	const problems: RowProblem[] = [];
	const seen = new Map<string, number>();
	body.forEach((cells, i) => {
		const row = i + 2;
		const raw: Record<string, string> = {};
		columns.forEach((field, c) => {
			if (field) raw[field] = cells[c] ?? '';
		});
		if (raw.jointType) raw.jointType = raw.jointType.toLowerCase();
		if (raw.position) raw.position = raw.position.toUpperCase();
		const mark = raw.mark ?? '';
		const parsed = jointSchema.safeParse(raw);
		if (!parsed.success) {
			for (const issue of parsed.error.issues) {
				const field = String(issue.path[0] ?? '') as keyof JointForm;
				problems.push({ row, mark, message: `${LABELS[field] ?? field}: ${issue.message}` });
			}
			return;
		}
		const key = parsed.data.mark.toLowerCase();
		const first = seen.get(key);
		if (first !== undefined) {
			problems.push({
				row,
				mark,
				message: `mark ${parsed.data.mark} is already on line ${first}.`
			});
			return;
		}
		seen.set(key, row);
		rows.push({ ...parsed.data, row });
	});
	return { rows, problems };
}
