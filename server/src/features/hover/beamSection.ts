/**
 * A beam: what it is made of (species, level, source, slits, magnet, drift, detector) and,
 * when the evaluation computed it, whether the peaks are resolved, the peaks with the sublevels in
 * them, the deflection of each sublevel (labelled as the regime at the magnet says), and the
 * cautions in one line.
 */
import { levelDesignationText } from '../../eval/designationText';
import { lonePeak, MERGED_PEAK_TEXT, nothingToResolveText } from '../../eval/lonePeak';
import type { BeamResult, EvaluationResult, LevelResult } from '../../eval/resultTypes';
import { lengthText, speedText, trimNumber, withUncertainty } from '../../eval/quantityText';
import { beamPositionNoise } from '../../eval/noiseFloors';
import type { BeamModel } from '../../model/types';
import { md, mdTable, mdTitle } from '../shared/markdown';
import { levelResult } from '../shared/results';
import { valueInUnits } from '../shared/units';
import { labelsAt, stateHeader, stateLabel } from './regimeLabels';
import { cautionLine } from './cautionLine';

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

/** One line: how many peaks and whether they are resolved (or nothing to resolve), with what would resolve them. */
export function beamVerdict(r: BeamResult): string | undefined {
  if (!r.computed) return undefined;
  const peaks = `${r.peaks.length} peak${r.peaks.length === 1 ? '' : 's'}`;
  if (r.all_resolved === undefined) return peaks;
  const lone = lonePeak(r);
  if (lone === 'nothing-to-resolve') return `${peaks}: ${nothingToResolveText(r)}`;
  if (lone === 'merged') return `${peaks}: ${MERGED_PEAK_TEXT}, not resolved${r.resolving_advice ? `. ${r.resolving_advice}` : ''}`;
  if (r.all_resolved) return `${peaks}, all resolved`;
  return `${peaks}, not all resolved${r.resolving_advice ? `. ${r.resolving_advice}` : ''}`;
}

/** Peak members as the labels that describe the states at the magnet's field, shortened past four. */
function membersText(members: readonly string[], label: (low: string) => string): string {
  const shown = members.slice(0, 4).map((m) => md(label(m)));
  return members.length > 4 ? `${shown.join('; ')}; … (${members.length} sublevels)` : shown.join('; ');
}

function results(r: BeamResult, maxRows: number, level: LevelResult | undefined): string | undefined {
  if (!r.computed) return undefined;
  const parts: string[] = [];
  const verdict = beamVerdict(r);
  if (verdict) parts.push(`${mdTitle('At the detector')}: ${verdict}`);
  if (r.speeds) parts.push(`mean speed ${speedText(r.speeds.mean_m_per_s)}, most probable ${speedText(r.speeds.most_probable_m_per_s)}`);
  const noise = beamPositionNoise(r);
  // The states are named as the level's regime at the magnet's field says (|m_J, m_I> when decoupled).
  const highOf = new Map(r.sublevels.map((s) => [s.label, s.high_label]));
  const scheme = r.magnet ? labelsAt(level, { kind: 'magnet', name: r.magnet }).scheme : 'low';
  const label = (low: string): string => stateLabel({ low, high: highOf.get(low) }, scheme);
  if (r.peaks.length > 0) {
    parts.push(
      mdTable(
        ['peak at', 'FWHM', 'sublevels in it'],
        r.peaks.map((p) => [withUncertainty(p.position_m, p.position_m_unc, (v) => lengthText(v, 4, noise)), p.fwhm_m !== null ? lengthText(p.fwhm_m) : '—', membersText(p.members, label)]),
      ),
    );
  }
  if (r.sublevels.length > 0) {
    parts.push(
      mdTable(
        [stateHeader(scheme).replace(/^state/, 'sublevel'), 'μ/μ_B', 'population', 'mean deflection'],
        r.sublevels.slice(0, maxRows).map((s) => [md(label(s.label)), withUncertainty(s.moment_bohr, s.moment_bohr_unc, (v) => trimNumber(v, 4)), trimNumber(s.population, 3), withUncertainty(s.mean_deflection_m, s.mean_deflection_m_unc, (v) => lengthText(v, 4, noise))]),
      ),
    );
  }
  const caution = cautionLine(r.cautions);
  if (caution) parts.push(caution);
  return parts.join('\n\n');
}

export function beamSection(b: BeamModel, r: BeamResult | undefined, maxRows: number, result?: Pick<EvaluationResult, 'levels'>): string {
  const level = b.species && b.level ? levelResult(result, b.species.name, b.level.name) : undefined;
  const res = r ? results(r, maxRows, level) : undefined;
  return res ? `${inputs(b)}\n\n${res}` : inputs(b);
}
