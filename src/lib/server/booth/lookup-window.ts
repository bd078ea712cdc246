/**
 * Booth look-ups are logged one row per link and outcome per window of this length (aligned to
 * the epoch), whichever process served them; see lookups.ts. On its own so tests can read it.
 */
export const LOOKUP_WINDOW_MS = 10 * 60_000;
