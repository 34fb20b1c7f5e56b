/**
 * Working fields and which species each one concerns (docs/format.md, "Which fields a level is
 * evaluated at"). A species' levels, and the lines and resonances between them, are evaluated at
 * the fields that concern it, in the file's order (fields, then magnets):
 * - a `field` with `species = …` concerns those species; a `field` without it, every species;
 * - a magnet concerns the species of the beams that fly through it; a magnet no beam uses,
 *   every species.
 * So a file of one species, or one whose fields name no species and whose magnets each carry a
 * beam of every species, is evaluated as it always was: every level at every field.
 */
import type { MagnetModel, SetupModel, SpeciesModel } from '../model/types';
import type { WorkingField } from './levelEvaluation';
import type { MagnetResult, SpeciesResult } from './resultTypes';

/** Every field and magnet that has a value, in the file's order: fields, then magnets. */
export function workingFields(model: SetupModel): WorkingField[] {
  return scopedFields(model).scoped.map((s) => s.field);
}

interface ScopedField {
  field: WorkingField;
  /** The species the field concerns; undefined: every species. */
  species?: ReadonlySet<SpeciesModel>;
}

/** A beam through a magnet and the species it carries. */
type Flown = { name: string; species: SpeciesModel };

function scopedFields(model: SetupModel): { scoped: ScopedField[]; flown: Map<MagnetModel, Flown[]> } {
  const scoped: ScopedField[] = [];
  for (const f of model.fields) {
    if (!f.tesla) continue;
    const field: WorkingField = { source: { kind: 'field', name: f.name }, tesla: f.tesla.value, range: f.tesla.range ?? f.nameRange, ...(f.tesla.unit ? { unit: f.tesla.unit } : {}) };
    scoped.push({ field, ...(f.species ? { species: new Set(f.species) } : {}) });
  }
  // The species that flies is the level's (a beam may name one species and a level of another).
  const flown = new Map<MagnetModel, Flown[]>();
  for (const b of model.beams) {
    const sp = b.level?.species ?? b.species;
    if (!b.magnet || !sp) continue;
    const beams = flown.get(b.magnet) ?? [];
    beams.push({ name: b.name, species: sp });
    flown.set(b.magnet, beams);
  }
  for (const m of model.magnets) {
    if (!m.fieldT) continue;
    const field: WorkingField = { source: { kind: 'magnet', name: m.name }, tesla: m.fieldT.value, range: m.fieldT.range ?? m.nameRange, ...(m.fieldT.unit ? { unit: m.fieldT.unit } : {}) };
    const beams = flown.get(m);
    scoped.push({ field, ...(beams ? { species: new Set(beams.map((b) => b.species)) } : {}) });
  }
  return { scoped, flown };
}

export interface FieldScope {
  /** Every working field of the file. */
  all: WorkingField[];
  /** The working fields that concern a species (the same array for species that share them). */
  of(species: SpeciesModel): WorkingField[];
  /** `evaluated_at` of a species evaluated at some of the working fields only (else empty). */
  evaluatedAt(species: SpeciesModel): Pick<SpeciesResult, 'evaluated_at'>;
  /** A magnet's `beams`: those through it and the species each carries, the species it concerns. */
  beamsThrough(magnet: MagnetModel): Pick<MagnetResult, 'beams'>;
}

export function fieldScope(model: SetupModel): FieldScope {
  const { scoped, flown } = scopedFields(model);
  const all = scoped.map((s) => s.field);
  const beamsThrough = (m: MagnetModel): Pick<MagnetResult, 'beams'> => {
    const beams = flown.get(m);
    return beams ? { beams: beams.map((b) => ({ name: b.name, species: b.species.name })) } : {};
  };
  if (scoped.every((s) => !s.species)) return { all, of: () => all, evaluatedAt: () => ({}), beamsThrough };
  const cache = new Map<SpeciesModel, WorkingField[]>();
  const of = (species: SpeciesModel): WorkingField[] => {
    let fields = cache.get(species);
    if (!fields) {
      fields = scoped.filter((s) => !s.species || s.species.has(species)).map((s) => s.field);
      if (fields.length === all.length) fields = all;
      cache.set(species, fields);
    }
    return fields;
  };
  return {
    all,
    of,
    evaluatedAt(species) {
      const own = of(species);
      return own === all ? {} : { evaluated_at: own.map((f) => ({ ...f.source })) };
    },
    beamsThrough,
  };
}
