/**
 * `sources = a, b`: the field sources a magnet, trap or slower uses, each name resolved against
 * the file's sources (unknown names get the usual did-you-mean problem). A name given twice is
 * counted once, with a warning.
 */
import type { SettingNode } from '../format/ast';
import type { NameIndex } from './nameIndex';
import { readNameList } from './nameListReader';
import type { ProblemList } from './problems';
import type { FieldSourceModel } from './types';

/** The resolved sources in the order written; undefined when the list is malformed or none resolves. */
export function readSourceList(setting: SettingNode, index: NameIndex<FieldSourceModel>, problems: ProblemList): FieldSourceModel[] | undefined {
  const out = readNameList(setting, index, problems, { blocks: 'coil, solenoid, wire or slab blocks', items: 'source names', example: 'quad, bias', twiceCode: 'source-listed-twice' });
  return out && out.length > 0 ? out : undefined;
}
