/** A line's components at one field as result rows (shared by J-level lines and lines with a whole term). */
import { stickSpectrum, type DipoleComponent } from '../physics/transitions';
import { polarizationName } from './polarizationName';
import type { LineComponentResult } from './resultTypes';

/** `highLabels`: also give both ends' uncoupled labels (lines with a whole term). */
export function lineComponentRows(components: readonly DipoleComponent[], highLabels = false): LineComponentResult[] {
  return stickSpectrum(components).map((c, k) => {
    const full = components[k]!;
    // Two literals rather than a spread of an optional key: the same keys in the same order, without a temporary object per row.
    const row: LineComponentResult =
      full.absoluteHz !== null
        ? {
            offset_Hz: c.offsetHz,
            absolute_Hz: full.absoluteHz,
            strength: c.strength,
            polarization: polarizationName(c.polarization),
            lower_label: c.lowerLabel,
            upper_label: c.upperLabel,
            along_field: c.alongField,
            across_field: c.acrossField,
          }
        : {
            offset_Hz: c.offsetHz,
            strength: c.strength,
            polarization: polarizationName(c.polarization),
            lower_label: c.lowerLabel,
            upper_label: c.upperLabel,
            along_field: c.alongField,
            across_field: c.acrossField,
          };
    if (highLabels) {
      row.lower_high_label = full.lower.high.text;
      row.upper_high_label = full.upper.high.text;
    }
    return row;
  });
}
