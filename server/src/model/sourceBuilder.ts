/** Dispatches the field-source blocks (`coil`, `solenoid`, `wire`, `slab`) to their builders. */
import type { BlockNode } from '../format/ast';
import { buildCoilOrSolenoid } from './coilBuilder';
import type { ProblemList } from './problems';
import { buildSlab } from './slabBuilder';
import type { FieldSourceModel } from './types';
import { buildWire } from './wireBuilder';

export const SOURCE_BLOCKS = ['coil', 'solenoid', 'wire', 'slab'] as const;

export function isSourceBlock(node: BlockNode): node is BlockNode & { kind: FieldSourceModel['kind'] } {
  return (SOURCE_BLOCKS as readonly string[]).includes(node.kind);
}

export function buildFieldSource(node: BlockNode & { kind: FieldSourceModel['kind'] }, problems: ProblemList): FieldSourceModel | undefined {
  if (!node.name) {
    problems.add('name-missing', `a ${node.kind} needs a name, as in \`${node.kind} ${node.kind === 'coil' ? 'quad' : node.kind === 'wire' ? 'rail' : node.kind === 'slab' ? 'pole' : 'tube'}\``, node.keyword.range);
    return undefined;
  }
  switch (node.kind) {
    case 'coil':
    case 'solenoid':
      return buildCoilOrSolenoid(node as BlockNode & { kind: 'coil' | 'solenoid' }, node.name, problems);
    case 'wire':
      return buildWire(node as BlockNode & { kind: 'wire' }, node.name, problems);
    case 'slab':
      return buildSlab(node as BlockNode & { kind: 'slab' }, node.name, problems);
  }
}
