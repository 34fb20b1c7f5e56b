/**
 * `key = a, b`: a list of names of one kind of block, each resolved against the file's index
 * (unknown names get the usual did-you-mean problem). Used for the sources of a magnet, trap or
 * slower and for the species a field acts on.
 */
import type { Range, SettingNode } from '../format/ast';
import type { ModelCode } from './modelCodes';
import type { NameIndex } from './nameIndex';
import type { ProblemList } from './problems';
import { allParts } from '../format/values';

export interface NameListWording {
  /** What the names name, for the messages: 'coil, solenoid, wire or slab blocks'. */
  blocks: string;
  /** What one item is: 'source names'. */
  items: string;
  /** An example list: 'quad, bias'. */
  example: string;
  /** The code for a name written twice (a warning: it is counted once); without it, a repeat is just dropped. */
  twiceCode?: ModelCode;
}

/** The resolved names in the order written, each once; undefined when the list is empty. */
export function readNameList<T extends { name: string; nameRange: Range }>(setting: SettingNode, index: NameIndex<T>, problems: ProblemList, wording: NameListWording): T[] | undefined {
  const key = setting.key.text;
  if (allParts(setting.groups).length === 0) {
    problems.add('value-missing', `${key} needs the names of ${wording.blocks}, e.g. ${key} = ${wording.example}`, setting.range);
    return undefined;
  }
  const out: T[] = [];
  for (const group of setting.groups) {
    const [part, extra] = group;
    if (!part || extra || part.kind !== 'word') {
      const range = group.length > 0 ? { start: group[0]!.range.start, end: group[group.length - 1]!.range.end } : setting.valueText.range;
      problems.add('value-not-allowed', `${key} lists ${wording.items} separated by commas, e.g. ${wording.example}; got '${group.map((p) => p.text).join(' ')}'`, range);
      continue;
    }
    const found = index.resolve(part, problems);
    if (!found) continue;
    if (out.includes(found)) {
      if (wording.twiceCode) problems.add(wording.twiceCode, `'${part.text}' is already in this list; it is counted once`, part.range);
      continue;
    }
    out.push(found);
  }
  return out;
}
