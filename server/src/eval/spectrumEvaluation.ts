/**
 * A line's synthesized spectrum at each working field (docs/spectra.md): the components of the
 * line evaluation (whatever computed them), weighted by the viewing direction and analyser, each
 * drawn as one Voigt profile whose Lorentzian part is the upper level's natural width and whose
 * Gaussian part is the Doppler and instrument widths together.
 */
import type { Problem, Range } from '../format/ast';
import { SPECTRUM_POINTS_DEFAULT, SPECTRUM_POINTS_MAX } from '../model/limits';
import type { BeamModel, LineModel, SpectrumRequest } from '../model/types';
import { analyserProblem, spectrumPeak } from '../physics/lineshape';
import { dopplerPart } from './spectrumDoppler';
import { EVAL_RULES } from './evalCodes';
import type { LineResult, SpectrumResult } from './resultTypes';
import { frequencyText, trimNumber } from './quantityText';
import { spectrumSamples } from './spectrumSamples';
import { componentWeight, shapeWidths, spectrumWindow } from './spectrumShape';

export function addSpectra(line: LineModel, result: LineResult, problems: Problem[], beams: readonly BeamModel[]): LineResult {
  const req = line.spectrum;
  const upper = line.upper;
  if (!req || !upper || result.at_fields.length === 0) return result;
  const say = (code: keyof typeof EVAL_RULES, message: string, range: Range = req.range): void => {
    problems.push({ code, severity: EVAL_RULES[code].severity, message, range });
  };
  const doppler = dopplerPart(line, result.line_centre_Hz, beams, (m) => say('spectrum-doppler-beam', `line '${line.name}': ${m}`, req.dopplerBeam!.range));
  const widths = shapeWidths(req, upper, doppler?.sigmaHz ?? 0);
  if (!widths.lifetime) {
    say(
      'spectrum-no-linewidth',
      `line '${line.name}': level '${upper.name}' has no lifetime or natural linewidth, so the spectrum has no natural (Lorentzian) width; give the level \`lifetime = …\` or \`linewidth = …\``,
    );
  }
  if ((req.dopplerK || req.dopplerBeam) && !result.line_centre_Hz) {
    say(
      'spectrum-no-line-frequency',
      `line '${line.name}': the Doppler width is proportional to the line's frequency, which is unknown here; give both levels an energy to include it`,
      (req.dopplerK ?? req.dopplerBeam)!.range,
    );
  }
  if (widths.gammaHz === 0 && widths.sigmaHz === 0) {
    say('spectrum-no-width', `line '${line.name}': the spectrum has no width at all (no lifetime, Doppler or instrument width), so there is no line shape to draw`);
    return result;
  }
  const unseparable = req.direction === 'across' ? analyserProblem(req.direction, req.light) : undefined;
  if (unseparable) say('spectrum-analyser-mixes', `line '${line.name}': ${unseparable}; only the ${req.light} components are drawn, as if they could be`, req.lightRange ?? req.range);
  const warned = new Set<string>();
  const atFields = result.at_fields.map((f) => {
    const weights = f.components.map((c) => componentWeight(c, req));
    if (!weights.some((w) => w > 0)) {
      if (!warned.has('empty')) say('spectrum-nothing-seen', nothingSeen(line.name, req), req.lightRange ?? req.range);
      warned.add('empty');
      return f;
    }
    const offsets = f.components.map((c) => c.offset_Hz);
    const window = spectrumWindow(offsets, weights, widths, req.spanHz?.value);
    const outside = offsets.filter((o, k) => weights[k]! > 0 && (o < window[0] || o > window[1])).length;
    if (outside > 0 && !warned.has('span')) {
      warned.add('span');
      const seen = weights.filter((w) => w > 0).length;
      say('spectrum-span-cuts', `line '${line.name}': span ${frequencyText(req.spanHz!.value, 4)} leaves ${outside} of the ${seen} seen components outside the window at field ${f.source.name}; widen the span or leave it out to fit them all`, req.spanHz!.range);
    }
    const points = samplePoints(window, widths.voigtFwhmHz, req.points?.value);
    if ((window[1] - window[0]) / (points - 1) > widths.voigtFwhmHz / 2 && !warned.has('points')) {
      warned.add('points');
      say(
        'spectrum-undersampled',
        `line '${line.name}': ${points} samples over ${frequencyText(window[1] - window[0], 4)} are ${frequencyText((window[1] - window[0]) / (points - 1), 3)} apart, more than half the line width (${frequencyText(widths.voigtFwhmHz, 3)}), so narrow peaks may be missed or drawn low; narrow the span or add points (up to ${SPECTRUM_POINTS_MAX})`,
        req.points?.range ?? req.spanHz?.range ?? req.range,
      );
    }
    const partial: Omit<SpectrumResult, 'peak_offset_Hz' | 'peak_per_Hz'> = {
      direction: req.direction,
      light: req.light,
      ...(widths.lifetime ? { lifetime_s: widths.lifetime.value, lifetime_source: widths.lifetime.source, natural_fwhm_Hz: 2 * widths.gammaHz } : {}),
      ...(widths.dopplerFwhmHz ? { doppler_fwhm_Hz: widths.dopplerFwhmHz } : {}),
      ...(doppler?.temperatureK !== undefined ? { temperature_K: doppler.temperatureK } : {}),
      ...(doppler?.beam !== undefined ? { beam: doppler.beam, transverse_rms_speed_m_per_s: doppler.transverseRmsSpeed! } : {}),
      ...(req.instrumentHz ? { instrument_fwhm_Hz: req.instrumentHz.value } : {}),
      gamma_Hz: widths.gammaHz,
      sigma_Hz: widths.sigmaHz,
      voigt_fwhm_Hz: widths.voigtFwhmHz,
      window_Hz: window,
      points,
      weights,
    };
    const samples = spectrumSamples({ ...partial, peak_offset_Hz: 0, peak_per_Hz: 0 }, f.components);
    let k = 0;
    for (let i = 1; i < samples.intensity.length; i++) if (samples.intensity[i]! > samples.intensity[k]!) k = i;
    // The highest sample only brackets the peak (samples are up to half a line width apart): refine it.
    const last = samples.offsetHz.length - 1;
    const peak = last > 0 && widths.sigmaHz + widths.gammaHz > 0
      ? spectrumPeak(f.components.map((c, j) => ({ frequencyHz: c.offset_Hz, weight: weights[j] ?? 0 })), widths.sigmaHz, widths.gammaHz, samples.offsetHz[Math.max(0, k - 1)]!, samples.offsetHz[Math.min(last, k + 1)]!, samples.offsetHz[k]!)
      : { offsetHz: samples.offsetHz[k]!, perHz: samples.intensity[k]! };
    return { ...f, spectrum: { ...partial, peak_offset_Hz: peak.offsetHz, peak_per_Hz: peak.perHz } };
  });
  return { ...result, at_fields: atFields };
}

/** The file's `points`, or enough for five samples per line width: at least the default, at most the cap. */
function samplePoints(window: [number, number], fwhmHz: number, written: number | undefined): number {
  if (written !== undefined) return written;
  const wanted = Math.ceil((5 * (window[1] - window[0])) / fwhmHz) + 1;
  return Math.min(SPECTRUM_POINTS_MAX, Math.max(SPECTRUM_POINTS_DEFAULT, wanted));
}

function nothingSeen(name: string, req: SpectrumRequest): string {
  const why = analyserProblem(req.direction, req.light);
  return `line '${name}': ${why ?? `no component of this line is seen ${req.direction} the field through the '${req.light}' analyser, so there is no spectrum to draw`}`;
}

/** The widths of a spectrum in words, for reports and hovers. */
export function spectrumWidthsText(s: SpectrumResult): string {
  const parts = [
    s.natural_fwhm_Hz !== undefined ? `natural ${frequencyText(s.natural_fwhm_Hz, 4)}` : 'no natural width',
    s.doppler_fwhm_Hz !== undefined
      ? `Doppler ${frequencyText(s.doppler_fwhm_Hz, 4)} ${s.beam !== undefined ? `across beam ${s.beam} (transverse rms speed ${trimNumber(s.transverse_rms_speed_m_per_s, 4)} m/s)` : `at ${trimNumber(s.temperature_K, 6)} K`}`
      : undefined,
    s.instrument_fwhm_Hz !== undefined ? `instrument ${frequencyText(s.instrument_fwhm_Hz, 4)}` : undefined,
  ].filter((p): p is string => p !== undefined);
  return `${parts.join(', ')}; Voigt FWHM ≈ ${frequencyText(s.voigt_fwhm_Hz, 4)}`;
}
