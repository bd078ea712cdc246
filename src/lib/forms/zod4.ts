// The zod 4 adapters, imported by their own file. superforms' adapter index
// (`sveltekit-superforms/adapters`) imports the adapter of every validation library it supports,
// which pulls typebox, vine, effect… into the build: hundreds of warnings and dead weight. The
// package's exports map has no entry for one adapter, so `$superforms-zod4` (svelte.config.js)
// points at the file.
export { zod as zod4, zodClient as zod4Client } from '$superforms-zod4';
