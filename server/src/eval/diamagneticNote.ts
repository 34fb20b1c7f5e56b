/**
 * A note when a whole term is computed without its diamagnetic term although that term would
 * matter: its spread over the sublevels, (e²B²⟨r²⟩/8mₑh)(⟨sin²θ⟩_max − ⟨sin²θ⟩_min), estimated
 * with a hydrogenic ⟨r²⟩ (n of the last subshell written, Z = 1 — larger than the ⟨r²⟩ of a
 * valence electron that penetrates the core, so the estimate errs toward saying it), exceeds
 * 1e-3 of the smallest splitting between neighbouring sublevels at a working field (the 1e-3 is
 * common practice for "negligible"). Crossings (gaps below 1e-9 of the level's spread) are not
 * splittings.
 */
import { BOHR_RADIUS } from '../physics/constants';
import { diamagneticHzPerT2, hydrogenicR2InBohr2, sinSquaredMean } from '../physics/engine';
import type { LevelModel } from '../model/types';
import type { EvaluationNote } from './levelEvaluation';
import { frequencyText } from './quantityText';
import { fieldName, type FieldPoint } from './regimeNotes';

const NEGLIGIBLE = 1e-3;
const CROSSING = 1e-9;

/** Smallest gap between neighbouring sublevel energies (ascending), crossings left out; Infinity if none. */
function smallestSplitting(energies: readonly number[]): number {
  const spread = energies.length > 0 ? energies[energies.length - 1]! - energies[0]! : 0;
  let least = Infinity;
  for (let k = 1; k < energies.length; k++) {
    const gap = energies[k]! - energies[k - 1]!;
    if (gap > CROSSING * spread) least = Math.min(least, gap);
  }
  return least;
}

export function diamagneticNote(level: LevelModel, points: readonly FieldPoint[]): EvaluationNote | undefined {
  const L = level.term?.L ?? 0;
  const valence = level.configuration?.subshells.at(-1);
  if (level.kind !== 'term' || level.r2 || L === 0 || !valence) return undefined;
  const r2Bohr2 = hydrogenicR2InBohr2(valence.n, L);
  const perT2 = diamagneticHzPerT2(r2Bohr2 * BOHR_RADIUS ** 2) * (sinSquaredMean(L, L) - sinSquaredMean(L, 0));
  const matters = points.filter((p) => {
    const energies = p.r.exact.map((s) => s.energy_Hz).sort((a, b) => a - b);
    return perT2 * p.f.tesla ** 2 > NEGLIGIBLE * smallestSplitting(energies);
  });
  if (matters.length === 0) return undefined;
  const worst = matters.reduce((a, b) => (Math.abs(b.f.tesla) > Math.abs(a.f.tesla) ? b : a));
  const shift = perT2 * worst.f.tesla ** 2;
  return {
    code: 'diamagnetic-not-included',
    message:
      `term ${level.species.name}.${level.name} is computed without the diamagnetic term, which would change its splittings by up to ` +
      `about ${frequencyText(shift, 2)} at ${fieldName(worst.f)} (hydrogenic estimate, ⟨r²⟩ ≈ ${r2Bohr2} a0², n = ${valence.n}), ` +
      `more than ${NEGLIGIBLE} of its smallest splitting there; give the valence electron's \`r2 = … a0^2\` to include it`,
    range: level.nameRange,
    related: matters.map((p) => ({ message: `${fieldName(p.f)} is set here`, range: p.f.range })),
  };
}
