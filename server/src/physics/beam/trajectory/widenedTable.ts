/**
 * Flights read each sublevel's energy and moment from a table over 0 … maxT (sublevelCurves.ts).
 * An atom deflected far from the beam line can meet stronger fields than the table holds; then
 * the table is widened fourfold and every flight repeated, twice at most. The beam's own flights
 * (fieldMapBeam.ts) and the re-flights for uncertainties and fits (coefficientFlights.ts) share
 * this one loop.
 */
import type { BeamIssue } from '../types';
import type { SublevelCurves } from './sublevelCurves';

/** What a set of flights returns when an atom met a field beyond the table: a symbol, so no flown value (a string, a number) can be taken for it. */
export const BEYOND_TABLE: unique symbol = Symbol('beyond the table');

/** Tables tried: the first and two widenings (our choice: a fourfold widening twice covers 16 times the first range). */
const ATTEMPTS = 3;
const WIDENING = 4;

export type WidenedFlights<T> =
  /** Flown within the table over 0 … maxT; `issues` are the table's own. */
  | { kind: 'flown'; value: T; curves: SublevelCurves; maxT: number; issues: BeamIssue[] }
  /** The table could not be built. */
  | { kind: 'no-table'; issues: BeamIssue[] }
  /** Still beyond after the last widening; `maxT` is the range that would have come next. */
  | { kind: 'beyond'; maxT: number };

export function flyWideningTable<T>(
  firstMaxT: number,
  table: (maxT: number) => { curves?: SublevelCurves; issues: BeamIssue[] },
  fly: (curves: SublevelCurves) => T | typeof BEYOND_TABLE,
): WidenedFlights<T> {
  let maxT = firstMaxT;
  for (let attempt = 0; attempt < ATTEMPTS; attempt++) {
    const built = table(maxT);
    if (!built.curves) return { kind: 'no-table', issues: built.issues };
    const flown = fly(built.curves);
    if (flown !== BEYOND_TABLE) return { kind: 'flown', value: flown, curves: built.curves, maxT, issues: built.issues };
    maxT *= WIDENING;
  }
  return { kind: 'beyond', maxT };
}
