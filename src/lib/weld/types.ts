// The bottom layer of the weld core: every type the modules share, and the list of check ids.
// It imports nothing from its siblings (only reference tables' types), so the import graph of
// src/lib/weld has a floor and no cycle (eslint import-x/no-cycle keeps it so).
import type { BaseMetalRow } from '$reference/base-metals';
import type { GasMix } from '$reference/shielding-gas';
import type { TungstenClassRow } from '$reference/tungsten';
import type {
	Band,
	CurrentType,
	MetalFamily,
	Process,
	Source,
	SourceKind,
	Transfer
} from '$reference/types';

export type { Band, CurrentType, MetalFamily, Process, Transfer };

export type UnitSystem = 'imperial' | 'metric';

// ---- the settings record (SI) ----
/** Weight percent. */
export interface Chemistry {
	C?: number;
	Mn?: number;
	Cr?: number;
	Mo?: number;
	V?: number;
	Ni?: number;
	Cu?: number;
}

export interface ProcedureRanges {
	amps?: Partial<Band>;
	volts?: Partial<Band>;
	travelSpeedMmPerS?: Partial<Band>;
	wireFeedMmPerS?: Partial<Band>;
	/** Maximum heat input in J/mm; `basis` says whether it was set with ISO's k or ASME's none. */
	heatInputMax?: { jPerMm: number; basis: 'asme' | 'iso' };
	preheatMinC?: number;
}

export interface WeldSettings {
	process: Process;
	currentType?: CurrentType;
	transfer?: Transfer;
	amps?: number;
	volts?: number;
	travelSpeedMmPerS?: number;
	wireFeedMmPerS?: number;
	thicknessMm?: number;
	baseMetal?: { spec?: string; family?: MetalFamily };
	filler?: { classification?: string; diameterMm?: number };
	tungsten?: { classification?: string; diameterMm?: number };
	gas?: { name?: string; flowLPerMin?: number };
	/** Test or production position, e.g. "2F", "3G". */
	position?: string;
	preheatC?: number;
	/** Lens shade number in use. */
	lensShade?: number;
	chemistry?: Chemistry;
	procedure?: ProcedureRanges;
}

export interface CheckOptions {
	/** The user's unit system for messages and `expected` units (default imperial). */
	system?: UnitSystem;
}

// ---- checks and their findings ----

export const CHECK_IDS = [
	'amps-vs-thickness',
	'amps-vs-filler',
	'amps-vs-tungsten',
	'tungsten-vs-current',
	'wfs-vs-amps',
	'current-type',
	'heat-input',
	'lens-shade',
	'gas-vs-process',
	'gas-flow',
	'filler-classification',
	'filler-vs-base-metal',
	'base-metal',
	'preheat',
	'carbon-equivalent',
	'within-procedure',
	'requalification',
	'pqr-ranges',
	'welder-positions',
	'welder-deposit-thickness',
	'welder-diameter',
	'continuity'
] as const;

export type CheckId = (typeof CHECK_IDS)[number];

export type FindingStatus = 'ok' | 'caution' | 'outside';

export interface FindingSource {
	label: string;
	kind: SourceKind;
}

export interface Expected {
	min?: number;
	max?: number;
	unit: string;
}

export interface Finding {
	check: CheckId;
	status: FindingStatus;
	message: string;
	/** The value checked, in `expected.unit` (a classification string for text checks). */
	value: number | string | null;
	expected: Expected;
	source: FindingSource;
	/** The input the finding concerns, as a path into the settings body: "amps", "filler.diameter". */
	field?: string;
}

// ---- what run-checks resolves once ----

export type FillerForm = 'solid wire or rod' | 'flux-cored wire' | 'covered electrode';

export interface Filler {
	classification: string;
	spec: string;
	family: MetalFamily;
	form: FillerForm;
	minTensileKsi: number | null;
	fNumber: number;
	aNumber: number | null;
	suits: readonly MetalFamily[];
	meaning: string;
	/** Shielding the classification calls for (FCAW C/M suffix, self-shielded types). */
	gas?: 'CO2' | 'Ar/CO2 75-80 %' | 'none';
	/** Currents the classification is made for, where the designation says. */
	currents?: readonly CurrentType[];
	/** The A5.18M twin when a metric designation was entered (ER48S-6 -> ER70S-6). */
	enteredAs?: string;
	/** False when the designation reads right but is not in Beadline's table. */
	inTable: boolean;
	source: Source;
	fNumberSource: Source;
	aNumberSource: Source;
}

export interface BaseMetal {
	/** Null when only a family was given. */
	row: BaseMetalRow | null;
	family: MetalFamily;
	pNumber: string | null;
	group: number | null;
	/** Listed under AWS D1.1:2015 Table 3.3 category B. */
	d11CategoryB: boolean;
}

/** What run-checks resolves once (parsed filler, tungsten, gas, base metal) and hands every check. */
export interface CheckContext {
	s: WeldSettings;
	system: UnitSystem;
	/** Base metal family from the spec, or as given. */
	family?: MetalFamily;
	metal?: BaseMetal;
	filler?: Filler;
	tungsten?: TungstenClassRow;
	gas?: GasMix;
}
