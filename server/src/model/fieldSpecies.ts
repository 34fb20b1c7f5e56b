/**
 * `species = Rb87, K39` under a `field`: the species the field acts on, so that only their
 * levels are evaluated at it (docs/format.md, "Which fields a level is evaluated at"). Read after
 * every species (this file's and the used files') is known, since the list may name any of them.
 */
import type { BlockNode } from '../format/ast';
import type { NameIndex } from './nameIndex';
import { readNameList } from './nameListReader';
import type { ProblemList } from './problems';
import type { SpeciesModel } from './types';

/**
 * The species the block's `species` setting names (empty when none of them resolves: the field
 * then acts on no species, and the unknown names are errors); undefined when the block has no
 * such setting or its list is empty (the field acts on every species).
 */
export function readFieldSpecies(block: BlockNode, index: NameIndex<SpeciesModel>, problems: ProblemList): SpeciesModel[] | undefined {
  const setting = block.settings.find((s) => s.key.text === 'species');
  if (!setting) return undefined;
  return readNameList(setting, index, problems, { blocks: 'species blocks', items: 'species names', example: 'Rb87, K39' });
}
