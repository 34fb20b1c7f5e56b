import { describe, expect, it } from 'vitest';
import { sameShapeInput, type PatternInput } from '../../server/src/physics/beam/detectorPattern';
import type { BeamGeometry } from '../../server/src/physics/beam/types';

/** Every key of T required: adding a field to PatternInput or BeamGeometry makes this file fail the type check until the field is listed below. */
type EveryKey<T> = { [K in keyof Required<T>]: T[K] };

// Distinct values in every field, optional ones included, so a dropped or swapped field shows.
const geometry: EveryKey<BeamGeometry> = {
  slit1M: 1e-4,
  slit2M: 2e-4,
  slitSeparationM: 0.3,
  magnetLengthM: 0.4,
  driftM: 0.5,
  detectorWidthM: 6e-5,
  gradientTPerM: 70,
  detectorOffsetM: 8e-4,
};
const everyField: EveryKey<PatternInput> = {
  massKg: 9e-26,
  geometry,
  source: { kind: 'single', speed: 500 },
  sublevels: [{ label: 'a', momentJT: 1e-23, population: 1 }],
  bins: 1024,
  speedPanels: 64,
  tailFraction: 2e-3,
  mergeFraction: 0.3,
  dipCriterion: 0.7,
  spanM: { startM: -0.01, endM: 0.01 },
  minRelativeProminence: 2e-3,
};

describe('sameShapeInput copies the pattern input into one fixed shape', () => {
  it('keeps every field of PatternInput and BeamGeometry, optional ones included', () => {
    const copy = sameShapeInput(everyField);
    expect(copy).toStrictEqual(everyField);
    expect(Object.keys(copy).sort()).toEqual(Object.keys(everyField).sort());
    expect(Object.keys(copy.geometry).sort()).toEqual(Object.keys(geometry).sort());
  });
  it('gives inputs of different shapes the same key order (absent options as undefined)', () => {
    const sparse: PatternInput = { sublevels: everyField.sublevels, source: everyField.source, geometry: { ...geometry, detectorOffsetM: undefined }, massKg: 1e-25 };
    const a = sameShapeInput(sparse);
    const b = sameShapeInput(everyField);
    expect(Object.keys(a)).toEqual(Object.keys(b));
    expect(Object.keys(a.geometry)).toEqual(Object.keys(b.geometry));
    expect(a.bins).toBeUndefined();
    expect(a.massKg).toBe(1e-25);
  });
});
