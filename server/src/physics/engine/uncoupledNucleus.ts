/**
 * A level with a nuclear spin but no hyperfine constants (A = B = C = 0): the nucleus is not
 * coupled to J, yet it still feels the field through g_I I_z. Its states are |m_J, m_I> at
 * every field, with E/h = (μ_B B/h)(g_J m_J + g_I m_I). For J = 0 these are |F = I, m_F = m_I>.
 */
import type { CleanHyperfine } from './validateSpec';

export function nucleusUncoupled(s: CleanHyperfine): boolean {
  return s.twoI > 0 && s.A === 0 && s.B === 0 && s.C === 0;
}
