/**
 * `coil` (one loop, or a coaxial pair with `spacing`) and `solenoid` blocks → FieldSourceModel
 * with their exact parts (docs/fields.md).
 */
import type { BlockNode } from '../format/ast';
import type { LoopSpec, SolenoidSpec, Vec3 } from '../physics/fields/types';
import { positive } from './apparatusBuilder';
import type { ProblemList } from './problems';
import { readSettingQuantity, readSettingWord } from './settingReaders';
import { missingKeys, ORIGIN, PLUS_Z, readAxis, readCurrent, readPoint, readTurns } from './sourceReaders';
import type { FieldSourceModel } from './types';

export function buildCoilOrSolenoid(node: BlockNode & { kind: 'coil' | 'solenoid' }, name: NonNullable<BlockNode['name']>, problems: ProblemList): FieldSourceModel {
  const model: FieldSourceModel = { name: name.text, node, nameRange: name.range, kind: node.kind, parts: [], centre: ORIGIN, axis: PLUS_Z };
  const what = `${node.kind} '${name.text}'`;
  let bad = false;
  for (const s of node.settings) {
    const ok = ((): boolean => {
      switch (s.key.text) {
        case 'radius':
          return (model.radiusM = positive(s, readSettingQuantity(s, 'length', problems, 'radius, e.g. 3.5 cm'), problems)) !== undefined;
        case 'length':
          return (model.lengthM = positive(s, readSettingQuantity(s, 'length', problems, 'winding length, e.g. 30 cm'), problems)) !== undefined;
        case 'turns':
          return (model.turns = readTurns(s, problems)) !== undefined;
        case 'current':
          return (model.currentA = readCurrent(s, what, problems)) !== undefined;
        case 'centre': {
          const v = readPoint(s, problems);
          if (v) model.centre = v;
          return v !== undefined;
        }
        case 'axis': {
          const v = readAxis(s, problems);
          if (v) model.axis = v;
          return v !== undefined;
        }
        case 'spacing':
          return (model.spacingM = positive(s, readSettingQuantity(s, 'length', problems, 'distance between the two loops, e.g. 7 cm'), problems)) !== undefined;
        case 'sense': {
          const w = readSettingWord(s, ['same', 'opposite'] as const, problems);
          if (w) model.sense = { value: w, source: 'this file', range: s.valueText.range };
          return w !== undefined;
        }
        case 'conductor':
          return (model.conductorM = positive(s, readSettingQuantity(s, 'length', problems, 'copper wire diameter, e.g. 1.2 mm'), problems)) !== undefined;
        default:
          return true;
      }
    })();
    if (!ok) bad = true;
  }
  const sense = node.settings.find((s) => s.key.text === 'sense');
  if (sense && node.kind === 'coil' && !node.settings.some((s) => s.key.text === 'spacing')) {
    problems.add('source-sense-without-spacing', `sense applies to a pair of loops; ${what} is one loop (give spacing to make it a pair)`, sense.key.range);
  }
  const required = node.kind === 'coil' ? ['radius', 'turns', 'current'] : ['radius', 'length', 'turns', 'current'];
  const missing = missingKeys(node.settings, required);
  if (missing.length > 0) {
    problems.add('source-incomplete', `${what} has no ${missing.join(', ')}; its field needs ${missing.length > 1 ? 'them' : 'it'}`, name.range, { data: { missing } });
  }
  if (bad || missing.length > 0 || !model.radiusM || !model.turns || !model.currentA) return model;
  const centre = model.centre!.value;
  const axis = model.axis!.value;
  const ampereTurns = model.turns.value * model.currentA.value;
  if (node.kind === 'solenoid') {
    if (!model.lengthM) return model;
    const part: SolenoidSpec = { kind: 'solenoid', centre, axis, radiusM: model.radiusM.value, lengthM: model.lengthM.value, ampereTurns };
    model.parts = [part];
    return model;
  }
  const loopAt = (c: Vec3, at: number): LoopSpec => ({ kind: 'loop', centre: c, axis, radiusM: model.radiusM!.value, ampereTurns: at });
  if (!model.spacingM) {
    model.parts = [loopAt(centre, ampereTurns)];
    return model;
  }
  const h = model.spacingM.value / 2;
  const opposite = model.sense?.value === 'opposite';
  model.parts = [
    loopAt([centre[0] - h * axis[0], centre[1] - h * axis[1], centre[2] - h * axis[2]], ampereTurns),
    loopAt([centre[0] + h * axis[0], centre[1] + h * axis[1], centre[2] + h * axis[2]], opposite ? -ampereTurns : ampereTurns),
  ];
  return model;
}
