/**
 * Reads a line's spectrum settings (docs/spectra.md):
 *   spectrum = along | across     asks for the spectrum, seen along or across the field
 *   light = all | pi | sigma | sigma+ | sigma-   analyser (default all)
 *   doppler = 350 K               gas temperature for the Doppler width
 *   doppler = beam NAME           or the transverse speed spread of a beam of this file
 *   instrument = 5 MHz            Gaussian instrument width (FWHM)
 *   span = 4 GHz                  window width (default: from the components and widths)
 *   points = 2001                 samples
 */
import type { SettingNode } from '../format/ast';
import { SPECTRUM_POINTS_MAX, SPECTRUM_POINTS_MIN } from './limits';
import type { ProblemList } from './problems';
import { readSettingNumber, readSettingQuantity, readSettingWord } from './settingReaders';
import type { LineModel, SpectrumRequest, Valued } from './types';
import { allParts } from '../format/values';

export const SPECTRUM_DIRECTIONS = ['along', 'across'] as const;
export const SPECTRUM_LIGHTS = ['all', 'pi', 'sigma', 'sigma+', 'sigma-'] as const;

export function readSpectrumRequest(line: LineModel, settings: readonly SettingNode[], problems: ProblemList): SpectrumRequest | undefined {
  const spectrumSetting = settings.find((s) => s.key.text === 'spectrum');
  if (!spectrumSetting) {
    for (const s of settings) {
      problems.add('spectrum-setting-unused', `${s.key.text} shapes the spectrum of line '${line.name}', which is not asked for; add \`spectrum = across\` (or along) to draw it`, s.key.range);
    }
    return undefined;
  }
  const direction = readSettingWord(spectrumSetting, SPECTRUM_DIRECTIONS, problems);
  // With a bad direction the other settings are still read, so their mistakes show now, not after this one is fixed.
  const req: SpectrumRequest = { range: spectrumSetting.range, direction: direction ?? 'across', light: 'all' };
  for (const s of settings) {
    switch (s.key.text) {
      case 'light': {
        const w = readSettingWord(s, SPECTRUM_LIGHTS, problems);
        if (w) {
          req.light = w;
          req.lightRange = s.valueText.range;
        }
        break;
      }
      case 'doppler': {
        const parts = allParts(s.groups);
        if (parts[0]?.kind === 'word' && parts[0].text === 'beam') {
          const name = parts[1];
          if (parts.length !== 2 || name?.kind !== 'word') {
            problems.add('value-not-allowed', 'write doppler = beam <name>, naming a beam of this file, or a gas temperature such as doppler = 350 K', s.valueText.range);
          } else {
            req.dopplerBeam = { name: name.text, range: name.range };
          }
          break;
        }
        const t = positiveValue(readSettingQuantity(s, 'temperature', problems, 'gas temperature for the Doppler width, e.g. 350 K'), 'the temperature', problems);
        if (t) req.dopplerK = t;
        break;
      }
      case 'instrument': {
        const w = positiveValue(readSettingQuantity(s, 'frequency-like', problems, 'instrument width (FWHM), e.g. 5 MHz'), 'the instrument width', problems);
        if (w) req.instrumentHz = w;
        break;
      }
      case 'span': {
        const w = positiveValue(readSettingQuantity(s, 'frequency-like', problems, 'width of the frequency window, e.g. 4 GHz'), 'the span', problems);
        if (w) req.spanHz = w;
        break;
      }
      case 'points': {
        const n = readSettingNumber(s, problems, `number of samples, ${SPECTRUM_POINTS_MIN} to ${SPECTRUM_POINTS_MAX}`);
        if (!n) break;
        if (!Number.isInteger(n.value) || n.value < SPECTRUM_POINTS_MIN || n.value > SPECTRUM_POINTS_MAX) {
          problems.add('spectrum-points-out-of-range', `points must be a whole number from ${SPECTRUM_POINTS_MIN} to ${SPECTRUM_POINTS_MAX}, got ${n.value}`, n.range!);
        } else {
          req.points = n;
        }
        break;
      }
      default:
        break;
    }
  }
  return direction ? req : undefined;
}

function positiveValue(v: Valued<number> | undefined, what: string, problems: ProblemList): Valued<number> | undefined {
  if (!v || v.value > 0) return v;
  problems.add('value-out-of-range', `${what} must be above zero`, v.range!);
  return undefined;
}
