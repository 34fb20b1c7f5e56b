/**
 * Model of a measured detector profile: counts(x) = amplitude · P(x − offset) + background,
 * with P the exact beam engine's detector pattern (speed law ⊗ two-slit image ⊗ aperture,
 * sublevel moments from the Zeeman engine). Free: gradient, oven temperature, detector offset and
 * width, the magnet's field, populations of each F (relative to the first), background; the
 * amplitude is always free (counts have no absolute scale). Width, temperature and populations
 * enter by their absolute value; `sizeParameters` lists them so results are reported as sizes.
 */
import type { PatternInput } from '../beam';
// The pattern without peak refinement: a fit needs the density only, not off-grid peak positions.
import { computePattern } from '../beam/detectorPattern';
import { solveLevel, type HyperfineLevelSpec } from '../engine';

export type ProfileParameter = 'gradient' | 'temperature' | 'offset' | 'width' | 'field' | 'populations' | 'background';

export interface ProfileSetup {
  input: PatternInput;
  /** The level and magnet field, to recompute moments when the field is free. */
  spec: HyperfineLevelSpec;
  magnetFieldT: number;
  /** Twice F of each sublevel, same order as input.sublevels (for per-F populations). */
  twoF: number[];
}

/** Difference step for this model: the pattern is computed on a grid, so steps far below a bin only see its rounding. */
export const PROFILE_RELATIVE_STEP = 1e-4;

export interface ProfileModel {
  /** Names of the fitted parameters, in order (amplitude last but one, populations expanded). */
  names: string[];
  start: number[];
  scale: number[];
  model(p: Float64Array, out: Float64Array): boolean;
  /** ∂model/∂p (count × p): amplitude and background exactly (the model is linear in them), the rest by central differences. */
  jacobian(p: Float64Array, out: Float64Array): boolean;
}

/** Parameters that enter by their absolute value. */
export function isSizeParameter(name: string): boolean {
  return name === 'width' || name === 'temperature' || name.startsWith('population');
}

/** Bins of the pattern grid over the scanned span. */
const BINS = 1024;

function interpolate(xs: Float64Array, ys: Float64Array, x: number): number {
  const n = xs.length;
  if (n === 0 || x < xs[0]! || x > xs[n - 1]!) return 0;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (xs[mid]! <= x) lo = mid;
    else hi = mid;
  }
  const t = xs[hi]! === xs[lo]! ? 0 : (x - xs[lo]!) / (xs[hi]! - xs[lo]!);
  return ys[lo]! * (1 - t) + ys[hi]! * t;
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
    else if (name === 'populations') for (const f of fs.slice(1)) push(`population F=${f % 2 === 0 ? f / 2 : `${f}/2`}`, firstWeight.get(f) ?? 1, 1e-3);
  }
  // One grid for every evaluation (shifted by the starting offset only): a grid that moved with
  // the parameters would add its own steps to the model.
  const margin = 0.1 * (Math.max(...positionsM) - Math.min(...positionsM) || 1e-3);
  const grid = { startM: Math.min(...positionsM) - startOffsetM - margin, endM: Math.max(...positionsM) - startOffsetM + margin };
  const index = (n: string): number => names.indexOf(n);

  const shape = (p: Float64Array): { xs: Float64Array; ys: Float64Array; offset: number; background: number } | null => {
    const g = { ...geometry };
    if (index('gradient') >= 0) g.gradientTPerM = p[index('gradient')]!;
    // Width, temperature and populations enter by their size: a step through zero stays computable.
    if (index('width') >= 0) g.detectorWidthM = Math.abs(p[index('width')]!);
    const offset = index('offset') >= 0 ? p[index('offset')]! : startOffsetM;
    let src = source;
    if (index('temperature') >= 0) {
      if (source.kind !== 'effusive') return null;
      src = { kind: 'effusive', temperatureK: Math.abs(p[index('temperature')]!) };
    }
    let moments = setup.input.sublevels.map((s) => s.momentJT);
    if (index('field') >= 0) {
      const solved = solveLevel(setup.spec, p[index('field')]!);
      if (solved.states.length !== moments.length) return null;
      moments = solved.states.map((s) => s.momentJT);
    }
    const sublevels = setup.input.sublevels.map((s, i) => {
      const f = setup.twoF[i]!;
      const k = names.indexOf(`population F=${f % 2 === 0 ? f / 2 : `${f}/2`}`);
      const relative = k >= 0 ? Math.abs(p[k]!) / (firstWeight.get(f) || 1) : 1;
      return { label: s.label, momentJT: moments[i]!, population: s.population * relative };
    });
    const pattern = computePattern({
      ...setup.input,
      geometry: g,
      source: src,
      sublevels,
      bins: BINS,
      spanM: grid,
    }, undefined, false);
    if (pattern.issues.some((i) => i.severity === 'error') || pattern.total.length === 0) return null;
    return { xs: pattern.positionsM, ys: pattern.total, offset, background: index('background') >= 0 ? p[index('background')]! : 0 };
  };

  // The amplitude starts at its linear least-squares value for the starting shape.
  const first = shape(Float64Array.from(start));
  let amplitude = 1;
  if (first) {
    let num = 0;
    let den = 0;
    for (let i = 0; i < positionsM.length; i++) {
      const v = interpolate(first.xs, first.ys, positionsM[i]! - first.offset);
      num += v * counts[i]!;
      den += v * v;
    }
    if (den > 0 && num > 0) amplitude = num / den;
  }
  push('amplitude', amplitude, 1e-30);
  const ampAt = names.length - 1;
  const n = positionsM.length;
  const m = names.length;
  const unitShape = (p: Float64Array, out: Float64Array): boolean => {
    const s = shape(p);
    if (!s) return false;
    for (let i = 0; i < n; i++) out[i] = interpolate(s.xs, s.ys, positionsM[i]! - s.offset);
    return true;
  };
  const bgAt = names.indexOf('background');
  return {
    names,
    start,
    scale,
    model(p, out) {
      if (!unitShape(p, out)) return false;
      const a = p[ampAt]!;
      const bg = bgAt >= 0 ? p[bgAt]! : 0;
      for (let i = 0; i < n; i++) out[i] = a * out[i]! + bg;
      return true;
    },
    jacobian(p, out) {
      const base = new Float64Array(n);
      if (!unitShape(p, base)) return false;
      const a = p[ampAt]!;
      const plus = new Float64Array(n);
      const minus = new Float64Array(n);
      const q = Float64Array.from(p);
      for (let j = 0; j < m; j++) {
        if (j === ampAt || j === bgAt) {
          for (let i = 0; i < n; i++) out[i * m + j] = j === ampAt ? base[i]! : 1;
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
