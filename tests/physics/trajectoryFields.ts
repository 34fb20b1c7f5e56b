/**
 * Analytic fields for the trajectory tests, written here independently of the field-source code:
 * a field whose magnitude has a uniform gradient along z (the uniform-gradient magnet), and
 * long straight wires along x (textbook infinite-wire field μ0 I / 2πr and its derivatives).
 */
import type { FieldFunction, Mat3, Vec3 } from '../../server/src/physics/fields/types';

const MU0 = 1.25663706127e-6; // CODATA 2022 vacuum permeability

/** B = (0, 0, B0 + G z): |B| rises uniformly along z (only meaningful for B0 + G z > 0). */
export function uniformGradientField(b0: number, g: number): FieldFunction {
  const gradient: Mat3 = [
    [0, 0, 0],
    [0, 0, 0],
    [0, 0, g],
  ];
  return (p: Vec3) => ({ B: [0, 0, b0 + g * p[2]], gradient });
}

/** Infinite wires along +x through (y0, z0) with currents in A. */
export function infiniteWires(wires: readonly { y: number; z: number; current: number }[]): FieldFunction {
  return (p: Vec3) => {
    let by = 0, bz = 0, gyy = 0, gyz = 0, gzy = 0, gzz = 0;
    for (const w of wires) {
      const k = (MU0 * w.current) / (2 * Math.PI);
      const ry = p[1] - w.y;
      const rz = p[2] - w.z;
      const r2 = ry * ry + rz * rz;
      const r4 = r2 * r2;
      by += (-k * rz) / r2;
      bz += (k * ry) / r2;
      gyy += (2 * k * ry * rz) / r4;
      gyz += (-k * (ry * ry - rz * rz)) / r4;
      gzy += (k * (rz * rz - ry * ry)) / r4;
      gzz += (-2 * k * ry * rz) / r4;
    }
    return {
      B: [0, by, bz],
      gradient: [
        [0, 0, 0],
        [0, gyy, gyz],
        [0, gzy, gzz],
      ],
    };
  };
}

/** Finite straight segments from x = −half to +half (Biot–Savart closed form); gradient by 4th-order central differences. */
export function finiteWires(wires: readonly { y: number; z: number; current: number }[], half: number): FieldFunction {
  const bAt = (p: Vec3): Vec3 => {
    const out = [0, 0, 0];
    for (const w of wires) {
      const along = p[0] + half; // distance from the start along +x
      const ry = p[1] - w.y;
      const rz = p[2] - w.z;
      const rho2 = ry * ry + rz * rz;
      const c1 = along / Math.sqrt(along * along + rho2);
      const c2 = (along - 2 * half) / Math.sqrt((along - 2 * half) ** 2 + rho2);
      const mag = ((MU0 * w.current) / (4 * Math.PI * rho2)) * (c1 - c2);
      out[1] += -mag * rz;
      out[2] += mag * ry;
    }
    return out as unknown as Vec3;
  };
  return (p: Vec3) => {
    const B = bAt(p);
    const cols: number[][] = [];
    const h = 1e-6;
    for (let j = 0; j < 3; j++) {
      const at = (d: number): Vec3 => {
        const q = [p[0], p[1], p[2]];
        q[j] += d;
        return bAt(q as unknown as Vec3);
      };
      const a = at(2 * h), b = at(h), c = at(-h), d = at(-2 * h);
      cols.push([0, 1, 2].map((i) => (-a[i] + 8 * b[i] - 8 * c[i] + d[i]) / (12 * h)));
    }
    const gradient = [0, 1, 2].map((i) => [cols[0][i], cols[1][i], cols[2][i]]) as unknown as Mat3;
    return { B, gradient };
  };
}
