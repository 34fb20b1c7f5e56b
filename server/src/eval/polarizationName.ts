/**
 * Polarisation names. Every text a person reads (reports, hovers, diagrams) writes π, σ+, σ−;
 * the ASCII names are identifiers of the machine-readable outputs (JSON values, CSV cells), which
 * analysis code compares as plain strings.
 */
import type { MagneticKind } from '../physics/transitions';

export type PolarizationName = 'pi' | 'sigma+' | 'sigma-';

const NAMES: Record<MagneticKind, PolarizationName | 'two-photon'> = { π: 'pi', 'σ+': 'sigma+', 'σ−': 'sigma-', 'two-photon': 'two-photon' };
const SYMBOLS: Record<PolarizationName | 'two-photon', MagneticKind> = { pi: 'π', 'sigma+': 'σ+', 'sigma-': 'σ−', 'two-photon': 'two-photon' };

export function polarizationName<K extends MagneticKind>(k: K): K extends 'two-photon' ? 'two-photon' : PolarizationName {
  return NAMES[k] as K extends 'two-photon' ? 'two-photon' : PolarizationName;
}

/** The symbol people read for an ASCII name ('sigma-' → 'σ−'); an unknown name is returned as it is. */
export function polarizationSymbol(name: string): string {
  return SYMBOLS[name as PolarizationName] ?? name;
}
