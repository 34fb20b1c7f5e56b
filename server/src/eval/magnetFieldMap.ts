/**
 * The field a magnet built from sources makes, and where its beam line runs (docs/beam.md,
 * "Magnets built from sources"): the beam flies along +x through `at` (the origin by default).
 */
import { sumField } from '../physics/fields';
import type { FieldFunction, Vec3 } from '../physics/fields/types';
import type { MagnetModel } from '../model/types';

export interface MagnetFieldMap {
  field: FieldFunction;
  centre: Vec3;
}

/** Undefined when the magnet is not built from sources, or none of them is usable (the model has said why). */
export function magnetFieldMap(magnet: MagnetModel | undefined): MagnetFieldMap | undefined {
  if (!magnet?.sources || magnet.sources.length === 0) return undefined;
  const parts = magnet.sources.flatMap((s) => s.parts);
  if (parts.length === 0) return undefined;
  return { field: sumField(parts), centre: magnet.atM?.value ?? [0, 0, 0] };
}
