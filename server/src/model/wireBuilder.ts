/** `wire` blocks → FieldSourceModel: a straight wire, infinite unless `length`, with an optional parallel return wire. */
import type { BlockNode } from '../format/ast';
import type { WireSpec } from '../physics/fields/types';
import { positive } from './apparatusBuilder';
import type { ProblemList } from './problems';
import { readSettingQuantity } from './settingReaders';
import { missingKeys, readAxis, readCurrent, readPoint } from './sourceReaders';
import type { FieldSourceModel } from './types';

/** A return point closer than this to the wire's line (relative to the larger of 1 m and the offsets) is on it. */
const SAME_LINE = 1e-9;

export function buildWire(node: BlockNode & { kind: 'wire' }, name: NonNullable<BlockNode['name']>, problems: ProblemList): FieldSourceModel {
  const model: FieldSourceModel = { name: name.text, node, nameRange: name.range, kind: 'wire', parts: [] };
  const what = `wire '${name.text}'`;
  let bad = false;
  for (const s of node.settings) {
    let ok = true;
    switch (s.key.text) {
      case 'current':
        ok = (model.currentA = readCurrent(s, what, problems)) !== undefined;
        break;
      case 'through':
        ok = (model.through = readPoint(s, problems)) !== undefined;
        break;
      case 'direction':
        ok = (model.direction = readAxis(s, problems)) !== undefined;
        break;
      case 'length':
        ok = (model.lengthM = positive(s, readSettingQuantity(s, 'length', problems, 'wire length, e.g. 20 cm'), problems)) !== undefined;
        break;
      case 'return':
        ok = (model.returnThrough = readPoint(s, problems)) !== undefined;
        break;
      default:
        break;
    }
    if (!ok) bad = true;
  }
  const missing = missingKeys(node.settings, ['current', 'through', 'direction']);
  if (missing.length > 0) {
    problems.add('source-incomplete', `${what} has no ${missing.join(', ')}; its field needs ${missing.length > 1 ? 'them' : 'it'}`, name.range, { data: { missing } });
  }
  if (bad || missing.length > 0 || !model.currentA || !model.through || !model.direction) return model;
  const t = model.direction.value;
  const base = { kind: 'wire' as const, direction: t, ...(model.lengthM ? { lengthM: model.lengthM.value } : {}) };
  const parts: WireSpec[] = [{ ...base, point: model.through.value, currentA: model.currentA.value }];
  if (model.returnThrough) {
    const p = model.through.value;
    const r = model.returnThrough.value;
    const d = [r[0] - p[0], r[1] - p[1], r[2] - p[2]];
    const along = d[0] * t[0] + d[1] * t[1] + d[2] * t[2];
    const off = Math.hypot(d[0] - along * t[0], d[1] - along * t[1], d[2] - along * t[2]);
    if (off <= SAME_LINE * Math.max(1, Math.hypot(...p), Math.hypot(...r))) {
      problems.add('source-return-on-wire', `the return of ${what} lies on the wire's own line; it must run beside it, e.g. return = 0, -2, 0 mm for a wire through 0, 2, 0 mm`, model.returnThrough.range!);
      return model;
    }
    parts.push({ ...base, point: r, currentA: -model.currentA.value });
  }
  model.parts = parts;
  return model;
}
