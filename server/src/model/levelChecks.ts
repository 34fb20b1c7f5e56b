/**
 * Physics checks on a level once its species is known: hyperfine constants that cannot act,
 * and a measured g_J far from the LS-coupling value.
 */
import { landeGJ, orbitalGFactor } from '../physics/gFactors';
import { ELECTRON_GS } from '../physics/constants';
import type { ProblemList } from './problems';
import { checkTermSettings } from './termChecks';
import type { LevelModel, SettingsModel } from './types';

/** Relative difference between measured and LS g_J above which we point it out (common practice: LS is good to ~1e-3 for light atoms). */
const GJ_NOTICE_FRACTION = 0.01;

export function checkLevelPhysics(level: LevelModel, settings: SettingsModel, problems: ProblemList): void {
  const term = level.term;
  if (level.valid) checkTermSettings(level, problems);
  if (level.kind === 'term' && level.valid) {
    for (const [key, v] of [['A', level.A], ['B', level.B], ['C', level.C], ['g_J', level.gJMeasured]] as const) {
      if (v?.range) {
        problems.add('term-hyperfine-unsupported', `${key} is not used for a whole term (a term without J); give it on a J level instead${key === 'A' || key === 'B' ? `, or per J level as ${key}_J = <J> <value>, …` : ''}`, v.range, {
          data: { removeSetting: key },
        });
      }
    }
    return;
  }
  if (!term || term.twoJ === null || !level.valid) return;
  const twoI = level.species.twoI.value;
  const twoJ = term.twoJ;
  const fromFile = (v: { range?: unknown } | undefined): boolean => !!v && v.range !== undefined;

  for (const [key, v] of [['A', level.A], ['B', level.B], ['C', level.C]] as const) {
    // A rejected I already has its own error; "I = 0" would be a second, wrong message.
    if (twoI === 0 && fromFile(v) && !level.species.spinRejected) {
      problems.add('hyperfine-without-nucleus', `${key} has no effect: species '${level.species.name}' has no nuclear spin (I = 0)`, v!.range!, {
        data: { removeSetting: key },
      });
    }
  }
  if (level.A && fromFile(level.A) && twoI > 0 && twoJ === 0) {
    problems.add('dipole-cannot-act', `A cannot act here: with J = 0 there is no electronic angular momentum for the nucleus to couple to (this level has ${describe(twoI, twoJ)}); the nuclear Zeeman effect is computed without it`, level.A.range!, {
      data: { removeSetting: 'A' },
    });
  }
  if (level.B && fromFile(level.B) && twoI > 0 && (twoI < 2 || twoJ < 2)) {
    problems.add('quadrupole-cannot-act', `B cannot act here: a quadrupole needs I ≥ 1 and J ≥ 1, and this level has ${describe(twoI, twoJ)}`, level.B.range!, {
      data: { removeSetting: 'B' },
    });
  }
  if (level.C && fromFile(level.C) && twoI > 0 && (twoI < 3 || twoJ < 3)) {
    problems.add('octupole-cannot-act', `C cannot act here: an octupole needs I ≥ 3/2 and J ≥ 3/2, and this level has ${describe(twoI, twoJ)}`, level.C.range!, {
      data: { removeSetting: 'C' },
    });
  }
  const measured = level.gJMeasured;
  if (measured && fromFile(measured) && twoJ > 0) {
    const gS = settings.gS === 2 ? 2 : ELECTRON_GS;
    const gL = settings.reducedMass && level.species.massKg ? orbitalGFactor(level.species.massKg.value) : 1;
    const ls = landeGJ(term.twoS, term.L, twoJ, { gS, gL });
    if (Math.abs(measured.value - ls) > GJ_NOTICE_FRACTION * Math.abs(ls)) {
      problems.add('gj-measured-differs', `measured g_J = ${measured.value} differs from the LS-coupling value ${ls.toFixed(5)} by ${(((measured.value - ls) / ls) * 100).toFixed(1)} %; the measured value is used`, measured.range!);
    }
  }
}

function describe(twoI: number, twoJ: number): string {
  const half = (n: number): string => (n % 2 === 0 ? String(n / 2) : `${n}/2`);
  return `I = ${half(twoI)}, J = ${half(twoJ)}`;
}
