/**
 * Field-source benchmark (issue 16): B and the gradient tensor of a 10-loop assembly at one point
 * (invented: five coaxial pairs of radii 2–6 cm, tilted axis, point off the axis). Goal: under
 * 5 µs per point. Baseline measured in the same run: the point-dipole field and gradient of the
 * same ten loops (the cheapest field a loop can have), for the ratio.
 */
import { VACUUM_PERMEABILITY } from '../server/src/physics/constants';
import { sumField, type FieldSourceSpec, type Vec3 } from '../server/src/physics/fields';
import { bestMs } from './timing';

const AXIS: Vec3 = [0, 0.6, 0.8];
const LOOPS: FieldSourceSpec[] = Array.from({ length: 10 }, (_, i) => {
  const r = 0.02 + 0.01 * Math.floor(i / 2);
  const s = (i % 2 === 0 ? -1 : 1) * (0.5 * r);
  return { kind: 'loop', centre: [0, s * AXIS[1], s * AXIS[2]], axis: AXIS, radiusM: r, ampereTurns: 1000 * (i % 2 === 0 ? 1 : -1) };
});

function dipoleSum(p: Vec3): number {
  let acc = 0;
  for (const l of LOOPS) {
    if (l.kind !== 'loop') continue;
    const m = l.ampereTurns * Math.PI * l.radiusM * l.radiusM;
    const rx = p[0] - l.centre[0];
    const ry = p[1] - l.centre[1];
    const rz = p[2] - l.centre[2];
    const r2 = rx * rx + ry * ry + rz * rz;
    const r = Math.sqrt(r2);
    const mr = m * (l.axis[0] * rx + l.axis[1] * ry + l.axis[2] * rz);
    const k = VACUUM_PERMEABILITY / (4 * Math.PI * r2 * r);
    // B and the nine gradient entries, so that the baseline does comparable arithmetic.
    for (let i = 0; i < 3; i++) {
      const ri = i === 0 ? rx : i === 1 ? ry : rz;
      acc += k * ((3 * mr * ri) / r2 - m * l.axis[i]!);
      for (let j = 0; j < 3; j++) acc += (k / r2) * ri * (j === 0 ? rx : j === 1 ? ry : rz);
    }
  }
  return acc;
}

export function runFieldSourcesBench(): { name: string; lines: string[] } {
  const field = sumField(LOOPS);
  const N = 20_000;
  const points: Vec3[] = Array.from({ length: N }, (_, i) => [0.004 + 1e-7 * i, 0.003, 0.001 - 2e-8 * i]);
  let sink = 0;
  const exact = bestMs(() => {
    for (const p of points) sink += field(p).gradient[2][2];
  });
  const dipole = bestMs(() => {
    for (const p of points) sink += dipoleSum(p);
  });
  const perPointUs = (exact / N) * 1000;
  const basePerPointUs = (dipole / N) * 1000;
  return {
    name: 'field-sources',
    lines: [
      `10 loops, B + gradient at one point: ${perPointUs.toFixed(2)} µs (goal < 5 µs) ${perPointUs < 5 ? 'ok' : 'OVER'}`,
      `same ten loops as point dipoles: ${basePerPointUs.toFixed(3)} µs (exact is x${(perPointUs / basePerPointUs).toFixed(1)})`,
      `(checksum ${sink.toExponential(3)})`,
    ],
  };
}
