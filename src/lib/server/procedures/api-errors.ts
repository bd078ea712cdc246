// A service's refusal as the API's JSON answer; anything else stays a logged 500.
import { ApiFailure } from '../api/respond';
import { ForbiddenError, NotFoundError, RefusedError } from '../people/errors';
import { AlreadyDecidedError } from './access';

export function apiFailureFor(e: unknown): unknown {
	if (e instanceof ApiFailure) return e;
	if (e instanceof NotFoundError) return new ApiFailure(404, { message: e.message });
	if (e instanceof ForbiddenError) return new ApiFailure(403, { message: e.message });
	if (e instanceof AlreadyDecidedError) return new ApiFailure(409, { message: e.message });
	if (e instanceof RefusedError)
		return e.field
			? new ApiFailure(400, { errors: { [e.field]: [e.message] } })
			: new ApiFailure(409, { message: e.message });
	return e;
}

/** Runs a service call; its refusal becomes the API's answer. */
export async function attempt<T>(work: () => Promise<T>): Promise<T> {
	try {
		return await work();
	} catch (e) {
		throw apiFailureFor(e);
	}
}
