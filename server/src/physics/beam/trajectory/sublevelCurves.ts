/**
 * Every sublevel's energy E(|B|) and moment μ(|B|) = −∂E/∂B over a range of field magnitudes,
 * from one exact sweep of the engine and quintic Hermite interpolation between its points (E,
 * ∂E/∂B and ∂²E/∂B² at both ends of each interval). The moment is the derivative of the
 * interpolated energy, so a trajectory conserves kinetic + interpolated potential energy to the
 * integrator's accuracy. States are followed by (m block, rank) through the sweep, which is
 * exact because levels of one block never cross: this is adiabatic following of the sublevel.
 */
import { BOHR_MAGNETON_HZ_PER_T, PLANCK_H } from '../../constants';
import { sweepLevel, type LevelSpec } from '../../engine';
import { beamIssue, type BeamIssue } from '../types';

export interface SublevelCurveLabel {
  /** Low-field label text, as the engine writes it (`F=2, m_F=+1`). */
  low: string;
  high: string;
  twoM: number;
}

export interface SublevelCurves {
  labels: SublevelCurveLabel[];
  /** Largest |B| covered, T. */
  maxFieldT: number;
  /** Node spacing of the table, T. */
  stepT: number;
  /** Energy E/h (Hz) into out[0] and moment μ (J/T) into out[1] of state i at |B| = b (0 ≤ b ≤ maxFieldT). */
  at(i: number, b: number, out: Float64Array): void;
  /** Smallest energy gap from state i to a state whose m differs by one, Hz (Infinity when there is none). */
  neighbourGapHz(i: number, b: number): number;
  /** Largest |μ_interpolated − μ_exact| found at the interval midpoints, J/T (the table's own check). */
  interpolationErrorJT: number;
}

export interface CurveOptions {
  /** Nodes per field scale of the level's zero-field structure (default 64: μ good to ~1e-9 μ_B, see docs/beam.md). */
  nodesPerScale?: number;
  /** Fewest intervals over the range (default 64). */
  minIntervals?: number;
  /** Most intervals (default 16384). */
  maxIntervals?: number;
}

/** Nodes per field scale: quintic Hermite error in μ scales as (h/B_scale)⁵, (1/64)⁵ ≈ 1e-9. */
export const NODES_PER_SCALE = 64;

/** Undefined (with issues) when the engine cannot sweep the level. */
export function sublevelCurves(spec: LevelSpec, maxFieldT: number, options: CurveOptions = {}): { curves?: SublevelCurves; issues: BeamIssue[] } {
  const issues: BeamIssue[] = [];
  if (!(maxFieldT > 0) || !Number.isFinite(maxFieldT)) {
    issues.push(beamIssue('error', 'trajectory-field-range-invalid', `The field range of a trajectory must be a positive number of tesla (got ${maxFieldT}).`));
    return { issues };
  }
  // The zero-field structure sets the field scale over which E(B) bends (hyperfine or fine).
  const zero = sweepLevel(spec, 0, maxFieldT, 2, { crossings: false });
  if (zero.states.length === 0) {
    for (const i of zero.issues) issues.push(beamIssue('error', 'trajectory-level-unusable', i.message));
    return { issues };
  }
  let lo = Infinity;
  let hi = -Infinity;
  for (const s of zero.states) {
    lo = Math.min(lo, s.energyHz[0]);
    hi = Math.max(hi, s.energyHz[0]);
  }
  const scaleT = (hi - lo) / BOHR_MAGNETON_HZ_PER_T;
  const perScale = options.nodesPerScale ?? NODES_PER_SCALE;
  const wanted = scaleT > 0 ? Math.ceil((maxFieldT / scaleT) * perScale) : 0;
  const intervals = Math.min(options.maxIntervals ?? 16384, Math.max(options.minIntervals ?? 64, wanted));
  const sweep = sweepLevel(spec, 0, maxFieldT, intervals + 1, { crossings: false, curvature: true });
  if (sweep.states.length === 0 || sweep.states.some((s) => !s.d2EdB2)) {
    for (const i of sweep.issues) issues.push(beamIssue('error', 'trajectory-level-unusable', i.message));
    return { issues };
  }
  const n = intervals + 1;
  const h = maxFieldT / intervals;
  // Per state: E (Hz), h·∂E/∂B, h²·∂²E/∂B² at each node, interleaved for locality.
  const tables = sweep.states.map((s) => {
    const t = new Float64Array(3 * n);
    for (let p = 0; p < n; p++) {
      t[3 * p] = s.energyHz[p];
      t[3 * p + 1] = (-s.momentJT[p] / PLANCK_H) * h;
      t[3 * p + 2] = s.d2EdB2![p] * h * h;
    }
    return t;
  });
  const labels = sweep.states.map((s) => ({ low: s.low.text, high: s.high.text, twoM: s.twoM }));
  const at = (i: number, b: number, out: Float64Array): void => hermiteAt(tables[i]!, h, intervals, b, out);
  const scratch = new Float64Array(2);
  const neighbours = labels.map((l) => labels.map((o, j) => (Math.abs(o.twoM - l.twoM) === 2 ? j : -1)).filter((j) => j >= 0));
  const neighbourGapHz = (i: number, b: number): number => {
    at(i, b, scratch);
    const e = scratch[0];
    let gap = Infinity;
    for (const j of neighbours[i]!) {
      at(j, b, scratch);
      gap = Math.min(gap, Math.abs(scratch[0] - e));
    }
    return gap;
  };
  const curves: SublevelCurves = { labels, maxFieldT, stepT: h, at, neighbourGapHz, interpolationErrorJT: 0 };
  curves.interpolationErrorJT = midpointError(spec, curves, intervals);
  for (const i of sweep.issues) if (i.severity !== 'info') issues.push(beamIssue('warning', 'trajectory-level-note', i.message));
  return { curves, issues };
}

/** Quintic Hermite on the interval holding b; t ∈ [0, 1]. */
function hermiteAt(t: Float64Array, h: number, intervals: number, b: number, out: Float64Array): void {
  let k = Math.floor(b / h);
  if (k >= intervals) k = intervals - 1;
  if (k < 0) k = 0;
  const u = b / h - k;
  const o = 3 * k;
  const e0 = t[o];
  const d0 = t[o + 1];
  const c0 = t[o + 2];
  const e1 = t[o + 3];
  const d1 = t[o + 4];
  const c1 = t[o + 5];
  const u2 = u * u;
  const u3 = u2 * u;
  const u4 = u3 * u;
  const u5 = u4 * u;
  const g0 = 10 * u3 - 15 * u4 + 6 * u5;
  out[0] =
    e0 * (1 - g0) +
    d0 * (u - 6 * u3 + 8 * u4 - 3 * u5) +
    c0 * 0.5 * (u2 - 3 * u3 + 3 * u4 - u5) +
    e1 * g0 +
    d1 * (-4 * u3 + 7 * u4 - 3 * u5) +
    c1 * 0.5 * (u3 - 2 * u4 + u5);
  const dg0 = 30 * u2 - 60 * u3 + 30 * u4;
  const slope =
    (e1 - e0) * dg0 +
    d0 * (1 - 18 * u2 + 32 * u3 - 15 * u4) +
    c0 * 0.5 * (2 * u - 9 * u2 + 12 * u3 - 5 * u4) +
    d1 * (-12 * u2 + 28 * u3 - 15 * u4) +
    c1 * 0.5 * (3 * u2 - 8 * u3 + 5 * u4);
  out[1] = (-slope / h) * PLANCK_H;
}

/** Exact moments at every interval midpoint (one sweep through them) against the table. */
function midpointError(spec: LevelSpec, curves: SublevelCurves, intervals: number): number {
  const h = curves.stepT;
  const exact = sweepLevel(spec, 0.5 * h, curves.maxFieldT - 0.5 * h, intervals, { crossings: false });
  const out = new Float64Array(2);
  let worst = 0;
  exact.states.forEach((s) => {
    const i = curves.labels.findIndex((l) => l.low === s.low.text);
    if (i < 0) return;
    for (let p = 0; p < exact.fieldsT.length; p++) {
      curves.at(i, exact.fieldsT[p]!, out);
      worst = Math.max(worst, Math.abs(out[1] - s.momentJT[p]!));
    }
  });
  return worst;
}
