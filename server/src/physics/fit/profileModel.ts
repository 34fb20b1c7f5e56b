/**
 * Model of a measured detector profile: counts(x) = amplitude · P(x − offset) + background,
 * with P the exact beam engine's detector pattern (speed law ⊗ two-slit image ⊗ aperture,
 * sublevel moments from the Zeeman engine). Free: gradient, oven temperature, detector offset and
 * width, the magnet's field, populations of each F (relative to the first), background; the
 * amplitude is always free (counts have no absolute scale). Width, temperature and populations
 * enter by their absolute value; `sizeParameters` lists them so results are reported as sizes.
 * A beam whose magnet is built from sources takes its deflections from flights (`flights`): a
 * scale on every source's strength replaces the gradient, and the pattern is fed each
 * sublevel's coefficient k as an effective moment k M / (G (L1²/2 + L1 L2)) (fieldMapPattern.ts).
 */
import { leverArmM2, type PatternInput } from '../beam';
import { speedLawFor } from '../beam/speedLawFor';
import { effectiveMomentJT } from '../beam/trajectory/fieldMapPattern';
// The pattern without peak refinement: a fit needs the density only, not off-grid peak positions.
import { computePattern } from '../beam/detectorPattern';
import { solveLevel, type HyperfineLevelSpec } from '../engine';

export type ProfileParameter = 'gradient' | 'temperature' | 'offset' | 'width' | 'field' | 'populations' | 'background' | 'source_scale';

/** The flights of a beam through a magnet built from sources. */
export interface ProfileFlights {
  /** Each sublevel's deflection coefficient k = z_detector · v² (m³/s², input.sublevels' order) with every source's strength times `scale`, flown at `speed`; null when a flight fails. */
  coefficients(scale: number, speed: number): Float64Array | null;
}

export interface ProfileSetup {
  input: PatternInput;
  /** The level and magnet field, to recompute moments when the field is free. */
  spec: HyperfineLevelSpec;
  magnetFieldT: number;
  /** Twice F of each sublevel, same order as input.sublevels (for per-F populations). */
  twoF: number[];
  /** A magnet built from sources: the deflections come from these flights (then `gradient` and `field` are not parameters). */
  flights?: ProfileFlights;
}

/** Difference step for this model: the pattern is computed on a grid, so steps far below a bin only see its rounding. */
export const PROFILE_RELATIVE_STEP = 1e-4;

export interface ProfileModel {
  /** Names of the fitted parameters, in order (amplitude last but one, populations expanded). */
  names: string[];
  start: number[];
  scale: number[];
  model(p: Float64Array, out: Float64Array): boolean;
  /** ∂model/∂p (count × p): amplitude, background, offset and populations exactly, the rest by central differences. */
  jacobian(p: Float64Array, out: Float64Array): boolean;
  /** Detector patterns computed so far (the model's cost; for benchmarks and tests). */
  patterns(): number;
}

/** Parameters that enter by their absolute value. */
export function isSizeParameter(name: string): boolean {
  // The field reversed (source_scale < 0) has the same |B|, so the same deflections.
  return name === 'width' || name === 'temperature' || name === 'source_scale' || name.startsWith('population');
}

/** Bins of the pattern grid over the scanned span. */
const BINS = 1024;

/**
 * The grid values ys (at ascending xs) linearly interpolated at each x − shift into `out`, 0 off
 * the grid; with `slopes`, the interpolant's slope there too (its exact derivative in x, taken
 * from the right at a knot). Positions are usually ascending, so the search walks from the last
 * segment and falls back to bisection.
 */
function sampleGrid(xs: Float64Array, ys: Float64Array, positions: Float64Array, shift: number, out: Float64Array, slopes?: Float64Array): void {
  const n = xs.length;
  let lo = 0;
  for (let i = 0; i < positions.length; i++) {
    const x = positions[i]! - shift;
    if (n < 2 || x < xs[0]! || x > xs[n - 1]!) {
      out[i] = 0;
      if (slopes) slopes[i] = 0;
      continue;
    }
    if (x < xs[lo]!) lo = 0;
    if (x >= xs[lo + 1]!) {
      if (lo + 2 < n && x < xs[lo + 2]!) lo++;
      else {
        let hi = n - 1;
        while (hi - lo > 1) {
          const mid = (lo + hi) >> 1;
          if (xs[mid]! <= x) lo = mid;
          else hi = mid;
        }
        if (lo === n - 1) lo = n - 2;
      }
    }
    const dx = xs[lo + 1]! - xs[lo]!;
    const slope = dx > 0 ? (ys[lo + 1]! - ys[lo]!) / dx : 0;
    out[i] = ys[lo]! + slope * (x - xs[lo]!);
    if (slopes) slopes[i] = slope;
  }
}

export function profileModel(setup: ProfileSetup, positionsM: Float64Array, counts: Float64Array, free: readonly ProfileParameter[], startOffsetM = 0): ProfileModel {
  const fs = [...new Set(setup.twoF)].sort((a, b) => a - b);
  const names: string[] = [];
  const start: number[] = [];
  const scale: number[] = [];
  const geometry = { ...setup.input.geometry };
  delete geometry.detectorOffsetM;
  const source = setup.input.source;
  const firstWeight = new Map<number, number>();
  setup.twoF.forEach((f, i) => firstWeight.set(f, Math.max(firstWeight.get(f) ?? 0, setup.input.sublevels[i]!.population)));
  const push = (name: string, value: number, size: number): void => {
    names.push(name);
    start.push(value);
    scale.push(Math.max(Math.abs(value), size));
  };
  for (const name of free) {
    if (name === 'gradient') push('gradient', geometry.gradientTPerM, 1e-3);
    else if (name === 'temperature') push('temperature', source.kind === 'effusive' ? source.temperatureK : 0, 1);
    else if (name === 'offset') push('offset', startOffsetM, 1e-6);
    else if (name === 'width') push('width', geometry.detectorWidthM, 1e-6);
    else if (name === 'field') push('field', setup.magnetFieldT, 1e-6);
    else if (name === 'background') push('background', 0, 1);
    else if (name === 'source_scale') push('source_scale', 1, 1e-3);
    else if (name === 'populations') for (const f of fs.slice(1)) push(`population F=${f % 2 === 0 ? f / 2 : `${f}/2`}`, firstWeight.get(f) ?? 1, 1e-3);
  }
  // One grid for every evaluation (shifted by the starting offset only): a grid that moved with
  // the parameters would add its own steps to the model.
  const margin = 0.1 * (Math.max(...positionsM) - Math.min(...positionsM) || 1e-3);
  const grid = { startM: Math.min(...positionsM) - startOffsetM - margin, endM: Math.max(...positionsM) - startOffsetM + margin };
  const index = (n: string): number => names.indexOf(n);

  const fLabel = (f: number): string => `population F=${f % 2 === 0 ? f / 2 : `${f}/2`}`;
  // Which population parameter (if any) scales each sublevel.
  const popParam = setup.twoF.map((f) => names.indexOf(fLabel(f)));

  /** The pattern on its grid at p: total, and per F the summed contribution and weight (for the population columns). */
  interface Shape {
    xs: Float64Array;
    ys: Float64Array;
    byF: Map<number, { sum: Float64Array; weight: number }>;
  }
  let patterns = 0;
  const shape = (p: Float64Array): Shape | null => {
    const g = { ...geometry };
    if (index('gradient') >= 0) g.gradientTPerM = p[index('gradient')]!;
    // Width, temperature and populations enter by their size: a step through zero stays computable.
    if (index('width') >= 0) g.detectorWidthM = Math.abs(p[index('width')]!);
    let src = source;
    if (index('temperature') >= 0) {
      if (source.kind !== 'effusive') return null;
      src = { kind: 'effusive', temperatureK: Math.abs(p[index('temperature')]!) };
    }
    let moments = setup.input.sublevels.map((s) => s.momentJT);
    if (setup.flights) {
      // The flights at the reference speed ⟨1/v²⟩^(−1/2) of the (possibly fitted) speed law.
      const speed = 1 / Math.sqrt(speedLawFor(src, setup.input.massKg).meanInverseSquare);
      const k = setup.flights.coefficients(index('source_scale') >= 0 ? p[index('source_scale')]! : 1, speed);
      const lever = g.gradientTPerM * leverArmM2(g);
      if (!k || !(lever !== 0) || !Number.isFinite(speed)) return null;
      moments = moments.map((_, i) => effectiveMomentJT(k[i]!, setup.input.massKg, lever));
    } else if (index('field') >= 0) {
      const solved = solveLevel(setup.spec, p[index('field')]!);
      if (solved.states.length !== moments.length) return null;
      moments = solved.states.map((s) => s.momentJT);
    }
    const sublevels = setup.input.sublevels.map((s, i) => {
      const f = setup.twoF[i]!;
      const k = popParam[i]!;
      const relative = k >= 0 ? Math.abs(p[k]!) / (firstWeight.get(f) || 1) : 1;
      return { label: s.label, momentJT: moments[i]!, population: s.population * relative };
    });
    patterns++;
    const pattern = computePattern({
      ...setup.input,
      geometry: g,
      source: src,
      sublevels,
      bins: BINS,
      spanM: grid,
    }, undefined, false);
    if (pattern.issues.some((i) => i.severity === 'error') || pattern.total.length === 0) return null;
    const byF = new Map<number, { sum: Float64Array; weight: number }>();
    popParam.forEach((k, i) => {
      if (k < 0) return;
      const f = setup.twoF[i]!;
      const entry = byF.get(f) ?? { sum: new Float64Array(pattern.total.length), weight: 0 };
      byF.set(f, entry);
      const part = pattern.perSublevel[i]!;
      for (let j = 0; j < part.length; j++) entry.sum[j] += part[j]!;
      entry.weight += pattern.sublevels[i]!.weight;
    });
    return { xs: pattern.positionsM, ys: pattern.total, byF };
  };

  // The offset, background and amplitude do not change the pattern, only how it is sampled and
  // scaled: the last pattern is kept with the other parameters it was computed at. The Jacobian
  // is asked for where the fitter has just evaluated the model, and a step that moves only
  // those three needs no new pattern.
  const offsetAt = names.indexOf('offset');
  const bgAt = names.indexOf('background');
  const offsetOf = (p: Float64Array): number => (offsetAt >= 0 ? p[offsetAt]! : startOffsetM);
  // Every parameter but the amplitude is named by now; these are the ones that shape the pattern.
  const shaping = names.map((_, j) => j).filter((j) => j !== offsetAt && j !== bgAt);
  const keyOf = (p: Float64Array): number[] => shaping.map((j) => p[j]!);
  let cachedAt: number[] | null = null;
  let cached: Shape | null = null;
  const shapeAt = (p: Float64Array): Shape | null => {
    const key = keyOf(p);
    if (cachedAt && cachedAt.every((v, j) => Object.is(v, key[j]))) return cached;
    cached = shape(p);
    cachedAt = key;
    return cached;
  };

  // The amplitude starts at its linear least-squares value for the starting shape.
  const n = positionsM.length;
  const first = shapeAt(Float64Array.from(start));
  let amplitude = 1;
  if (first) {
    const v = new Float64Array(n);
    sampleGrid(first.xs, first.ys, positionsM, offsetOf(Float64Array.from(start)), v);
    let num = 0;
    let den = 0;
    for (let i = 0; i < n; i++) {
      num += v[i]! * counts[i]!;
      den += v[i]! * v[i]!;
    }
    if (den > 0 && num > 0) amplitude = num / den;
  }
  push('amplitude', amplitude, 1e-30);
  const ampAt = names.length - 1;
  const m = names.length;
  /** The unit shape at the data positions, uncached (for difference columns). */
  const unitShape = (p: Float64Array, out: Float64Array): boolean => {
    const s = shape(p);
    if (!s) return false;
    sampleGrid(s.xs, s.ys, positionsM, offsetOf(p), out);
    return true;
  };
  const base = new Float64Array(n);
  const slope = new Float64Array(n);
  const part = new Float64Array(n);
  const plus = new Float64Array(n);
  const minus = new Float64Array(n);
  return {
    names,
    start,
    scale,
    patterns: () => patterns,
    model(p, out) {
      const s = shapeAt(p);
      if (!s) return false;
      sampleGrid(s.xs, s.ys, positionsM, offsetOf(p), out);
      const a = p[ampAt]!;
      const bg = bgAt >= 0 ? p[bgAt]! : 0;
      for (let i = 0; i < n; i++) out[i] = a * out[i]! + bg;
      return true;
    },
    // Exact columns where the model is linear or simple in the parameter: amplitude, background,
    // offset (minus the interpolant's slope) and populations (below); the rest, which move the
    // deflections, the speed law or the aperture, by central differences of the pattern.
    jacobian(p, out) {
      const s = shapeAt(p);
      if (!s) return false;
      sampleGrid(s.xs, s.ys, positionsM, offsetOf(p), base, slope);
      const a = p[ampAt]!;
      const q = Float64Array.from(p);
      for (let j = 0; j < m; j++) {
        if (j === ampAt || j === bgAt) {
          for (let i = 0; i < n; i++) out[i * m + j] = j === ampAt ? base[i]! : 1;
          continue;
        }
        if (j === offsetAt) {
          for (let i = 0; i < n; i++) out[i * m + j] = -a * slope[i]!;
          continue;
        }
        // Population π_F scales the populations of F by |π_F|/π⁰_F; with weights w normalised
        // over all sublevels, ∂P/∂π_F = (S_F − W_F·P)/π_F, S_F the contributions of F and W_F
        // their weight. At π_F = 0 that F has no contribution to read: differences then.
        const popF = p[j] !== 0 ? [...s.byF].find(([f]) => names.indexOf(fLabel(f)) === j) : undefined;
        if (popF) {
          const { sum, weight } = popF[1];
          sampleGrid(s.xs, sum, positionsM, offsetOf(p), part);
          for (let i = 0; i < n; i++) out[i * m + j] = (a * (part[i]! - weight * base[i]!)) / p[j]!;
          continue;
        }
        const h = PROFILE_RELATIVE_STEP * Math.max(Math.abs(p[j]!), scale[j]!);
        q[j] = p[j]! + h;
        const okPlus = unitShape(q, plus);
        q[j] = p[j]! - h;
        const okMinus = unitShape(q, minus);
        q[j] = p[j]!;
        if (!okPlus && !okMinus) return false;
        const hi = okPlus ? plus : base;
        const lo = okMinus ? minus : base;
        const width = (okPlus ? h : 0) + (okMinus ? h : 0);
        for (let i = 0; i < n; i++) out[i * m + j] = (a * (hi[i]! - lo[i]!)) / width;
      }
      return true;
    },
  };
}
