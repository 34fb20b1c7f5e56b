/**
 * Curvature of the field magnitude: the Hessian ∂²|B|/∂x_i∂x_j, by central differences of the
 * analytic gradient of |B|, ∂|B|/∂x_j = Σ_i B_i ∂B_i/∂x_j / |B|. Its error is O(h²) in the step
 * plus rounding of order ε|∇|B||/h; the default step suits sources of centimetre size.
 * |B| has no derivative where B = 0 (a quadrupole's centre): that is an issue, not a number.
 */
import { issue, type FieldIssue } from './issues';
import type { FieldFunction, FieldSample, Mat3, Vec3 } from './types';

export const DEFAULT_CURVATURE_STEP_M = 1e-5;
/** |B| must exceed this many steps times |∇B| for the differences to see a smooth |B|. */
const ZERO_MARGIN = 10;

function zeroField() {
  return issue('info', 'source-zero-field', 'The field vanishes at or next to the point, where |B| has no curvature (it grows linearly from a zero).');
}

/** ∇|B| from one sample; undefined where B = 0. */
export function magnitudeGradient(sample: FieldSample): Vec3 | undefined {
  const [bx, by, bz] = sample.B;
  const mag = Math.hypot(bx, by, bz);
  if (!(mag > 0)) return undefined;
  const g = sample.gradient;
  return [(bx * g[0][0] + by * g[1][0] + bz * g[2][0]) / mag, (bx * g[0][1] + by * g[1][1] + bz * g[2][1]) / mag, (bx * g[0][2] + by * g[1][2] + bz * g[2][2]) / mag];
}

export interface MagnitudeCurvature {
  /** Symmetric; undefined when |B| vanishes on the stencil. */
  hessian?: Mat3;
  issues: FieldIssue[];
}

export function magnitudeHessian(field: FieldFunction, point: Vec3, stepM = DEFAULT_CURVATURE_STEP_M): MagnitudeCurvature {
  if (!(stepM > 0) || !Number.isFinite(stepM)) return { issues: [issue('error', 'source-bad-step', 'The difference step for the curvature must be a positive length.')] };
  // Next to a zero, |B| is a cone: differences across it are meaningless, so say so instead.
  const here = field(point);
  const g = here.gradient;
  const gradSize = Math.hypot(...g[0], ...g[1], ...g[2]);
  if (!(Math.hypot(...here.B) > ZERO_MARGIN * stepM * gradSize)) return { issues: [zeroField()] };
  const cols: Vec3[] = [];
  for (let j = 0; j < 3; j++) {
    const plus: [number, number, number] = [point[0], point[1], point[2]];
    const minus: [number, number, number] = [point[0], point[1], point[2]];
    plus[j] += stepM;
    minus[j] -= stepM;
    const gp = magnitudeGradient(field(plus));
    const gm = magnitudeGradient(field(minus));
    if (!gp || !gm) return { issues: [zeroField()] };
    cols.push([(gp[0] - gm[0]) / (2 * stepM), (gp[1] - gm[1]) / (2 * stepM), (gp[2] - gm[2]) / (2 * stepM)]);
  }
  const h = (i: number, j: number): number => (cols[j][i] + cols[i][j]) / 2;
  return {
    hessian: [
      [h(0, 0), h(0, 1), h(0, 2)],
      [h(1, 0), h(1, 1), h(1, 2)],
      [h(2, 0), h(2, 1), h(2, 2)],
    ],
    issues: [],
  };
}
