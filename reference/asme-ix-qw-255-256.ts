// ASME IX QW-255 (GMAW and FCAW) and QW-256 (GTAW): how each welding variable is classed.
// E essential, S supplementary essential (when toughness testing applies), N nonessential.
// Rows read from public WPS/PQR review checklists that reproduce the tables; rows where those
// copies were ambiguous about which process a mark belongs to are left out.
import { ASME_IX_QW_255_256 } from './sources';
import type { Source } from './types';

export type VariableClass = 'E' | 'S' | 'N';

export interface AsmeVariableRow {
	paragraph: string;
	brief: string;
	/** Classes under QW-255 (GMAW/FCAW); several when the paragraph has several parts. */
	gmaw: readonly VariableClass[];
	/** Classes under QW-256 (GTAW). */
	gtaw: readonly VariableClass[];
	source: Source;
}

const r = (
	paragraph: string,
	brief: string,
	gmaw: readonly VariableClass[],
	gtaw: readonly VariableClass[]
): AsmeVariableRow => ({ paragraph, brief, gmaw, gtaw, source: ASME_IX_QW_255_256 });

export const QW_255_256: readonly AsmeVariableRow[] = [
	r('QW-402.1', 'change in groove design', ['N'], ['N']),
	r('QW-402.4', 'deletion of backing in a single-welded groove', ['N'], ['N']),
	r('QW-402.10', 'change in root spacing', ['N'], ['N']),
	r('QW-402.11', 'addition or deletion of nonfusing retainers', ['N'], ['N']),
	r('QW-403.5', 'change in Group Number', ['S'], ['S']),
	r('QW-403.6', 'minimum thickness qualified (toughness)', ['S'], ['S']),
	r('QW-403.8', 'change in thickness T beyond the range qualified', ['E'], ['E']),
	r('QW-403.10', 'thickness limits, short-circuit transfer', ['E'], []),
	r('QW-403.11', 'change in P-Number qualified', ['E'], ['E']),
	r('QW-403.13', 'change among P-Nos. 5, 9 and 10', ['E'], ['E']),
	r('QW-404.3', 'change in size of filler metal', [], ['N']),
	r('QW-404.4', 'change in F-Number', ['E'], ['E']),
	r('QW-404.5', 'change in A-Number', ['E'], ['E']),
	r('QW-404.6', 'change in electrode diameter', ['N'], []),
	r('QW-404.14', 'addition or deletion of filler metal', [], ['E']),
	r('QW-404.22', 'addition or deletion of consumable insert', [], ['N']),
	r('QW-404.30', 'change in deposited weld metal thickness t', ['E'], ['E']),
	r('QW-404.32', 'deposit thickness limits, short-circuit transfer', ['E'], []),
	r('QW-404.33', 'change in AWS classification', ['N'], ['N']),
	r('QW-404.50', 'addition or deletion of flux', [], ['N']),
	r('QW-405.1', 'addition of other welding positions', ['N'], ['N']),
	r('QW-405.2', 'change in position (toughness)', ['S'], ['S']),
	r('QW-405.3', 'change in vertical progression', ['N'], ['N']),
	r('QW-406.1', 'decrease in preheat over 100 °F (55 °C)', ['E'], ['E']),
	r('QW-406.3', 'increase in interpass over 100 °F (55 °C)', ['S'], ['S']),
	r('QW-407.1', 'change in PWHT', ['E'], ['E']),
	r('QW-407.2', 'change in PWHT time and temperature', ['S'], ['S']),
	r('QW-407.4', 'thickness limits with PWHT', ['E'], ['E']),
	r('QW-408.1', 'addition or deletion of trailing gas, or its composition', ['N'], ['N']),
	r('QW-408.2', 'change in shielding gas (single, mixture or percentage)', ['E'], ['E']),
	r('QW-408.3', 'change in shielding gas flow rate', ['N'], ['N']),
	r('QW-408.5', 'addition or deletion of backing gas, or its flow', ['N'], ['N']),
	r('QW-408.9', 'deletion of backing gas or change in its composition', ['E'], ['E']),
	r('QW-408.10', 'change in shielding or trailing gas', ['E'], ['E']),
	r('QW-409.1', 'increase in heat input (toughness)', ['S'], ['S']),
	r('QW-409.2', 'change in transfer mode', ['E'], []),
	r('QW-409.3', 'addition or deletion of pulsing current', [], ['N']),
	r('QW-409.4', 'change in current or polarity', ['S', 'N'], ['S', 'N']),
	r(
		'QW-409.8',
		'change in amperage and voltage range (and wire feed speed, travel speed)',
		['N'],
		['N']
	),
	r('QW-409.12', 'change in tungsten electrode type or size', [], ['N']),
	r('QW-410.1', 'change from string to weave bead', ['N'], ['N']),
	r('QW-410.3', 'change in orifice, cup or nozzle size', ['N'], ['N']),
	r('QW-410.5', 'change in method of cleaning', ['N'], ['N']),
	r('QW-410.6', 'change in method of back gouging', ['N'], ['N']),
	r('QW-410.7', 'change in oscillation', ['N'], ['N']),
	r('QW-410.8', 'change in contact tube to work distance', ['N'], []),
	r('QW-410.9', 'change from multipass to single pass per side', ['S', 'N'], ['S', 'N']),
	r('QW-410.10', 'change from single to multiple electrodes', ['S', 'N'], ['S', 'N']),
	r('QW-410.11', 'change from closed to out-of-chamber welding', [], ['E']),
	r('QW-410.15', 'change in electrode spacing', ['N'], ['N']),
	r('QW-410.25', 'change from manual or semiautomatic to machine or automatic', ['N'], ['N']),
	r('QW-410.26', 'addition or deletion of peening', ['N'], ['N']),
	r('QW-410.64', 'use of thermal processes', ['E'], ['E'])
];
