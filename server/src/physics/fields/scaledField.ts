/** Every source's strength (currents, magnetisations) times s: the field and its gradient are linear in them. */
import type { FieldFunction, Mat3, Vec3 } from './types';

export function scaledField(field: FieldFunction, s: number): FieldFunction {
  if (s === 1) return field;
  return (p: Vec3) => {
    const { B, gradient: g } = field(p);
    const row = (r: Vec3): Vec3 => [s * r[0], s * r[1], s * r[2]];
    return { B: row(B), gradient: [row(g[0]), row(g[1]), row(g[2])] as Mat3 };
  };
}
