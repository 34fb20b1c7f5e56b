/** Line-components diagram data: the stick spectrum of one line at one working field. */
import type { LineResult } from '../eval/resultTypes';
import type { LinesViewData } from '../render';
import { fieldInUnit } from '../eval/writtenUnit';
import { spectrumSamples } from '../eval/spectrumSamples';
import { frequencyText } from '../eval/quantityText';
import { voigtProfile } from '../physics/lineshape';

/** The index of the named field among the line's computed fields, else the first. */
export function lineFieldIndex(line: LineResult, fieldName: string | undefined): number {
  const i = fieldName === undefined ? -1 : line.at_fields.findIndex((f) => f.source.name === fieldName);
  return i >= 0 ? i : 0;
}

/** `writtenUnit`: the unit the file wrote the field in, so the figure says `3.23 G` back. */
export function linesView(line: LineResult, fieldIndex = 0, writtenUnit?: string): LinesViewData | undefined {
  const at = line.at_fields[fieldIndex];
  if (!at || at.components.length === 0) return undefined;
  const field = fieldInUnit(at.field_T, { unit: writtenUnit });
  const where = at.source.name === 'zero' && at.field_T === 0 ? 'zero field' : `${at.source.kind} ${at.source.name}, ${field}`;
  return {
    title: `line ${line.name}: ${line.lower ?? '?'} → ${line.upper ?? '?'} at ${where}`,
    fieldT: at.field_T,
    fieldText: field,
    fieldName: `${at.source.kind} ${at.source.name}`,
    components: at.components.map((c, k) => ({
      offsetHz: c.offset_Hz,
      strength: c.strength,
      polarization: c.polarization,
      label: `${c.lower_label} → ${c.upper_label}`,
      // The sticks under a spectrum show what its curve counts: strength × the viewing factor.
      ...(at.spectrum ? { observed: at.spectrum.weights[k] ?? 0 } : {}),
    })),
    ...(at.spectrum ? { spectrum: spectrumCurve(at.spectrum, at.components) } : {}),
  };
}

function spectrumCurve(s: NonNullable<LineResult['at_fields'][number]['spectrum']>, components: LineResult['at_fields'][number]['components']): NonNullable<LinesViewData['spectrum']> {
  const samples = spectrumSamples(s, components);
  const light = s.light === 'all' ? 'all light' : `${s.light} light`;
  // The figure itself says when its samples are too far apart to show the peaks (spectrum-undersampled).
  const step = (s.window_Hz[1] - s.window_Hz[0]) / Math.max(1, s.points - 1);
  const sparse = step > s.voigt_fwhm_Hz / 2 ? `; too few samples: ${frequencyText(step, 3)} apart, peaks not resolved` : '';
  return {
    offsetHz: samples.offsetHz,
    intensity: samples.intensity,
    unitPeak: voigtProfile(0, s.sigma_Hz, s.gamma_Hz),
    caption: `spectrum ${s.direction} the field, ${light}, Voigt FWHM ${frequencyText(s.voigt_fwhm_Hz, 3)} (a lone component peaks at its stick${sparse})`,
  };
}
