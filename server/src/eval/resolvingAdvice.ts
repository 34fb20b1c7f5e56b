/**
 * What would resolve merged beam peaks, in one sentence shared by the diagnostic, the text
 * report, the hover and the JSON, so every place gives the same suggestions.
 */
import { gradientText, lengthText } from './quantityText';
import type { BeamResult } from './resultTypes';

/** The sentence, or undefined when the peaks are resolved or the search did not run. */
export function resolvingAdvice(r: BeamResult): string | undefined {
  if (!r.computed || r.all_resolved !== false || r.resolving_gradient_T_per_m === undefined) return undefined;
  const options: string[] = [];
  if (typeof r.resolving_gradient_T_per_m === 'number') options.push(`a gradient of at least ${gradientText(Math.abs(r.resolving_gradient_T_per_m), 3)}`);
  if (typeof r.resolving_magnet_length_m === 'number') options.push(`a magnet of at least ${lengthText(r.resolving_magnet_length_m, 3)}`);
  if (typeof r.resolving_drift_m === 'number') options.push(`a drift of at least ${lengthText(r.resolving_drift_m, 3)}`);
  return options.length > 0
    ? `Any one of ${options.join(', or ')} would resolve them.`
    : 'No gradient, magnet length or drift up to 100 times the present one resolves them; narrow the slits or change the source.';
}
