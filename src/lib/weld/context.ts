// What run-checks resolves once and hands every check. The type lives in the bottom layer
// (types.ts); this module names it for existing imports.
export type { CheckContext } from './types';
