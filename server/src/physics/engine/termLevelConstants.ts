/**
 * What a whole-term spec resolves to, for reports: the J-level energies, the radial hyperfine
 * parameters and how they were obtained, and the J-level constants A_J, B_J they imply.
 */
import type { HyperfineSource, RadialParameters } from './termHyperfineParameters';
import type { EngineIssue, WholeTermSpec } from './types';
import { validateTerm } from './validateTerm';
import { impliedLevelConstants } from './wholeTermModel';

export interface TermConstants {
  levels: { twoJ: number; energyHz: number; A: number; B: number }[];
  radial: RadialParameters;
  quadrupoleL: number;
  source: HyperfineSource;
}

export function termLevelConstants(spec: WholeTermSpec): { constants: TermConstants | null; issues: EngineIssue[] } {
  const issues: EngineIssue[] = [];
  const s = validateTerm(spec, issues);
  if (!s) return { constants: null, issues };
  const implied = impliedLevelConstants(s);
  const levels = [...s.levelEnergies].map(([twoJ, energyHz]) => ({ twoJ, energyHz, A: implied.get(twoJ)?.A ?? 0, B: implied.get(twoJ)?.B ?? 0 }));
  return { constants: { levels, radial: s.radial, quadrupoleL: s.quadrupoleL, source: s.hyperfineSource }, issues };
}
