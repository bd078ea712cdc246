// Public API of the weld computation core. Pure TypeScript: runs on the server and in the browser.
export * from './units';
export * from './findings';
export * from './check-catalogue';
export * from './settings';
export * from './filler';
export * from './tungsten';
export * from './base-metal';
export * from './amperage';
export * from './heat-input';
export * from './shade';
export * from './gas-flow';
export * from './preheat';
export * from './polarity';
export * from './qualified-ranges';
export * from './requalification';
export * from './continuity';
export * from './run-checks';
export type { CheckContext } from './context';
