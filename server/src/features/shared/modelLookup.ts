/** From syntax nodes and name declarations to the model objects built from them. */
import type { BlockNode, LevelNode, Range } from '../../format/ast';
import type { BeamModel, FieldModel, LevelModel, LineModel, MagnetModel, NameUse, ResonanceModel, SetupModel, SpeciesModel } from '../../model/types';
import { sameRange } from './names';

export function speciesOfBlock(model: SetupModel | undefined, block: BlockNode): SpeciesModel | undefined {
  return model?.species.find((s) => s.node === block);
}

export function levelOfNode(model: SetupModel | undefined, block: BlockNode, node: LevelNode): LevelModel | undefined {
  return speciesOfBlock(model, block)?.levels.find((l) => l.node === node);
}

export function fieldOfBlock(model: SetupModel | undefined, block: BlockNode): FieldModel | undefined {
  return model?.fields.find((f) => f.node === block);
}

export function magnetOfBlock(model: SetupModel | undefined, block: BlockNode): MagnetModel | undefined {
  return model?.magnets.find((m) => m.node === block);
}

export function beamOfBlock(model: SetupModel | undefined, block: BlockNode): BeamModel | undefined {
  return model?.beams.find((b) => b.node === block);
}

export function lineOfBlock(model: SetupModel | undefined, block: BlockNode): LineModel | undefined {
  return model?.lines.find((l) => l.node === block);
}

export function resonanceOfBlock(model: SetupModel | undefined, block: BlockNode): ResonanceModel | undefined {
  return model?.resonances.find((r) => r.node === block);
}

export type Declared =
  | { kind: 'species'; item: SpeciesModel }
  | { kind: 'level'; item: LevelModel }
  | { kind: 'field'; item: FieldModel }
  | { kind: 'magnet'; item: MagnetModel }
  | { kind: 'beam'; item: BeamModel }
  | { kind: 'line'; item: LineModel }
  | { kind: 'resonance'; item: ResonanceModel };

/** The model object declared at `range` with this kind of name; `uri` when it is declared in another file (through `use`). */
export function declaredAt(model: SetupModel, kind: NameUse['kind'], range: Range, uri?: string): Declared | undefined {
  const at = <T extends { nameRange: Range }>(items: T[]): T | undefined => items.find((x) => sameRange(x.nameRange, range));
  // Only species and their levels come from other files; a range alone could match one in either file.
  const fromHere = (s: SpeciesModel): boolean => s.origin?.uri === uri;
  if (uri !== undefined && kind !== 'species' && kind !== 'level') return undefined;
  switch (kind) {
    case 'species': {
      const item = at(model.species.filter(fromHere));
      return item && { kind, item };
    }
    case 'level': {
      const item = at(model.species.filter(fromHere).flatMap((s) => s.levels));
      return item && { kind, item };
    }
    case 'field': {
      const item = at(model.fields);
      return item && { kind, item };
    }
    case 'magnet': {
      const item = at(model.magnets);
      return item && { kind, item };
    }
    case 'beam': {
      const item = at(model.beams);
      return item && { kind, item };
    }
    case 'line': {
      const item = at(model.lines);
      return item && { kind, item };
    }
    case 'resonance': {
      const item = at(model.resonances);
      return item && { kind, item };
    }
    default:
      return undefined;
  }
}
