import type { Role } from './roles';

export interface NavItem {
	href: string;
	label: string;
}

// Each role sees the places it works in; the server still guards every one of them.
const BY_ROLE: Record<Role, NavItem[]> = {
	admin: [
		{ href: '/admin', label: 'Overview' },
		{ href: '/admin/people', label: 'People' },
		{ href: '/admin/shop', label: 'Shop' },
		{ href: '/admin/tokens', label: 'API tokens' },
		{ href: '/admin/audit', label: 'Audit trail' },
		{ href: '/procedures', label: 'Procedures' },
		{ href: '/welders', label: 'Welders' },
		{ href: '/jobs', label: 'Jobs' }
	],
	engineer: [
		{ href: '/records', label: 'Bench records' },
		{ href: '/procedures', label: 'Procedures' },
		{ href: '/pqrs', label: 'PQRs' },
		{ href: '/welders', label: 'Welders' },
		{ href: '/jobs', label: 'Jobs' }
	],
	inspector: [
		{ href: '/reviews', label: 'Review desk' },
		{ href: '/procedures', label: 'Procedures' },
		{ href: '/welders', label: 'Welders' },
		{ href: '/jobs', label: 'Jobs' }
	],
	welder: [
		{ href: '/booth', label: 'Booth' },
		{ href: '/jobs', label: 'Jobs' },
		{ href: '/welders/me', label: 'My qualifications' }
	]
};

const FOR_ALL: NavItem[] = [{ href: '/help/checks', label: 'How checks work' }];

export function navFor(role: Role, extras: { mailCatcher: boolean }): NavItem[] {
	const items = [...BY_ROLE[role]];
	if (role === 'admin' && extras.mailCatcher)
		items.push({ href: '/admin/mail', label: 'Caught mail' });
	return [...items, ...FOR_ALL];
}
