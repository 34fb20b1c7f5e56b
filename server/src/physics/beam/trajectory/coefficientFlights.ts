/**
 * The deflection coefficients k = z_detector · v² of a beam's sublevels flown at one speed, for
 * setups that differ a little from the beam's own (an input nudged for its uncertainty, every
 * source scaled in a profile fit). The pattern reads only the coefficients at the reference
 * speed (fieldMapPattern.ts), so these re-fly that one speed per sublevel and reuse the moment
 * table while the level is unchanged; the table is widened (and the flights repeated) when an
 * atom strays beyond it, as fieldMapBeam.ts does.
 */
import type { LevelSpec } from '../../engine';
import type { FieldMapInput } from './fieldMapBeam';
import { flySublevel } from './flight';
import { sublevelCurves, type SublevelCurves } from './sublevelCurves';

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
  flights: number;
}

/** Keeps one moment table per level spec (by identity) so re-flights with the same level reuse it. */
export class CoefficientFlyer {
  private tables = new Map<LevelSpec, SublevelCurves>();
  /** Flights flown so far (the cost of what used this flyer). */
  flights = 0;

  fly(setup: CoefficientSetup, speed: number): CoefficientFlights {
    let maxT = setup.maxFieldT;
    const exitAngles = new Float64Array(setup.labels.length);
    for (let attempt = 0; attempt < 3; attempt++) {
      const curves = this.curves(setup.spec, maxT);
      if (!curves) return { k: null, exitAngles, flights: 0 };
      const k = new Float64Array(setup.labels.length);
      let beyond = false;
      let failed = false;
      let flown = 0;
      const flightSetup = { field: setup.field, centre: setup.centre, magnetLengthM: setup.magnetLengthM, driftM: setup.driftM, massKg: setup.massKg, curves };
      for (let i = 0; i < setup.labels.length && !beyond && !failed; i++) {
        const state = curves.labels.findIndex((l) => l.low === setup.labels[i]);
        if (state < 0) failed = true;
        else {
          const f = flySublevel(flightSetup, state, speed, setup.options);
          flown++;
          if (f.issues.some((x) => x.code === 'trajectory-field-beyond-table')) beyond = true;
          else if (!f.ok) failed = true;
          k[i] = f.detector.zM * speed * speed;
          exitAngles[i] = f.exit.angleZ;
        }
      }
      this.flights += flown;
      if (beyond) {
        maxT *= 4;
        continue;
      }
      return { k: failed ? null : k, exitAngles, flights: flown };
    }
    return { k: null, exitAngles, flights: 0 };
  }

  private curves(spec: LevelSpec, maxT: number): SublevelCurves | undefined {
    const known = this.tables.get(spec);
    if (known && known.maxFieldT >= maxT) return known;
    const built = sublevelCurves(spec, maxT).curves;
    if (built) this.tables.set(spec, built);
    return built;
  }
}
