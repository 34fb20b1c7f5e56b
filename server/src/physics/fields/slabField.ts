/**
 * Field and gradient of a uniformly magnetised rectangular block (edges along x, y, z), from its
 * surface magnetic charge σ = M·n̂ on the faces: each face is a uniformly charged rectangle whose
 * H field has the closed form (integrate (x − x')/|x − x'|³ over the rectangle; see e.g.
 * E. P. Furlani, Permanent Magnet and Electromechanical Devices, Academic Press 2001, §4.3,
 * from memory; checked here against SciPy quadrature of the same surface integral):
 *   H_u = (σ/4π) [[ln(v + R)]],  H_v = (σ/4π) [[ln(u + R)]],  H_w = −(σ/4π) [[atan(uv/(wR))]],
 * u, v, w the offsets from the point to the corners (w to the face plane), R = √(u² + v² + w²),
 * [[f]] = f(u₂,v₂) − f(u₁,v₂) − f(u₂,v₁) + f(u₁,v₁). B = μ0 H outside, μ0 (H + M) inside.
 *
 * Rounding care: ln(v + R) cancels when v < 0 and |v| ≫ √(u² + w²), so each pair of corners that
 * share u is taken together, using ln(v + R) = ln(u² + w²) − ln(R − v); with both v ≤ 0 the ln(u² + w²)
 * drop out, which keeps points on the lines that continue an edge exact. Derivatives likewise
 * (q = 1/(R(v + R)) obeys q(v) + q(−v) = 2/(u² + w²)). The third column of the gradient follows from
 * the first two: H is curl- and divergence-free off the charged faces.
 * The caller keeps the point off the block's surface (the field jumps there; at edges it diverges).
 *
 * Round-off (slabFieldWithRoundOff): far from the block the terms cancel to a dipole field many
 * orders below each of them, so how much of a small result is rounding depends on the point. The
 * sums below also add up the squares of the sizes of the terms they combine: each term is rounded
 * by a few ε of its size (a log of a ratio by ε absolute, from the ratio's own rounding), and
 * independent roundings add like a random walk, so the root of that sum times a few ε is their
 * size. The offsets to the corners are themselves rounded by ε of the coordinates, which moves
 * the result by its derivative.
 */
import type { FieldSample, SlabSpec, Vec3 } from './types';
import { accToMat, newAcc } from './vec3';

/** ln(v₂ + R₂) − ln(v₁ + R₁) for v₁ < v₂ at a shared p = u² + w². */
function pairLog(v1: number, v2: number, p: number, r1: number, r2: number): number {
  if (v1 >= 0) return Math.log((v2 + r2) / (v1 + r1));
  if (v2 <= 0) return Math.log((r1 - v1) / (r2 - v2));
  return Math.log(((v2 + r2) * (r1 - v1)) / p);
}

/** q(v₂) − q(v₁), q(v) = 1/(R(v + R)). */
function pairQ(v1: number, v2: number, p: number, r1: number, r2: number): number {
  if (v1 >= 0) return 1 / (r2 * (v2 + r2)) - 1 / (r1 * (v1 + r1));
  if (v2 <= 0) return 1 / (r1 * (r1 - v1)) - 1 / (r2 * (r2 - v2));
  return 1 / (r2 * (v2 + r2)) + 1 / (r1 * (r1 - v1)) - 2 / p;
}

/** The size of the terms pairQ combines, each of which carries its own rounding. */
function pairQSize(v1: number, v2: number, p: number, r1: number, r2: number): number {
  // Every branch of pairQ takes 1/(R(R + |v|)) at both corners; the one across v = 0 adds 2/p.
  const outer = 1 / (r2 * (r2 + Math.abs(v2))) + 1 / (r1 * (r1 + Math.abs(v1)));
  return v1 < 0 && v2 > 0 ? outer + 2 / p : outer;
}

/** The size of the next derivative's terms over one pair of corners (for the rounding of the offsets). */
function pairCurvature(v1: number, v2: number, p: number, r1: number, r2: number): number {
  return 1 / (r1 * r1) + 1 / (r2 * r2) + (v1 < 0 && v2 > 0 ? 2 / p : 0);
}

const sq = (x: number): number => x * x;

function cornerAtan(u: number, v: number, w: number, r: number): number {
  if (w === 0) return u * v === 0 ? 0 : (Math.sign(u * v) * Math.PI) / 2;
  return Math.atan((u * v) / (w * r));
}

/**
 * Adds (J_n/4π)-scaled H (T) and its gradient from the charged rectangle at x_k = plane, spanning
 * [lo_a, hi_a] × [lo_b, hi_b], with charge sign `sigma` (μ0σ in T).
 */
function addFace(out: SlabSums, point: Vec3, k: number, plane: number, lo: Vec3, hi: Vec3, sigma: number): void {
  const a = (k + 1) % 3;
  const b = (k + 2) % 3;
  const w = plane - point[k];
  const us = [lo[a] - point[a], hi[a] - point[a]];
  const vs = [lo[b] - point[b], hi[b] - point[b]];
  const w2 = w * w;
  let hu = 0;
  let hv = 0;
  let hw = 0;
  let duDu = 0;
  let duDw = 0;
  let dvDv = 0;
  let dvDw = 0;
  let cross = 0;
  // Squared sizes of the terms combined (field, gradient, the gradient's own derivative), in units of c.
  let bSq = 0;
  let gSq = 0;
  let hSq = 0;
  const r = [
    [0, 0],
    [0, 0],
  ];
  for (let i = 0; i < 2; i++) {
    for (let j = 0; j < 2; j++) r[i][j] = Math.sqrt(us[i] * us[i] + vs[j] * vs[j] + w2);
  }
  for (let i = 0; i < 2; i++) {
    const si = i === 1 ? 1 : -1;
    // Pairs over v at fixed u_i: H_u and its u-, w-derivatives.
    const pu = us[i] * us[i] + w2;
    const lu = pairLog(vs[0], vs[1], pu, r[i][0], r[i][1]);
    hu += si * lu;
    const qv = pairQ(vs[0], vs[1], pu, r[i][0], r[i][1]);
    duDu += si * us[i] * qv;
    duDw += si * w * qv;
    bSq += sq(1 + Math.abs(lu));
    gSq += sq((Math.abs(us[i]) + Math.abs(w)) * pairQSize(vs[0], vs[1], pu, r[i][0], r[i][1]));
    hSq += sq(pairCurvature(vs[0], vs[1], pu, r[i][0], r[i][1]));
    // Pairs over u at fixed v_i: H_v and its v-, w-derivatives.
    const pv = vs[i] * vs[i] + w2;
    const lv = pairLog(us[0], us[1], pv, r[0][i], r[1][i]);
    hv += si * lv;
    const qu = pairQ(us[0], us[1], pv, r[0][i], r[1][i]);
    dvDv += si * vs[i] * qu;
    dvDw += si * w * qu;
    bSq += sq(1 + Math.abs(lv));
    gSq += sq((Math.abs(vs[i]) + Math.abs(w)) * pairQSize(us[0], us[1], pv, r[0][i], r[1][i]));
    hSq += sq(pairCurvature(us[0], us[1], pv, r[0][i], r[1][i]));
    for (let j = 0; j < 2; j++) {
      const sij = si * (j === 1 ? 1 : -1);
      const t = cornerAtan(us[i], vs[j], w, r[i][j]);
      hw += sij * t;
      cross += sij / r[i][j];
      bSq += sq(1 + Math.abs(t));
      gSq += 1 / (r[i][j] * r[i][j]);
    }
  }
  const c = sigma / (4 * Math.PI);
  out.bSq += c * c * bSq;
  out.gSq += c * c * gSq;
  out.hSq += c * c * hSq;
  out.B[a] += c * hu;
  out.B[b] += c * hv;
  out.B[k] -= c * hw;
  // ∂/∂x = −∂/∂(offset): each derivative of [[·]] with respect to the point changes sign.
  const gaa = -c * duDu;
  const gbb = -c * dvDv;
  const gab = -c * cross;
  const gak = -c * duDw;
  const gbk = -c * dvDw;
  const g = out.g;
  g[3 * a + a] += gaa;
  g[3 * b + b] += gbb;
  g[3 * k + k] -= gaa + gbb;
  g[3 * a + b] += gab;
  g[3 * b + a] += gab;
  g[3 * a + k] += gak;
  g[3 * k + a] += gak;
  g[3 * b + k] += gbk;
  g[3 * k + b] += gbk;
}

/** The running sums of the faces, with the squared sizes of the terms that went into them (T², (T/m)², (T/m²)²). */
interface SlabSums {
  B: number[];
  g: number[];
  bSq: number;
  gSq: number;
  hSq: number;
  lo: Vec3;
  hi: Vec3;
  inside: boolean;
}

/** A block's field with the rounding its closed form leaves at the point. */
export interface SlabFieldWithRoundOff {
  sample: FieldSample;
  /** The size of the rounding left in any component of B (T) and of the gradient (T/m) at the point (a few ε, random-walk sum). */
  roundOff: { B: number; gradient: number };
}

/**
 * A few ε: each term passes a square root, a ratio and a log or an atan, then products and sums,
 * each rounding by ε/2 of its result. Measured against 50-digit values (tests/eval/cleanFieldFloor.test.ts),
 * this is 13 to 10⁵ times the actual error of a thin film's field and gradient from 1 mm to 10 m.
 */
const TERM_ROUNDING = 4 * Number.EPSILON;

/**
 * The faces summed, with the sizes of their terms. The plain field adds them up too: about a fifth
 * more work, where a flag to skip it made V8 run the sized evaluation at 2.5–3.0 times the plain
 * one in processes that asked for both (docs/fields.md, the speed of the field map).
 */
function sumFaces(spec: SlabSpec, point: Vec3): SlabSums {
  const lo: Vec3 = [spec.centre[0] - spec.sizeM[0] / 2, spec.centre[1] - spec.sizeM[1] / 2, spec.centre[2] - spec.sizeM[2] / 2];
  const hi: Vec3 = [spec.centre[0] + spec.sizeM[0] / 2, spec.centre[1] + spec.sizeM[1] / 2, spec.centre[2] + spec.sizeM[2] / 2];
  const out: SlabSums = { B: [0, 0, 0], g: newAcc() as number[], bSq: 0, gSq: 0, hSq: 0, lo, hi, inside: false };
  for (let k = 0; k < 3; k++) {
    const j = spec.magnetisationT[k];
    if (j === 0) continue;
    addFace(out, point, k, hi[k], lo, hi, j);
    addFace(out, point, k, lo[k], lo, hi, -j);
  }
  const inside = point[0] > lo[0] && point[0] < hi[0] && point[1] > lo[1] && point[1] < hi[1] && point[2] > lo[2] && point[2] < hi[2];
  if (inside) for (let k = 0; k < 3; k++) out.B[k] += spec.magnetisationT[k];
  out.inside = inside;
  return out;
}

export function slabField(spec: SlabSpec, point: Vec3): FieldSample {
  const out = sumFaces(spec, point);
  return { B: [out.B[0], out.B[1], out.B[2]], gradient: accToMat(out.g as ReturnType<typeof newAcc>) };
}

export function slabFieldWithRoundOff(spec: SlabSpec, point: Vec3): SlabFieldWithRoundOff {
  const out = sumFaces(spec, point);
  // The offsets point → corner are rounded by ε of the larger coordinate they come from.
  let reach = 0;
  for (let k = 0; k < 3; k++) reach = Math.max(reach, Math.abs(point[k]), Math.abs(out.lo[k]), Math.abs(out.hi[k]));
  const shift = 2 * Number.EPSILON * reach;
  const inner = out.inside ? Math.hypot(...spec.magnetisationT) : 0;
  const bSize = Math.sqrt(out.bSq + inner * inner);
  const gSize = Math.sqrt(out.gSq);
  return {
    sample: { B: [out.B[0], out.B[1], out.B[2]], gradient: accToMat(out.g as ReturnType<typeof newAcc>) },
    roundOff: {
      B: TERM_ROUNDING * bSize + shift * gSize,
      gradient: TERM_ROUNDING * gSize + shift * Math.sqrt(out.hSq),
    },
  };
}
