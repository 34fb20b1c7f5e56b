/**
 * The Voigt profile: a Lorentzian of half width γ (HWHM) convolved with a Gaussian of standard
 * deviation σ, normalised to unit area over frequency (Hz⁻¹). V(ν) = Re w(z)/(σ√(2π)) with
 * z = (ν + iγ)/(σ√2) — the same convention as SciPy's `voigt_profile(x, sigma, gamma)`.
 * Either width may be zero (pure Gaussian or pure Lorentzian).
 */
import { FaddeevaReal } from './faddeevaReal';

const SQRT2 = Math.SQRT2;
const SQRT_2PI = Math.sqrt(2 * Math.PI);

export class VoigtShape {
  readonly sigmaHz: number;
  readonly gammaHz: number;
  private readonly k?: FaddeevaReal;
  private readonly scale: number;
  private readonly norm: number;

  constructor(sigmaHz: number, gammaHz: number) {
    if (!(sigmaHz >= 0) || !(gammaHz >= 0) || !Number.isFinite(sigmaHz) || !Number.isFinite(gammaHz) || sigmaHz + gammaHz === 0) {
      throw new RangeError(`a Voigt profile needs finite widths σ, γ ≥ 0, not both 0 (got σ = ${sigmaHz}, γ = ${gammaHz})`);
    }
    this.sigmaHz = sigmaHz;
    this.gammaHz = gammaHz;
    if (sigmaHz > 0) {
      this.k = new FaddeevaReal(gammaHz / (sigmaHz * SQRT2));
      this.scale = 1 / (sigmaHz * SQRT2);
      this.norm = 1 / (sigmaHz * SQRT_2PI);
    } else {
      this.scale = 0;
      this.norm = gammaHz / Math.PI;
    }
  }

  /** Profile value at detuning `dHz` from the component, Hz⁻¹. */
  at(dHz: number): number {
    if (this.k) return this.k.at(dHz * this.scale) * this.norm;
    return this.norm / (dHz * dHz + this.gammaHz * this.gammaHz);
  }
}

export function voigtProfile(dHz: number, sigmaHz: number, gammaHz: number): number {
  return new VoigtShape(sigmaHz, gammaHz).at(dHz);
}
