/** Line-components diagram data: the stick spectrum of one line at one working field. */
import type { LineResult } from '../eval/resultTypes';
import type { LinesViewData } from '../render';
import { fieldInUnit } from '../eval/writtenUnit';
import { spectrumSamples } from '../eval/spectrumSamples';
import { frequencyText } from '../eval/quantityText';
import { synthesizeSpectrum, VoigtShape } from '../physics/lineshape';
import { CURVE_FLOOR, mergeStretches, samplesAbove, type Stretch } from '../render/spectrumFrame';

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

type AtField = LineResult['at_fields'][number];

function spectrumCurve(s: NonNullable<AtField['spectrum']>, components: AtField['components']): NonNullable<LinesViewData['spectrum']> {
  const samples = spectrumSamples(s, components);
  const light = s.light === 'all' ? 'all light' : `${s.light} light`;
  const shape = new VoigtShape(s.sigma_Hz, s.gamma_Hz);
  const unitPeak = shape.at(0);
  const step = (s.window_Hz[1] - s.window_Hz[0]) / Math.max(1, s.points - 1);
  // The curve's peak as the report finds it (refined between samples), in stick units.
  const peak = Math.max(s.peak_per_Hz, ...samples.intensity) / unitPeak;
  const floor = CURVE_FLOOR * peak;
  const stretches = mergeStretches([
    ...samplesAbove(samples.offsetHz, Array.from(samples.intensity, (v) => v / unitPeak), floor),
    // A component whose own profile clears the floor is there even when samples step over it.
    ...components.flatMap((c, k): Stretch[] => {
      const w = s.weights[k] ?? 0;
      if (!(w >= floor)) return [];
      const r = reach(shape, unitPeak, floor / w, s.voigt_fwhm_Hz);
      return [[Math.max(s.window_Hz[0], c.offset_Hz - r), Math.min(s.window_Hz[1], c.offset_Hz + r)]];
    }),
  ]);
  // Samples a twentieth of the width apart draw a smooth top even on a segment of a broken axis.
  const sparse = step > s.voigt_fwhm_Hz / FINE_PER_WIDTH;
  return {
    offsetHz: samples.offsetHz,
    intensity: samples.intensity,
    unitPeak,
    caption: `spectrum ${s.direction} the field, ${light}, Voigt FWHM ≈ ${frequencyText(s.voigt_fwhm_Hz, 4)}`,
    stretches,
    floor: CURVE_FLOOR,
    windowHz: [s.window_Hz[0], s.window_Hz[1]],
    points: s.points,
    ...(sparse ? { fine: fineSamples(s, components, stretches), reportStepHz: step, widthHz: s.voigt_fwhm_Hz } : {}),
  };
}

/** The distance at which a lone component's profile falls to `fraction` of its peak (bisection; the profile falls monotonically). */
function reach(shape: VoigtShape, unitPeak: number, fraction: number, fwhmHz: number): number {
  if (fraction >= 1) return 0;
  const target = fraction * unitPeak;
  let lo = 0;
  let hi = fwhmHz > 0 ? fwhmHz : 1;
  for (let k = 0; k < 200 && shape.at(hi) > target; k++) hi *= 2;
  for (let k = 0; k < 60; k++) {
    const mid = (lo + hi) / 2;
    if (shape.at(mid) > target) lo = mid;
    else hi = mid;
  }
  return hi;
}

/** At most this many extra samples in all, and per stretch. */
const FINE_TOTAL = 20_001;
/** Samples per line width the figure wants. */
const FINE_PER_WIDTH = 20;
const FINE_PER_STRETCH = 2_001;

/**
 * Exact samples at a twentieth of the line width across each stretch, for a figure whose report
 * samples are coarser than that (at worst they step over its peaks, `spectrum-undersampled`): the
 * figure draws what the line is, the report's samples stay as they are.
 */
function fineSamples(s: NonNullable<AtField['spectrum']>, components: AtField['components'], stretches: readonly Stretch[]): { offsetHz: Float64Array; intensity: Float64Array } {
  const comps = components.map((c, k) => ({ frequencyHz: c.offset_Hz, weight: s.weights[k] ?? 0 }));
  const budget = Math.max(11, Math.min(FINE_PER_STRETCH, Math.floor(FINE_TOTAL / Math.max(1, stretches.length))));
  const offsets: number[] = [];
  const values: number[] = [];
  for (const [a, b] of stretches) {
    const points = Math.max(11, Math.min(budget, Math.ceil((b - a) / (s.voigt_fwhm_Hz / FINE_PER_WIDTH)) + 1));
    const stepHz = (b - a) / (points - 1);
    const v = synthesizeSpectrum(comps, s.sigma_Hz, s.gamma_Hz, { fromHz: a, stepHz, points });
    for (let i = 0; i < points; i++) {
      offsets.push(a + i * stepHz);
      values.push(v[i]!);
    }
  }
  return { offsetHz: Float64Array.from(offsets), intensity: Float64Array.from(values) };
}
