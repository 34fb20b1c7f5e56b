/** Flat rows of a line's components for plots and exports. */
import type { DipoleComponent, StickRow } from './types';

/** `labels`: 'low' uses |F, m_F> (or |J, m_J>) names, 'high' the uncoupled |m_J, m_I> names. */
export function stickSpectrum(components: readonly DipoleComponent[], labels: 'low' | 'high' = 'low'): StickRow[] {
  return components.map((c) => ({
    offsetHz: c.offsetHz,
    strength: c.strength,
    polarization: c.polarization,
    lowerLabel: (labels === 'low' ? c.lower.low : c.lower.high).text,
    upperLabel: (labels === 'low' ? c.upper.low : c.upper.high).text,
    alongField: c.alongField,
    acrossField: c.acrossField,
  }));
}
