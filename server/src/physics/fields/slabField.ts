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

function cornerAtan(u: number, v: number, w: number, r: number): number {
  if (w === 0) return u * v === 0 ? 0 : (Math.sign(u * v) * Math.PI) / 2;
  return Math.atan((u * v) / (w * r));
}

/**
 * Adds (J_n/4π)-scaled H (T) and its gradient from the charged rectangle at x_k = plane, spanning
 * [lo_a, hi_a] × [lo_b, hi_b], with charge sign `sigma` (μ0σ in T).
 */
function addFace(out: { B: number[]; g: number[] }, point: Vec3, k: number, plane: number, lo: Vec3, hi: Vec3, sigma: number): void {
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
    hu += si * pairLog(vs[0], vs[1], pu, r[i][0], r[i][1]);
    const qv = pairQ(vs[0], vs[1], pu, r[i][0], r[i][1]);
    duDu += si * us[i] * qv;
    duDw += si * w * qv;
    // Pairs over u at fixed v_i: H_v and its v-, w-derivatives.
    const pv = vs[i] * vs[i] + w2;
    hv += si * pairLog(us[0], us[1], pv, r[0][i], r[1][i]);
    const qu = pairQ(us[0], us[1], pv, r[0][i], r[1][i]);
    dvDv += si * vs[i] * qu;
    dvDw += si * w * qu;
    for (let j = 0; j < 2; j++) {
      const sij = si * (j === 1 ? 1 : -1);
      hw += sij * cornerAtan(us[i], vs[j], w, r[i][j]);
      cross += sij / r[i][j];
    }
  }
  const c = sigma / (4 * Math.PI);
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

export function slabField(spec: SlabSpec, point: Vec3): FieldSample {
  const lo: Vec3 = [spec.centre[0] - spec.sizeM[0] / 2, spec.centre[1] - spec.sizeM[1] / 2, spec.centre[2] - spec.sizeM[2] / 2];
  const hi: Vec3 = [spec.centre[0] + spec.sizeM[0] / 2, spec.centre[1] + spec.sizeM[1] / 2, spec.centre[2] + spec.sizeM[2] / 2];
  const out = { B: [0, 0, 0], g: newAcc() as number[] };
  for (let k = 0; k < 3; k++) {
    const j = spec.magnetisationT[k];
    if (j === 0) continue;
    addFace(out, point, k, hi[k], lo, hi, j);
    addFace(out, point, k, lo[k], lo, hi, -j);
  }
  const inside = point[0] > lo[0] && point[0] < hi[0] && point[1] > lo[1] && point[1] < hi[1] && point[2] > lo[2] && point[2] < hi[2];
  if (inside) for (let k = 0; k < 3; k++) out.B[k] += spec.magnetisationT[k];
  return { B: [out.B[0], out.B[1], out.B[2]], gradient: accToMat(out.g as ReturnType<typeof newAcc>) };
}
