/**
 * The flights of a beam through a magnet built from sources, for a profile fit
 * (physics/fit/profileModel.ts): the pattern input with each sublevel's flown coefficient
 * (fieldMapPattern.ts), and the coefficients again with every source's strength scaled, at the
 * speed asked (one moment table kept between calls, widened when the scale grows; the beam's own
 * flights at the reference speed stand for scale 1).
 */
import { CoefficientFlyer, fieldMapPattern } from '../physics/beam/trajectory';
import type { HyperfineLevelSpec } from '../physics/engine';
import { scaledField } from '../physics/fields';
import type { ProfileFlights } from '../physics/fit';
import type { MagnetModel } from '../model/types';
import type { BeamInputs } from './beamInput';
import { magnetFieldMap } from './magnetFieldMap';

export function sourceFlights(inputs: BeamInputs, spec: HyperfineLevelSpec, magnet: MagnetModel): { flights: ProfileFlights; patternInput: BeamInputs['input']; flown: () => number } | undefined {
  const map = magnetFieldMap(magnet);
  if (!map) return undefined;
  const labels = inputs.input.sublevels.map((s) => s.label);
  const mapped = fieldMapPattern({ pattern: inputs.input, field: map.field, centre: map.centre, obstacles: map.obstacles, spec, labels });
  if (!mapped.fieldMap || mapped.fieldMap.issues.some((i) => i.severity === 'error')) return undefined;
  const geo = inputs.input.geometry;
  const flyer = new CoefficientFlyer();
  const base = { field: map.field, centre: map.centre, magnetLengthM: geo.magnetLengthM, driftM: geo.driftM, massKg: inputs.input.massKg, spec, labels, maxFieldT: mapped.fieldMap.tableMaxFieldT };
  // A fit that leaves the scale and the speeds alone (width, populations) asks again for the same flights.
  const known = new Map<string, Float64Array | null>();
  // The beam's own flights at the reference speed are those at scale 1: the fit's start needs no new flight.
  const reference = mapped.referenceSpeed;
  if (reference !== undefined && mapped.speeds?.[0] === reference) {
    const own = mapped.fieldMap.sublevels;
    known.set(`1 ${reference}`, own.length === labels.length && own.every((s) => s.flights[0]!.flight.ok) ? Float64Array.from(own, (s) => s.coefficientM3PerS2) : null);
  }
  const coefficients = (scale: number, speed: number): Float64Array | null => {
    const key = `${scale} ${speed}`;
    if (!known.has(key)) {
      if (known.size >= 16) known.clear();
      known.set(key, flyer.fly({ ...base, field: scaledField(map.field, scale), maxFieldT: base.maxFieldT * Math.max(1, Math.abs(scale)) }, speed).k);
    }
    return known.get(key)!;
  };
  return { flights: { coefficients }, patternInput: mapped.pattern, flown: () => flyer.flights };
}
