/**
 * A synthesized spectrum: every component's weight times one Voigt shape, summed on an evenly
 * spaced grid of frequencies. All components of a line share the upper level's lifetime and the
 * atoms' speed spread, so they share one shape, and that makes it fast:
 *  - within 40 (σ√2) of each component ln K is tabulated once, exactly, at
 *    a step τ ≤ 1/128 that is a whole multiple or a whole fraction of the grid step, so along
 *    one component the interpolation weights repeat and are computed once per component;
 *  - elsewhere every sample is exact (the continued fraction, a pure Gaussian or Lorentzian).
 * Measured against the exact profile: within 5e-10 relative (tests/physics/lineshape.test.ts).
 */
import { FaddeevaReal } from './faddeevaReal';

export interface WeightedComponent {
  /** Frequency on the grid's axis (e.g. offset from the line centre), Hz. */
  frequencyHz: number;
  /** Observed weight (strength × angular factor). */
  weight: number;
}

export interface UniformGrid {
  fromHz: number;
  stepHz: number;
  points: number;
}

/** Beyond this the continued fraction needs at most 6 steps and is as cheap as the table. */
const X_TABLE = 40;
const MAX_TABLE_STEP = 1 / 128;
/** The table stops here; finer grids than this many table steps per grid step use exact values. */
const MAX_PERIOD = 4096;

export function gridFrequencies(grid: UniformGrid): Float64Array {
  const f = new Float64Array(grid.points);
  for (let i = 0; i < grid.points; i++) f[i] = grid.fromHz + i * grid.stepHz;
  return f;
}

/** Σ weight · V(ν − ν_k) at each grid frequency, Hz⁻¹ per unit weight (area = Σ weight). */
export function synthesizeSpectrum(components: readonly WeightedComponent[], sigmaHz: number, gammaHz: number, grid: UniformGrid): Float64Array {
  const out = new Float64Array(grid.points);
  const live = components.filter((c) => c.weight !== 0);
  if (live.length === 0 || grid.points === 0) return out;
  if (sigmaHz === 0) {
    for (const c of live) {
      const a = (c.weight * gammaHz) / Math.PI;
      for (let i = 0; i < out.length; i++) {
        const d = grid.fromHz + i * grid.stepHz - c.frequencyHz;
        out[i] = out[i]! + a / (d * d + gammaHz * gammaHz);
      }
    }
    return out;
  }
  const scale = 1 / (sigmaHz * Math.SQRT2);
  const norm = 1 / (sigmaHz * Math.sqrt(2 * Math.PI));
  const y = gammaHz * scale;
  const exact = new FaddeevaReal(y);
  const h = grid.stepHz * scale;
  const table = y > 0 && h > 0 ? logTable(exact, h) : undefined;
  for (const c of live) {
    const x0 = (grid.fromHz - c.frequencyHz) * scale;
    const w = c.weight * norm;
    let iLo = grid.points;
    let iHi = -1;
    if (table) {
      iLo = Math.max(0, Math.ceil((-X_TABLE - x0) / h));
      iHi = Math.min(grid.points - 1, Math.floor((X_TABLE - x0) / h));
      if (iHi >= iLo) addFromTable(out, table, x0, h, iLo, iHi, w);
      else iLo = out.length;
    }
    for (let i = 0; i < out.length; i++) {
      if (i === iLo) {
        i = iHi;
        continue;
      }
      out[i] = out[i]! + w * exact.at(x0 + i * h);
    }
  }
  return out;
}

interface LogTable {
  /** ln K at x = (m − centre)·tau. */
  values: Float64Array;
  centre: number;
  tau: number;
  /** Grid steps per repeat of the interpolation weights, and table steps per repeat. */
  period: number;
  advance: number;
}

function logTable(exact: FaddeevaReal, h: number): LogTable | undefined {
  let tau: number;
  let period: number;
  let advance: number;
  if (h >= MAX_TABLE_STEP) {
    const m = Math.ceil(h / MAX_TABLE_STEP);
    tau = h / m;
    period = 1;
    advance = m;
  } else {
    period = Math.floor(MAX_TABLE_STEP / h);
    if (period > MAX_PERIOD) return undefined;
    tau = h * period;
    advance = 1;
  }
  const half = Math.ceil(X_TABLE / tau) + 4;
  const values = new Float64Array(2 * half + 1);
  for (let m = 0; m <= half; m++) {
    const v = Math.log(exact.at(m * tau));
    values[half + m] = v;
    values[half - m] = v;
  }
  return { values, centre: half, tau, period, advance };
}

function addFromTable(out: Float64Array, t: LogTable, x0: number, h: number, iLo: number, iHi: number, w: number): void {
  const v = t.values;
  for (let r = 0; r < t.period && iLo + r <= iHi; r++) {
    // Every t.period-th sample from iLo + r shares one fractional position between table nodes.
    const u = (x0 + (iLo + r) * h) / t.tau + t.centre;
    let j = Math.floor(u);
    const s = u - j;
    const a = s + 2, b = s + 1, d = s - 1, e = s - 2, f = s - 3;
    const cd = s * d, ef = e * f, ab = a * b;
    const w0 = -(b * cd * ef) / 120, w1 = (a * cd * ef) / 24, w2 = -(ab * d * ef) / 12;
    const w3 = (ab * s * ef) / 12, w4 = -(ab * cd * f) / 24, w5 = (ab * cd * e) / 120;
    for (let i = iLo + r; i <= iHi; i += t.period, j += t.advance) {
      out[i] = out[i]! + w * Math.exp(w0 * v[j - 2]! + w1 * v[j - 1]! + w2 * v[j]! + w3 * v[j + 1]! + w4 * v[j + 2]! + w5 * v[j + 3]!);
    }
  }
}
