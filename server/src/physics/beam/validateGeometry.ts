/**
 * Geometry checks, reported as issues. The model is paraxial: the collimator's
 * half-angle (w1 + w2)/(2d) must stay below MAX_HALF_ANGLE_RAD, where tan θ ≈ θ
 * is still good to 0.3 % and the beam is still a collimated beam (our bound, see
 * docs/beam.md). Beyond it the straight-line trapezoid image is not trusted.
 */
import { beamIssue, type BeamGeometry, type BeamIssue } from './types';

export const MAX_HALF_ANGLE_RAD = 0.1;

function finite(x: number): boolean {
  return typeof x === 'number' && Number.isFinite(x);
}

export function validateGeometry(g: BeamGeometry): BeamIssue[] {
  const issues: BeamIssue[] = [];
  const mustBePositive: [keyof BeamGeometry, string][] = [
    ['slit1M', 'first slit width'],
    ['slit2M', 'second slit width'],
    ['slitSeparationM', 'slit separation'],
  ];
  for (const [key, words] of mustBePositive) {
    const v = g[key] as number;
    if (!finite(v) || v <= 0) {
      issues.push(beamIssue('error', 'beam-length-invalid', `The ${words} must be a positive length (got ${v} m).`));
    }
  }
  const mayBeZero: [keyof BeamGeometry, string][] = [
    ['magnetLengthM', 'magnet length'],
    ['driftM', 'drift length'],
    ['detectorWidthM', 'detector width'],
  ];
  for (const [key, words] of mayBeZero) {
    const v = g[key] as number;
    if (!finite(v) || v < 0) {
      issues.push(beamIssue('error', 'beam-length-invalid', `The ${words} cannot be negative (got ${v} m).`));
    }
  }
  if (!finite(g.gradientTPerM)) {
    issues.push(beamIssue('error', 'beam-gradient-invalid', `The field gradient must be a number of T/m (got ${g.gradientTPerM}).`));
  }
  if (g.detectorOffsetM !== undefined && !finite(g.detectorOffsetM)) {
    issues.push(beamIssue('error', 'beam-length-invalid', `The detector offset must be a number of metres (got ${g.detectorOffsetM}).`));
  }
  if (issues.length > 0) return issues;

  if (g.magnetLengthM === 0 && g.gradientTPerM !== 0) {
    issues.push(
      beamIssue(
        'error',
        'beam-gradient-without-magnet',
        'A field gradient is given but the magnet length is 0; give the length of the gradient region.',
      ),
    );
  }
  if (g.magnetLengthM + g.driftM === 0) {
    issues.push(
      beamIssue('error', 'beam-detector-at-slit', 'Magnet length and drift are both 0: the detector would sit at the second slit.'),
    );
  }
  const halfAngle = (g.slit1M + g.slit2M) / (2 * g.slitSeparationM);
  if (halfAngle > MAX_HALF_ANGLE_RAD) {
    issues.push(
      beamIssue(
        'error',
        'beam-slits-too-wide',
        `The slits are too wide for their separation: the beam's half-angle (w1 + w2)/2d = ${halfAngle.toPrecision(3)} rad exceeds ${MAX_HALF_ANGLE_RAD} rad, beyond the small-angle model. Narrow the slits or move them apart.`,
      ),
    );
  }
  if (g.detectorWidthM === 0) {
    issues.push(beamIssue('info', 'beam-point-detector', 'Detector width 0: the pattern is that of an ideal point detector.'));
  }
  if (g.gradientTPerM === 0) {
    issues.push(beamIssue('info', 'beam-no-gradient', 'The field gradient is 0: no sublevel is deflected.'));
  }
  return issues;
}
