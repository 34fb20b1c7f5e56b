/** Checks on the sublevel list handed over by the Zeeman engine. */
import { beamIssue, type BeamIssue, type BeamSublevel } from './types';

export function validateSublevels(sublevels: readonly BeamSublevel[]): BeamIssue[] {
  const issues: BeamIssue[] = [];
  if (!Array.isArray(sublevels) || sublevels.length === 0) {
    return [beamIssue('error', 'beam-no-sublevels', 'No sublevels were given, so there is no beam to deflect.')];
  }
  let sum = 0;
  sublevels.forEach((s, i) => {
    const name = typeof s.label === 'string' && s.label !== '' ? s.label : `#${i + 1}`;
    if (!Number.isFinite(s.momentJT)) {
      issues.push(beamIssue('error', 'beam-moment-invalid', `Sublevel ${name}: the magnetic moment must be a finite number of J/T.`));
    }
    if (!Number.isFinite(s.population) || s.population < 0) {
      issues.push(
        beamIssue('error', 'beam-population-invalid', `Sublevel ${name}: the population must be a finite number ≥ 0 (got ${s.population}).`),
      );
    } else sum += s.population;
  });
  if (issues.length === 0 && !(sum > 0)) {
    issues.push(beamIssue('error', 'beam-population-empty', 'Every sublevel has population 0, so no atoms reach the detector.'));
  }
  return issues;
}
