/**
 * "What is my field?" from one measured resonance: every field in the range where the named
 * pair is resonant at the measured frequency (on the exact engine), each with its standard
 * uncertainty u(B) = u(f)/|df/dB| — the one-point fit, where the Jacobian is df/dB itself.
 */
import type { HyperfineLevelSpec } from '../engine';
import { resonanceFields, type SublevelPair, type TransitionIssue } from '../transitions';

export interface CalibrationRoot {
  fieldT: number;
  /** Standard uncertainty of the field from u(f); null without u(f) or at a field-insensitive point. */
  uncertaintyT: number | null;
  dfdBHzPerT: number;
}

export interface FieldCalibration {
  roots: CalibrationRoot[];
  issues: TransitionIssue[];
}

export function calibrateField(
  spec: HyperfineLevelSpec,
  pair: SublevelPair,
  frequencyHz: number,
  uncertaintyHz: number | undefined,
  range: { fromT: number; toT: number; points?: number },
): FieldCalibration {
  const found = resonanceFields(spec, frequencyHz, { fromT: range.fromT, toT: range.toT, points: range.points ?? 2001 }, { pair, twoPhoton: true });
  const roots = found.resonances.map((r) => {
    const slope = Math.abs(r.transition.dfdB);
    const u = uncertaintyHz !== undefined && slope > 0 ? uncertaintyHz / slope : null;
    return { fieldT: r.fieldT, uncertaintyT: u !== null && Number.isFinite(u) ? u : null, dfdBHzPerT: r.transition.dfdB };
  });
  return { roots, issues: found.issues };
}
