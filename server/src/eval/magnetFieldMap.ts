/**
 * The field a magnet built from sources makes, and where its beam line runs (docs/beam.md,
 * "Magnets built from sources"): the beam flies along +x through `at` (the origin by default).
 */
import { sumField } from '../physics/fields';
import type { FieldFunction, FieldSourceSpec, Vec3 } from '../physics/fields/types';
import type { MagnetModel } from '../model/types';

export interface MagnetFieldMap {
  field: FieldFunction;
  centre: Vec3;
  /** Every part with the name of the source it belongs to (the beam line must keep clear of them). */
  obstacles: { name: string; spec: FieldSourceSpec }[];
}

/** Undefined when the magnet is not built from sources, or none of them is usable (the model has said why). */
export function magnetFieldMap(magnet: MagnetModel | undefined): MagnetFieldMap | undefined {
  if (!magnet?.sources || magnet.sources.length === 0) return undefined;
  const parts = magnet.sources.flatMap((s) => s.parts);
  if (parts.length === 0) return undefined;
  const obstacles = magnet.sources.flatMap((s) => s.parts.map((spec) => ({ name: s.name, spec })));
  return { field: sumField(parts), centre: magnet.atM?.value ?? [0, 0, 0], obstacles };
}
