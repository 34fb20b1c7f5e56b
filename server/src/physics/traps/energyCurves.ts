/**
 * Each sublevel's exact energy as a function of the field magnitude, E(|B|), from one engine sweep
 * over the field range the trap reaches. Between sweep points the curve is the cubic Hermite
 * interpolant of the energies and their exact slopes (the moments), so E and dE/dB are smooth
 * and cheap enough to evaluate thousands of times while a minimum or a barrier is searched.
 * An atom in a static trap follows its own state adiabatically; states of different m cross
 * without coupling, which is what the engine's (block, rank) following gives.
 */
import { PLANCK_H } from '../constants';
import { solveLevel, sweepLevel, type EngineIssue, type LevelSpec, type LowFieldLabel } from '../engine';

/** Points of the sweep behind the curves; enough that the Hermite error is far below the depth's sampling. */
export const CURVE_POINTS = 201;

export interface EnergyCurve {
  low: LowFieldLabel;
  twoM: number;
  /** E/h at |B| (Hz); past the swept range it continues along the last slope. */
  energyHz(fieldT: number): number;
  /** d(E/h)/dB at |B| (Hz/T); positive for a low-field seeker. */
  slopeHzPerT(fieldT: number): number;
  /** The lowest field above `fromT` where dE/dB turns from positive to negative (a low-field seeker turns high-field seeking), or null within the swept range. */
  turningFieldT(fromT: number): number | null;
}

export interface EnergyCurves {
  curves: EnergyCurve[];
  /** The top of the swept range, T. */
  topT: number;
  issues: EngineIssue[];
}

/** Sweep `spec` from 0 to `topT` and wrap every state in its interpolant. */
export function energyCurves(spec: LevelSpec, topT: number): EnergyCurves {
  const top = topT > 0 && Number.isFinite(topT) ? topT : 1e-4;
  const sweep = sweepLevel(spec, 0, top, CURVE_POINTS, { crossings: false });
  const step = top / (CURVE_POINTS - 1);
  const curves = sweep.states.map((s): EnergyCurve => {
    const e = s.energyHz;
    // dE/dB in Hz/T from the Hellmann–Feynman moment μ = −∂E/∂B.
    const d = Float64Array.from(s.momentJT, (m) => -m / PLANCK_H);
    const last = CURVE_POINTS - 1;
    const locate = (b: number): [number, number] => {
      const x = Math.abs(b) / step;
      const i = Math.min(Math.floor(x), last - 1);
      return [i, x - i];
    };
    const energyHz = (b: number): number => {
      const f = Math.abs(b);
      if (f >= top) return e[last] + d[last] * (f - top);
      const [i, t] = locate(f);
      const t2 = t * t;
      const t3 = t2 * t;
      return (2 * t3 - 3 * t2 + 1) * e[i] + (t3 - 2 * t2 + t) * step * d[i] + (-2 * t3 + 3 * t2) * e[i + 1] + (t3 - t2) * step * d[i + 1];
    };
    const slopeHzPerT = (b: number): number => {
      const f = Math.abs(b);
      if (f >= top) return d[last];
      const [i, t] = locate(f);
      const t2 = t * t;
      return ((6 * t2 - 6 * t) * e[i] + (6 * t2 - 6 * t) * -e[i + 1]) / step + (3 * t2 - 4 * t + 1) * d[i] + (3 * t2 - 2 * t) * d[i + 1];
    };
    // The exact slope from one engine solve, for the last digits of a turning field.
    const exactSlope = (b: number): number => {
      const hit = solveLevel(spec, b).states.find((x) => x.twoM === s.twoM && x.low.text === s.low.text);
      return hit ? -hit.momentJT / PLANCK_H : slopeHzPerT(b);
    };
    const turnings = new Map<number, number>();
    const turningIn = (i: number): number => {
      const known = turnings.get(i);
      if (known !== undefined) return known;
      // The sweep's slopes at both ends are exact engine values, so the interval brackets the root: bisect on exact solves.
      let lo = i * step;
      let hi = (i + 1) * step;
      for (let k = 0; k < 44; k++) {
        const mid = 0.5 * (lo + hi);
        if (exactSlope(mid) > 0) lo = mid;
        else hi = mid;
      }
      const root = 0.5 * (lo + hi);
      turnings.set(i, root);
      return root;
    };
    const turningFieldT = (from: number): number | null => {
      const f = Math.abs(from);
      for (let i = Math.max(0, Math.floor(f / step)); i < last; i++) {
        if (d[i] > 0 && d[i + 1] <= 0) {
          const root = turningIn(i);
          if (root >= f) return root;
        }
      }
      return null;
    };
    return { low: s.low, twoM: s.twoM, energyHz, slopeHzPerT, turningFieldT };
  });
  return { curves, topT: top, issues: sweep.issues };
}

/** The curve of the state one step toward the untrapped end of the same low-field manifold (m → m − sign m), the RF knife's partner. */
export function rfPartner(curves: readonly EnergyCurve[], c: EnergyCurve): EnergyCurve | undefined {
  if (c.twoM === 0) return undefined;
  const twoM = c.twoM - 2 * Math.sign(c.twoM);
  return curves.find((o) => o.twoM === twoM && sameManifold(o.low, c.low));
}

function sameManifold(a: LowFieldLabel, b: LowFieldLabel): boolean {
  if (a.scheme === 'F' && b.scheme === 'F') return a.twoF === b.twoF && a.twoJ === b.twoJ;
  if (a.scheme === 'J' && b.scheme === 'J') return a.twoJ === b.twoJ && a.twoMI === b.twoMI;
  return false;
}
