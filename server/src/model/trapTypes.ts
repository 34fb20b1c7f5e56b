/** The `trap` block in the model (docs/traps.md): sources, level, gravity, region, temperature, cut. */
import type { BlockNode, Range } from '../format/ast';
import type { Vec3 } from '../physics/fields/types';
import type { FieldSourceModel, LevelModel, Valued } from './types';

export interface TrapModel {
  name: string;
  node: BlockNode;
  nameRange: Range;
  /** The sources whose summed field makes the trap; absent when `sources` is missing or names nothing usable. */
  sources?: FieldSourceModel[];
  level?: LevelModel;
  /** Unit vector along gravity, or null for `gravity = off`; default −z. `range` is the setting's value. */
  gravity: { down: Vec3 | null; range?: Range };
  /** Cloud temperature, K. */
  temperatureK?: Valued<number>;
  /** The RF knife's energy above the bottom, J (written as a temperature E/k_B or a frequency E/h). */
  cutJ?: Valued<number>;
  /** The region's radius, m, when written (`region`); otherwise the evaluation derives it from the sources. */
  regionRadiusM?: Valued<number>;
  /** The region's centre, m (`centre`); default the origin. */
  regionCentre?: Valued<Vec3>;
}
