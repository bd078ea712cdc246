import { ISO_TR_17671_1 } from './sources';
import type { Process, Source } from './types';

export interface KFactorRow {
	/** ISO 4063 process reference number. */
	iso4063: number;
	name: string;
	k: number;
	source: Source;
}

export const K_FACTORS: readonly KFactorRow[] = [
	{
		iso4063: 121,
		name: 'Submerged arc welding with wire electrode',
		k: 1.0,
		source: ISO_TR_17671_1
	},
	{ iso4063: 111, name: 'Manual metal arc (covered electrode)', k: 0.8, source: ISO_TR_17671_1 },
	{ iso4063: 131, name: 'MIG welding', k: 0.8, source: ISO_TR_17671_1 },
	{ iso4063: 135, name: 'MAG welding', k: 0.8, source: ISO_TR_17671_1 },
	{ iso4063: 114, name: 'Self-shielded flux-cored wire', k: 0.8, source: ISO_TR_17671_1 },
	{ iso4063: 136, name: 'Flux-cored wire, active gas', k: 0.8, source: ISO_TR_17671_1 },
	{ iso4063: 137, name: 'Flux-cored wire, inert gas', k: 0.8, source: ISO_TR_17671_1 },
	{ iso4063: 138, name: 'Metal-cored wire, active gas', k: 0.8, source: ISO_TR_17671_1 },
	{ iso4063: 141, name: 'TIG welding', k: 0.6, source: ISO_TR_17671_1 },
	{ iso4063: 15, name: 'Plasma arc welding', k: 0.6, source: ISO_TR_17671_1 }
];

/** The ISO 4063 number each Beadline process is counted as. */
export const PROCESS_ISO4063: Record<Process, number> = {
	GTAW: 141,
	GMAW: 135,
	FCAW: 136,
	SMAW: 111
};
