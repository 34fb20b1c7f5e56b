/**
 * Out-of-sample check of the coarse screen of the resolving search (physics/beam/trialScreen.ts):
 * its margins are empirical, so on random invented beams — close sublevels included, whose
 * peaks are only a few coarse bins apart — the advice with the screen on must be exactly the
 * advice with it off (TRIAL_SCREEN.enabled, a module-internal switch). The reference is the
 * search itself without the screen: the screen may only save work, never change an answer.
 * FUZZ_RUNS sets the number of beams (default 40), FUZZ_TIME_MS a time limit (default 8 s; a few seconds
 * on an idle machine); fast-check prints the seed of a failure.
 */
import fc from 'fast-check';
import { describe, expect, it, vi } from 'vitest';
import { detectorPattern, resolvingOptions, type DetectorPattern, type PatternInput } from '../../server/src/physics/beam';
import { TRIAL_SCREEN } from '../../server/src/physics/beam/trialScreen';
import { ATOMIC_MASS_UNIT, BOHR_MAGNETON, BOLTZMANN_K } from '../../server/src/physics/constants';

const RUNS = Number(process.env.FUZZ_RUNS ?? '') || 40;
/** Bounded run time on a loaded machine: fast-check stops drawing beams after this (not a failure). */
const TIME_LIMIT_MS = Number(process.env.FUZZ_TIME_MS ?? '') || 8_000;

/** How often the screen claimed a trial certainly above the bar (the test is not vacuous if it did). */
const seen = vi.hoisted(() => ({ claims: 0 }));
vi.mock('../../server/src/physics/beam/trialScreen', async (importOriginal) => {
  const m = await importOriginal<typeof import('../../server/src/physics/beam/trialScreen')>();
  return {
    ...m,
    certainlyAbove: (...args: Parameters<typeof m.certainlyAbove>): boolean => {
      const claim = m.certainlyAbove(...args);
      if (claim) seen.claims++;
      return claim;
    },
  };
});

/** Invented beams: oven or jet (a single speed is never screened), 1–5 moments within ±2 μ_B, each possibly with a close twin. */
/** Uniform over [lo, hi] (fc.double spreads its draws over the floats' exponents: mostly tiny numbers). */
const uniform = (lo: number, hi: number): fc.Arbitrary<number> => fc.integer({ min: 0, max: 1_000_000 }).map((i) => lo + ((hi - lo) * i) / 1_000_000);

// noBias: fast-check's default bias towards the ends of each range would make most beams equal moments or extremes.
const beam: fc.Arbitrary<PatternInput> = fc
  .noBias(fc.record({
    massU: uniform(6, 160),
    slit1: uniform(5e-6, 100e-6),
    slit2: uniform(5e-6, 100e-6),
    separation: uniform(0.1, 0.6),
    magnet: uniform(0.02, 0.25),
    drift: uniform(0, 0.6),
    detector: fc.oneof(fc.constant(0), uniform(1e-6, 50e-6)),
    // The gradient puts the first two moments' mean deflections 10^-0.5 … 10^1.5 image widths apart.
    apartDecades: uniform(-0.5, 1.5),
    negative: fc.boolean(),
    source: fc.oneof(
      fc.record({ kind: fc.constant('effusive' as const), temperatureK: uniform(300, 1300) }),
      fc.record({ kind: fc.constant('jet' as const), meanSpeed: uniform(300, 1800), relativeSpread: uniform(0.02, 0.33) }),
    ),
    moments: fc.array(uniform(-2, 2), { minLength: 2, maxLength: 4 }),
    // A twin at a relative distance 10^-4 … 10^-0.5 of its moment: from merged to a few coarse bins apart to well apart.
    twins: fc.array(fc.record({ of: fc.nat(), decades: uniform(-4, -0.5) }), { maxLength: 2 }),
  }))
  .map((r) => {
    const moments = [...r.moments, ...r.twins.map((t) => r.moments[t.of % r.moments.length]! * (1 + 10 ** t.decades))];
    // Rough sizes only (the gradient is just a way to land near the interesting range): the image
    // FWHM max(a, b) of docs/beam.md §1 and ⟨1/v²⟩ = M/2kT (oven) or about 1/⟨v⟩² (jet).
    const mass = r.massU * ATOMIC_MASS_UNIT;
    const flight = r.magnet + r.drift;
    const image = Math.max(r.slit2 * (1 + flight / r.separation), (r.slit1 * flight) / r.separation) + r.detector;
    const inverseSquare = r.source.kind === 'effusive' ? mass / (2 * BOLTZMANN_K * r.source.temperatureK) : 1 / r.source.meanSpeed ** 2;
    const lever = r.magnet ** 2 / 2 + r.magnet * r.drift;
    const apartMoment = Math.max(Math.abs(r.moments[0]! - r.moments[1]!), 1e-3) * BOHR_MAGNETON;
    const gradient = (10 ** r.apartDecades * image * mass) / (apartMoment * lever * inverseSquare);
    return {
      massKg: mass,
      geometry: {
        slit1M: r.slit1,
        slit2M: r.slit2,
        slitSeparationM: r.separation,
        magnetLengthM: r.magnet,
        driftM: r.drift,
        detectorWidthM: r.detector,
        gradientTPerM: (r.negative ? -1 : 1) * gradient,
      },
      source: r.source,
      sublevels: moments.map((m, i) => ({ label: `s${i}`, momentJT: m * BOHR_MAGNETON, population: 1 })),
      // The smallest grid the screen works on (8 × its 256 bins): half the cost of the default 4,096.
      bins: 2048,
    };
  });

function adviceWithScreen(input: PatternInput, present: DetectorPattern, enabled: boolean): ReturnType<typeof resolvingOptions> {
  TRIAL_SCREEN.enabled = enabled;
  try {
    return resolvingOptions(input, present);
  } finally {
    TRIAL_SCREEN.enabled = true;
  }
}

describe('coarse screen of the resolving search, out of sample', () => {
  it('gives the same advice as the search without it, on random oven and jet beams', () => {
    seen.claims = 0;
    let unresolved = 0;
    fc.assert(
      fc.property(beam, (input) => {
        const present = detectorPattern(input);
        if (present.allResolved || present.pairs.length === 0) return; // no search, or no fixed groups to screen
        unresolved++;
        expect(adviceWithScreen(input, present, true)).toEqual(adviceWithScreen(input, present, false));
      }),
      { numRuns: RUNS, interruptAfterTimeLimit: TIME_LIMIT_MS, markInterruptAsFailure: false },
    );
    // Not vacuous: beams with unresolved pairs were searched, and the screen made claims on them.
    expect(unresolved).toBeGreaterThanOrEqual(3);
    expect(seen.claims).toBeGreaterThan(0);
  }, 120_000); // the time limit above, plus one beam's two searches on a loaded machine
});
