/** A beam: what it is made of (species, level, source, slits, magnet, drift, detector) in readable units. */
import type { BeamModel } from '../../model/types';
import { trimNumber } from '../../eval/quantityText';
import { md, mdTitle } from '../shared/markdown';
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

export function beamSection(b: BeamModel): string {
  const lines = [mdTitle(`beam ${md(b.name)}`)];
  lines.push(`species: ${b.species ? md(b.species.name) : 'not given'}; level: ${b.level ? `${md(b.level.name)} (${md(b.level.designationText)})` : 'not given'}`);
  lines.push(`source: ${sourceText(b)}`);
  const sl = b.slits?.value;
  if (sl) {
    lines.push(`slits: ${valueInUnits(sl.firstM, 'length').slice(-1)[0]} and ${valueInUnits(sl.secondM, 'length').slice(-1)[0]}, ${valueInUnits(sl.separationM, 'length').slice(-1)[0]} apart`);
  }
  lines.push(`magnet: ${b.magnet ? md(b.magnet.name) : 'not given'}`);
  if (b.driftM) lines.push(`drift = ${valueInUnits(b.driftM.value, 'length').join(' = ')}`);
  if (b.detectorM) lines.push(`detector = ${valueInUnits(b.detectorM.value, 'length').join(' = ')}`);
  return lines.join('  \n');
}
