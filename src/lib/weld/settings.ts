// The SI settings record every check reads. Built from a request body by schemas/checks.ts or
// from a form; all fields but `process` are optional and a check with missing inputs is skipped.
// The types live in the bottom layer (types.ts); this module names them for existing imports.
export type {
	Band,
	CheckOptions,
	Chemistry,
	CurrentType,
	MetalFamily,
	Process,
	ProcedureRanges,
	Transfer,
	WeldSettings
} from './types';
