/** Builds `slower` blocks: a cycling line, capture and final speeds, the safety factor, the design. */
import type { BlockNode, SettingNode } from '../format/ast';
import type { NameIndex } from './nameIndex';
import type { ProblemList } from './problems';
import { readSettingNumber, readSettingQuantity, readSettingWord, singlePart } from './settingReaders';
import { readSourceList } from './sourceListReader';
import { readDirection, readVector } from './vectorReader';
import type { FieldSourceModel, LineModel, SlowerModel, Valued } from './types';

export const SLOWER_DESIGNS = ['decreasing', 'increasing', 'spin_flip'] as const;
/** Defaults: η = 0.5 and s0 = 2 are middle-of-the-road choices for a first design (common practice). */
export const DEFAULT_SAFETY = 0.5;
export const DEFAULT_SATURATION = 2;

const DEFAULT_SOURCE = 'default';

export function buildSlower(node: BlockNode, index: { lines: NameIndex<LineModel>; sources: NameIndex<FieldSourceModel> }, problems: ProblemList): SlowerModel | undefined {
  if (!node.name) {
    problems.add('name-missing', 'a slower needs a name, as in `slower zs`', node.keyword.range);
    return undefined;
  }
  const slower: SlowerModel = {
    name: node.name.text,
    node,
    nameRange: node.name.range,
    safety: { value: DEFAULT_SAFETY, source: DEFAULT_SOURCE },
    design: 'decreasing',
    saturation: { value: DEFAULT_SATURATION, source: DEFAULT_SOURCE },
    repump: false,
  };
  for (const s of node.settings) {
    switch (s.key.text) {
      case 'line': {
        const part = singlePart(s, problems, 'a line name');
        slower.lineRange = s.valueText.range;
        const l = part ? index.lines.resolve(part, problems) : undefined;
        if (l) slower.line = l;
        break;
      }
      case 'capture': {
        const v = positive(s, readSettingQuantity(s, 'speed', problems, 'capture speed, e.g. 350 m/s'), problems);
        if (v) slower.captureMPerS = v;
        break;
      }
      case 'final': {
        const v = readSettingQuantity(s, 'speed', problems, 'final speed, e.g. 20 m/s');
        if (v && v.value < 0) problems.add('value-out-of-range', `final must not be negative, got ${s.valueText.text}`, v.range ?? s.valueText.range);
        else if (v) slower.finalMPerS = v;
        break;
      }
      case 'safety': {
        const v = readSettingNumber(s, problems, 'safety factor η, e.g. 0.6');
        if (v && !(v.value > 0 && v.value <= 1)) {
          problems.add('slower-safety-out-of-range', `safety is the fraction η of the largest deceleration the light can give, so it must be in (0, 1]; got ${s.valueText.text}`, v.range ?? s.valueText.range);
        } else if (v) slower.safety = v;
        break;
      }
      case 'design': {
        const w = readSettingWord(s, SLOWER_DESIGNS, problems);
        if (w) {
          slower.design = w;
          slower.designRange = s.valueText.range;
        }
        break;
      }
      case 'bias': {
        const v = readSettingQuantity(s, 'flux-density', problems, 'bias field B_bias, e.g. -150 G');
        if (v) slower.biasT = v;
        break;
      }
      case 'saturation': {
        const v = readSettingNumber(s, problems, 'saturation parameter s0 = I/I_sat, e.g. 2');
        if (v && !(v.value > 0)) problems.add('value-out-of-range', `saturation must be greater than zero, got ${s.valueText.text}`, v.range ?? s.valueText.range);
        else if (v) slower.saturation = v;
        break;
      }
      case 'sources': {
        const list = readSourceList(s, index.sources, problems);
        if (list) slower.sources = list;
        break;
      }
      case 'start': {
        const v = readVector(s, 'length', problems);
        if (v) slower.start = v;
        break;
      }
      case 'axis': {
        const v = readDirection(s, problems);
        if (v) slower.axis = v;
        break;
      }
      case 'repump':
        slower.repump = readSettingWord(s, ['on', 'off'] as const, problems) === 'on';
        break;
      default:
        break;
    }
  }
  const { captureMPerS: v0, finalMPerS: vf } = slower;
  if (v0 && vf && vf.value >= v0.value) {
    problems.add('slower-final-not-below-capture', `the final speed (${textOf(node, 'final')}) must be below the capture speed (${textOf(node, 'capture')}): a slower only slows atoms down`, vf.range ?? slower.nameRange, {
      related: [{ message: 'the capture speed', range: v0.range ?? slower.nameRange }],
    });
    delete slower.finalMPerS;
  }
  const missing = (['line', 'capture', 'final'] as const).filter((k) => !node.settings.some((s) => s.key.text === k));
  if (missing.length > 0) {
    problems.add('slower-incomplete', `slower '${slower.name}' has no ${missing.join(', ')}; the profile needs ${missing.length > 1 ? 'them' : 'it'}, e.g. \`${missing[0]} = ${EXAMPLES[missing[0]!]}\``, slower.nameRange, {
      data: { missing },
    });
  }
  return slower;
}

const EXAMPLES: Record<'line' | 'capture' | 'final', string> = { line: 'D2', capture: '350 m/s', final: '20 m/s' };

function textOf(node: BlockNode, key: string): string {
  return node.settings.find((s) => s.key.text === key)?.valueText.text ?? '';
}

function positive(s: SettingNode, v: Valued<number> | undefined, problems: ProblemList): Valued<number> | undefined {
  if (v && v.value <= 0) {
    problems.add('value-out-of-range', `${s.key.text} must be greater than zero, got ${s.valueText.text}`, v.range ?? s.valueText.range);
    return undefined;
  }
  return v;
}
