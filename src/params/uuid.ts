import type { ParamMatcher } from '@sveltejs/kit';

// A malformed id never reaches a load or the database: the route simply does not match (404).
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

export const match: ParamMatcher = (param) => UUID.test(param);
