import type { Role } from '$lib/roles';

// The invented demo shop of the product brief. These passwords exist only in demo databases.
export const DEMO_SHOP = 'Larkspur Trailer & Rail';

export interface DemoPerson {
	name: string;
	email: string;
	role: Role;
	password: string;
}

export const DEMO_PEOPLE: DemoPerson[] = [
	{
		name: 'Dana Okafor',
		email: 'dana@larkspur.example',
		role: 'admin',
		password: 'demo-admin-larkspur'
	},
	{
		name: 'Reuben Castell',
		email: 'reuben@larkspur.example',
		role: 'engineer',
		password: 'demo-engineer-larkspur'
	},
	{
		name: 'Mirela Sand',
		email: 'mirela@larkspur.example',
		role: 'inspector',
		password: 'demo-inspector-larkspur'
	},
	{
		name: 'Tomas Whitlow',
		email: 'tomas@larkspur.example',
		role: 'welder',
		password: 'demo-welder-larkspur'
	},
	{
		name: 'Priya Venn',
		email: 'priya@larkspur.example',
		role: 'welder',
		password: 'demo-welder-venn'
	}
];

/** A second invented shop, so that isolation between shops can be seen and tested. */
export const OTHER_SHOP = 'Harrow Gate Ironworks';
export const OTHER_PEOPLE: DemoPerson[] = [
	{
		name: 'Ines Marlow',
		email: 'ines@harrowgate.example',
		role: 'admin',
		password: 'demo-admin-harrow'
	},
	{
		name: 'Colm Rudd',
		email: 'colm@harrowgate.example',
		role: 'engineer',
		password: 'demo-engineer-harrow'
	}
];
