/**
 * An engine eigenstate written on the fully uncoupled basis |m_L, m_S, m_I> of its LS term, so
 * that a J level and a whole term (or two whole terms) can meet in one dipole matrix element.
 * A J level's |J, m_J> expands as Σ <L m_L S m_S | J m_J> |m_L, m_S> (Clebsch–Gordan).
 */
import { clebschGordan } from '../angularMomentum';
import type { SublevelState } from '../engine';

/** Components of one state: twice-projections and coefficient, m_I = 0 without a nucleus. */
export interface LsComponent {
  twoML: number;
  twoMS: number;
  twoMI: number;
  c: number;
}

export const lsKey = (twoML: number, twoMS: number, twoMI: number): string => `${twoML},${twoMS},${twoMI}`;

export function lsComponents(state: SublevelState, twoL: number, twoS: number, twoJ: number | null): LsComponent[] {
  const out: LsComponent[] = [];
  state.basis.forEach((b, k) => {
    const c = state.vector[k];
    if (c === 0) return;
    if (b.scheme === 'mL,mS') {
      out.push({ twoML: b.twoML, twoMS: b.twoMS, twoMI: b.twoMI ?? 0, c });
      return;
    }
    if (twoJ === null) return;
    for (let twoML = -twoL; twoML <= twoL; twoML += 2) {
      const twoMS = b.twoMJ - twoML;
      if (Math.abs(twoMS) > twoS) continue;
      const cg = clebschGordan(twoL, twoML, twoS, twoMS, twoJ, b.twoMJ);
      if (cg !== 0) out.push({ twoML, twoMS, twoMI: b.twoMI, c: c * cg });
    }
  });
  return out;
}

/** Key → coefficient, for looking up the upper state's components. */
export function lsIndex(components: readonly LsComponent[]): Map<string, number> {
  const m = new Map<string, number>();
  for (const x of components) m.set(lsKey(x.twoML, x.twoMS, x.twoMI), (m.get(lsKey(x.twoML, x.twoMS, x.twoMI)) ?? 0) + x.c);
  return m;
}
