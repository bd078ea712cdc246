import type { Model, ModelStatic } from 'sequelize';

/**
 * `parent.hasMany(child, { foreignKey, as })` for each `as: child`: the one-to-many links that
 * share a foreign key (a revision's sign-offs, PQR links and record links) read as one list.
 */
export function hasManyAs<M extends Model>(
	parent: ModelStatic<M>,
	foreignKey: string,
	children: Record<string, ModelStatic<Model>>
): void {
	for (const [as, child] of Object.entries(children)) parent.hasMany(child, { foreignKey, as });
}
