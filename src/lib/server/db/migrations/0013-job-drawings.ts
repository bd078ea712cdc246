import { DataTypes, type QueryInterface } from 'sequelize';
import { realType } from '../dialect';

// A job's drawing and where each joint sits on it (issue #17). The drawing is an upload (PDF or
// image; `drawing_key` like every storage key column, so the upload sweep counts it referenced),
// with its digest and, for an image, its size in pixels. A joint's marker is stored as fractions
// of the drawing's width and height (0–1 from the top left), so it stays put at any size the
// drawing is shown at. Inspection reports need no change: 0012 gave joint_inspections their
// report columns.
const text = (n: number) => ({ type: DataTypes.STRING(n), allowNull: true });

export async function up({ context: q }: { context: QueryInterface }) {
	await q.addColumn('jobs', 'drawing_key', text(80));
	await q.addColumn('jobs', 'drawing_name', text(200));
	await q.addColumn('jobs', 'drawing_sha256', text(64));
	await q.addColumn('jobs', 'drawing_width', { type: DataTypes.INTEGER, allowNull: true });
	await q.addColumn('jobs', 'drawing_height', { type: DataTypes.INTEGER, allowNull: true });
	await q.addColumn('job_joints', 'marker_x', { type: realType(q), allowNull: true });
	await q.addColumn('job_joints', 'marker_y', { type: realType(q), allowNull: true });
}

export async function down({ context: q }: { context: QueryInterface }) {
	for (const c of ['marker_y', 'marker_x']) await q.removeColumn('job_joints', c);
	for (const c of [
		'drawing_height',
		'drawing_width',
		'drawing_sha256',
		'drawing_name',
		'drawing_key'
	])
		await q.removeColumn('jobs', c);
}
