/**
 * How a level's designation is shown: the configuration space-separated (`1s2 2s`, never the
 * dotted `1s2.2s` some files write) and the term with the ° parity mark (`²P°₃/₂`, never `2Po3/2`).
 * The dotted and `o` forms stay accepted as input; outputs use these.
 */
import type { LevelModel } from '../model/types';
import { formatConfiguration, type Configuration } from '../physics/configuration';
import { formatTermSymbol, type TermSymbol } from '../physics/termSymbol';

/** The configuration as shown, or null without one. */
export function configurationText(c: Configuration | null | undefined): string | null {
  return c ? formatConfiguration(c, 'ascii') : null;
}

/** Configuration and term as shown, e.g. `2p ²P°₃/₂`; the written text when the term cannot be read. */
export function designationText(configuration: Configuration | null | undefined, term: TermSymbol | null | undefined, written: string): string {
  if (!term) return written;
  return [configurationText(configuration), formatTermSymbol(term, 'unicode')].filter((x) => x).join(' ');
}

export function levelDesignationText(level: Pick<LevelModel, 'configuration' | 'term' | 'designationText'>): string {
  return designationText(level.configuration, level.term, level.designationText);
}
