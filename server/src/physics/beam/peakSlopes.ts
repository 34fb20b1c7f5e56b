/**
 * How a refined peak position moves with the deflection coefficients k_i of its members and with
 * the two slit-image box widths a, b. The position x_p is a zero of ∂P/∂x, so by the implicit-function
 * theorem dx_p/dθ = −(∂²P/∂x∂θ)/(∂²P/∂x²). With the box form of peakRefine.ts,
 *   P(x) = Σ_i (w_i/(a b)) Σ_{s,t=±1} s t J_i(x + sa/2 + tb/2),  J = H averaged over the aperture W,
 * every derivative is a divided difference of closed forms of the speed law:
 *   ∂H/∂e = F(e) = P(z ≤ e),  and, as H(e) = E[(e − k u)⁺] with u = 1/v²,  ∂H/∂k = −E[u; z ≤ e].
 * The aperture width W enters through the averaging limits c ± W/2 (and a 1/W prefactor):
 *   ∂²P/∂x∂W = Σ_i (w_i/(a b W)) Σ s t (F(c + W/2) + F(c − W/2))/2 − P_x/W.
 * All exact; no finite differences. A point detector (W = 0) would need the density itself, which
 * the speed laws do not expose: undefined there, as where the refinement did not run.
 */
import { cumulativeAt } from './depositDeflections';
import { deflectionCoefficient } from './deflection';
import type { PatternInput } from './detectorPattern';
import { resolveOptions } from './patternOptions';
import type { RefineMember } from './peakRefine';
import { slitImage, type SlitImage } from './slitImage';
import type { SpeedLaw } from './speedLaw';
import { speedLawFor } from './speedLawFor';

export interface PeakSlopes {
  /** dx_p/dk_i for each member, in the order given (s²/m², as k is in m³/s²). */
  perK: number[];
  /** dx_p/da and dx_p/db: the slit-image box widths (dimensionless). */
  perBoxA: number;
  perBoxB: number;
  /** dx_p/dW: the detector (aperture) width (dimensionless). */
  perDetector: number;
}

const at = new Float64Array(2);

/** F(e) = P(z ≤ e) and ∂H/∂k = −E[u; z ≤ e] at e for one member. */
function closedForms(e: number, k: number, law: SpeedLaw): { F: number; Hk: number } {
  if (k === 0) return { F: e > 0 ? 1 : 0, Hk: e >= 0 ? -law.meanInverseSquare : 0 };
  cumulativeAt(e, k, law, at);
  return { F: at[0], Hk: -at[1] / k };
}

export interface PeakAt {
  positionM: number;
  /** Indices into the input's sublevels: the pattern's own grouping. */
  memberIndices: readonly number[];
}

/**
 * Slopes of each peak (positions and members as the pattern found them; weights as in the pattern).
 * Undefined for a peak that is not a smooth maximum of the exact profile.
 */
export function peakSlopes(input: PatternInput, peaks: readonly PeakAt[]): (PeakSlopes | undefined)[] {
  const { options } = resolveOptions(input);
  const image = slitImage(input.geometry);
  if (input.source.kind === 'single' || !(image.boxAM > 0 && image.boxBM > 0 && image.detectorM > 0)) return peaks.map(() => undefined);
  const law = speedLawFor(input.source, input.massKg, options.speedPanels);
  const popSum = input.sublevels.reduce((s, x) => s + x.population, 0);
  const members = (p: PeakAt) =>
    p.memberIndices.map((i) => ({ k: deflectionCoefficient(input.sublevels[i]!.momentJT, input.massKg, input.geometry), weight: input.sublevels[i]!.population / popSum }));
  return peaks.map((p) => (p.memberIndices.length > 0 ? slopesAt(p.positionM, members(p), law, image) : undefined));
}

function slopesAt(x: number, members: readonly RefineMember[], law: SpeedLaw, image: SlitImage): PeakSlopes | undefined {
  const { boxAM: a, boxBM: b, detectorM: w } = image;
  let pxx = 0;
  let spreadA = 0;
  let spreadB = 0;
  let spreadW = 0;
  const pxk: number[] = [];
  for (const { k, weight } of members) {
    const c0 = weight / (a * b * w);
    let dk = 0;
    for (const s of [-1, 1]) {
      for (const t of [-1, 1]) {
        const c = x + (s * a) / 2 + (t * b) / 2;
        const hi = closedForms(c + w / 2, k, law);
        const lo = closedForms(c - w / 2, k, law);
        const curve = s * t * c0 * (hi.F - lo.F);
        pxx += curve;
        spreadA += (s / 2) * curve;
        spreadB += (t / 2) * curve;
        spreadW += (s * t * c0 * (hi.F + lo.F)) / 2;
        dk += s * t * c0 * (hi.Hk - lo.Hk);
      }
    }
    pxk.push(dk);
  }
  if (!(pxx < 0) || !Number.isFinite(pxx)) return undefined;
  // The 1/(a b W) prefactor would add −P_x/a (resp. /b, /W), but P_x = 0 at the maximum: dropped, since
  // at the refined position (~1e-5 relative off) that term would be mostly the refinement's own error.
  return { perK: pxk.map((v) => -v / pxx), perBoxA: -spreadA / pxx, perBoxB: -spreadB / pxx, perDetector: -spreadW / pxx };
}
