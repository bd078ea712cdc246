import type { ParamMatcher } from '@sveltejs/kit';

// Positive integer ids that stay exact as JavaScript numbers (at most 15 digits, no leading zero).
const ID = /^[1-9][0-9]{0,14}$/;

export const match: ParamMatcher = (param) => ID.test(param);
