/**
 * The largest radiation-pressure deceleration of a two-level atom and the length a
 * constant-deceleration slower needs (C. J. Foot, "Atomic Physics", OUP 2005, §9.3, from memory:
 * F_max = ħkΓ/2 at full saturation; L = (v0² − vf²)/(2 η a_max)).
 */
import { HBAR } from '../constants';

/** a_max = ħkΓ/(2m), k = 2π/λ, Γ = 1/τ; m/s². */
export function maxDeceleration(wavelengthM: number, lifetimeS: number, massKg: number): number {
  const k = (2 * Math.PI) / wavelengthM;
  const gamma = 1 / lifetimeS;
  return (HBAR * k * gamma) / (2 * massKg);
}

/** Distance to slow from v0 to vf at the constant deceleration a, m. */
export function slowingLength(captureMPerS: number, finalMPerS: number, decelerationMPerS2: number): number {
  return (captureMPerS * captureMPerS - finalMPerS * finalMPerS) / (2 * decelerationMPerS2);
}

/** The scattering-force deceleration at saturation s0 and detuning δ (Hz, seen by the atom): a_max s0/(1 + s0 + (2δ/Γ)²) with Γ in Hz·2π. */
export function scatteringDeceleration(maxMPerS2: number, saturation: number, detuningHz: number, lifetimeS: number): number {
  const x = 2 * (2 * Math.PI * detuningHz) * lifetimeS;
  return (maxMPerS2 * saturation) / (1 + saturation + x * x);
}
