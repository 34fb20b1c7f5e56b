/**
 * A line at a working field its evaluation left out (the field concerns another species;
 * docs/format.md): computed when the panel or `sublevel spectrum --field` asks for it, so every
 * (line, field) pair stays within reach although the evaluation holds only those that concern it.
 */
import type { Problem } from '../format/ast';
import type { SetupModel } from '../model/types';
import type { GJLookup } from './gJLookup';
import type { WorkingField } from './levelEvaluation';
import { evaluateLine } from './lineEvaluation';
import type { LineResult } from './resultTypes';
import { addSpectra } from './spectrumEvaluation';

/**
 * The named line with its components (and spectrum, if asked for) at `field` only, without the
 * uncertainties the whole evaluation attaches; undefined when the file has no such line.
 */
export function lineAtField(model: SetupModel, name: string, field: WorkingField, gJOf: GJLookup): LineResult | undefined {
  const line = model.lines.find((l) => l.name === name);
  if (!line) return undefined;
  const problems: Problem[] = []; // the evaluation has reported them already
  return addSpectra(line, evaluateLine(line, [field], gJOf, problems, model.settings), problems, model.beams);
}
