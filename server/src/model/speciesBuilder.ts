/**
 * Builds a SpeciesModel from a `species` block: built-in data when the name is known,
 * overridden by the file's settings; a species defined by hand otherwise.
 */
import type { BlockNode } from '../format/ast';
import { allowedEdits, editDistance } from '../format/didYouMean';
import { ATOMIC_MASS_UNIT, NUCLEAR_MAGNETON } from '../physics/constants';
import { nuclearGFromMoment } from '../physics/gFactors';
import { citationOf, findSpecies, normalizedSpellings, normalizeSpeciesName } from '../physics/species';
import { buildLevel } from './levelBuilder';
import { NameIndex } from './nameIndex';
import type { ProblemList } from './problems';
import { readSettingNumber, readSettingQuantity, readSettingSpin } from './settingReaders';
import type { LevelModel, NameUse, SpeciesModel, Valued } from './types';

export function buildSpecies(node: BlockNode, uses: NameUse[], problems: ProblemList): SpeciesModel | undefined {
  if (!node.name) {
    problems.add('name-missing', 'a species needs a name: a built-in one such as Rb87, or your own', node.keyword.range);
    return undefined;
  }
  const builtin = findSpecies(node.name.text);
  const species: SpeciesModel = {
    name: node.name.text,
    node,
    nameRange: node.name.range,
    ...(builtin ? { builtin } : {}),
    ...(builtin ? { massKg: { value: builtin.massU.value * ATOMIC_MASS_UNIT, source: builtin.massU.source } } : {}),
    twoI: builtin ? { ...builtin.twoI } : { value: 0, source: 'no nuclear spin given' },
    gI: builtin?.gI
      ? { value: builtin.gI.value, source: citationOf(builtin.gI), ...(builtin.gI.uncertainty !== undefined ? { uncertainty: builtin.gI.uncertainty } : {}) }
      : { value: 0, source: 'no nuclear moment given' },
    levels: [],
  };

  let gIFromFile: Valued<number> | undefined;
  let muIFromFile: Valued<number> | undefined;
  for (const s of node.settings) {
    switch (s.key.text) {
      case 'mass': {
        const m = readSettingQuantity(s, 'mass', problems, 'atomic mass, e.g. 86.909 u');
        if (m && m.value <= 0) problems.add('value-out-of-range', `mass must be positive, got ${s.valueText.text}`, s.valueText.range);
        else if (m) species.massKg = m;
        break;
      }
      case 'I': {
        const spin = readSettingSpin(s, problems, 'nuclear spin');
        if (spin) species.twoI = spin;
        else species.spinRejected = true;
        break;
      }
      case 'g_I':
        gIFromFile = readSettingNumber(s, problems, 'nuclear g-factor in units of μ_B');
        break;
      case 'mu_I':
        muIFromFile = readSettingQuantity(s, 'moment', problems, 'nuclear magnetic moment, e.g. 2.7515 muN');
        break;
      default:
        break;
    }
  }
  applyNuclearG(species, gIFromFile, muIFromFile, node, problems);
  checkHandDefined(species, node, problems);

  const levels = new NameIndex<LevelModel>('level', uses);
  for (const ln of node.levels) {
    const level = buildLevel(ln, species, problems);
    if (level && levels.declare(level, problems)) species.levels.push(level);
  }
  return species;
}

function applyNuclearG(
  species: SpeciesModel,
  gI: Valued<number> | undefined,
  muI: Valued<number> | undefined,
  node: BlockNode,
  problems: ProblemList,
): void {
  const twoI = species.twoI.value;
  const fromMoment = muI && twoI > 0 ? nuclearGFromMoment(muI.value / NUCLEAR_MAGNETON, twoI) : undefined;
  if (gI) species.gI = gI;
  else if (muI && fromMoment !== undefined) species.gI = { value: fromMoment, source: `from mu_I in this file`, ...(muI.range ? { range: muI.range } : {}) };
  if (gI && fromMoment !== undefined && Math.abs(gI.value - fromMoment) > 1e-3 * Math.abs(fromMoment)) {
    problems.add('species-g-conflict', `g_I = ${gI.value} and mu_I (which gives g_I = ${fromMoment.toPrecision(6)}) disagree; g_I is used`, gI.range ?? node.headerRange, {
      ...(muI?.range ? { related: [{ message: 'mu_I is given here', range: muI.range }] } : {}),
    });
  }
  const fileGivesSpin = node.settings.some((s) => s.key.text === 'I');
  if (fileGivesSpin && twoI > 0 && !gI && !muI && !species.builtin?.gI) {
    problems.add('species-needs-nuclear-g', `species '${species.name}' has nuclear spin but no g_I or mu_I; g_I is taken as 0`, node.name?.range ?? node.headerRange);
  }
}

function checkHandDefined(species: SpeciesModel, node: BlockNode, problems: ProblemList): void {
  if (species.builtin || species.massKg || node.settings.some((s) => s.key.text === 'mass')) return;
  const near = nearSpecies(species.name);
  const suggestions = near.map((n) => n.id);
  // One clearly nearest built-in name is the likely meaning: say it first and prefer its fix.
  const clear = near.length > 0 && (near.length === 1 || near[0]!.distance < near[1]!.distance) ? near[0]!.id : undefined;
  const lead = suggestions.length > 0 ? `'${species.name}' is not a built-in species; did you mean ${suggestions.join(' or ')}? ` : `'${species.name}' is not a built-in species. `;
  problems.add('species-needs-mass', `${lead}A species defined by hand needs its own mass (mass = … u).`, node.name?.range ?? node.headerRange, {
    data: { suggestions, ...(clear ? { preferred: clear } : {}) },
  });
}

/** Canonical ids of built-in species spelt close to `name` ('Rubidum87' → Rb87), nearest first. */
function nearSpecies(name: string, max = 3): { id: string; distance: number }[] {
  const key = normalizeSpeciesName(name);
  if (key === '' || key.length > 64) return [];
  const limit = allowedEdits(key.length);
  const best = new Map<string, number>();
  for (const [form, id] of normalizedSpellings()) {
    const d = editDistance(key, form, limit);
    if (d <= limit && d < form.length && d < (best.get(id) ?? Number.POSITIVE_INFINITY)) best.set(id, d);
  }
  return [...best].map(([id, distance]) => ({ id, distance })).sort((a, b) => a.distance - b.distance).slice(0, max);
}
