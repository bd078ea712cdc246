// Who compiles a job's data book: the engineer who runs the job, the inspector who signs its
// inspections, and admins. Reading the verification page needs no account at all.
import type { Role } from '$lib/roles';

export const DATA_BOOK_ROLES: Role[] = ['admin', 'engineer', 'inspector'];
