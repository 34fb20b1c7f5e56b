/**
 * The physical range of a magnetic field. The strongest fields known are at magnetar surfaces,
 * about 1e11 T (from memory); laboratory magnets reach about 1e2 T steady and 1e3 T in
 * destructive pulses (from memory). A field far beyond that is a typing or unit mistake, so
 * anything above MAX_FIELD_T is refused where it is written, once, instead of being computed.
 */
import type { Range } from '../format/ast';
import type { ProblemList } from './problems';
import type { Valued } from './types';

export const MAX_FIELD_T = 1e12;

/** The field if it is within the physical range; otherwise undefined, with the problem added. */
export function physicalField(v: Valued<number> | undefined, written: string, range: Range, problems: ProblemList): Valued<number> | undefined {
  if (!v || Math.abs(v.value) <= MAX_FIELD_T) return v;
  problems.add(
    'field-beyond-physical',
    `${written} is beyond any magnetic field that exists: magnetars, the strongest known, reach about 1e11 T and laboratory magnets about 1e3 T; Sublevel accepts fields up to 1e12 T. Check the number and its unit`,
    range,
  );
  return undefined;
}
