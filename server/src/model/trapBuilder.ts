/** Builds `trap` blocks (docs/traps.md): which sources, which level, gravity, the region, temperature and the RF cut. */
import type { BlockNode, Problem, SettingNode } from '../format/ast';
import { makeProblem } from '../format/codes';
import { canonicalUnitName, isOffsetUnit } from '../format/unitGrammar';
import { frequencyKindOf, readQuantity } from '../format/units';
import { listWords } from '../physics/listWords';
import { BOLTZMANN_K, PLANCK_H } from '../physics/constants';
import type { NameIndex } from './nameIndex';
import type { ProblemList } from './problems';
import { readLevelSetting } from './resonanceBuilder';
import { readSettingQuantity, singlePart } from './settingReaders';
import { readSourceList } from './sourceListReader';
import type { TrapModel } from './trapTypes';
import type { FieldSourceModel, NameUse, SpeciesModel, Valued } from './types';
import { readDirection, readVector } from './vectorReader';

export const DEFAULT_GRAVITY_DOWN = [0, 0, -1] as const;

export function buildTrap(
  node: BlockNode,
  index: { species: NameIndex<SpeciesModel>; sources: NameIndex<FieldSourceModel> },
  uses: NameUse[],
  problems: ProblemList,
): TrapModel | undefined {
  if (!node.name) {
    problems.add('name-missing', 'a trap needs a name, as in `trap quadtrap`', node.keyword.range);
    return undefined;
  }
  const trap: TrapModel = { name: node.name.text, node, nameRange: node.name.range, gravity: { down: [...DEFAULT_GRAVITY_DOWN] } };
  for (const s of node.settings) {
    switch (s.key.text) {
      case 'sources': {
        const list = readSourceList(s, index.sources, problems);
        if (list) trap.sources = list;
        break;
      }
      case 'level': {
        const lv = readLevelSetting(s, index.species, uses, problems);
        if (lv) trap.level = lv;
        break;
      }
      case 'gravity':
        readGravity(s, trap, problems);
        break;
      case 'temperature': {
        const t = readSettingQuantity(s, 'temperature', problems, 'cloud temperature, e.g. 100 uK');
        if (t && positive(s, t, problems)) trap.temperatureK = t;
        break;
      }
      case 'cut': {
        const c = readCut(s, problems);
        if (c) trap.cutJ = c;
        break;
      }
      case 'region': {
        const r = readSettingQuantity(s, 'length', problems, 'radius of the trap region, e.g. 1 cm');
        if (r && positive(s, r, problems)) trap.regionRadiusM = r;
        break;
      }
      case 'centre': {
        const c = readVector(s, 'length', problems);
        if (c) trap.regionCentre = c;
        break;
      }
      default:
        break;
    }
  }
  const missing = (['sources', 'level'] as const).filter((k) => !node.settings.some((s) => s.key.text === k));
  if (missing.length > 0) {
    problems.add('trap-incomplete', `trap '${trap.name}' has no ${missing.join(' and ')}; the trap summary needs ${missing.length > 1 ? 'both' : 'it'}`, node.name.range, {
      data: { missing },
    });
  }
  return trap;
}

/** `gravity = -z`, `gravity = 0, 0, -1` or `gravity = off`. */
function readGravity(s: SettingNode, trap: TrapModel, problems: ProblemList): void {
  const only = s.groups.length === 1 && s.groups[0]!.length === 1 ? s.groups[0]![0] : undefined;
  if (only?.kind === 'word' && only.text === 'off') {
    trap.gravity = { down: null, range: s.valueText.range };
    return;
  }
  const d = readDirection(s, problems);
  if (d) trap.gravity = { down: d.value, range: s.valueText.range };
}

/** The knife's energy written as a temperature (E = k_B T) or a frequency, wavenumber or energy (E = h ν). */
function readCut(s: SettingNode, problems: ProblemList): Valued<number> | undefined {
  const part = singlePart(s, problems, 'RF cut, e.g. 1 mK or 20 MHz');
  if (!part) return undefined;
  // A temperature reads degC as a point on a scale (3 degC = 276.15 K); a cut is a difference above the bottom.
  if (part.kind === 'quantity' && isOffsetUnit(canonicalUnitName(part.unit.text) ?? '')) {
    const message = `cut needs an energy above the trap's bottom, not a reading on a temperature scale: got ${part.unit.text}; write it in ${listWords(CUT_TEMPERATURE_UNITS)} (E = k_B T)`;
    problems.push(makeProblem('unit-wrong-dimension', message, part.unit.range, { data: { suggestions: [...CUT_TEMPERATURE_UNITS] } }));
    return undefined;
  }
  // A bare number is not read (a cut is no plain number of joules): say which units a cut takes; degC is not one of them.
  if (part.kind === 'number') {
    const message = `cut needs a unit: write the knife's energy as a temperature (${CUT_TEMPERATURE_UNITS.join(', ')}), a frequency (e.g. 20 MHz), a wavenumber (cm^-1) or an energy (J, eV); a bare number is not read`;
    problems.push(makeProblem('unit-missing', message, part.range, { data: { suggestions: [...CUT_TEMPERATURE_UNITS, 'MHz', 'J'].map((u) => `${part.text} ${u}`) } }));
    return undefined;
  }
  const unit = part.kind === 'quantity' ? { unit: part.unit.text } : {};
  // Read straight into joules (E = k_B T, E = h ν) in one conversion: `3e-30 J` stays 3e-30, not 3.0000000000000003e-30.
  const asT = readQuantity(part, 'temperature', undefined, BOLTZMANN_K);
  if (!asT.problem && asT.si !== undefined) return checkCut(s, { value: asT.si, source: 'this file', range: part.range, ...unit }, problems);
  const asF = readQuantity(part, 'frequency-like', undefined, PLANCK_H);
  if (!asF.problem && asF.si !== undefined) return checkCut(s, { value: asF.si, source: 'this file', range: part.range, ...unit }, problems);
  // A misspelt unit gets the reading that knows its spelling (`2 mk` → `mK`); a unit that is
  // neither a temperature nor a frequency (`3 m`) gets both kinds' fixes, each keeping the number.
  const spelled = [asT.problem, asF.problem].find((q) => q !== undefined && q.code !== 'unit-wrong-dimension' && (q.data?.suggestions?.length ?? 0) > 0);
  if (!spelled && asT.problem?.code === 'unit-wrong-dimension' && asF.problem?.code === 'unit-wrong-dimension' && part.kind === 'quantity') {
    problems.push(neitherKindProblem(asF.problem, part.unit.text, asF.problem.data?.suggestions ?? []));
    return undefined;
  }
  const p = spelled ?? asF.problem ?? asT.problem;
  if (p) problems.push({ ...p, message: `cut needs an energy written as a temperature (e.g. 1 mK) or a frequency (e.g. 20 MHz); ${p.message}` });
  return undefined;
}

/** Temperatures a knife is written in (no degC: a cut is an energy above the bottom, not a reading on a scale). */
const CUT_TEMPERATURE_UNITS = ['mK', 'uK', 'K'] as const;

/** "a frequency", "a wavenumber", "an energy": what a frequency-like unit writes. */
const KIND_WORDS = { frequency: 'a frequency', wavenumber: 'a wavenumber', energy: 'an energy' } as const;

/** A cut in a unit of no allowed kind: one message naming the kinds, the fixes of each, each fix labelled with its own kind. */
function neitherKindProblem(frequencyProblem: Problem, written: string, frequencyUnits: readonly string[]): Problem {
  const kinds: Record<string, string> = {};
  for (const u of CUT_TEMPERATURE_UNITS) kinds[u] = 'a temperature';
  for (const u of frequencyUnits) {
    const kind = frequencyKindOf(u);
    kinds[u] = kinds[u] ?? (kind ? KIND_WORDS[kind] : 'a frequency');
  }
  const others = [...new Set(frequencyUnits.map((u) => kinds[u]!))];
  return {
    ...frequencyProblem,
    message: `cut needs an energy above the trap's bottom, written as a temperature (${CUT_TEMPERATURE_UNITS.join(', ')}) or as ${listWords(others)} (${frequencyUnits.join(', ')}); got ${written}, which is none of these`,
    data: { suggestions: Object.keys(kinds), kinds },
  };
}

function checkCut(s: SettingNode, v: Valued<number>, problems: ProblemList): Valued<number> | undefined {
  return Number.isFinite(v.value) && positive(s, v, problems) ? v : undefined;
}

function positive(s: SettingNode, v: Valued<number>, problems: ProblemList): boolean {
  if (v.value > 0) return true;
  problems.add('value-out-of-range', `${s.key.text} must be greater than zero, got ${s.valueText.text}`, v.range ?? s.valueText.range);
  return false;
}
