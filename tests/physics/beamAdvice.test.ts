/**
 * The resolving options against closed forms outside the engine: an effusive beam's deflections
 * z = k/v² have the density ∝ z⁻³ exp(−c/z) (flux ∝ v³ exp(−Mv²/2kT), the textbook effusive flux
 * law); two sublevels with k and 2k then show no dip at all between their maxima (c/3 and 2c/3),
 * whatever the slits, magnet or drift. A single-speed beam has no speed spread to narrow.
 */
import { describe, expect, it } from 'vitest';
import { detectorPattern, resolvingOptions, worstDip, type PatternInput } from '../../server/src/physics/beam';
import { ATOMIC_MASS_UNIT, BOHR_MAGNETON } from '../../server/src/physics/constants';

// Invented scenario: 52 u, g_J = 3/2, J = 2 sublevels m_J = -2 … 2 (moments −m_J g_J μ_B).
const j2: PatternInput = {
  massKg: 52 * ATOMIC_MASS_UNIT,
  geometry: { slit1M: 20e-6, slit2M: 20e-6, slitSeparationM: 0.5, magnetLengthM: 0.1, driftM: 0.4, detectorWidthM: 10e-6, gradientTPerM: 100 },
  source: { kind: 'effusive', temperatureK: 500 },
  sublevels: [-2, -1, 0, 1, 2].map((m) => ({ label: `m=${m}`, momentJT: -m * 1.5 * BOHR_MAGNETON, population: 1 })),
};

/** Dip ratio of ρ(z) + ρ(z/2)/2 with ρ ∝ z⁻³ exp(−1/z) (c = 1), between the two maxima 1/3 and 2/3. */
function analyticDip(): number {
  const rho = (z: number): number => Math.exp(-1 / z) / (z * z * z);
  const sum = (z: number): number => rho(z) + rho(z / 2) / 2;
  const [a, b] = [1 / 3, 2 / 3];
  let low = Infinity;
  for (let i = 0; i <= 1000; i++) low = Math.min(low, sum(a + ((b - a) * i) / 1000));
  return low / Math.min(sum(a), sum(b));
}

describe('resolving options', () => {
  it('effusive J = 2: the closed form has no dip between m_J = 1 and 2, and the engine agrees', () => {
    expect(analyticDip()).toBe(1);
    const p = detectorPattern(j2);
    expect(worstDip(p)).toBeGreaterThan(0.97);
  });

  it('effusive J = 2: only a narrower speed spread is offered, and it resolves', () => {
    const found = resolvingOptions(j2, detectorPattern(j2));
    expect(found.options.map((o) => o.parameter)).toEqual(['speedSpread']);
    expect(found.options[0]!.resolvesAll).toBe(true);
    expect(found.options[0]!.value).toBe(0.1);
  });

  it('single speed, slit-limited: no speed-spread option; the gradient option resolves at the dip criterion', () => {
    const one: PatternInput = { ...j2, source: { kind: 'single', speed: 530 }, geometry: { ...j2.geometry, gradientTPerM: 0.5 } };
    const found = resolvingOptions(one, detectorPattern(one));
    const kinds = found.options.map((o) => o.parameter);
    expect(kinds).not.toContain('speedSpread');
    const g = found.options.find((o) => o.parameter === 'gradient')!;
    expect(g.resolvesAll).toBe(true);
    expect(g.worstDipRatio).toBeLessThanOrEqual(0.8);
    expect(g.worstDipRatio).toBeGreaterThan(0.7);
    for (const o of found.options) expect(o.worstDipRatio).toBeLessThan(found.presentWorstDipRatio - 0.02);
  });
});
