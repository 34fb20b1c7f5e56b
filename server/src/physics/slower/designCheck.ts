/**
 * A field B(z) along the slower (the ideal one, or a coil design's) against what the atoms need.
 * At each z the laser is resonant with one speed, v_res = λ (shift·B − δ); an atom riding that
 * resonance needs the deceleration −v_res dv_res/dz. Where that exceeds what the light can give,
 * a_max s0/(1 + s0), the atoms fall behind the resonance and leave it: they are dropped there.
 * The samples are a uniform grid with extra points where a field bends (the √ end, a coil's fall).
 */
import { idealField, idealSpeed } from './idealProfile';
import { checkGrid } from './zGrid';
import type { AxisField, DesignCheck, IdealProfile } from './types';

export interface CheckInput {
  profile: IdealProfile;
  /** The field checked; absent: the ideal profile itself (each point computed once, its speed taken from the profile). */
  field?: AxisField;
  /** Zeeman shift of the driven pair per tesla, signed as the profile uses it, Hz/T. */
  shiftHzPerT: number;
  wavelengthM: number;
  saturation: number;
  /** Uniform samples over [0, L] (default 201); more are added between them where a field bends (zGrid.ts). */
  points?: number;
}

export function checkDesign(input: CheckInput): DesignCheck {
  const { profile: p, field, shiftHzPerT, wavelengthM } = input;
  const n = Math.max(2, Math.round(input.points ?? 201));
  const reachable = (p.maxDecelerationMPerS2 * input.saturation) / (1 + input.saturation);
  const samples: DesignCheck['samples'] = [];
  let worst = 0;
  let dropAtM: number | undefined;
  let capture = 0;
  // Curves through the samples stray at most about 1e-3 ΔB from either field (0.2 px on the figure).
  const grid = field ? checkGrid(field, (z) => idealField(p, z).BT, p.lengthM, n - 1, 1e-3 * p.deltaBT) : checkGrid((z) => idealField(p, z), undefined, p.lengthM, n - 1, 1e-3 * p.deltaBT);
  for (const { zM, idealT, at } of grid) {
    const resonantMPerS = field ? wavelengthM * (shiftHzPerT * at.BT - p.detuningHz) : idealSpeed(p, zM);
    const slope = wavelengthM * shiftHzPerT * at.dBdzTPerM;
    // Past the last sample the ideal profile's derivative diverges at the stop point only, never inside [0, L).
    const neededMPerS2 = resonantMPerS > 0 ? -resonantMPerS * slope : 0;
    samples.push({ zM, idealT, fieldT: at.BT, resonantMPerS, neededMPerS2 });
    worst = Math.max(worst, neededMPerS2 / p.designDecelerationMPerS2);
    capture = Math.max(capture, resonantMPerS);
    if (dropAtM === undefined && neededMPerS2 > reachable) dropAtM = zM;
  }
  return { samples, worstOverDesign: worst, captureMPerS: capture, reachableMPerS2: reachable, ...(dropAtM !== undefined ? { dropAtM } : {}) };
}
