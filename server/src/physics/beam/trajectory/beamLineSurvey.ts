/**
 * The field along a magnet's beam line before any atom flies: |B| and ∂|B|/∂z at the centre
 * (what a uniform-gradient magnet would be given), the weakest and strongest |B| along the
 * stretch, whether the line runs through a source, and how much the gradient averaged along
 * the stretch changes across the beam height (where the uniform model would mislead).
 */
import type { FieldFunction, FieldSourceSpec, Vec3 } from '../../fields/types';
import { beamIssue, type BeamIssue } from '../types';
import { magnitudeAndGradient } from './fieldMagnitude';
import { closestApproach } from './lineClearance';
import { cm, um } from './messageText';

export interface SurveyInput {
  field: FieldFunction;
  centre: Vec3;
  magnetLengthM: number;
  /** Half the beam's height inside the magnet (along z), m. */
  halfHeightM: number;
  /** Samples along the stretch (default 401). */
  samples?: number;
  /** The parts that make the field, with the names to report them by: the line must keep clear of them. */
  obstacles?: readonly { name: string; spec: FieldSourceSpec }[];
}

export interface BeamLineSurvey {
  /** |B| at the centre, T. */
  fieldT: number;
  /** ∂|B|/∂z at the centre, T/m. */
  gradientTPerM: number;
  /** ∂|B|/∂z averaged along the stretch on the beam line and at ±halfHeight, T/m. */
  meanGradientTPerM: { below: number; on: number; above: number };
  /** Largest |Ḡ(±h) − Ḡ(0)| / |Ḡ(0)| (0 when Ḡ(0) is 0). */
  gradientVariation: number;
  minFieldT: number;
  /** x of the weakest |B| from the magnet entrance, m. */
  minFieldAtM: number;
  /** Largest |B| on the beam line, T. */
  maxOnLineT: number;
  /** Largest |B| on the three lines, T (sets the range the moments are tabulated over). */
  maxFieldT: number;
  issues: BeamIssue[];
}

/** Closest a beam line may pass a thin conductor (at least this, or the beam's half height when larger), m. */
export const MIN_CLEARANCE_M = 1e-6;

/** Above this the averaged gradient varies too much across the beam for the uniform model (our choice, docs/beam.md). */
export const GRADIENT_VARIATION_LIMIT = 0.05;

export function surveyBeamLine(input: SurveyInput): BeamLineSurvey {
  const { field, centre, magnetLengthM: L, halfHeightM: h } = input;
  const n = Math.max(3, input.samples ?? 401);
  const issues: BeamIssue[] = [];
  const m = new Float64Array(4);
  const x0 = centre[0] - L / 2;
  let minB = Infinity;
  let minAt = 0;
  let maxB = 0;
  let maxOnLine = 0;
  let blocked: number | undefined;
  const sums = [0, 0, 0];
  const offsets = [-h, 0, h];
  for (let k = 0; k < n; k++) {
    const s = (L * k) / (n - 1);
    // trapezoid weights for the average along the stretch
    const w = k === 0 || k === n - 1 ? 0.5 : 1;
    for (let o = 0; o < 3; o++) {
      magnitudeAndGradient(field([x0 + s, centre[1], centre[2] + offsets[o]!]), m);
      if (!Number.isFinite(m[0]) || !Number.isFinite(m[3])) {
        if (o === 1 && blocked === undefined) blocked = s;
        continue;
      }
      maxB = Math.max(maxB, m[0]);
      sums[o] += w * m[3];
      if (o === 1 && m[0] < minB) {
        minB = m[0];
        minAt = s;
      }
      if (o === 1) maxOnLine = Math.max(maxOnLine, m[0]);
    }
  }
  const mean = sums.map((v) => v / (n - 1));
  magnitudeAndGradient(field(centre), m);
  const fieldT = Number.isFinite(m[0]) ? m[0] : 0;
  const gradientTPerM = Number.isFinite(m[3]) ? m[3] : 0;
  const on = mean[1]!;
  const variation = on !== 0 ? Math.max(Math.abs(mean[0]! - on), Math.abs(mean[2]! - on)) / Math.abs(on) : 0;
  const clearance = Math.max(h, MIN_CLEARANCE_M);
  const hits = (input.obstacles ?? [])
    .map((o) => ({ name: o.name, ...closestApproach(o.spec, [x0, centre[1], centre[2]], L) }))
    .filter((o) => o.distanceM < clearance);
  if (hits.length > 0) {
    const first = hits[0]!;
    issues.push(
      beamIssue(
        'error',
        'magnet-line-meets-source',
        `The beam line runs into source '${first.name}' ${cm(first.atM)} into the magnet (it passes ${um(first.distanceM)} from it, within the beam's half height of ${um(clearance)}); move \`at\` or the source.`,
      ),
    );
  } else if (blocked !== undefined) {
    issues.push(
      beamIssue('error', 'magnet-line-meets-source', `The beam line runs through a field source ${cm(blocked)} into the magnet, where the field is not defined; move \`at\` off the sources.`),
    );
  } else if (h > 0 && variation > GRADIENT_VARIATION_LIMIT) {
    issues.push(
      beamIssue(
        'warning',
        'magnet-gradient-uneven',
        `The gradient of |B| along z, averaged over the magnet, changes by ${(100 * variation).toFixed(0)} % across the beam height (±${(h * 1e3).toPrecision(2)} mm); atoms at the edges of the beam are deflected differently, and the peak shapes (computed for the beam line) do not include that.`,
      ),
    );
  }
  return {
    fieldT,
    gradientTPerM,
    meanGradientTPerM: { below: mean[0]!, on, above: mean[2]! },
    gradientVariation: variation,
    minFieldT: Number.isFinite(minB) ? minB : 0,
    minFieldAtM: minAt,
    maxOnLineT: maxOnLine,
    maxFieldT: maxB,
    issues,
  };
}
