/** Line shapes and synthesized spectra (no I/O). */
export { FaddeevaReal, faddeevaReal } from './faddeevaReal';
export { erfcx } from './erfcx';
export { VoigtShape, voigtProfile } from './voigt';
export {
  GAUSS_FWHM_PER_SIGMA,
  dopplerSigmaFromSpeedSpread,
  dopplerSigmaHz,
  gaussianSigmaHz,
  lifetimeFromFwhm,
  naturalFwhmHz,
  voigtFwhmApprox,
} from './widths';
export { AIR_MIN_WAVELENGTH_M, AIR_STANDARD, airIndex, airWavelengthM } from './airIndex';
export { analyserProblem, observedWeight, passesAnalyser, viewAngleRad, type Analyser, type ViewDirection } from './observation';
export { gridFrequencies, synthesizeSpectrum, type UniformGrid, type WeightedComponent } from './spectrum';
export { spectrumPeak } from './spectrumPeak';
export { beamTransverseRmsSpeed } from './beamDoppler';
