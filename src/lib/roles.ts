// Shared by server and browser: who may do what is decided on the server, this only names roles.
export const ROLES = ['admin', 'engineer', 'inspector', 'welder'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
	admin: 'Admin',
	engineer: 'Engineer',
	inspector: 'Inspector',
	welder: 'Welder'
};

/** Where each role lands after signing in. */
export const START_PAGE: Record<Role, string> = {
	admin: '/admin',
	engineer: '/records',
	inspector: '/reviews',
	welder: '/booth'
};
