/**
 * The highest point of a synthesized spectrum between two frequencies: the sampled grid only
 * brackets it (its step is up to half a line width), so the maximum is refined on the exact sum
 * of Voigt profiles by golden-section search. The bracket must hold one maximum (the caller
 * gives the samples either side of the highest one).
 */
import type { WeightedComponent } from './spectrum';
import { VoigtShape } from './voigt';

const INVERSE_GOLDEN = (Math.sqrt(5) - 1) / 2;
/** 0.618^80 ≈ 2e-17: the bracket shrinks to round-off of its ends. */
const ITERATIONS = 80;

export function spectrumPeak(components: readonly WeightedComponent[], sigmaHz: number, gammaHz: number, loHz: number, hiHz: number): { offsetHz: number; perHz: number } {
  const shape = new VoigtShape(sigmaHz, gammaHz);
  const live = components.filter((c) => c.weight !== 0);
  const f = (x: number): number => live.reduce((sum, c) => sum + c.weight * shape.at(x - c.frequencyHz), 0);
  let a = Math.min(loHz, hiHz);
  let b = Math.max(loHz, hiHz);
  let c = b - INVERSE_GOLDEN * (b - a);
  let d = a + INVERSE_GOLDEN * (b - a);
  let fc = f(c);
  let fd = f(d);
  for (let i = 0; i < ITERATIONS && b - a > 0; i++) {
    if (fc >= fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - INVERSE_GOLDEN * (b - a);
      fc = f(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + INVERSE_GOLDEN * (b - a);
      fd = f(d);
    }
  }
  const x = (a + b) / 2;
  return { offsetHz: x, perHz: f(x) };
}
