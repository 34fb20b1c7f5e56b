/**
 * Syntax tree → semantic model. Declarations are collected first (species and their levels,
 * fields, magnets, and the species of used files), then references (beams, lines) are
 * resolved, so order in the file does not matter.
 */
import type { Range, SetupDocument } from '../format/ast';
import { buildBeam, buildField, buildMagnet } from './apparatusBuilder';
import { BlockMemo } from './blockMemo';
import { checkLevelPhysics } from './levelChecks';
import { buildLine } from './lineBuilder';
import { locationKey } from './locations';
import { NameIndex } from './nameIndex';
import { ProblemList } from './problems';
import { applySettings, DEFAULT_SETTINGS } from './settingsBuilder';
import { buildSpecies } from './speciesBuilder';
import { buildResonance } from './resonanceBuilder';
import { buildData } from './dataBuilder';
import { buildFit } from './fitBuilder';
import { buildSlower } from './slowerBuilder';
import { buildTrap } from './trapBuilder';
import type { TrapModel } from './trapTypes';
import type { DataModel, FitRequestModel } from './fitTypes';
import type { SetupSources } from './sources';
import { BLOCKS_PER_STOP_CHECK, stopEvery, type StopCheck } from '../format/stopCheck';
import { buildFieldSource, isSourceBlock } from './sourceBuilder';
import { checkSourceOverlaps } from './sourceOverlaps';
import { readFieldSpecies } from './fieldSpecies';
import type { BeamModel, FieldModel, FieldSourceModel, LineModel, MagnetModel, NameUse, ResonanceModel, SetupModel, SlowerModel, SpeciesModel, UsedFileModel } from './types';
import { resolveUses, rootUseContext, type UseContext } from './useResolver';

/**
 * `sources` says where the text lives and how to read the files its `use` statements name;
 * without it a `use` cannot be followed (and says so). `context` is for used files. `memo`
 * reuses what was built for the blocks of an earlier version that this one shares (the editor
 * passes one per version); the model is the same with or without it. `stop` is asked every
 * BLOCKS_PER_STOP_CHECK blocks (and species for the level checks); when it says stop,
 * `EvaluationStopped` is thrown (format/stopCheck.ts).
 */
export function buildModel(doc: SetupDocument, sources: SetupSources = {}, context?: UseContext, memo: BlockMemo = new BlockMemo(), stop?: StopCheck): SetupModel {
  const problems = new ProblemList();
  const used = doc.uses.length > 0 ? resolveUses(doc, sources, context ?? rootUseContext(sources.uri), buildModel, problems) : [];
  const names: NameUse[] = [];
  const settings = { ...DEFAULT_SETTINGS };
  const species = new NameIndex<SpeciesModel>('species', names, (items, build) => memo.carry('species', items, build));
  const fields = new NameIndex<FieldModel>('field', names);
  // Sources come before everything that lists them (magnets, traps, slowers), wherever they are in the file.
  const fieldSources = new NameIndex<FieldSourceModel>('source', names);
  for (const block of doc.blocks) {
    if (!isSourceBlock(block)) continue;
    const s = memo.build(block, names, problems, (_u, p) => buildFieldSource(block, p));
    if (s) fieldSources.declare(s, problems);
  }
  checkSourceOverlaps(fieldSources.all(), problems);
  const magnets = new NameIndex<MagnetModel>('magnet', names);
  const beams = new NameIndex<BeamModel>('beam', names);
  const lines = new NameIndex<LineModel>('line', names);
  const resonances = new NameIndex<ResonanceModel>('resonance', names);
  const scopedFields: FieldModel[] = [];

  for (let i = 0; i < doc.blocks.length; i++) {
    stopEvery(stop, i, BLOCKS_PER_STOP_CHECK);
    const block = doc.blocks[i]!;
    switch (block.kind) {
      case 'species': {
        const s = memo.build(block, names, problems, (u, p) => buildSpecies(block, u, p));
        if (s) species.declare(s, problems);
        break;
      }
      case 'field': {
        const f = memo.build(block, names, problems, (_u, p) => buildField(block, p));
        // The species a field names are resolved below, on a copy: the memoised field is shared with earlier versions.
        const scoped = f && block.settings.some((s) => s.key.text === 'species') ? { ...f } : f;
        if (scoped) fields.declare(scoped, problems);
        if (scoped && scoped !== f) scopedFields.push(scoped);
        break;
      }
      case 'magnet': {
        // A magnet built from sources reads their blocks too, so it is not memoised with its own block.
        const fromSources = block.settings.some((s) => s.key.text === 'sources');
        const m = fromSources ? buildMagnet(block, problems, { sources: fieldSources }) : memo.build(block, names, problems, (_u, p) => buildMagnet(block, p));
        if (m) magnets.declare(m, problems);
        break;
      }
      case 'settings':
        applySettings(block, settings, problems);
        break;
      default:
        break;
    }
  }
  adoptUsedSpecies(used, species, problems);
  for (const f of scopedFields) {
    const acted = readFieldSpecies(f.node, species, problems);
    if (acted) f.species = acted;
  }
  const traps = new NameIndex<TrapModel>('trap', names);
  let beamOrdinal = 0;
  const beamsWithoutName: BeamModel[] = [];
  for (let i = 0; i < doc.blocks.length; i++) {
    stopEvery(stop, i, BLOCKS_PER_STOP_CHECK);
    const block = doc.blocks[i]!;
    if (block.kind === 'beam') {
      const b = buildBeam(block, { species, magnets }, names, problems, beamOrdinal++);
      if (block.name) beams.declare(b, problems);
      else beamsWithoutName.push(b);
    } else if (block.kind === 'line') {
      const l = buildLine(block, species, names, problems);
      if (l) lines.declare(l, problems);
    } else if (block.kind === 'resonance') {
      const r = buildResonance(block, species, names, problems);
      if (r) resonances.declare(r, problems);
    } else if (block.kind === 'trap') {
      const t = buildTrap(block, { species, sources: fieldSources }, names, problems);
      if (t) traps.declare(t, problems);
    }
  }
  // Slowers name lines.
  const slowers = new NameIndex<SlowerModel>('slower', names);
  for (const block of doc.blocks) {
    if (block.kind !== 'slower') continue;
    const s = buildSlower(block, { lines, sources: fieldSources }, problems);
    if (s) slowers.declare(s, problems);
  }
  // Data name beams and levels; fits name data: so they come last.
  const data = new NameIndex<DataModel>('data', names);
  const fits = new NameIndex<FitRequestModel>('fit', names);
  for (const block of doc.blocks) {
    if (block.kind !== 'data') continue;
    const d = buildData(block, { species, beams, sources }, names, problems);
    if (d) data.declare(d, problems);
  }
  for (const block of doc.blocks) {
    if (block.kind !== 'fit') continue;
    const f = buildFit(block, data, problems);
    if (f) fits.declare(f, problems);
  }
  const model: SetupModel = {
    doc,
    uses: used,
    species: species.all(),
    fields: fields.all(),
    sources: fieldSources.all(),
    magnets: magnets.all(),
    beams: [...beams.all(), ...beamsWithoutName],
    lines: lines.all(),
    resonances: resonances.all(),
    data: data.all(),
    fits: fits.all(),
    slowers: slowers.all(),
    traps: traps.all(),
    settings,
    names,
    problems: problems.items,
  };
  // A used file's levels are checked in that file.
  const settingsKey = JSON.stringify(model.settings);
  for (let i = 0; i < model.species.length; i++) {
    stopEvery(stop, i, BLOCKS_PER_STOP_CHECK);
    const s = model.species[i]!;
    if (!s.origin) memo.check(s.node, settingsKey, problems, (p) => s.levels.forEach((l) => checkLevelPhysics(l, model.settings, p)));
  }
  return model;
}

/**
 * The species of used files join this file's, by name. A name this file declares itself, or
 * that an earlier `use` brought in from another declaration, is a duplicate; the same
 * declaration reached twice (two used files that use one file) is not.
 */
function adoptUsedSpecies(used: UsedFileModel[], species: NameIndex<SpeciesModel>, problems: ProblemList): void {
  for (const u of used) {
    const kept: SpeciesModel[] = [];
    for (const s of u.species) {
      const origin = s.origin!;
      const there = { message: `'${s.name}' is declared in ${origin.path}`, range: s.nameRange, uri: origin.uri };
      const first = species.adopt(s);
      if (!first) {
        kept.push(s);
        continue;
      }
      if (!first.origin) {
        problems.add('name-duplicate', `species '${s.name}' is also declared in ${origin.path} (used on line ${origin.useRange.start.line + 1}); the one here is used`, first.nameRange, {
          related: [there],
        });
      } else if (locationKey(first.origin.uri) !== locationKey(origin.uri) || !sameRange(first.nameRange, s.nameRange)) {
        problems.add('name-duplicate', `${origin.path} brings a species named '${s.name}' that ${first.origin.path} brings already`, origin.useRange, {
          related: [there, { message: `'${s.name}' is first declared in ${first.origin.path}`, range: first.nameRange, uri: first.origin.uri }],
        });
      }
    }
    u.species = kept;
  }
}

function sameRange(a: Range, b: Range): boolean {
  return a.start.line === b.start.line && a.start.character === b.start.character && a.end.line === b.end.line && a.end.character === b.end.character;
}
