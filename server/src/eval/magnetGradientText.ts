/**
 * The two gradients of a magnet built from field sources, each said with where it is taken: the
 * magnet's own ∂|B|/∂z is the one at the centre of its beam line (`at`), a beam's is averaged along
 * the magnet's length of that line (docs/beam.md §7). A coil pair can give 0.8 T/m at its centre and
 * 10 T/m on average, so neither is printed bare beside the other.
 */
import { pointText } from './fieldSourceText';
import { gradientText, lengthText } from './quantityText';
import type { BeamResult, MagnetResult } from './resultTypes';

/** The stretch a beam's mean gradient is averaged over: "the 8 cm of beam line". */
export function averagedOverText(magnet: MagnetResult | undefined): string {
  return magnet?.length_m !== undefined ? `the ${lengthText(magnet.length_m)} of beam line` : 'the beam line';
}

/** The gradient each beam through the magnet averages along its length, with the beam's name: "10.1 T/m (beam main)". */
export function averagedGradients(m: MagnetResult, beams: readonly BeamResult[], name: (beam: string) => string = (b) => b): string[] {
  return beams.filter((b) => b.magnet === m.name && b.field_map).map((b) => `${gradientText(b.field_map!.mean_gradient_T_per_m, 4)} (beam ${name(b.name)})`);
}

/** Where a sources-built magnet's field and gradient are taken, and what the beams through it average; undefined for a magnet with written values (uniform, the same everywhere). */
export function magnetGradientNote(m: MagnetResult, beams: readonly BeamResult[]): string | undefined {
  if (!m.sources) return undefined;
  const at = m.at_m ? pointText(m.at_m) : 'the origin';
  const averaged = averagedGradients(m, beams);
  const tail = averaged.length > 0 ? `; averaged along ${averagedOverText(m)}, ∂|B|/∂z is ${averaged.join(', ')}` : '';
  return `field and gradient at the centre of the beam line, ${at}${tail}`;
}
