/** The widths, weights and window of a line's spectrum, from the request and the levels. */
import type { LevelModel, SpectrumRequest, Valued } from '../model/types';
import {
  GAUSS_FWHM_PER_SIGMA,
  gaussianSigmaHz,
  naturalFwhmHz,
  observedWeight,
  voigtFwhmApprox,
} from '../physics/lineshape';
import type { Polarization } from '../physics/transitions';
import type { LineComponentResult } from './resultTypes';

export interface ShapeWidths {
  lifetime?: Valued<number>;
  /** Lorentzian HWHM γ = Γ/4π and Gaussian σ, Hz. */
  gammaHz: number;
  sigmaHz: number;
  dopplerFwhmHz?: number;
  voigtFwhmHz: number;
}

/** `dopplerSigma`: the Doppler part's standard deviation, Hz (0 when there is none). */
export function shapeWidths(req: SpectrumRequest, upper: LevelModel, dopplerSigma: number): ShapeWidths {
  const lifetime = upper.lifetimeS;
  const gammaHz = lifetime ? naturalFwhmHz(lifetime.value) / 2 : 0;
  const sigmaHz = gaussianSigmaHz(dopplerSigma, req.instrumentHz?.value ?? 0);
  return {
    ...(lifetime ? { lifetime } : {}),
    gammaHz,
    sigmaHz,
    ...(dopplerSigma > 0 ? { dopplerFwhmHz: dopplerSigma * GAUSS_FWHM_PER_SIGMA } : {}),
    voigtFwhmHz: voigtFwhmApprox(2 * gammaHz, sigmaHz * GAUSS_FWHM_PER_SIGMA),
  };
}

const POLARIZATION: Record<LineComponentResult['polarization'], Polarization> = { pi: 'π', 'sigma+': 'σ+', 'sigma-': 'σ−' };

export function componentWeight(c: LineComponentResult, req: Pick<SpectrumRequest, 'direction' | 'light'>): number {
  return c.strength * observedWeight(POLARIZATION[c.polarization], req.direction, req.light);
}

/** Margin on each side of the outermost seen components, in Voigt FWHMs. */
const WINDOW_MARGIN_FWHM = 6;

/** The window: `span` centred on the seen components, or the components with a margin of widths. */
export function spectrumWindow(offsets: readonly number[], weights: readonly number[], widths: ShapeWidths, spanHz: number | undefined): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  offsets.forEach((o, k) => {
    if (weights[k]! > 0) {
      lo = Math.min(lo, o);
      hi = Math.max(hi, o);
    }
  });
  const mid = (lo + hi) / 2;
  const half = spanHz !== undefined ? spanHz / 2 : (hi - lo) / 2 + WINDOW_MARGIN_FWHM * widths.voigtFwhmHz;
  return [mid - half, mid + half];
}
