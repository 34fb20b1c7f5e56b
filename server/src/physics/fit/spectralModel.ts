/**
 * Model of measured RF/microwave resonances and level intervals within one hyperfine level:
 * each point is |E_upper − E_lower|/h of two named sublevels at its field, from the exact
 * engine (no linear or closed formula), with any of field, g_J, A and B free.
 */
import { solveLevel, type HyperfineLevelSpec } from '../engine';
import { lowKey, refKey } from '../transitions/sublevelTag';
import type { SublevelRef } from '../transitions';

export type SpectralParameter = 'field' | 'g_J' | 'A' | 'B';

export interface SpectralPoint {
  lower: SublevelRef;
  upper: SublevelRef;
  /** The field the point was taken at; absent: the fit's free `field`. */
  fieldT?: number;
}

export interface SpectralModel {
  start: number[];
  scale: number[];
  model(p: Float64Array, out: Float64Array): boolean;
}

/** Start values come from the spec (and `fieldStartT` for the field). */
export function spectralModel(spec: HyperfineLevelSpec, points: readonly SpectralPoint[], free: readonly SpectralParameter[], fieldStartT: number): SpectralModel {
  const keys = points.map((q) => [refKey(q.lower), refKey(q.upper)] as const);
  const startOf = (name: SpectralParameter): number =>
    name === 'field' ? fieldStartT : name === 'g_J' ? spec.gJ : name === 'A' ? spec.A : spec.B ?? 0;
  const start = free.map(startOf);
  // Difference steps: a field of 0 still needs a step of a sensible size (1 µT), B of 0 one of 1 kHz.
  const scale = free.map((name, j) => Math.max(Math.abs(start[j]!), name === 'field' ? 1e-6 : name === 'B' ? 1e3 : name === 'A' ? 1e3 : 1e-3));
  const fieldsUsed = (p: Float64Array): number => (free.includes('field') ? p[free.indexOf('field')]! : fieldStartT);
  return {
    start,
    scale,
    model(p, out) {
      const s: HyperfineLevelSpec = { ...spec };
      free.forEach((name, j) => {
        if (name === 'g_J') s.gJ = p[j]!;
        else if (name === 'A') s.A = p[j]!;
        else if (name === 'B') s.B = p[j]!;
      });
      const freeField = fieldsUsed(p);
      const cache = new Map<number, Map<string, number>>();
      for (let i = 0; i < points.length; i++) {
        const fieldT = points[i]!.fieldT ?? freeField;
        let energies = cache.get(fieldT);
        if (!energies) {
          const solved = solveLevel(s, fieldT);
          if (solved.states.length === 0) return false;
          energies = new Map(solved.states.map((st) => [lowKey(st.low), st.energyHz]));
          cache.set(fieldT, energies);
        }
        const [lk, uk] = keys[i]!;
        const lower = lk ? energies.get(lk) : undefined;
        const upper = uk ? energies.get(uk) : undefined;
        if (lower === undefined || upper === undefined) return false;
        out[i] = Math.abs(upper - lower);
      }
      return true;
    },
  };
}

/** True when the level has both sublevels (the caller reports a pair that does not exist). */
export function pairExists(spec: HyperfineLevelSpec, point: SpectralPoint): boolean {
  const names = new Set(solveLevel(spec, 0).states.map((s) => lowKey(s.low)));
  const lk = refKey(point.lower);
  const uk = refKey(point.upper);
  return lk !== null && uk !== null && lk !== uk && names.has(lk) && names.has(uk);
}
