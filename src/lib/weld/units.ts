// Quantities: stored SI (mm, A, V, mm/s, L/min, degC, J/mm), typed and shown in the user's
// system. One import for conversions, parsers and formatters.
export * from './unit-convert';
export * from './unit-parse';
export * from './unit-format';
