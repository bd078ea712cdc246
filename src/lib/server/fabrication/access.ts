// Who may do what with jobs. Pages and endpoints guard with these lists; the services check
// again inside the write, against the member as the database has them now (actingMember).
import type { Role } from '$lib/roles';

/** Everyone in the shop reads jobs: the welder opens one to log a weld. */
export const JOB_VIEW_ROLES: Role[] = ['admin', 'engineer', 'inspector', 'welder'];
/** Engineers and admins open jobs and list their joints, as they write procedures. */
export const JOB_AUTHOR_ROLES: Role[] = ['admin', 'engineer'];
/** Only the welder logs their own weld. */
export const WELD_ROLES: Role[] = ['welder'];
/** Inspectors override a refusal and record inspections, signing each. */
export const INSPECT_ROLES: Role[] = ['inspector'];
/** A rejected joint's repair is opened by engineers and admins, or by the inspector. */
export const REPAIR_ROLES: Role[] = ['admin', 'engineer', 'inspector'];
