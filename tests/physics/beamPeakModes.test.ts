// Peak positions of narrow-slit multi-peak beams against the analytic mode of each sublevel's
// profile: tests/reference/beam_peak_modes.json, written by scripts/reference/beam_peak_modes.py
// (the zero of the slope by mpmath quadrature at 30 digits and Illinois; versions in the file).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { detectorPattern, type BeamGeometry, type SpeedDistribution } from '../../server/src/physics/beam';
import { ATOMIC_MASS_UNIT } from '../../server/src/physics/constants';

interface Scenario {
  name: string;
  geometry: BeamGeometry;
  mass_u: number;
  source: SpeedDistribution;
  sublevels: { label: string; moment_JT: number; mode_m: number; fwhm_m: number | null }[];
}
/** Measured worst 6.5e-13 (docs/beam.md §4); the reference holds ~30 digits, the slope's round-off sets this. */
const MODE_TOLERANCE = 2e-12;
const ref = JSON.parse(readFileSync(join(__dirname, '..', 'reference', 'beam_peak_modes.json'), 'utf8')) as { scenarios: Scenario[] };

describe('peak positions agree with the analytic mode to MODE_TOLERANCE relative', () => {
  for (const s of ref.scenarios) {
    it(s.name, () => {
      const p = detectorPattern({
        massKg: s.mass_u * ATOMIC_MASS_UNIT,
        geometry: s.geometry,
        source: s.source,
        sublevels: s.sublevels.map((x) => ({ label: x.label, momentJT: x.moment_JT, population: 1 })),
      });
      expect(p.peaks).toHaveLength(s.sublevels.length);
      for (const r of s.sublevels) {
        const peak = p.peaks.find((k) => k.members.length === 1 && k.members[0] === r.label)!;
        const own = p.sublevels.find((x) => x.label === r.label)!;
        if (r.mode_m === 0) {
          expect(peak.positionM).toBe(0);
          expect(own.peakM).toBe(0);
          continue;
        }
        expect(Math.abs(peak.positionM / r.mode_m - 1), r.label).toBeLessThan(MODE_TOLERANCE);
        expect(Math.abs(own.peakM / r.mode_m - 1), r.label).toBeLessThan(MODE_TOLERANCE);
      }
    });
  }
});
