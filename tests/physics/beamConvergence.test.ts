// Convergence of the discretised pattern: doubling the detector grid (4096 → 8192 bins on the
// same span) or the jet's speed table (1024 → 2048 panels) must move peak positions, FWHMs and
// the pattern's first two moments by less than 1e-3 (relative; positions relative to
// max(|position|, image FWHM) so an undeflected peak is judged on the image scale).
import { describe, expect, it } from 'vitest';
import { detectorPattern, type BeamGeometry, type BeamSublevel, type DetectorPattern, type SpeedDistribution } from '../../server/src/physics/beam';
import { ATOMIC_MASS_UNIT, BOHR_MAGNETON } from '../../server/src/physics/constants';

/** 16 sublevels of a J = 1/2, I = 7/2 level at x = 0.5 (Breit–Rabi slopes, nuclear term dropped; invented scenario). */
function sixteenSublevels(): BeamSublevel[] {
  const out: BeamSublevel[] = [];
  const x = 0.5;
  const twoIplus1 = 8;
  for (let twoM = -8; twoM <= 8; twoM += 2) {
    const m = twoM / 2;
    for (const sign of [1, -1]) {
      if (Math.abs(twoM) === 8 && sign === -1) continue; // edge states exist once
      const root = Math.sqrt(1 + (4 * m * x) / twoIplus1 + x * x);
      const slope = Math.abs(twoM) === 8 ? Math.sign(m) : ((2 * m) / twoIplus1 + x) / root;
      out.push({ label: `${sign > 0 ? 'F=4' : 'F=3'} m=${m}`, momentJT: -sign * (2.0023 * BOHR_MAGNETON * slope) / 2, population: 1 });
    }
  }
  return out;
}

const geometry: BeamGeometry = {
  slit1M: 40e-6,
  slit2M: 30e-6,
  slitSeparationM: 0.8,
  magnetLengthM: 0.15,
  driftM: 0.6,
  detectorWidthM: 20e-6,
  gradientTPerM: 250,
};
const mass = 133 * ATOMIC_MASS_UNIT;

function moments(p: DetectorPattern): { mean: number; variance: number } {
  let m0 = 0;
  let m1 = 0;
  for (let j = 0; j < p.total.length; j++) {
    m0 += p.total[j];
    m1 += p.total[j] * p.positionsM[j];
  }
  const mean = m1 / m0;
  let c2 = 0;
  for (let j = 0; j < p.total.length; j++) c2 += p.total[j] * (p.positionsM[j] - mean) ** 2;
  return { mean, variance: c2 / m0 };
}

function compare(a: DetectorPattern, b: DetectorPattern): number {
  expect(b.peaks.length).toBe(a.peaks.length);
  const scale = a.image!.kernelFwhmM;
  let worst = 0;
  a.peaks.forEach((pa, i) => {
    const pb = b.peaks[i];
    worst = Math.max(worst, Math.abs(pa.positionM - pb.positionM) / Math.max(Math.abs(pa.positionM), scale));
    worst = Math.max(worst, Math.abs((pa.fwhmM ?? NaN) / (pb.fwhmM ?? NaN) - 1));
  });
  const ma = moments(a);
  const mb = moments(b);
  worst = Math.max(worst, Math.abs(ma.mean - mb.mean) / Math.sqrt(ma.variance), Math.abs(ma.variance / mb.variance - 1));
  return worst;
}

const sources: [string, SpeedDistribution][] = [
  ['oven 420 K', { kind: 'effusive', temperatureK: 420 }],
  ['jet 300 m/s ± 6 %', { kind: 'jet', meanSpeed: 300, relativeSpread: 0.06 }],
];

describe('pattern convergence, 16 sublevels', () => {
  for (const [name, source] of sources) {
    it(`${name}: 4096 → 8192 bins changes peaks and moments by < 1e-3`, () => {
      const sublevels = sixteenSublevels();
      const a = detectorPattern({ massKg: mass, geometry, source, sublevels, bins: 4096 });
      const b = detectorPattern({ massKg: mass, geometry, source, sublevels, bins: 8192 });
      expect(a.issues).toEqual([]);
      expect(a.peaks.length).toBeGreaterThan(2);
      expect(compare(a, b)).toBeLessThan(1e-3);
    });
  }
  it('jet: 1024 → 2048 speed-table panels changes peaks and moments by < 1e-3', () => {
    const sublevels = sixteenSublevels();
    const source = sources[1][1];
    const a = detectorPattern({ massKg: mass, geometry, source, sublevels, speedPanels: 1024 });
    const b = detectorPattern({ massKg: mass, geometry, source, sublevels, speedPanels: 2048 });
    expect(compare(a, b)).toBeLessThan(1e-3);
  });
  it('the 16-sublevel list has 16 entries and moments bounded by g_s μ_B/2', () => {
    const s = sixteenSublevels();
    expect(s).toHaveLength(16);
    for (const x of s) expect(Math.abs(x.momentJT)).toBeLessThanOrEqual((2.0023 * BOHR_MAGNETON) / 2 + 1e-30);
  });
});
