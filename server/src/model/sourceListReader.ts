/**
 * `sources = a, b`: the field sources a magnet, trap or slower uses, each name resolved against
 * the file's sources (unknown names get the usual did-you-mean problem). A name given twice is
 * counted once, with a warning.
 */
import type { SettingNode } from '../format/ast';
import type { NameIndex } from './nameIndex';
import type { ProblemList } from './problems';
import type { FieldSourceModel } from './types';

/** The resolved sources in the order written; undefined when the list is malformed or none resolves. */
export function readSourceList(setting: SettingNode, index: NameIndex<FieldSourceModel>, problems: ProblemList): FieldSourceModel[] | undefined {
  if (setting.groups.flat().length === 0) {
    problems.add('value-missing', `${setting.key.text} needs the names of coil, solenoid, wire or slab blocks, e.g. ${setting.key.text} = quad, bias`, setting.range);
    return undefined;
  }
  const out: FieldSourceModel[] = [];
  for (const group of setting.groups) {
    const [part, extra] = group;
    if (!part || extra || part.kind !== 'word') {
      const range = group.length > 0 ? { start: group[0]!.range.start, end: group[group.length - 1]!.range.end } : setting.valueText.range;
      problems.add('value-not-allowed', `${setting.key.text} lists source names separated by commas, e.g. quad, bias; got '${group.map((p) => p.text).join(' ')}'`, range);
      continue;
    }
    const found = index.resolve(part, problems);
    if (!found) continue;
    if (out.includes(found)) {
      problems.add('source-listed-twice', `'${part.text}' is already in this list; it is counted once`, part.range);
      continue;
    }
    out.push(found);
  }
  return out.length > 0 ? out : undefined;
}
