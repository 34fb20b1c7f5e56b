/** Builds `line` blocks: two levels of one species joined by an electric-dipole line. */
import type { BlockNode } from '../format/ast';
import { resolveLevel, type NameIndex } from './nameIndex';
import type { ProblemList } from './problems';
import type { LineModel, NameUse, SpeciesModel } from './types';

export function buildLine(node: BlockNode, species: NameIndex<SpeciesModel>, uses: NameUse[], problems: ProblemList): LineModel | undefined {
  if (!node.name) {
    problems.add('name-missing', 'a line needs a name, as in `line D2: ground -> upper`', node.keyword.range);
    return undefined;
  }
  const line: LineModel = { name: node.name.text, node, nameRange: node.name.range };
  const link = node.link;
  if (!link?.from || !link.to) {
    problems.add('line-incomplete', `line '${line.name}' needs two levels, as in \`line ${line.name}: ground -> upper\``, node.headerRange);
  }
  const lower = link?.from ? resolveLevel(link.from, species, undefined, uses, problems) : undefined;
  const upper = link?.to ? resolveLevel(link.to, species, lower?.species, uses, problems) : undefined;
  if (lower) line.lower = lower;
  if (upper) line.upper = upper;
  if (lower && upper) {
    if (lower.species !== upper.species) {
      problems.add('line-across-species', `line '${line.name}' joins ${lower.species.name} and ${upper.species.name}; a line joins two levels of one species`, node.headerRange);
    } else if (lower === upper) {
      problems.add('line-same-level', `line '${line.name}' goes from level '${lower.name}' to itself`, link!.to!.range);
    }
  }
  return line;
}
