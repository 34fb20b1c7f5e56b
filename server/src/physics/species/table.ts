/** The built-in species, in order of increasing Z then mass number. Frozen: read-only at run time. */
import { CAESIUM_133 } from './data-cesium';
import { CHROMIUM_52, CHROMIUM_53 } from './data-chromium';
import { HELIUM_3, HELIUM_4 } from './data-helium';
import { DEUTERIUM, HYDROGEN } from './data-hydrogen';
import { LITHIUM_6, LITHIUM_7 } from './data-lithium';
import { POTASSIUM_39, POTASSIUM_40, POTASSIUM_41 } from './data-potassium';
import { RUBIDIUM_85, RUBIDIUM_87 } from './data-rubidium';
import { SODIUM_23 } from './data-sodium';
import {
  CALCIUM_40,
  STRONTIUM_87,
  STRONTIUM_88,
  YTTERBIUM_171,
  YTTERBIUM_174,
} from './data-alkaline-earth-like';
import type { BuiltinSpecies } from './types';

/** Recursively freezes plain data so no caller can alter the shared table. */
function deepFreeze<T>(value: T): T {
  if (value !== null && typeof value === 'object' && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const inner of Object.values(value as Record<string, unknown>)) deepFreeze(inner);
  }
  return value;
}

export const BUILTIN_SPECIES: readonly BuiltinSpecies[] = deepFreeze([
  HYDROGEN,
  DEUTERIUM,
  HELIUM_3,
  HELIUM_4,
  LITHIUM_6,
  LITHIUM_7,
  SODIUM_23,
  POTASSIUM_39,
  POTASSIUM_40,
  POTASSIUM_41,
  CALCIUM_40,
  CHROMIUM_52,
  CHROMIUM_53,
  RUBIDIUM_85,
  RUBIDIUM_87,
  STRONTIUM_87,
  STRONTIUM_88,
  CAESIUM_133,
  YTTERBIUM_171,
  YTTERBIUM_174,
]);
