/**
 * The lengths Sublevel takes: sizes, distances and coordinates of an apparatus up to 1 km either
 * way (the same bound as the command line's field points). Beyond it a length is a typing slip
 * (`1e308 m`, `5 km` for `5 mm`), and squares of it overflow in the field formulas, so it is
 * refused where it is written instead of being computed.
 */
import type { Range } from '../format/ast';
import type { ProblemList } from './problems';

export const MAX_LENGTH_M = 1e3;

/** False, with the problem added, for a length beyond {@link MAX_LENGTH_M}. */
export function withinApparatus(valueM: number, written: string, range: Range, problems: ProblemList): boolean {
  if (Math.abs(valueM) <= MAX_LENGTH_M) return true;
  problems.add('value-beyond-apparatus', `${written} is beyond the lengths Sublevel takes (up to 1 km either way for a size, distance or position in an apparatus); check the number and its unit`, range);
  return false;
}
