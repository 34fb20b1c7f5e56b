/**
 * Completion: block words, `level` and setting keys at the start of a line; built-in species
 * after `species`; term symbols the configuration before the cursor allows; units of the
 * dimension a setting expects after a number; level, species and magnet names where a
 * reference goes; the fixed words of `source`, `slits` and `settings`; `use` and the setup
 * files beside the document in its path.
 */
import { type CompletionItem, CompletionItemKind, type Position } from 'vscode-languageserver-types';
import type { Analysis } from '../eval/analyze';
import type { BlockKind, BlockNode } from '../format/ast';
import { readNumber, readNumberPrefix, startsLikeNumber } from '../format/numbers';
import { BLOCK_KEYS, BLOCK_WORDS, isBlockWord, LEVEL_KEYS, LEVEL_WORD, USE_WORD } from '../format/schema';
import type { Token } from '../format/scanner';
import { halfText, signedHalfText } from '../eval/halves';
import { DATA_KINDS } from '../model/dataBuilder';
import { FIT_PARAMETERS } from '../model/fitTypes';
import { SLOWER_DESIGNS } from '../model/slowerBuilder';
import { SPECTRUM_DIRECTIONS, SPECTRUM_LIGHTS } from '../model/spectrumRequestBuilder';
import { DIRECTION_NAMES } from '../model/vectorReader';
import type { LevelModel, SetupModel } from '../model/types';
import { parseLevelDesignation } from '../physics/configuration';
import { item, unitItems, wordItems } from './completion/items';
import { builtinSpeciesItems } from './completion/speciesItems';
import { type FolderLister, usePathCompletions } from './completion/usePaths';
import { lineContext, type LineContext } from './completion/lineContext';
import { builtinDesignationItems, termItems } from './completion/termItems';
import { speciesOfBlock } from './shared/modelLookup';
import { expectedDimension } from './shared/units';

const BLOCK_WORD_DETAIL: Record<BlockKind, string> = {
  species: 'species <name> — an atom, built-in or your own',
  field: 'field <name> = <flux density>',
  magnet: 'magnet <name> — field, gradient, length',
  beam: 'beam <name> — species, level, source, slits, magnet, drift, detector',
  line: 'line <name>: <lower> -> <upper>',
  resonance: 'resonance <name> — RF/microwave transitions of a level: level, lower, upper, frequency, range',
  settings: 'settings — g_s, reduced_mass',
  data: 'data <name> — measured points: level, kind, lower, upper, point, file, beam',
  fit: 'fit <name> — data, free, start, range (or fit <name>: <data> -> <parameter>)',
  coil: 'coil <name> — a current loop, or a pair with spacing: radius, turns, current, centre, axis, spacing, sense, conductor',
  solenoid: 'solenoid <name> — radius, length, turns, current, centre, axis, conductor',
  wire: 'wire <name> — a straight wire: current, through, direction, length, return',
  slab: 'slab <name> — a magnetised block: size, centre, magnetisation',
  slower: 'slower <name> — line, capture, final, safety, design, bias, saturation, sources',
  trap: 'trap <name> — sources, level, gravity, temperature, cut, region, centre',
};

function statementStart(c: LineContext): CompletionItem[] {
  const out: CompletionItem[] = [];
  const block = c.enclosing;
  let order = 0;
  if (block) {
    for (const key of BLOCK_KEYS[block.kind]) out.push(item(key, CompletionItemKind.Property, c.replace, { insert: `${key} = `, detail: `${block.kind} setting`, order: order++ }));
    if (block.kind === 'species') {
      out.push(item(LEVEL_WORD, CompletionItemKind.Keyword, c.replace, { insert: 'level ${1:name}: ${2}', snippet: true, detail: 'level <name>: [configuration] <term>', order: order++ }));
      const hasLevelAbove = block.levels.some((l) => l.range.start.line < c.position.line);
      if (hasLevelAbove) for (const key of LEVEL_KEYS) out.push(item(key, CompletionItemKind.Property, c.replace, { insert: `${key} = `, detail: 'setting of the level above', order: order++ }));
    }
  }
  // A block word spelt like a key of this block (`field` in a magnet) is offered once, as the key.
  const keys = new Set(out.map((i) => i.label));
  for (const w of BLOCK_WORDS) if (!keys.has(w)) out.push(item(w, CompletionItemKind.Keyword, c.replace, { insert: `${w} `, detail: BLOCK_WORD_DETAIL[w], order: order++ }));
  out.push(item(USE_WORD, CompletionItemKind.Keyword, c.replace, { insert: 'use "${1:file.sublevel}"', snippet: true, detail: 'use "<path>" — the species of another setup file', order: order++ }));
  return out;
}

/** Level names, qualified with their species when the bare name is not unique; `except` is left out (a line's other end). */
function levelNameItems(model: SetupModel | undefined, c: LineContext, only?: LevelModel['species'], except?: LevelModel): CompletionItem[] {
  if (!model) return [];
  const all = model.species.flatMap((s) => s.levels);
  const count = new Map<string, number>();
  for (const l of all) count.set(l.name, (count.get(l.name) ?? 0) + 1);
  return all
    .filter((l) => (!only || l.species === only) && l !== except)
    .map((l, i) => {
      const label = !only && (count.get(l.name) ?? 0) > 1 ? `${l.species.name}.${l.name}` : l.name;
      return item(label, CompletionItemKind.EnumMember, c.replace, { detail: `${l.species.name}: ${l.designationText}`, order: i });
    });
}

function isNumber(t: Token | undefined): boolean {
  return !!t && t.kind === 'atom' && readNumber(t.text)?.ok === true;
}

/** Units after a number, or glued to it (`0.45m|` completes the `m`). */
function unitsAfterNumber(c: LineContext, valueTokens: Token[], dimension: ReturnType<typeof expectedDimension>): CompletionItem[] | undefined {
  if (!dimension) return undefined;
  const previous = valueTokens[valueTokens.length - 1];
  if (!c.typing && isNumber(previous)) return unitItems(dimension, c.replace);
  if (c.typing && isNumber(previous) && !startsLikeNumber(c.typing.text)) return unitItems(dimension, c.replace);
  if (c.typing && startsLikeNumber(c.typing.text)) {
    const p = readNumberPrefix(c.typing.text);
    if (p && p.length < c.typing.text.length) {
      const start = { line: c.position.line, character: c.typing.start + p.length };
      return unitItems(dimension, { start, end: c.replace.end });
    }
  }
  return undefined;
}

function valueCompletions(c: LineContext, model: SetupModel | undefined, block: BlockNode, key: string, inLevel: boolean, valueTokens: Token[]): CompletionItem[] {
  const words = valueTokens.filter((t) => t.kind === 'atom');
  const previousWord = [...words].reverse().find((t) => !startsLikeNumber(t.text))?.text;
  const dimension = expectedDimension({ blockKind: block.kind, key, inLevel, ...(previousWord ? { previousWord } : {}) });
  const units = unitsAfterNumber(c, valueTokens, dimension);
  if (units) return units;
  if (inLevel) {
    // After a complete value on a level line, the next thing is another level key.
    if (valueTokens.length > 0 && !c.typing?.text.match(/^[+-]?\d/)) {
      return LEVEL_KEYS.filter((k) => k !== key).map((k, i) => item(k, CompletionItemKind.Property, c.replace, { insert: `${k} = `, order: i }));
    }
    return [];
  }
  const empty = words.length === 0;
  switch (`${block.kind}.${key}`) {
    case 'beam.species':
      return empty ? (model?.species ?? []).map((s, i) => item(s.name, CompletionItemKind.Module, c.replace, { order: i })) : [];
    case 'field.species': {
      // A list: after a comma (or at its start), the species not yet written.
      const last = valueTokens[valueTokens.length - 1];
      if (last && last.kind !== 'comma') return [];
      const written = new Set(words.map((w) => w.text));
      return (model?.species ?? []).filter((s) => !written.has(s.name)).map((s, i) => item(s.name, CompletionItemKind.Module, c.replace, { order: i }));
    }
    case 'beam.level': {
      if (!empty) return [];
      const beam = model?.beams.find((b) => b.node === block);
      return levelNameItems(model, c, beam?.species);
    }
    case 'resonance.level':
    case 'trap.level':
    case 'data.level':
      return empty ? levelNameItems(model, c) : [];
    case 'slower.line':
      return empty ? (model?.lines ?? []).map((l, i) => item(l.name, CompletionItemKind.Variable, c.replace, { order: i })) : [];
    case 'magnet.sources':
    case 'trap.sources':
    case 'slower.sources':
      return namesInList(valueTokens, words, (model?.sources ?? []).map((s) => s.name), c);
    case 'fit.data':
      return namesInList(valueTokens, words, (model?.data ?? []).map((d) => d.name), c);
    case 'fit.free':
      return namesInList(valueTokens, words, [...FIT_PARAMETERS], c);
    case 'slower.design':
      return empty ? wordItems(SLOWER_DESIGNS, c.replace, 'the shape of the field profile') : [];
    case 'slower.repump':
      return empty ? wordItems(['on', 'off'], c.replace) : [];
    case 'trap.gravity':
      // Down first: it is what a trap on a table has.
      return empty ? wordItems(['-z', ...DIRECTION_NAMES.filter((w) => w !== '-z'), 'off'], c.replace, 'direction of gravity, three numbers, or off') : [];
    case 'line.spectrum':
      return empty ? wordItems(SPECTRUM_DIRECTIONS, c.replace, 'look across or along the field') : [];
    case 'line.light':
      return empty ? wordItems(SPECTRUM_LIGHTS, c.replace, 'analyser in front of the detector') : [];
    case 'line.doppler':
      if (empty) return wordItems(['beam'], c.replace, 'a temperature such as 310 K, or beam <name>');
      return words.length === 1 && words[0]!.text === 'beam' ? (model?.beams ?? []).map((b, i) => item(b.name, CompletionItemKind.Variable, c.replace, { order: i })) : [];
    case 'data.kind':
      return empty ? wordItems(DATA_KINDS, c.replace, 'what was measured: resonance fields, intervals, or a beam profile') : [];
    case 'resonance.lower':
    case 'resonance.upper': {
      if (valueTokens.length > 0) return [];
      const level = model?.resonances.find((r) => r.node === block)?.level;
      return sublevelItems(level, c);
    }
    case 'resonance.two_photon':
      return empty ? wordItems(['on', 'off'], c.replace) : [];
    case 'data.beam':
      return empty ? (model?.beams ?? []).map((b, i) => item(b.name, CompletionItemKind.Variable, c.replace, { order: i })) : [];
    case 'beam.magnet':
      return empty ? (model?.magnets ?? []).map((m, i) => item(m.name, CompletionItemKind.Variable, c.replace, { order: i })) : [];
    case 'beam.source':
      if (empty) return wordItems(['oven', 'jet', 'speed'], c.replace, 'oven <temperature> | jet <speed> spread <percent> | speed <speed>');
      if (words[0]?.text === 'jet' && words.length >= 2 && !words.some((w) => w.text === 'spread')) return wordItems(['spread'], c.replace);
      return [];
    case 'beam.slits':
      return valueTokens.some((t) => t.kind === 'comma') && !words.some((w) => w.text === 'apart') && words.length >= 2 ? wordItems(['apart'], c.replace) : [];
    case 'settings.g_s':
      return empty ? wordItems(['exact', '2'], c.replace, 'exact: CODATA |g_e|; 2: textbook fractions') : [];
    case 'settings.reduced_mass':
      return empty ? wordItems(['on', 'off'], c.replace) : [];
    case 'coil.axis':
    case 'solenoid.axis':
    case 'wire.direction':
      return empty ? wordItems(DIRECTION_NAMES, c.replace, 'a direction, or three numbers such as 0, 1, 1') : [];
    case 'coil.sense':
      return empty ? wordItems(['same', 'opposite'], c.replace, 'same: currents alike; opposite: a quadrupole pair') : [];
    case 'slab.magnetisation':
      // `1.2 T |` → along; `1.2 T along |` → a direction.
      if (words[words.length - 1]?.text === 'along') return wordItems(DIRECTION_NAMES, c.replace, 'direction of magnetisation');
      return words.length >= 2 && !words.some((w) => w.text === 'along') ? wordItems(['along'], c.replace) : [];
    default:
      return [];
  }
}

/** `lower = |`: the F, m_F pairs of the resonance's level (F from |J − I| to J + I, angular momentum addition). */
function sublevelItems(level: LevelModel | undefined, c: LineContext): CompletionItem[] {
  const twoJ = level?.kind === 'level' ? level.term?.twoJ : undefined;
  if (!level || twoJ === undefined || twoJ === null) return [];
  const twoI = level.species.twoI.value;
  const labels: string[] = [];
  for (let twoF = Math.abs(twoJ - twoI); twoF <= twoJ + twoI; twoF += 2) {
    for (let twoM = twoF; twoM >= -twoF; twoM -= 2) labels.push(`${halfText(twoF)} ${signedHalfText(twoM)}`);
  }
  return wordItems(labels, c.replace, `F and m_F of a sublevel of ${level.name}`);
}

/** Names for a comma-separated list (`sources = a, |`): at its start or after a comma, those not yet written. */
function namesInList(valueTokens: Token[], words: Token[], names: string[], c: LineContext): CompletionItem[] {
  const last = valueTokens[valueTokens.length - 1];
  if (last && last.kind !== 'comma') return [];
  const written = new Set(words.map((w) => w.text));
  return names.filter((n) => !written.has(n)).map((n, i) => item(n, CompletionItemKind.Variable, c.replace, { order: i }));
}

/** `level <name>: <configuration> |` → terms; after the term → the level's keys. */
function levelLineCompletions(c: LineContext, model: SetupModel | undefined, block: BlockNode): CompletionItem[] {
  const colon = c.before.findIndex((t) => t.kind === 'colon');
  if (colon < 0) return [];
  const designation = c.prefix.slice(c.before[colon]!.end, c.typing ? c.typing.start : c.prefix.length).trim();
  const written = designation === '' ? undefined : parseLevelDesignation(designation);
  if (written?.term && written.term.twoJ !== null && !written.issues.some((i) => i.severity === 'error')) {
    return LEVEL_KEYS.map((k, i) => item(k, CompletionItemKind.Property, c.replace, { insert: `${k} = `, order: i }));
  }
  if (designation === '') {
    return builtinDesignationItems(speciesOfBlock(model, block)?.builtin, c.replace);
  }
  return termItems(designation, c.replace);
}

function headerCompletions(c: LineContext, model: SetupModel | undefined): CompletionItem[] | undefined {
  const first = c.before[0];
  if (!first || first.kind !== 'atom' || !isBlockWord(first.text)) return undefined;
  const second = c.before[1];
  if (second && (second.kind === 'equals' || second.kind === 'colon') && c.enclosing && BLOCK_KEYS[c.enclosing.kind].includes(first.text)) return undefined;
  switch (first.text) {
    case 'species':
      return c.before.length === 1 ? builtinSpeciesItems(c.replace) : [];
    case 'line': {
      const arrow = c.before.findIndex((t) => t.kind === 'arrow');
      const colon = c.before.findIndex((t) => t.kind === 'colon');
      if (arrow >= 0 && arrow === c.before.length - 1) {
        const fromText = c.before[arrow - 1]?.text;
        const from = model?.species.flatMap((s) => s.levels).find((l) => l.name === fromText || `${l.species.name}.${l.name}` === fromText);
        return levelNameItems(model, c, from?.species, from);
      }
      if (colon >= 0 && colon === c.before.length - 1) return levelNameItems(model, c);
      return [];
    }
    case 'field': {
      const eq = c.before.findIndex((t) => t.kind === 'equals');
      if (eq < 0) return [];
      return unitsAfterNumber(c, c.before.slice(eq + 1), 'flux-density') ?? [];
    }
    default:
      return [];
  }
}

/**
 * `folder` lists the setup files beside the document, for the path of a `use` statement; the
 * language service passes it (features do no I/O).
 */
export function completion(analysis: Analysis, position: Position, folder?: FolderLister): CompletionItem[] {
  const c = lineContext(analysis.doc, position);
  const path = usePathCompletions(c, folder);
  if (path) return path;
  if (c.inComment) return [];
  const model = analysis.model;
  if (c.before.length === 0) return statementStart(c);
  const header = headerCompletions(c, model);
  if (header) return header;
  const block = c.enclosing;
  if (!block) return [];
  const first = c.before[0]!;
  if (first.kind === 'atom' && first.text === LEVEL_WORD && block.kind === 'species') {
    const eq = c.before.map((t) => t.kind).lastIndexOf('equals');
    if (eq < 1) return levelLineCompletions(c, model, block);
  }
  const eq = c.before.map((t) => t.kind).lastIndexOf('equals');
  if (eq < 1) return [];
  const key = c.before[eq - 1]!.text;
  const inLevel = block.kind === 'species' && LEVEL_KEYS.includes(key);
  return valueCompletions(c, model, block, key, inLevel, c.before.slice(eq + 1));
}
