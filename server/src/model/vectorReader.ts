/**
 * Readers for three-component values: a point or size (`0, 0, 3 cm`: one unit at the end applies
 * to all three; or a unit on each number) and a direction (`x`, `-z`, or three plain numbers,
 * normalised). Problems are reported at the value's range, in plain words.
 */
import type { Range, SettingNode, ValuePart } from '../format/ast';
import type { Dimension } from '../format/units';
import type { Vec3 } from '../physics/fields/types';
import type { ProblemList } from './problems';
import { isUnreadable, readPartQuantity } from './settingReaders';
import type { Valued } from './types';
import { allParts } from '../format/values';

const FILE_SOURCE = 'this file';

export const DIRECTION_WORDS: Readonly<Record<string, Vec3>> = {
  x: [1, 0, 0],
  y: [0, 1, 0],
  z: [0, 0, 1],
  '+x': [1, 0, 0],
  '+y': [0, 1, 0],
  '+z': [0, 0, 1],
  '-x': [-1, 0, 0],
  '-y': [0, -1, 0],
  '-z': [0, 0, -1],
};

/** The direction words as a user writes them (the `+` forms are accepted, not offered). */
export const DIRECTION_NAMES: readonly string[] = Object.keys(DIRECTION_WORDS).filter((w) => !w.startsWith('+'));

function spanOf(parts: readonly ValuePart[], fallback: Range): Range {
  return parts.length > 0 ? { start: parts[0]!.range.start, end: parts[parts.length - 1]!.range.end } : fallback;
}

/**
 * Three quantities of one dimension from the setting's three comma-separated groups. A plain
 * number takes the unit written at the end (`0, 0, 3 cm`); a number with its own unit keeps it.
 */
export function readVector(setting: SettingNode, kind: Dimension, problems: ProblemList): Valued<Vec3> | undefined {
  const example = kind === 'length' ? 'e.g. 0, 0, 3 cm' : 'three numbers and a unit';
  const groups = setting.groups;
  const range = setting.valueText.range;
  if (groups.length !== 3 || groups.some((g) => g.length !== 1)) {
    problems.add('vector-malformed', `${setting.key.text} needs three values separated by commas with a unit (${example}), got '${setting.valueText.text}'`, range);
    return undefined;
  }
  const parts = groups.map((g) => g[0]!);
  if (parts.some(isUnreadable)) return undefined;
  const last = parts[2]!;
  if (parts.some((p) => p.kind === 'word')) {
    const word = parts.find((p) => p.kind === 'word')!;
    problems.add('vector-malformed', `${setting.key.text} needs numbers (${example}), got '${word.text}'`, word.range);
    return undefined;
  }
  if (last.kind !== 'quantity') {
    problems.add('vector-malformed', `${setting.key.text} needs a unit after the last number (${example})`, last.range);
    return undefined;
  }
  const values: number[] = [];
  const uncertainties: (number | undefined)[] = [];
  for (const p of parts) {
    // A plain number borrows the unit written at the end.
    const q: ValuePart = p.kind === 'number' ? { kind: 'quantity', number: p.number, unit: last.unit, text: `${p.text} ${last.unit.text}`, range: p.range } : p;
    const v = readPartQuantity(q, kind, problems, setting.key.text);
    if (!v) return undefined;
    values.push(v.value);
    uncertainties.push(v.uncertainty);
  }
  // Components written with an uncertainty (`0, 0, 1.5(1) mm`) are uncertain inputs (docs/uncertainty.md).
  const componentUncertainty = uncertainties.some((u) => u !== undefined) ? { componentUncertainty: [uncertainties[0], uncertainties[1], uncertainties[2]] as const } : {};
  return { value: [values[0]!, values[1]!, values[2]!], source: FILE_SOURCE, range, unit: last.unit.text, ...componentUncertainty };
}

/** A direction from value parts: one word (x, -z, …) or three plain numbers in `groups`, normalised. */
export function readDirectionParts(key: string, groups: readonly (readonly ValuePart[])[], range: Range, problems: ProblemList): Valued<Vec3> | undefined {
  const flat = allParts(groups);
  const allowed = DIRECTION_NAMES;
  if (flat.length === 1 && flat[0]!.kind === 'word') {
    const w = flat[0]!;
    const v = DIRECTION_WORDS[w.text];
    if (!v) {
      problems.add('direction-unknown', `${key} must be one of ${allowed.join(', ')} or three numbers such as 0, 1, 1; got '${w.text}'`, w.range, {
        data: { suggestions: allowed.filter((a) => a.toLowerCase() === w.text.toLowerCase() || a.endsWith(w.text.toLowerCase().slice(-1))) },
      });
      return undefined;
    }
    return { value: v, source: FILE_SOURCE, range: w.range };
  }
  const span = spanOf(flat, range);
  if (groups.length !== 3 || groups.some((g) => g.length !== 1) || flat.some((p) => p.kind !== 'number')) {
    problems.add('direction-unknown', `${key} must be one of ${allowed.join(', ')} or three plain numbers separated by commas, such as 0, 1, 1`, span);
    return undefined;
  }
  const n = flat.map((p) => (p.kind === 'number' ? p.number.value : NaN));
  const len = Math.hypot(n[0]!, n[1]!, n[2]!);
  if (!(len > 0) || !Number.isFinite(len)) {
    problems.add('direction-zero', `${key} = ${flat.map((p) => p.text).join(', ')} has no direction: at least one number must be non-zero`, span);
    return undefined;
  }
  // Directions are exact in the field sums and flights; say so rather than drop a written uncertainty quietly.
  const uncertain = flat.filter((p) => p.kind === 'number' && p.number.uncertainty !== undefined);
  if (uncertain.length > 0) {
    problems.add('direction-uncertainty-unused', `the uncertainty written on ${key} is not used: directions are taken as exact, so it reaches no result (write the uncertainty on a position or a size instead)`, spanOf(uncertain, span));
  }
  return { value: [n[0]! / len, n[1]! / len, n[2]! / len], source: FILE_SOURCE, range: span };
}

export function readDirection(setting: SettingNode, problems: ProblemList): Valued<Vec3> | undefined {
  if (allParts(setting.groups).length === 0) {
    problems.add('value-missing', `${setting.key.text} needs a direction (x, y, z, -x, -y, -z or three numbers)`, setting.range);
    return undefined;
  }
  return readDirectionParts(setting.key.text, setting.groups, setting.valueText.range, problems);
}
