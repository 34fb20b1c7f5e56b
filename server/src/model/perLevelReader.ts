/**
 * Settings that give one value per J level of a whole term: `A_J = 1/2 46 MHz, 3/2 -3.06 MHz`
 * (J, then a frequency-like quantity, comma-separated). Used by A_J, B_J and E_J.
 */
import type { SettingNode } from '../format/ast';
import type { ProblemList } from './problems';
import { readPartQuantity } from './settingReaders';
import type { PerLevelValue } from './types';

export function readPerLevel(s: SettingNode, problems: ProblemList, example: string): PerLevelValue[] | undefined {
  const out: PerLevelValue[] = [];
  for (const g of s.groups) {
    const range = g.length > 0 ? { start: g[0]!.range.start, end: g[g.length - 1]!.range.end } : s.valueText.range;
    const j = g[0];
    const twice = j?.kind === 'number' ? 2 * j.number.value : Number.NaN;
    if (g.length !== 2 || !Number.isInteger(twice) || twice < 0 || g[1]!.kind === 'word') {
      problems.add('term-level-value-malformed', `write ${s.key.text} = <J> <value>, … with one J of the term and a value in each group, e.g. ${s.key.text} = ${example}`, range);
      return undefined;
    }
    const v = readPartQuantity(g[1]!, 'frequency-like', problems, s.key.text);
    if (!v) return undefined;
    out.push({ twoJ: twice, value: v.value, range, valueRange: g[1]!.range });
  }
  if (out.length === 0) {
    problems.add('value-missing', `${s.key.text} needs a value, e.g. ${s.key.text} = ${example}`, s.range);
    return undefined;
  }
  return out;
}
