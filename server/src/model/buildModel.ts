/**
 * Syntax tree → semantic model. Declarations are collected first (species and their levels,
 * fields, magnets), then references (beams, lines) are resolved, so order in the file does not matter.
 */
import type { SetupDocument } from '../format/ast';
import { buildBeam, buildField, buildMagnet } from './apparatusBuilder';
import { checkLevelPhysics } from './levelChecks';
import { buildLine } from './lineBuilder';
import { NameIndex } from './nameIndex';
import { ProblemList } from './problems';
import { applySettings, DEFAULT_SETTINGS } from './settingsBuilder';
import { buildSpecies } from './speciesBuilder';
import { buildResonance } from './resonanceBuilder';
import type { BeamModel, FieldModel, LineModel, MagnetModel, NameUse, ResonanceModel, SetupModel, SpeciesModel } from './types';

export function buildModel(doc: SetupDocument): SetupModel {
  const problems = new ProblemList();
  const names: NameUse[] = [];
  const settings = { ...DEFAULT_SETTINGS };
  const species = new NameIndex<SpeciesModel>('species', names);
  const fields = new NameIndex<FieldModel>('field', names);
  const magnets = new NameIndex<MagnetModel>('magnet', names);
  const beams = new NameIndex<BeamModel>('beam', names);
  const lines = new NameIndex<LineModel>('line', names);
  const resonances = new NameIndex<ResonanceModel>('resonance', names);

  for (const block of doc.blocks) {
    switch (block.kind) {
      case 'species': {
        const s = buildSpecies(block, names, problems);
        if (s) species.declare(s, problems);
        break;
      }
      case 'field': {
        const f = buildField(block, problems);
        if (f) fields.declare(f, problems);
        break;
      }
      case 'magnet': {
        const m = buildMagnet(block, problems);
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
  let beamOrdinal = 0;
  const beamsWithoutName: BeamModel[] = [];
  for (const block of doc.blocks) {
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
    }
  }
  const model: SetupModel = {
    doc,
    species: species.all(),
    fields: fields.all(),
    magnets: magnets.all(),
    beams: [...beams.all(), ...beamsWithoutName],
    lines: lines.all(),
    resonances: resonances.all(),
    settings,
    names,
    problems: problems.items,
  };
  for (const s of model.species) for (const l of s.levels) checkLevelPhysics(l, model.settings, problems);
  return model;
}
