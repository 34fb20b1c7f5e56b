/** ASCII names of polarisations for JSON and CSV (the physics modules use π, σ+, σ−). */
import type { MagneticKind } from '../physics/transitions';

export type PolarizationName = 'pi' | 'sigma+' | 'sigma-';

const NAMES: Record<MagneticKind, PolarizationName | 'two-photon'> = { π: 'pi', 'σ+': 'sigma+', 'σ−': 'sigma-', 'two-photon': 'two-photon' };

export function polarizationName<K extends MagneticKind>(k: K): K extends 'two-photon' ? 'two-photon' : PolarizationName {
  return NAMES[k] as K extends 'two-photon' ? 'two-photon' : PolarizationName;
}
