/** Whole-term specs shared by the whole-term engine and line tests. */
import { ELECTRON_GS } from '../../server/src/physics/constants';
import type { WholeTermSpec } from '../../server/src/physics/engine';
import reference from '../reference/engine_whole_term.json';
import { level, num } from '../fixtures/builtinLookup';

export { reference };

type Case = (typeof reference.cases)['Li7_2P'];

/** The spec the reference generator describes: J-level energies, A_1/2, A_3/2, B_3/2 (Hz). */
export function termFromReference(c: Case): WholeTermSpec {
  return {
    kind: 'term',
    twoS: 1,
    L: 1,
    twoI: c.twoI,
    gL: 1,
    gS: ELECTRON_GS,
    gI: c.gI,
    levelEnergies: Object.entries(c.energies).map(([j, e]) => ({ twoJ: Number(j), energyHz: e })),
    levelA: Object.entries(c.A).map(([j, a]) => ({ twoJ: Number(j), A: a })),
    levelB: Object.entries(c.B).map(([j, b]) => ({ twoJ: Number(j), B: b })),
  };
}

/** ⁷Li 2P and ⁸⁷Rb 5P (alkali D-line data compilations; ⁷Li A_1/2 from the cited 91.873(5) MHz interval, as scripts/reference/engine_whole_term.py says). */
export const LI7_2P = termFromReference(reference.cases.Li7_2P);
export const RB87_5P = termFromReference(reference.cases.Rb87_5P);

/** ⁷Li 2P3/2 − 2P1/2 as the built-in table has it (its D2 minus D1 line), Hz. */
export const LI7_FINE_STRUCTURE_HZ = num(level('Li7', 'P3/2').energyHz, 'Li7 D2') - num(level('Li7', 'P1/2').energyHz, 'Li7 D1');
