import type { SessionUser } from '$lib/server/auth/session-user';

// See https://svelte.dev/docs/kit/types#app.d.ts
declare global {
	namespace App {
		interface Error {
			message: string;
			/** A short reference a user can quote to the shop's admin; no stack, no internals. */
			ref?: string;
		}
		interface Locals {
			/** The signed-in member, checked against the database on every request; null when signed out. */
			user: SessionUser | null;
		}
		// interface PageData {}
		// interface PageState {}
		// interface Platform {}
	}
}

export {};
