/** Checks on the speed law and mass, reported as issues (never thrown). */
import { EFFUSIVE_RELATIVE_SPREAD } from './jetLaw';
import { beamIssue, type BeamIssue, type SpeedDistribution } from './types';

function positive(value: number): boolean {
  return Number.isFinite(value) && value > 0;
}

export function validateSource(source: SpeedDistribution, massKg: number): BeamIssue[] {
  const issues: BeamIssue[] = [];
  if (!positive(massKg)) {
    issues.push(beamIssue('error', 'beam-mass-invalid', `The atomic mass must be a positive number of kilograms (got ${massKg}).`));
  }
  switch (source.kind) {
    case 'effusive':
      if (!positive(source.temperatureK)) {
        issues.push(
          beamIssue('error', 'beam-temperature-invalid', `The oven temperature must be above 0 K (got ${source.temperatureK} K).`),
        );
      }
      break;
    case 'jet':
      if (!positive(source.meanSpeed)) {
        issues.push(beamIssue('error', 'beam-speed-invalid', `The jet's mean speed must be above 0 m/s (got ${source.meanSpeed}).`));
      }
      if (!positive(source.relativeSpread)) {
        issues.push(
          beamIssue(
            'error',
            'beam-spread-invalid',
            `The jet's relative speed spread must be above 0 (got ${source.relativeSpread}); use a single-speed source for a mono-energetic beam.`,
          ),
        );
      } else if (source.relativeSpread >= EFFUSIVE_RELATIVE_SPREAD) {
        issues.push(
          beamIssue(
            'error',
            'beam-spread-too-wide',
            `A relative rms spread of ${source.relativeSpread} is at least that of an oven beam (${EFFUSIVE_RELATIVE_SPREAD.toFixed(4)}); describe the source as an oven instead.`,
          ),
        );
      }
      break;
    case 'single':
      if (!positive(source.speed)) {
        issues.push(beamIssue('error', 'beam-speed-invalid', `The beam speed must be above 0 m/s (got ${source.speed}).`));
      }
      break;
    default:
      issues.push(beamIssue('error', 'beam-source-unknown', 'Unknown source kind; use an oven, a jet or a single speed.'));
  }
  return issues;
}
