/**
 * Which statements and setting keys the format allows where. Keys are case-sensitive
 * (`A` is the hyperfine constant; `a` is a typo that gets a suggestion).
 */
import type { BlockKind } from './ast';

export const BLOCK_WORDS: readonly BlockKind[] = ['species', 'field', 'magnet', 'beam', 'line', 'resonance', 'settings', 'data', 'fit', 'coil', 'solenoid', 'wire', 'slab', 'slower', 'trap'];

export const LEVEL_WORD = 'level';

/** `use "<path>"` at the top level: the species of another setup file become available. */
export const USE_WORD = 'use';

/** Keys a level takes, on its own line or on the lines after it. */
export const LEVEL_KEYS: readonly string[] = ['A', 'B', 'C', 'g_J', 'energy', 'zeta', 'A_J', 'B_J', 'E_J', 'lifetime', 'linewidth', 'r2'];

/** Keys each block takes on the lines after its header. */
export const BLOCK_KEYS: Readonly<Record<BlockKind, readonly string[]>> = {
  species: ['mass', 'I', 'g_I', 'mu_I'],
  field: ['species'],
  magnet: ['field', 'gradient', 'length', 'sources', 'at'],
  beam: ['species', 'level', 'source', 'slits', 'magnet', 'drift', 'detector', 'populations'],
  line: ['spectrum', 'light', 'doppler', 'instrument', 'span', 'points'],
  resonance: ['level', 'lower', 'upper', 'frequency', 'range', 'two_photon'],
  settings: ['g_s', 'reduced_mass'],
  data: ['level', 'kind', 'lower', 'upper', 'point', 'file', 'beam'],
  fit: ['data', 'free', 'start', 'range'],
  // Field sources (docs/fields.md).
  coil: ['radius', 'turns', 'current', 'centre', 'axis', 'spacing', 'sense', 'conductor'],
  solenoid: ['radius', 'length', 'turns', 'current', 'centre', 'axis', 'conductor'],
  wire: ['current', 'through', 'direction', 'length', 'return'],
  slab: ['size', 'centre', 'magnetisation'],
  slower: ['line', 'capture', 'final', 'safety', 'design', 'bias', 'saturation', 'repump', 'sources', 'start', 'axis'],
  trap: ['sources', 'level', 'gravity', 'temperature', 'cut', 'region', 'centre'],
};

/** Keys that may be written more than once in a block, each line one more value (`point` in `data`). */
export const REPEATABLE_KEYS: readonly string[] = ['point'];

/** Plain words that appear inside values; never mistaken for misspelt units. */
export const VALUE_WORDS: readonly string[] = ['oven', 'jet', 'speed', 'spread', 'apart', 'at', 'exact', 'on', 'off', 'along', 'across', 'same', 'opposite'];

export function isBlockWord(word: string): word is BlockKind {
  return (BLOCK_WORDS as readonly string[]).includes(word);
}

/** The block kinds whose bodies accept `key`, e.g. `mass` → ['species']. */
export function blocksWithKey(key: string): BlockKind[] {
  return BLOCK_WORDS.filter((kind) => BLOCK_KEYS[kind].includes(key));
}
