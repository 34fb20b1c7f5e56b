/** Characteristic speeds of a source, for reports and hovers (issues instead of throwing). */
import { speedLawFor } from './speedLawFor';
import type { BeamIssue, SpeedDistribution } from './types';
import { validateSource } from './validateSource';

export interface SourceSpeeds {
  /** Flux-weighted mean speed, m/s. */
  meanSpeed: number;
  /** Flux-weighted rms spread, m/s. */
  rmsSpread: number;
  /** Maximum of the flux density, m/s (oven: √(3kT/M)). */
  mostProbableSpeed: number;
  /** ⟨1/v²⟩ over the flux, s²/m² (oven: M/2kT). */
  meanInverseSquare: number;
}

export function sourceSpeeds(source: SpeedDistribution, massKg: number): { speeds?: SourceSpeeds; issues: BeamIssue[] } {
  const issues = validateSource(source, massKg);
  if (issues.some((i) => i.severity === 'error')) return { issues };
  const law = speedLawFor(source, massKg);
  return {
    speeds: {
      meanSpeed: law.meanSpeed,
      rmsSpread: law.rmsSpread,
      mostProbableSpeed: law.mostProbableSpeed,
      meanInverseSquare: law.meanInverseSquare,
    },
    issues,
  };
}
