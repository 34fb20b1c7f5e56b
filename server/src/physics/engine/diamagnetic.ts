/**
 * The diamagnetic term of one valence electron, H_dia = (e²B²/8mₑ) r² sin²θ (the A² part of the
 * minimal-coupling Hamiltonian in the symmetric gauge; Bransden & Joachain, Physics of Atoms and
 * Molecules, §5.2). Inside one term (orbital l = L, radial ⟨r²⟩ given) it is diagonal in m_L:
 *   ⟨l m|sin²θ|l m⟩ = 2(l² + l − 1 + m²) / ((2l − 1)(2l + 3))
 * (checked with SymPy in scripts/reference/diamagnetic.py). The mixing with l ± 2 is left out.
 */
import { ELEMENTARY_CHARGE, ELECTRON_MASS, PLANCK_H } from '../constants';

/** ⟨l m|sin²θ|l m⟩ for integer l ≥ 0 and |m| ≤ l (2/3 for l = 0: the isotropic average). */
export function sinSquaredMean(l: number, m: number): number {
  return (2 * (l * l + l - 1 + m * m)) / ((2 * l - 1) * (2 * l + 3));
}

/** e²⟨r²⟩/(8 mₑ h): the diamagnetic energy per B² and per unit ⟨sin²θ⟩, Hz/T², for ⟨r²⟩ in m². */
export function diamagneticHzPerT2(r2M2: number): number {
  return (ELEMENTARY_CHARGE * ELEMENTARY_CHARGE * r2M2) / (8 * ELECTRON_MASS * PLANCK_H);
}

/**
 * Hydrogenic ⟨r²⟩ in units of a₀² for principal number n and orbital l with effective charge Z:
 * n²(5n² + 1 − 3l(l + 1))/(2Z²) (Bethe & Salpeter, Quantum Mechanics of One- and Two-Electron
 * Atoms, eq. 3.26). Only for estimating whether the term matters.
 */
export function hydrogenicR2InBohr2(n: number, l: number, z = 1): number {
  return (n * n * (5 * n * n + 1 - 3 * l * (l + 1))) / (2 * z * z);
}
