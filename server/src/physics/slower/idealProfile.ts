/**
 * The ideal field profile of a constant-deceleration slower (C. J. Foot, "Atomic Physics", OUP
 * 2005, §9.3.1, from memory): an atom that stays resonant while it slows at a = η a_max has
 * v(z) = v0 √(1 − z/L0), L0 = v0²/(2a), so the field must follow
 *   B(z) = B_bias ± ΔB √(1 − z/L0),  ΔB = h v0 / (λ |μ'|),
 * from the resonance condition δ + v/λ = ±|μ'| B / h (δ the laser detuning, Hz; the atom sees
 * the counter-propagating laser blue-shifted by v/λ; μ' the moment difference of the pair).
 */
import { maxDeceleration, slowingLength } from './deceleration';
import { issue } from './issue';
import type { IdealProfile, SlowerDesign, SlowerIssue, SlowerRequest, SlowerTransition } from './types';

/** +1: |B| falls along the slower on the + branch (decreasing, spin-flip); −1: the increasing design. */
export function designSign(design: SlowerDesign): 1 | -1 {
  return design === 'increasing' ? -1 : 1;
}

/**
 * Each design's B_bias when the file gives none: decreasing ends at zero field (the laser
 * detuned red by the exit speed's Doppler shift); increasing starts at zero field (detuned red by
 * the capture speed's); spin-flip crosses zero with equal fields at both ends, which keeps the
 * largest |B| smallest (common practice).
 */
export function defaultBias(design: SlowerDesign, deltaBT: number, captureMPerS: number, finalMPerS: number): number {
  const ratio = finalMPerS / captureMPerS;
  switch (design) {
    case 'decreasing':
      return -deltaBT * ratio;
    case 'increasing':
      return deltaBT;
    case 'spin_flip':
      return (-deltaBT * (1 + ratio)) / 2;
  }
}

export function checkRequest(t: SlowerTransition, r: SlowerRequest): SlowerIssue[] {
  const issues: SlowerIssue[] = [];
  if (!(t.wavelengthM > 0 && Number.isFinite(t.wavelengthM))) issues.push(issue('error', 'slower-bad-transition', 'the line has no positive, finite wavelength'));
  if (!(t.lifetimeS > 0 && Number.isFinite(t.lifetimeS))) issues.push(issue('error', 'slower-bad-transition', 'the upper level has no positive, finite lifetime'));
  if (!(t.massKg > 0 && Number.isFinite(t.massKg))) issues.push(issue('error', 'slower-bad-transition', 'the atom has no positive, finite mass'));
  if (!Number.isFinite(t.rateHzPerT) || t.rateHzPerT === 0) issues.push(issue('error', 'slower-no-zeeman-shift', 'the driven pair has no Zeeman shift, so no field can keep it resonant'));
  if (!(r.captureMPerS > 0 && Number.isFinite(r.captureMPerS))) issues.push(issue('error', 'slower-bad-speeds', 'the capture speed must be positive'));
  if (!(r.finalMPerS >= 0 && Number.isFinite(r.finalMPerS))) issues.push(issue('error', 'slower-bad-speeds', 'the final speed must not be negative'));
  else if (r.finalMPerS >= r.captureMPerS) issues.push(issue('error', 'slower-bad-speeds', 'the final speed must be below the capture speed'));
  if (!(r.safety > 0 && r.safety <= 1)) issues.push(issue('error', 'slower-bad-safety', 'the safety factor η must be in (0, 1]'));
  if (!(r.saturation > 0 && Number.isFinite(r.saturation))) issues.push(issue('error', 'slower-bad-saturation', 'the saturation parameter must be positive'));
  if (r.biasT !== undefined && !Number.isFinite(r.biasT)) issues.push(issue('error', 'slower-bad-bias', 'the bias field must be a finite number'));
  return issues;
}

/** The profile, or the issues that stop it (never NaN). */
export function idealProfile(t: SlowerTransition, r: SlowerRequest): { profile?: IdealProfile; issues: SlowerIssue[] } {
  const issues = checkRequest(t, r);
  if (issues.length > 0) return { issues };
  const aMax = maxDeceleration(t.wavelengthM, t.lifetimeS, t.massKg);
  const a = r.safety * aMax;
  const lengthM = slowingLength(r.captureMPerS, r.finalMPerS, a);
  const stopLengthM = slowingLength(r.captureMPerS, 0, a);
  const rate = Math.abs(t.rateHzPerT);
  const deltaBT = r.captureMPerS / (t.wavelengthM * rate);
  const sign = designSign(r.design);
  const biasT = r.biasT ?? defaultBias(r.design, deltaBT, r.captureMPerS, r.finalMPerS);
  const ratio = r.finalMPerS / r.captureMPerS;
  const profile: IdealProfile = {
    maxDecelerationMPerS2: aMax,
    designDecelerationMPerS2: a,
    lengthM,
    stopLengthM,
    deltaBT,
    biasT,
    sign,
    detuningHz: sign * rate * biasT,
    entryFieldT: biasT + sign * deltaBT,
    exitFieldT: biasT + sign * deltaBT * ratio,
    captureMPerS: r.captureMPerS,
    finalMPerS: r.finalMPerS,
  };
  const u = (-sign * biasT) / deltaBT;
  if (u > ratio && u < 1) profile.zeroCrossingM = stopLengthM * (1 - u * u);
  issues.push(...designMismatch(r.design, profile));
  return { profile, issues };
}

type ProfileShape = Pick<IdealProfile, 'lengthM' | 'stopLengthM' | 'biasT' | 'deltaBT' | 'sign' | 'captureMPerS' | 'finalMPerS'>;

/**
 * v(z)/v0 = √(1 − z/L0) for z clamped to [0, L]. At the exit it is vf/v0 itself, the ratio the
 * entry and exit fields are made of: 1 − L/L0 = vf²/v0² cancels to round-off there, and the
 * √ of that noise would put round-off into a field that is zero in theory (the decreasing design).
 */
function speedRatio(p: ProfileShape, z: number): number {
  return z >= p.lengthM ? p.finalMPerS / p.captureMPerS : Math.sqrt(Math.max(1 - z / p.stopLengthM, 0));
}

/** B(z) and dB/dz of the ideal profile; z is clamped to [0, L] (the profile ends there). */
export function idealField(p: ProfileShape, zM: number): { BT: number; dBdzTPerM: number } {
  const z = Math.min(Math.max(zM, 0), p.lengthM);
  const root = speedRatio(p, z);
  const BT = p.biasT + p.sign * p.deltaBT * root;
  const dBdzTPerM = zM < 0 || zM > p.lengthM || root === 0 ? 0 : (-p.sign * p.deltaBT) / (2 * p.stopLengthM * root);
  return { BT, dBdzTPerM };
}

/**
 * The speed the ideal field is resonant with at z: v0 √(1 − z/L0), the capture and final speeds
 * as given at the ends. The same as λ (shift·B − δ) in theory, without that difference's
 * cancellation (which wrote 30.0000000000002 m/s for a final speed of 30 m/s).
 */
export function idealSpeed(p: ProfileShape, zM: number): number {
  const z = Math.min(Math.max(zM, 0), p.lengthM);
  return z >= p.lengthM ? p.finalMPerS : p.captureMPerS * speedRatio(p, z);
}

/** A bias that makes the profile something other than its design word says (a note, not an error). */
function designMismatch(design: SlowerDesign, p: IdealProfile): SlowerIssue[] {
  const crosses = p.zeroCrossingM !== undefined;
  const note = (message: string): SlowerIssue[] => [issue('info', 'slower-design-mismatch', message)];
  if (design === 'spin_flip' && !crosses) return note('with this bias the field does not change sign inside the slower, so it is not a spin-flip profile');
  if (design !== 'spin_flip' && crosses) return note(`with this bias the field changes sign inside the slower (a spin-flip profile), although the design says ${design}`);
  return [];
}
