/**
 * `slab` blocks → FieldSourceModel: a uniformly magnetised rectangular block with edges along
 * x, y, z. `magnetisation = 1.2 T along y` (μ0·M in T) or `= 9.5e5 A/m along 0, 1, 1` (M in A/m).
 */
import type { BlockNode, SettingNode } from '../format/ast';
import { VACUUM_PERMEABILITY } from '../physics/constants';
import type { Vec3 } from '../physics/fields/types';
import { ProblemList } from './problems';
import { isUnreadable, readPartQuantity } from './settingReaders';
import { missingKeys, ORIGIN, readPoint } from './sourceReaders';
import type { FieldSourceModel, Valued } from './types';
import { readDirectionParts, readVector } from './vectorReader';

/** The strongest permanent magnets (NdFeB) reach about 1.4–1.5 T remanence; 2.5 T is well beyond any (common practice). */
export const HIGH_MAGNETISATION_T = 2.5;

const FORM = 'magnetisation = <μ0·M in T, or M in A/m> along <direction>, e.g. 1.2 T along y';

function readMagnetisation(s: SettingNode, problems: ProblemList): { magnetisation: Valued<Vec3>; along: Vec3 } | undefined {
  const first = s.groups[0] ?? [];
  const [amount, along] = first;
  if (isUnreadable(amount)) return undefined;
  if (!amount || amount.kind !== 'quantity' || along?.text !== 'along' || first.length < 3) {
    problems.add('vector-malformed', `write ${FORM}`, s.valueText.range);
    return undefined;
  }
  // μ0·M in T, or M in A/m: try the field reading quietly first.
  const unitIsField = readPartQuantity(amount, 'flux-density', new ProblemList(), 'magnetisation');
  const size = unitIsField ?? readPartQuantity(amount, 'magnetisation', problems, 'magnetisation');
  if (!size) return undefined;
  const tesla = unitIsField ? size.value : VACUUM_PERMEABILITY * size.value;
  const dirGroups = [first.slice(2), ...s.groups.slice(1)];
  const dir = readDirectionParts('the direction of magnetisation', dirGroups, s.valueText.range, problems);
  if (!dir) return undefined;
  // `1.20(2) T along z`: the uncertainty is that of the magnitude μ0·|M|, T.
  const u = size.uncertainty !== undefined ? (unitIsField ? size.uncertainty : VACUUM_PERMEABILITY * size.uncertainty) : undefined;
  const magnetisation: Valued<Vec3> = {
    value: [tesla * dir.value[0], tesla * dir.value[1], tesla * dir.value[2]],
    source: 'this file',
    range: s.valueText.range,
    ...(size.unit ? { unit: size.unit } : {}),
    ...(u !== undefined ? { uncertainty: u } : {}),
  };
  return { magnetisation, along: dir.value };
}

export function buildSlab(node: BlockNode & { kind: 'slab' }, name: NonNullable<BlockNode['name']>, problems: ProblemList): FieldSourceModel {
  const model: FieldSourceModel = { name: name.text, node, nameRange: name.range, kind: 'slab', parts: [], centre: ORIGIN };
  const what = `slab '${name.text}'`;
  let bad = false;
  for (const s of node.settings) {
    switch (s.key.text) {
      case 'size': {
        const v = readVector(s, 'length', problems);
        if (v && v.value.some((x) => !(x > 0))) {
          problems.add('value-out-of-range', `every edge of a block must be longer than zero, got ${s.valueText.text}`, s.valueText.range);
          bad = true;
        } else if (v) model.sizeM = v;
        else bad = true;
        break;
      }
      case 'centre': {
        const v = readPoint(s, problems);
        if (v) model.centre = v;
        else bad = true;
        break;
      }
      case 'magnetisation': {
        const read = readMagnetisation(s, problems);
        if (!read) {
          bad = true;
          break;
        }
        model.magnetisationT = read.magnetisation;
        model.magnetisationAlong = read.along;
        const j = Math.hypot(...read.magnetisation.value);
        if (j === 0) problems.add('source-magnetisation-zero', `${what} is not magnetised, so it adds no field`, s.valueText.range);
        else if (j > HIGH_MAGNETISATION_T) {
          problems.add('source-magnetisation-high', `μ0·M = ${Number(j.toPrecision(4))} T is beyond any permanent magnet (the strongest reach about 1.5 T); check the number and unit`, s.valueText.range);
        }
        break;
      }
      default:
        break;
    }
  }
  const missing = missingKeys(node.settings, ['size', 'magnetisation']);
  if (missing.length > 0) {
    problems.add('source-incomplete', `${what} has no ${missing.join(', ')}; its field needs ${missing.length > 1 ? 'them' : 'it'}`, name.range, { data: { missing } });
  }
  if (bad || missing.length > 0 || !model.sizeM || !model.magnetisationT) return model;
  model.parts = [{ kind: 'slab', centre: model.centre!.value, sizeM: model.sizeM.value, magnetisationT: model.magnetisationT.value }];
  return model;
}
