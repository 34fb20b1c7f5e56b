/**
 * Transverse speed spread of a collimated beam, for the Doppler width seen across it.
 * An atom through slits of widths w₁, w₂ a distance L apart flies at an angle θ = (z₂ − z₁)/L
 * with z uniform over each slit, so ⟨θ²⟩ = (w₁² + w₂²)/(12 L²) (variance of a uniform
 * distribution, w²/12). Its transverse speed is v·θ, with v independent of θ, so the rms
 * transverse speed is √⟨v²⟩ · √⟨θ²⟩, ⟨v²⟩ = ⟨v⟩² + σ_v² over the flux. The spectrum uses a
 * Gaussian of that rms (the real distribution is trapezoid-like in θ: common practice).
 */
export function beamTransverseRmsSpeed(slit1M: number, slit2M: number, separationM: number, meanSpeed: number, rmsSpread: number): number {
  const theta2 = (slit1M * slit1M + slit2M * slit2M) / (12 * separationM * separationM);
  return Math.sqrt((meanSpeed * meanSpeed + rmsSpread * rmsSpread) * theta2);
}
