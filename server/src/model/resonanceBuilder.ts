/** Builds `resonance` blocks: which level, which pair of sublevels, which frequency, over which field range. */
import type { BlockNode, SettingNode } from '../format/ast';
import { resolveLevel, type NameIndex } from './nameIndex';
import type { ProblemList } from './problems';
import { readPartQuantity, readSettingQuantity, readSettingWord, singlePart, strayUnit } from './settingReaders';
import type { LevelModel, NameUse, ResonanceModel, SpeciesModel, SublevelName } from './types';
import { allParts } from '../format/values';

/** Default search range when the file gives none: wide enough for electron-spin resonance at X band. */
export const DEFAULT_RESONANCE_RANGE_T = { fromT: 0, toT: 1 };

export function buildResonance(node: BlockNode, species: NameIndex<SpeciesModel>, uses: NameUse[], problems: ProblemList): ResonanceModel | undefined {
  if (!node.name) {
    problems.add('name-missing', 'a resonance needs a name, as in `resonance clock`', node.keyword.range);
    return undefined;
  }
  const r: ResonanceModel = { name: node.name.text, node, nameRange: node.name.range, rangeT: { ...DEFAULT_RESONANCE_RANGE_T }, twoPhoton: false };
  for (const s of node.settings) {
    switch (s.key.text) {
      case 'level': {
        const lv = readLevelSetting(s, species, uses, problems);
        if (lv) r.level = lv;
        break;
      }
      case 'lower':
      case 'upper': {
        const n = readSublevelName(s, problems);
        if (n) r[s.key.text] = n;
        break;
      }
      case 'frequency': {
        const f = readSettingQuantity(s, 'frequency-like', problems, 'a transition frequency, e.g. 6.8347 GHz');
        if (f && f.value <= 0) problems.add('value-out-of-range', `frequency must be positive, got ${s.valueText.text}`, s.valueText.range);
        else if (f) r.frequencyHz = f;
        break;
      }
      case 'range': {
        const range = readFieldRange(s, problems);
        if (range) r.rangeT = range;
        break;
      }
      case 'two_photon': {
        const w = readSettingWord(s, ['on', 'off'] as const, problems);
        if (w) r.twoPhoton = w === 'on';
        break;
      }
      default:
        break;
    }
  }
  if (!r.level) problems.add('resonance-incomplete', `resonance '${r.name}' needs a level: level = <name>`, node.name.range);
  // A side written but unreadable is said at its value; only a side not written at all is missing.
  const written = (key: string): boolean => node.settings.some((s) => s.key.text === key);
  if (written('lower') !== written('upper')) {
    const [given, missing] = written('lower') ? ['lower', 'upper'] : ['upper', 'lower'];
    problems.add('resonance-incomplete', `resonance '${r.name}' gives its ${given} sublevel but not its ${missing} one; add ${missing} = <F> <m_F> (a resonance joins a pair)`, node.name.range);
  }
  return r;
}

/** `range = <from>, <to>`: two different fields, in increasing order, with the units written. */
export function readFieldRange(s: SettingNode, problems: ProblemList): ResonanceModel['rangeT'] | undefined {
  const parts = allParts(s.groups);
  if (parts.length !== 2) {
    problems.add('resonance-range-malformed', 'write range = <from field>, <to field>, e.g. range = 0 G, 10 G', s.valueText.range);
    return undefined;
  }
  const a = readPartQuantity(parts[0]!, 'flux-density', problems, 'range');
  const b = readPartQuantity(parts[1]!, 'flux-density', problems, 'range');
  if (!a || !b) return undefined;
  if (a.value === b.value) {
    problems.add('resonance-range-malformed', 'the range starts and ends at the same field; give two different fields', s.valueText.range);
    return undefined;
  }
  const [from, to] = a.value < b.value ? [a, b] : [b, a];
  return { fromT: from.value, toT: to.value, range: s.valueText.range, ...(from.unit ? { fromUnit: from.unit } : {}), ...(to.unit ? { toUnit: to.unit } : {}) };
}

/** `level = ground` or `level = Rb87.ground`, resolved among the species. */
export function readLevelSetting(s: SettingNode, species: NameIndex<SpeciesModel>, uses: NameUse[], problems: ProblemList): LevelModel | undefined {
  const part = singlePart(s, problems, 'level name');
  if (!part) return undefined;
  const dot = part.text.indexOf('.');
  const name = dot > 0 ? { text: part.text.slice(dot + 1), range: part.range } : part;
  const qualifier = dot > 0 ? { text: part.text.slice(0, dot), range: part.range } : undefined;
  return resolveLevel(qualifier ? { qualifier, name } : { name }, species, undefined, uses, problems);
}

/** `lower = 1 -1` (F and m_F; J and m_J for a term), also written `1, -1`. */
export function readSublevelName(s: SettingNode, problems: ProblemList): SublevelName | undefined {
  const parts = allParts(s.groups);
  const stray = parts.length === 1 ? strayUnit(parts[0]!) : undefined;
  if (stray) {
    problems.add('resonance-sublevel-malformed', `'${stray.text}' is not a number: write ${s.key.text} = <F> <m_F>, e.g. ${s.key.text} = 2 +1 (F and m_F of the low-field label)`, stray.range);
    return undefined;
  }
  const bad = (): undefined => {
    problems.add('resonance-sublevel-malformed', `write ${s.key.text} = <F> <m_F>, e.g. ${s.key.text} = 2 +1 (F and m_F of the low-field label)`, s.valueText.range);
    return undefined;
  };
  if (parts.length !== 2) return bad();
  const notNumber = parts.find((p) => p.kind !== 'number');
  if (notNumber) {
    if (notNumber.kind === 'word' && notNumber.unreadable) return undefined;
    problems.add('resonance-sublevel-malformed', `'${notNumber.text}' is not a number: write ${s.key.text} = <F> <m_F>, e.g. ${s.key.text} = 2 +1 (F and m_F of the low-field label)`, notNumber.range);
    return undefined;
  }
  const twice = parts.map((p) => (p.kind === 'number' ? 2 * p.number.value : NaN));
  const notHalf = parts.find((_, i) => Math.abs(twice[i]! - Math.round(twice[i]!)) > 1e-9);
  if (notHalf) {
    problems.add('resonance-sublevel-malformed', `${s.key.text}: F and m_F are whole or half-whole numbers, got ${notHalf.text}`, notHalf.range);
    return undefined;
  }
  const [twoF, twoM] = twice.map(Math.round) as [number, number];
  if (twoF < 0 || Math.abs(twoM) > twoF || (twoF - twoM) % 2 !== 0) {
    problems.add('resonance-sublevel-malformed', `m must run from −F to F in whole steps; got F = ${parts[0]!.text}, m = ${parts[1]!.text}`, s.valueText.range);
    return undefined;
  }
  return { twoF, twoM, range: s.valueText.range };
}
