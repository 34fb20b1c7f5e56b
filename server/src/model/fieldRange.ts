/**
 * The range of fields Sublevel computes, the same in a setup file and on the command line.
 * The atomic unit of magnetic flux density is 2.350 517 570 × 10^5 T (CODATA 2022); near it the
 * Zeeman term is as large as the binding of the atom, and the Hamiltonian used here (no
 * diamagnetic term) no longer describes it. Laboratory magnets reach about 1e2 T steady and 1e3 T
 * in destructive pulses (from memory). A field above MAX_FIELD_T is refused where it is written,
 * once, instead of being computed.
 */
import type { Range } from '../format/ast';
import type { ProblemList } from './problems';
import type { Valued } from './types';

export const MAX_FIELD_T = 1e5;

/** The field if it is within the physical range; otherwise undefined, with the problem added. */
export function physicalField(v: Valued<number> | undefined, written: string, range: Range, problems: ProblemList): Valued<number> | undefined {
  if (!v || Math.abs(v.value) <= MAX_FIELD_T) return v;
  problems.add(
    'field-beyond-physical',
    `${written} is outside the fields Sublevel computes (|B| up to 1e5 T; near the atomic unit, 2.35e5 T, the atom's own binding is no longer the larger term, and laboratory magnets reach about 1e3 T). Check the number and its unit`,
    range,
  );
  return undefined;
}
