// What a people service refuses, in words a page can show. Pages map these to 404, a field error
// or a form message; anything else thrown is a bug and ends as a 500 with a reference.

/** The object does not exist in the actor's shop. Another shop's object is "not found" too. */
export class NotFoundError extends Error {
	constructor(message = 'Not found.') {
		super(message);
		this.name = 'NotFoundError';
	}
}

/** The actor may not do this at all (stale role, disabled meanwhile). */
export class ForbiddenError extends Error {
	constructor(message = 'Your role does not allow this.') {
		super(message);
		this.name = 'ForbiddenError';
	}
}

/** A rule of the shop says no; `field` names the form field the message belongs at, if any. */
export class RefusedError extends Error {
	constructor(
		message: string,
		readonly field?: string
	) {
		super(message);
		this.name = 'RefusedError';
	}
}

/** The invite link was used, expired, revoked or never existed; callers never say which. */
export class InviteGoneError extends Error {
	constructor(readonly reason: 'unknown' | 'gone') {
		super('This invite link has already been used or has expired.');
		this.name = 'InviteGoneError';
	}
}
