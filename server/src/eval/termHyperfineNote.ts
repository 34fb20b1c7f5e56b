/**
 * The note that says how a whole term's hyperfine coupling between its J levels was obtained
 * when the file gives only J-level constants: which assumption closed the system.
 */
import type { LevelModel } from '../model/types';
import type { EvaluationNote } from './levelEvaluation';

export function termHyperfineNote(level: LevelModel, source: string): EvaluationNote | undefined {
  if (source !== 'level-constants, a_L = a_SD') return undefined;
  const range = level.levelA && level.levelA.length > 0 ? { start: level.levelA[0]!.range.start, end: level.levelA[level.levelA.length - 1]!.range.end } : level.nameRange;
  return {
    code: 'hyperfine-between-levels-assumed',
    message: `term ${level.species.name}.${level.name}: the hyperfine coupling between its J levels comes from the A_J values with the assumption a_L = a_SD (one radial mean ⟨r⁻³⟩ for the orbital and spin-dipolar parts, as for one electron without relativistic corrections); measured off-diagonal constants would replace it.`,
    range,
  };
}
