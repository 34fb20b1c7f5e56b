/**
 * Supersonic-jet flux: f(v) ∝ v³ exp(−(v − u)²/α²) (stream speed u, width α; the
 * ratio S = u/α is the jet's "speed ratio"). Users give the flux-weighted mean
 * speed and the relative rms spread σ_v/⟨v⟩; we solve for S, then u and α.
 * The v³ factor (flux weighting and the jet's own v² phase-space factor) makes
 * the density vanish at v = 0, which keeps ⟨1/v²⟩ — the mean deflection — finite.
 *
 * Cumulative integrals are tabulated on a uniform grid in w = v/α (Gauss–Legendre
 * inside each panel) and read back by cubic Hermite interpolation using the exact
 * density as the slope, so the table error falls like h⁴.
 */
import { gaussLegendre } from './gaussLegendre';
import type { SpeedLaw } from './speedLaw';

/** The relative rms spread of the S → 0 limit (the effusive law): √(2 − 9π/16)/(3√π/4). */
export const EFFUSIVE_RELATIVE_SPREAD = Math.sqrt(2 - (9 * Math.PI) / 16) / ((3 * Math.sqrt(Math.PI)) / 4);

/** Half-width of the tabulated range in units of α (density there < e^{−100} of the peak). */
const RANGE_IN_ALPHA = 10;

function shape(w: number, s: number): number {
  const d = w - s;
  return w * w * w * Math.exp(-d * d);
}

interface ShapeMoments {
  norm: number;
  mean: number;
  rms: number;
  inverseSquare: number;
}

/** Moments of w³ exp(−(w − S)²) in units of α (GL quadrature, 64 panels × 8 nodes). */
export function jetShapeMoments(s: number): ShapeMoments {
  const lo = Math.max(0, s - RANGE_IN_ALPHA);
  const hi = s + RANGE_IN_ALPHA;
  const panels = 64;
  const { nodes, weights } = gaussLegendre(8);
  const h = (hi - lo) / panels;
  let z = 0;
  let m1 = 0;
  let inv2 = 0;
  const ws: number[] = [];
  const fs: number[] = [];
  for (let p = 0; p < panels; p++) {
    const mid = lo + (p + 0.5) * h;
    for (let q = 0; q < nodes.length; q++) {
      const w = mid + 0.5 * h * nodes[q];
      const f = shape(w, s) * 0.5 * h * weights[q];
      ws.push(w);
      fs.push(f);
      z += f;
      m1 += f * w;
      inv2 += f / (w * w);
    }
  }
  const mean = m1 / z;
  let c2 = 0;
  for (let i = 0; i < ws.length; i++) c2 += fs[i] * (ws[i] - mean) * (ws[i] - mean);
  return { norm: z, mean, rms: Math.sqrt(c2 / z), inverseSquare: inv2 / z };
}

/** Speed ratio S whose law has rms/mean = relativeSpread (0 < relativeSpread < EFFUSIVE_RELATIVE_SPREAD). */
export function speedRatioForSpread(relativeSpread: number): number {
  let lo = 0;
  let hi = Math.max(10, 2 / relativeSpread);
  for (let i = 0; i < 200 && hi - lo > 1e-14 * hi; i++) {
    const mid = 0.5 * (lo + hi);
    const m = jetShapeMoments(mid);
    if (m.rms / m.mean > relativeSpread) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

const memo = new Map<string, SpeedLaw>();

/**
 * Jet law from mean speed and relative rms spread. `panels` sets the cumulative
 * table (the "speed grid": panels + 1 points over u ± 10α;
 * the interpolation error of the slower fraction is about 2e-7 at 256 panels and
 * falls as panels⁻⁴).
 */
export function jetLaw(meanSpeed: number, relativeSpread: number, panels = 1024): SpeedLaw {
  const key = `${meanSpeed}|${relativeSpread}|${panels}`;
  const hit = memo.get(key);
  if (hit) return hit;
  const table = shapeTable(relativeSpread, panels);
  const alpha = meanSpeed / table.m.mean;
  const law = lawFromTable(table, alpha);
  if (memo.size > 32) memo.clear();
  memo.set(key, law);
  return law;
}

/** The law's shape in units of α: it depends on the spread alone, so jets of any speed share it. */
interface ShapeTable {
  s: number;
  m: ShapeMoments;
  lo: number;
  hi: number;
  h: number;
  panels: number;
  cum: Float64Array;
  cumInv: Float64Array;
  dens: Float64Array;
}

/** Shape tables by spread and panels: many sources (one per beam and species) share a few spreads. */
const tables = new Map<string, ShapeTable>();

function shapeTable(relativeSpread: number, panels: number): ShapeTable {
  const key = `${relativeSpread}|${panels}`;
  const hit = tables.get(key);
  if (hit) return hit;
  const s = speedRatioForSpread(relativeSpread);
  const table = tabulate(s, jetShapeMoments(s), panels);
  if (tables.size > 32) tables.clear();
  tables.set(key, table);
  return table;
}

function tabulate(s: number, m: ShapeMoments, panels: number): ShapeTable {
  const lo = Math.max(0, s - RANGE_IN_ALPHA);
  const hi = s + RANGE_IN_ALPHA;
  const h = (hi - lo) / panels;
  const { nodes, weights } = gaussLegendre(6);
  const cum = new Float64Array(panels + 1); // ∫ f dw, normalised
  const cumInv = new Float64Array(panels + 1); // ∫ f/w² dw, normalised (units of 1/α²)
  const dens = new Float64Array(panels + 1);
  for (let p = 0; p <= panels; p++) dens[p] = shape(lo + p * h, s) / m.norm;
  for (let p = 0; p < panels; p++) {
    const mid = lo + (p + 0.5) * h;
    let a = 0;
    let b = 0;
    for (let q = 0; q < nodes.length; q++) {
      const w = mid + 0.5 * h * nodes[q];
      const f = (shape(w, s) / m.norm) * 0.5 * h * weights[q];
      a += f;
      b += f / (w * w);
    }
    cum[p + 1] = cum[p] + a;
    cumInv[p + 1] = cumInv[p] + b;
  }
  return { s, m, lo, hi, h, panels, cum, cumInv, dens };
}

function lawFromTable(table: ShapeTable, alpha: number): SpeedLaw {
  const { s, m, lo, hi, h, panels, cum, cumInv, dens } = table;
  const total = cum[panels];
  const totalInv = cumInv[panels];
  // Cubic Hermite on panel k with exact slopes.
  const read = (table: Float64Array, slopeAt: (k: number) => number, w: number, top: number): number => {
    if (w <= lo) return 0;
    if (w >= hi) return top;
    const x = (w - lo) / h;
    const k = Math.min(panels - 1, Math.floor(x));
    const t = x - k;
    const t2 = t * t;
    const t3 = t2 * t;
    return (
      (2 * t3 - 3 * t2 + 1) * table[k] +
      (t3 - 2 * t2 + t) * h * slopeAt(k) +
      (-2 * t3 + 3 * t2) * table[k + 1] +
      (t3 - t2) * h * slopeAt(k + 1)
    );
  };
  const slopeCum = (k: number): number => dens[k];
  const slopeInv = (k: number): number => {
    const w = lo + k * h;
    return w === 0 ? 0 : dens[k] / (w * w);
  };
  const alpha2 = alpha * alpha;
  return {
    slowerFraction: (v) => read(cum, slopeCum, v / alpha, total) / total,
    inverseSquareBelow: (v) => read(cumInv, slopeInv, v / alpha, totalInv) / (total * alpha2),
    cumulativeBelow: (v, into) => {
      into[0] = read(cum, slopeCum, v / alpha, total) / total;
      into[1] = read(cumInv, slopeInv, v / alpha, totalInv) / (total * alpha2);
    },
    meanInverseSquare: totalInv / (total * alpha2),
    meanSpeed: m.mean * alpha,
    rmsSpread: m.rms * alpha,
    mostProbableSpeed: ((s + Math.sqrt(s * s + 6)) / 2) * alpha,
    fastestSpeed: hi * alpha,
  };
}
