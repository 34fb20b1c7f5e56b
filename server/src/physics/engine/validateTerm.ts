/**
 * Checks a whole-term spec and resolves its data: the energy of every J level (from ζ or as
 * given) and the hyperfine parameters (given, or derived from the J-level constants with the
 * assumption stated in termHyperfineParameters.ts). Size caps as for the other kinds.
 */
import { couplings } from './halfIntegers';
import { issue } from './issues';
import { MAX_BASIS_STATES, MAX_BLOCK_SIZE } from './limits';
import { fineZeroFieldHz } from './zeroFieldLevels';
import { diamagneticHzPerT2 } from './diamagnetic';
import { hyperfineFromLevels, type HyperfineSource, type RadialParameters } from './termHyperfineParameters';
import { termBlockSize } from './termBasis';
import type { EngineIssue, WholeTermSpec } from './types';

export interface CleanTerm extends Pick<WholeTermSpec, 'kind' | 'twoS' | 'L' | 'twoI' | 'gL' | 'gS' | 'gI'> {
  /** E_J by twoJ, Hz. */
  levelEnergies: Map<number, number>;
  radial: RadialParameters;
  quadrupoleL: number;
  hyperfineSource: HyperfineSource;
  /** e²⟨r²⟩/(8mₑh), Hz/T²; 0 when the diamagnetic term is off. */
  diamagneticHzPerT2: number;
}

const isCount = (v: unknown): v is number => typeof v === 'number' && Number.isInteger(v) && v >= 0;
const isReal = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

function levelMap<T extends { twoJ: number }>(list: readonly T[] | undefined, value: (x: T) => unknown, jValues: number[], what: string, issues: EngineIssue[]): Map<number, number> | null {
  const out = new Map<number, number>();
  if (list === undefined) return out;
  if (!Array.isArray(list)) {
    issues.push(issue('error', 'bad-constant', `${what} must be a list of levels.`));
    return null;
  }
  for (const x of list) {
    const v = x && typeof x === 'object' ? value(x) : undefined;
    if (!x || !jValues.includes(x.twoJ) || !isReal(v)) {
      issues.push(issue('error', 'term-bad-level', `${what}: every entry needs a J of this term (${jValues.map((j) => (j % 2 ? `${j}/2` : j / 2)).join(', ')}) and a finite value.`));
      return null;
    }
    if (out.has(x.twoJ)) {
      issues.push(issue('error', 'term-bad-level', `${what}: the level J = ${x.twoJ % 2 ? `${x.twoJ}/2` : x.twoJ / 2} is given twice.`));
      return null;
    }
    out.set(x.twoJ, v);
  }
  return out;
}

function checkTermSize(twoL: number, twoS: number, twoI: number, issues: EngineIssue[]): boolean {
  const dimension = (twoL + 1) * (twoS + 1) * (twoI + 1);
  if (dimension > MAX_BASIS_STATES) {
    issues.push(issue('error', 'basis-too-large', `The term with its nucleus has ${dimension} sublevels; the engine handles at most ${MAX_BASIS_STATES}.`));
    return false;
  }
  // The middle block (total m = 0 or 1/2) is the largest.
  const largest = termBlockSize([twoL, twoS, twoI], (twoL + twoS + twoI) % 2);
  if (largest > MAX_BLOCK_SIZE) {
    issues.push(issue('error', 'block-too-large', `One m block of the term would have ${largest} states; the engine handles at most ${MAX_BLOCK_SIZE}.`));
    return false;
  }
  return true;
}

function fineEnergies(s: WholeTermSpec, jValues: number[], issues: EngineIssue[]): Map<number, number> | null {
  const hasZeta = s.zeta !== undefined;
  if (hasZeta && s.levelEnergies !== undefined) {
    issues.push(issue('error', 'term-fine-both', 'Give the fine structure once: either ζ or the energies of the J levels.'));
    return null;
  }
  if (hasZeta) {
    if (!isReal(s.zeta)) {
      issues.push(issue('error', 'bad-constant', 'ζ must be a finite number.'));
      return null;
    }
    return new Map(jValues.map((twoJ) => [twoJ, fineZeroFieldHz(s.L, s.twoS, twoJ, s.zeta as number)]));
  }
  const given = levelMap(s.levelEnergies, (x) => x.energyHz, jValues, 'Level energies', issues);
  if (!given) return null;
  if (given.size !== jValues.length) {
    issues.push(issue('error', 'term-fine-missing', `The term needs its fine structure: ζ, or the energy of each of its ${jValues.length} J levels (${given.size} given).`));
    return null;
  }
  return given;
}

export function validateTerm(s: WholeTermSpec, issues: EngineIssue[]): CleanTerm | null {
  if (!isCount(s.twoS) || !isCount(s.L) || !isCount(s.twoI)) {
    issues.push(issue('error', 'bad-momentum', 'twoS (twice S), L and twoI (twice I) must be whole numbers ≥ 0.'));
    return null;
  }
  if (!isReal(s.gL) || !isReal(s.gS) || !isReal(s.gI)) {
    issues.push(issue('error', 'bad-constant', 'g_L, g_S and g_I must be finite numbers.'));
    return null;
  }
  const twoL = 2 * s.L;
  if (!checkTermSize(twoL, s.twoS, s.twoI, issues)) return null;
  const jValues = couplings(twoL, s.twoS);
  const levelEnergies = fineEnergies(s, jValues, issues);
  if (!levelEnergies) return null;
  if (s.r2M2 !== undefined && !(isReal(s.r2M2) && s.r2M2 > 0)) {
    issues.push(issue('error', 'bad-constant', '⟨r²⟩ for the diamagnetic term must be a finite number above zero.'));
    return null;
  }
  const diamagnetic = s.r2M2 === undefined ? 0 : diamagneticHzPerT2(s.r2M2);
  const base = { kind: 'term' as const, twoS: s.twoS, L: s.L, twoI: s.twoI, gL: s.gL, gS: s.gS, gI: s.gI, levelEnergies, diamagneticHzPerT2: diamagnetic };
  if (s.twoI === 0) {
    // Fine structure alone (e.g. from measured J-level energies): nothing for hyperfine data to act on.
    if (s.radial !== undefined || s.levelA !== undefined || s.levelB !== undefined) {
      issues.push(issue('info', 'no-nucleus', 'With I = 0 there is no hyperfine structure; the hyperfine data have no effect.'));
    }
    return { ...base, radial: { orbital: 0, spinDipolar: 0, contact: 0 }, quadrupoleL: 0, hyperfineSource: 'none' };
  }
  if (s.radial !== undefined) {
    const r = s.radial;
    if (!r || ![r.orbital, r.spinDipolar, r.contact].every(isReal) || !(r.quadrupole === undefined || isReal(r.quadrupole))) {
      issues.push(issue('error', 'bad-constant', 'The radial parameters a_L, a_SD, a_C (and b_L) must be finite numbers.'));
      return null;
    }
    if (s.levelA !== undefined || s.levelB !== undefined) {
      issues.push(issue('error', 'term-hyperfine-twice', 'Give the hyperfine data once: either the radial parameters or the J-level constants.'));
      return null;
    }
    const radial = { orbital: r.orbital, spinDipolar: r.spinDipolar, contact: r.contact };
    return { ...base, radial, quadrupoleL: r.quadrupole ?? 0, hyperfineSource: 'radial' };
  }
  const levelA = levelMap(s.levelA, (x) => x.A, jValues, 'Hyperfine A constants', issues);
  const levelB = levelMap(s.levelB, (x) => x.B, jValues, 'Hyperfine B constants', issues);
  if (!levelA || !levelB) return null;
  const hf = hyperfineFromLevels(twoL, s.twoS, s.twoI, levelA, levelB, issues);
  if (!hf) return null;
  return { ...base, radial: hf.radial, quadrupoleL: hf.quadrupoleL, hyperfineSource: hf.source };
}
