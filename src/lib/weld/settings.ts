// The SI settings record every check reads. Built from a request body by schemas/checks.ts or
// from a form; all fields but `process` are optional and a check with missing inputs is skipped.
import type { Band, CurrentType, MetalFamily, Process, Transfer } from '$reference/types';
import type { UnitSystem } from './units';

export type { Band, CurrentType, MetalFamily, Process, Transfer };

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
