/**
 * The samples of a spectrum, computed on demand from its evaluation (they are not kept in the
 * JSON document): offset from the line centre, absolute frequency and wavelengths when the
 * line's frequency is known, and intensity per Hz for unit component strength.
 */
import { vacuumWavelengthM } from '../physics/species/conversions';
import { airWavelengthM, synthesizeSpectrum } from '../physics/lineshape';
import type { LineComponentResult, SpectrumResult } from './resultTypes';

export interface SpectrumSamples {
  offsetHz: Float64Array;
  intensity: Float64Array;
  /** Present when the line's frequency is known. */
  absoluteHz?: Float64Array;
  vacuumWavelengthM?: Float64Array;
  /** Present when every sample is at 200 nm or longer (shorter lines are quoted in vacuum). */
  airWavelengthM?: Float64Array;
}

export function spectrumSamples(s: SpectrumResult, components: readonly LineComponentResult[], lineCentreHz?: number): SpectrumSamples {
  const [from, to] = s.window_Hz;
  const n = s.points;
  const grid = { fromHz: from, stepHz: n > 1 ? (to - from) / (n - 1) : 0, points: n };
  const comps = components.map((c, k) => ({ frequencyHz: c.offset_Hz, weight: s.weights[k] ?? 0 }));
  const intensity = synthesizeSpectrum(comps, s.sigma_Hz, s.gamma_Hz, grid);
  const offsetHz = new Float64Array(n);
  for (let i = 0; i < n; i++) offsetHz[i] = from + i * grid.stepHz;
  const out: SpectrumSamples = { offsetHz, intensity };
  if (lineCentreHz !== undefined && lineCentreHz + from > 0) {
    const abs = new Float64Array(n);
    const vac = new Float64Array(n);
    const air = new Float64Array(n);
    let airOk = true;
    for (let i = 0; i < n; i++) {
      abs[i] = lineCentreHz + offsetHz[i]!;
      vac[i] = vacuumWavelengthM(abs[i]!);
      const a = airWavelengthM(vac[i]!);
      if (a === undefined) airOk = false;
      else air[i] = a;
    }
    out.absoluteHz = abs;
    out.vacuumWavelengthM = vac;
    if (airOk) out.airWavelengthM = air;
  }
  return out;
}
