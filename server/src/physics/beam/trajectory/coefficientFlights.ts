/**
 * The deflection coefficients k = z_detector · v² of a beam's sublevels flown at one speed, for
 * setups that differ a little from the beam's own (an input nudged for its uncertainty, every
 * source scaled in a profile fit). The pattern reads only the coefficients at the reference
 * speed (fieldMapPattern.ts), so these re-fly that one speed per sublevel and reuse the moment
 * table while the level is unchanged; the table is widened (and the flights repeated) when an
 * atom strays beyond it, by the loop fieldMapBeam.ts uses (widenedTable.ts).
 */
import type { LevelSpec } from '../../engine';
import type { FieldMapInput } from './fieldMapBeam';
import { flySublevel } from './flight';
import { sublevelCurves, type SublevelCurves } from './sublevelCurves';
import { BEYOND_TABLE, flyWideningTable } from './widenedTable';

/** A field-map beam's own flight set-up (fieldMapBeam.ts), with the moment table's field range. */
export type CoefficientSetup = Pick<FieldMapInput, 'field' | 'centre' | 'magnetLengthM' | 'driftM' | 'massKg' | 'spec' | 'labels' | 'options'> & {
  /** The field range of the moment table, T (a beam's `moment_table_max_T`). */
  maxFieldT: number;
};

export interface CoefficientFlights {
  /** k of each sublevel, m³/s² (same order as the labels); null when a flight failed. */
  k: Float64Array | null;
  /** dz/dx after the magnet, rad (∂k/∂drift = angle · v²). */
  exitAngles: Float64Array;
}

/** Keeps one moment table per level spec (by identity) so re-flights with the same level reuse it. */
export class CoefficientFlyer {
  private tables = new Map<LevelSpec, SublevelCurves>();
  /** Flights flown so far (the cost of what used this flyer; the fit bench prints it). */
  flights = 0;

  fly(setup: CoefficientSetup, speed: number): CoefficientFlights {
    const exitAngles = new Float64Array(setup.labels.length);
    const flown = flyWideningTable(
      setup.maxFieldT,
      (maxT) => ({ ...this.curves(setup.spec, maxT), issues: [] }),
      (curves) => this.flyAt(setup, curves, speed, exitAngles),
    );
    return { k: flown.kind === 'flown' ? flown.value : null, exitAngles };
  }

  /** Every sublevel at one speed: k, or null when a flight failed, or BEYOND_TABLE. */
  private flyAt(setup: CoefficientSetup, curves: SublevelCurves, speed: number, exitAngles: Float64Array): Float64Array | null | typeof BEYOND_TABLE {
    const k = new Float64Array(setup.labels.length);
    const flightSetup = { field: setup.field, centre: setup.centre, magnetLengthM: setup.magnetLengthM, driftM: setup.driftM, massKg: setup.massKg, curves };
    for (let i = 0; i < setup.labels.length; i++) {
      const state = curves.labels.findIndex((l) => l.low === setup.labels[i]);
      if (state < 0) return null;
      const f = flySublevel(flightSetup, state, speed, setup.options);
      this.flights++;
      if (f.issues.some((x) => x.code === 'trajectory-field-beyond-table')) return BEYOND_TABLE;
      if (!f.ok) return null;
      k[i] = f.detector.zM * speed * speed;
      exitAngles[i] = f.exit.angleZ;
    }
    return k;
  }

  private curves(spec: LevelSpec, maxT: number): { curves?: SublevelCurves } {
    const known = this.tables.get(spec);
    if (known && known.maxFieldT >= maxT) return { curves: known };
    const built = sublevelCurves(spec, maxT).curves;
    if (built) this.tables.set(spec, built);
    return built ? { curves: built } : {};
  }
}
