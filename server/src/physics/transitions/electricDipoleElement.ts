/**
 * Electric-dipole amplitude between one lower and one upper sublevel, from the engine
 * eigenvectors on the uncoupled basis |J m_J, I m_I>. The dipole acts on the electrons only,
 * so m_I is conserved, and by the Wigner–Eckart theorem
 *   <J' m_J' I m_I'| d_q |J m_J I m_I> = δ(m_I, m_I') (−1)^(J'−m_J') (J' 1 J; −m_J' q m_J) <J'||d||J>.
 * The result is in units of the reduced element <J'||d||J>.
 */
import { wigner3j } from '../angularMomentum';
import type { SublevelState } from '../engine';
import { basisIndex } from './basisLookup';

/** (−1)^(J'−m_J') (J' 1 J; −m_J' q m_J), all arguments twice their value. */
export function uncoupledDipoleFactor(twoJu: number, twoMJu: number, twoJl: number, twoMJl: number, q: number): number {
  const w = wigner3j(twoJu, 2, twoJl, -twoMJu, 2 * q, twoMJl);
  if (w === 0) return 0;
  const phase = (((twoJu - twoMJu) / 2) % 2 + 2) % 2 === 0 ? 1 : -1;
  return phase * w;
}

/** <upper| d_q |lower> / <J_u||d||J_l> with q = m_upper − m_lower (0 when |q| > 1). */
export function dipoleAmplitude(lower: SublevelState, upper: SublevelState, twoJl: number, twoJu: number): number {
  const twoQ = upper.twoM - lower.twoM;
  if (Math.abs(twoQ) > 2) return 0;
  const q = twoQ / 2;
  const upIndex = basisIndex(upper.basis);
  let amp = 0;
  for (let k = 0; k < lower.basis.length; k++) {
    const cl = lower.vector[k];
    if (cl === 0) continue;
    const b = lower.basis[k];
    if (b.scheme !== 'mJ,mI') return Number.NaN;
    const twoMJu = b.twoMJ + twoQ;
    const at = upIndex.get(`${twoMJu},${b.twoMI}`);
    if (at === undefined) continue;
    amp += cl * upper.vector[at] * uncoupledDipoleFactor(twoJu, twoMJu, twoJl, b.twoMJ, q);
  }
  return amp;
}
