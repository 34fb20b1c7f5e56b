/**
 * A beam: what it is made of (species, level, source, slits, magnet, drift, detector) and,
 * when the evaluation computed it, the deflection of each sublevel at the detector, the peaks,
 * and whether neighbouring peaks are resolved.
 */
import { levelDesignationText } from '../../eval/designationText';
import type { BeamResult } from '../../eval/resultTypes';
import { lengthText, speedText, trimNumber } from '../../eval/quantityText';
import { beamPositionNoise } from '../../eval/noiseFloors';
import type { BeamModel } from '../../model/types';
import { md, mdTable, mdTitle } from '../shared/markdown';
import { valueInUnits } from '../shared/units';

function sourceText(b: BeamModel): string {
  const s = b.source?.value;
  if (!s) return 'not given';
  switch (s.kind) {
    case 'oven':
      return `oven at ${valueInUnits(s.temperatureK, 'temperature').join(' = ')}`;
    case 'jet':
      return `jet at ${valueInUnits(s.speedMPerS, 'speed').join(' = ')}, relative spread ${trimNumber(s.spreadFraction * 100, 4)} %`;
    case 'speed':
      return `single speed ${valueInUnits(s.speedMPerS, 'speed').join(' = ')}`;
    default:
      return 'not given';
  }
}

function inputs(b: BeamModel): string {
  const lines = [mdTitle(`beam ${md(b.name)}`)];
  lines.push(`species: ${b.species ? md(b.species.name) : 'not given'}; level: ${b.level ? `${md(b.level.name)} (${md(levelDesignationText(b.level))})` : 'not given'}`);
  lines.push(`source: ${sourceText(b)}`);
  const sl = b.slits?.value;
  if (sl) lines.push(`slits: ${lengthText(sl.firstM)} and ${lengthText(sl.secondM)}, ${lengthText(sl.separationM)} apart`);
  lines.push(`magnet: ${b.magnet ? md(b.magnet.name) : 'not given'}`);
  if (b.driftM) lines.push(`drift = ${valueInUnits(b.driftM.value, 'length', b.driftM.unit).join(' = ')}`);
  if (b.detectorM) lines.push(`detector = ${valueInUnits(b.detectorM.value, 'length', b.detectorM.unit).join(' = ')}`);
  return lines.join('  \n');
}

/** One line: how many peaks and whether they are resolved, with the gradient that would resolve them. */
export function beamVerdict(r: BeamResult): string | undefined {
  if (!r.computed) return undefined;
  const peaks = `${r.peaks.length} peak${r.peaks.length === 1 ? '' : 's'}`;
  if (r.all_resolved === undefined) return peaks;
  if (r.all_resolved) return `${peaks}, all resolved`;
  return `${peaks}, not all resolved${r.resolving_advice ? `. ${r.resolving_advice}` : ''}`;
}

function results(r: BeamResult, maxRows: number): string | undefined {
  if (!r.computed) return undefined;
  const parts: string[] = [];
  const verdict = beamVerdict(r);
  if (verdict) parts.push(`${mdTitle('At the detector')}: ${verdict}`);
  if (r.speeds) parts.push(`mean speed ${speedText(r.speeds.mean_m_per_s)}, most probable ${speedText(r.speeds.most_probable_m_per_s)}`);
  const noise = beamPositionNoise(r);
  if (r.sublevels.length > 0) {
    parts.push(
      mdTable(
        ['sublevel', 'μ/μ_B', 'population', 'mean deflection'],
        r.sublevels.slice(0, maxRows).map((s) => [md(s.label), trimNumber(s.moment_bohr, 4), trimNumber(s.population, 3), lengthText(s.mean_deflection_m, 4, noise)]),
      ),
    );
  }
  if (r.peaks.length > 0) {
    parts.push(
      `peaks: ${r.peaks.map((p) => `${lengthText(p.position_m, 4, noise)}${p.fwhm_m !== null ? ` (FWHM ${lengthText(p.fwhm_m)})` : ''}`).join('; ')}`,
    );
  }
  for (const c of r.cautions) parts.push(`⚠ ${md(c)}`);
  return parts.join('\n\n');
}

export function beamSection(b: BeamModel, r: BeamResult | undefined, maxRows: number): string {
  const res = r ? results(r, maxRows) : undefined;
  return res ? `${inputs(b)}\n\n${res}` : inputs(b);
}
