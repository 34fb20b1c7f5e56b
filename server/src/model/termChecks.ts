/**
 * Checks on a whole term's per-level settings (A_J, B_J, E_J): every J named belongs to the
 * term and appears once, E_J gives every J level, E_J and zeta are not both given, and the
 * hyperfine constants have a nucleus to act on. On a J level these settings are not used.
 */
import { allowedJ } from '../physics/termSymbol';
import type { ProblemList } from './problems';
import type { LevelModel, PerLevelValue } from './types';

const half = (two: number): string => (two % 2 === 0 ? String(two / 2) : `${two}/2`);

function checkJs(key: string, list: PerLevelValue[], jValues: number[], problems: ProblemList): void {
  const seen = new Set<number>();
  for (const v of list) {
    if (!jValues.includes(v.twoJ)) {
      problems.add('term-level-unknown', `${key}: the term has no level J = ${half(v.twoJ)}; its levels are J = ${jValues.map(half).join(', ')}`, v.range);
    } else if (seen.has(v.twoJ)) {
      problems.add('term-level-unknown', `${key}: J = ${half(v.twoJ)} is given twice`, v.range);
    }
    seen.add(v.twoJ);
  }
}

export function checkTermSettings(level: LevelModel, problems: ProblemList): void {
  const term = level.term;
  if (!term) return;
  const lists = [['A_J', level.levelA], ['B_J', level.levelB], ['E_J', level.levelEnergies]] as const;
  if (level.kind !== 'term') {
    for (const [key, list] of lists) {
      if (list && list.length > 0) {
        const range = { start: list[0]!.range.start, end: list[list.length - 1]!.range.end };
        problems.add('per-level-needs-term', `${key} describes the J levels of a whole term and is not used on the J level '${level.name}'; write the term without J (with zeta or E_J) to use it`, range, { data: { removeSetting: key } });
      }
    }
    return;
  }
  const jValues = allowedJ(term.twoS, term.L);
  for (const [key, list] of lists) if (list) checkJs(key, list, jValues, problems);
  const energies = level.levelEnergies;
  if (energies && new Set(energies.map((e) => e.twoJ)).size < jValues.length) {
    problems.add('term-fine-missing', `E_J gives ${energies.length} of the term's ${jValues.length} J levels (J = ${jValues.map(half).join(', ')}); give the energy of each`, { start: energies[0]!.range.start, end: energies[energies.length - 1]!.range.end });
  }
  if (energies && level.zeta?.range) {
    problems.add('term-fine-twice', 'the term gives both zeta and the J-level energies E_J; E_J is used and zeta is ignored', level.zeta.range, { data: { removeSetting: 'zeta' } });
  }
  if (level.species.twoI.value === 0 && !level.species.spinRejected) {
    for (const [key, list] of lists.slice(0, 2)) {
      if (list && list.length > 0) {
        problems.add('hyperfine-without-nucleus', `${key} has no effect: species '${level.species.name}' has no nuclear spin (I = 0)`, list[0]!.range, { data: { removeSetting: key } });
      }
    }
  }
}
