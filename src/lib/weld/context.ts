// What run-checks resolves once (parsed filler, tungsten, gas, base metal) and hands every check.
import type { GasMix } from '$reference/shielding-gas';
import type { TungstenClassRow } from '$reference/tungsten';
import type { MetalFamily } from '$reference/types';
import type { BaseMetal } from './base-metal';
import type { Filler } from './filler';
import type { WeldSettings } from './settings';
import type { UnitSystem } from './units';

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
