/**
 * The maximum of a function with one maximum inside [lo, hi], by golden-section search: the
 * bracket shrinks by 0.618 a step, each step one new evaluation, until it is narrower than
 * `stopWidth` or `maxSteps` steps are done. Returns the bracket's middle. Values settle a flat top
 * only to ~√ε of its width: where the slope is at hand, its zero is the better mode (the beam's
 * peak refinement, beam/peakRefine.ts). Used by the spectrum's highest point and by the beam line's
 * closest approach to a source (the maximum of the negative distance).
 */
const INVERSE_GOLDEN = (Math.sqrt(5) - 1) / 2;

export function goldenMaximum(f: (x: number) => number, lo: number, hi: number, stopWidth: number, maxSteps = Number.POSITIVE_INFINITY): number {
  let x1 = hi - INVERSE_GOLDEN * (hi - lo);
  let x2 = lo + INVERSE_GOLDEN * (hi - lo);
  let f1 = f(x1);
  let f2 = f(x2);
  for (let step = 0; step < maxSteps && hi - lo > stopWidth; step++) {
    if (f1 < f2) {
      lo = x1;
      x1 = x2;
      f1 = f2;
      x2 = lo + INVERSE_GOLDEN * (hi - lo);
      f2 = f(x2);
    } else {
      hi = x2;
      x2 = x1;
      f2 = f1;
      x1 = hi - INVERSE_GOLDEN * (hi - lo);
      f1 = f(x1);
    }
  }
  return 0.5 * (lo + hi);
}
