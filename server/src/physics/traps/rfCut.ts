/**
 * The RF knife. Atoms whose energy above the bottom of the trap reaches the cut get to the
 * surface |B| = B_cut where the Zeeman energy above the minimum equals the cut; a field driving
 * the Δm = ±1 transition to the next, less trapped sublevel there removes them. The frequency is
 * the exact splitting at B_cut; the linear rule (low-field slopes for both the field and the
 * splitting) is given beside it as the check that holds at low field.
 */
import { PLANCK_H } from '../constants';
import type { EnergyCurve } from './energyCurves';
import type { RfCut } from './types';

/**
 * null when the cut is not positive, or when the sublevel's energy never rises by the cut below
 * `limitT` (the turning field or the top of the swept range): the knife would sit outside the trap.
 */
export function rfCut(curve: EnergyCurve, partner: EnergyCurve, minimumFieldT: number, cutJ: number, limitT: number): RfCut | null {
  const base = curve.energyHz(minimumFieldT);
  const cutHz = cutJ / PLANCK_H;
  const above = (b: number): number => curve.energyHz(b) - base - cutHz;
  if (!(cutHz > 0) || !(above(limitT) >= 0)) return null;
  let lo = minimumFieldT;
  let hi = limitT;
  for (let i = 0; i < 80; i++) {
    const mid = 0.5 * (lo + hi);
    if (above(mid) < 0) lo = mid;
    else hi = mid;
  }
  const fieldT = 0.5 * (lo + hi);
  const frequencyHz = Math.abs(curve.energyHz(fieldT) - partner.energyHz(fieldT));
  const slope = curve.slopeHzPerT(0);
  const linearField = minimumFieldT + cutHz / slope;
  const linearHz = Math.abs(slope - partner.slopeHzPerT(0)) * linearField;
  return { fieldT, frequencyHz, linearHz, partner: partner.low };
}
