import { describe, expect, it } from 'vitest';
import { beamCautions, detectorPattern, MAX_HALF_ANGLE_RAD, validateGeometry, type PatternInput } from '../../server/src/physics/beam';
import { BOHR_MAGNETON } from '../../server/src/physics/constants';
import { MASS_39_U, SLIT_BEAM_GEOMETRY } from '../fixtures/slitBeamGeometry';

const geometry = SLIT_BEAM_GEOMETRY;
const input: PatternInput = {
  massKg: MASS_39_U,
  geometry,
  source: { kind: 'effusive', temperatureK: 500 },
  sublevels: [{ label: 'a', momentJT: BOHR_MAGNETON, population: 1 }],
};
const codes = (p: PatternInput): string[] => detectorPattern(p).issues.map((i) => i.code);

describe('input checks come back as issues, never exceptions', () => {
  it('a clean input has no issues', () => {
    expect(codes(input)).toEqual([]);
  });
  it.each([
    ['slit1M', 0],
    ['slit2M', -1e-6],
    ['slitSeparationM', 0],
    ['magnetLengthM', -0.1],
    ['driftM', -0.1],
    ['detectorWidthM', -1e-6],
    ['slit1M', Number.NaN],
  ] as const)('%s = %s is an invalid length', (key, value) => {
    const p = detectorPattern({ ...input, geometry: { ...geometry, [key]: value } });
    expect(p.issues.map((i) => i.code)).toContain('beam-length-invalid');
    expect(p.total).toHaveLength(0);
  });
  it('a gradient with no magnet length', () => {
    expect(codes({ ...input, geometry: { ...geometry, magnetLengthM: 0 } })).toEqual(['beam-gradient-without-magnet']);
  });
  it('slits too wide for their separation (half-angle bound)', () => {
    // (w1 + w2)/2d = (0.07 + 0.07)/1.2 = 0.117 rad > 0.1 rad.
    expect(MAX_HALF_ANGLE_RAD).toBe(0.1);
    expect(validateGeometry({ ...geometry, slit1M: 0.07, slit2M: 0.07 }).map((i) => i.code)).toEqual(['beam-slits-too-wide']);
    expect(validateGeometry({ ...geometry, slit1M: 0.05, slit2M: 0.05 })).toEqual([]); // 0.083 rad is allowed
  });
  it('temperature, speeds, spread and mass', () => {
    expect(codes({ ...input, source: { kind: 'effusive', temperatureK: 0 } })).toEqual(['beam-temperature-invalid']);
    expect(codes({ ...input, source: { kind: 'single', speed: -3 } })).toEqual(['beam-speed-invalid']);
    expect(codes({ ...input, source: { kind: 'jet', meanSpeed: 0, relativeSpread: 0.1 } })).toEqual(['beam-speed-invalid']);
    expect(codes({ ...input, source: { kind: 'jet', meanSpeed: 500, relativeSpread: 0 } })).toEqual(['beam-spread-invalid']);
    expect(codes({ ...input, massKg: 0 })).toEqual(['beam-mass-invalid']);
  });
  it('sublevels: none, bad moment, negative or all-zero populations', () => {
    expect(codes({ ...input, sublevels: [] })).toEqual(['beam-no-sublevels']);
    expect(codes({ ...input, sublevels: [{ label: 'x', momentJT: Infinity, population: 1 }] })).toEqual(['beam-moment-invalid']);
    expect(codes({ ...input, sublevels: [{ label: 'x', momentJT: 1e-23, population: -1 }] })).toEqual(['beam-population-invalid']);
    expect(codes({ ...input, sublevels: [{ label: 'x', momentJT: 1e-23, population: 0 }] })).toEqual(['beam-population-empty']);
  });
  it('options out of range', () => {
    expect(codes({ ...input, bins: 3 })).toEqual(['beam-option-invalid']);
    expect(codes({ ...input, dipCriterion: 1.5 })).toEqual(['beam-option-invalid']);
    expect(codes({ ...input, spanM: { startM: 1, endM: 0 } })).toEqual(['beam-option-invalid']);
  });
  it('zero gradient and a point detector are notes, not errors', () => {
    const p = detectorPattern({ ...input, geometry: { ...geometry, gradientTPerM: 0, detectorWidthM: 0 } });
    expect(p.issues.map((i) => `${i.severity}:${i.code}`)).toEqual(['info:beam-point-detector', 'info:beam-no-gradient']);
    expect(p.peaks).toHaveLength(1);
  });
  it('a detector placed where no atoms arrive is reported; one on the beam receives a fraction', () => {
    const miss = detectorPattern({ ...input, geometry: { ...geometry, detectorOffsetM: -0.05 } });
    expect(miss.issues.map((i) => i.code)).toEqual(['beam-misses-detector']);
    expect(miss.detectorFraction).toBe(0);
    const hit = detectorPattern({ ...input, geometry: { ...geometry, detectorOffsetM: 0.004 } });
    expect(hit.issues).toEqual([]);
    expect(hit.detectorFraction).toBeGreaterThan(0);
    expect(hit.detectorFraction).toBeLessThan(1);
  });
  it('a wide oven tail beyond the grid is reported when it exceeds 5 %', () => {
    const p = detectorPattern({ ...input, spanM: { startM: -0.001, endM: 0.002 } });
    expect(p.offGridFraction).toBeGreaterThan(0.05);
    expect(p.issues.map((i) => i.code)).toEqual(['beam-pattern-off-grid']);
  });
});

describe('safety cautions follow the setup (thresholds: common practice)', () => {
  it('a hot alkali oven behind a strong magnet: magnet, hot oven, alkali metal, vacuum', () => {
    const c = beamCautions({ magnetFieldT: 0.45, ovenTemperatureK: 720, element: 'Li' });
    expect(c.map((x) => x.split(' ')[0])).toEqual(['Strong', 'Hot', 'Alkali', 'Vacuum:']);
    expect(c[0]).toContain('0.45 T');
    expect(c[1]).toContain('720 K');
    for (const x of c) expect(x).toMatch(/lab's/);
  });

  it('a 77 K source of a non-alkali species: cryogen, no hot oven, no alkali metal', () => {
    const c = beamCautions({ magnetFieldT: 0.45, ovenTemperatureK: 77, element: 'He' }).join(' ');
    expect(c).toContain('Cryogenic source (77 K)');
    expect(c).not.toMatch(/Hot oven|Alkali/);
  });

  it('a room-temperature source in a weak field: vacuum only', () => {
    expect(beamCautions({ magnetFieldT: 1e-4, ovenTemperatureK: 300 })).toEqual([expect.stringMatching(/^Vacuum/)]);
  });
});
