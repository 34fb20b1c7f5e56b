/**
 * Readers that turn one `key = value` setting into an SI number, an exact spin or a word,
 * reporting a plain-words problem at the value's range when the value does not fit.
 */
import type { ParsedNumber, Range, SettingNode, Spanned, ValuePart } from '../format/ast';
import { makeProblem } from '../format/codes';
import { convertSI, dimensionExamples, isUnitText, readQuantity, type Dimension } from '../format/units';
import { listWords } from '../physics/listWords';
import { withinApparatus } from './lengthRange';
import type { ProblemList } from './problems';
import type { Valued } from './types';
import { allParts } from '../format/values';

const FILE_SOURCE = 'this file';

/**
 * The value's single part, or a problem when the value is empty or has extra items; undefined
 * without another problem for a number that cannot be used (reported where it was read).
 */
export function singlePart(setting: SettingNode, problems: ProblemList, what: string): ValuePart | undefined {
  const parts = allParts(setting.groups);
  if (parts.length === 0) {
    problems.add('value-missing', `${setting.key.text} needs a value (${what})`, setting.range);
    return undefined;
  }
  const decimal = decimalComma(setting);
  if (decimal) {
    problems.add('value-decimal-comma', `'${decimal.written}' has a decimal comma; a comma separates list items, so write ${decimal.meant}`, decimal.range, { data: { suggestions: [decimal.meant] } });
    return undefined;
  }
  if (isListWithOneUnit(setting.groups)) {
    problems.add(
      'value-list-one-unit',
      `${setting.key.text} takes one value (${what}); '${setting.valueText.text}' is a list of ${setting.groups.length} numbers, and one unit at the end is shared only by the three numbers of a point or size: write one value`,
      setting.valueText.range,
    );
    return undefined;
  }
  if (parts.length > 1 || setting.groups.length > 1) {
    const extra = parts[1] ?? parts[0]!;
    problems.add('value-extra', `${setting.key.text} takes one value (${what}); the rest of the line is not used`, {
      start: extra.range.start,
      end: setting.valueText.range.end,
    });
  }
  return isUnreadable(parts[0]) ? undefined : parts[0];
}

/** `3, 2 G`: plain numbers, then one quantity, written where one value goes. */
function isListWithOneUnit(groups: ValuePart[][]): boolean {
  if (groups.length < 2 || groups.some((g) => g.length !== 1)) return false;
  const items = groups.map((g) => g[0]!);
  return items[items.length - 1]!.kind === 'quantity' && items.slice(0, -1).every((p) => p.kind === 'number');
}

/**
 * `3,2 G` where one value goes: a whole number, a comma with no blank either side, then digits.
 * Read as a list it gave a missing unit with a fix writing `3 T,2 G`, and an unused rest.
 */
function decimalComma(setting: SettingNode): { written: string; meant: string; range: Range } | undefined {
  const first = setting.groups[0];
  const second = setting.groups[1];
  if (setting.groups.length !== 2 || first?.length !== 1 || !second?.[0]) return undefined;
  const whole = first[0]!;
  const rest = second[0];
  if (whole.kind !== 'number' || !/^[+\-\u2212]?\d+$/.test(whole.text) || rest.kind === 'word' || !/^\d/.test(rest.text)) return undefined;
  const { end } = whole.range;
  const next = rest.range.start;
  if (end.line !== next.line || next.character !== end.character + 1) return undefined;
  const digits = /^\d+/.exec(rest.text)![0];
  return { written: `${whole.text},${digits}`, meant: `${whole.text}.${digits}`, range: { start: whole.range.start, end: { line: next.line, character: next.character + digits.length } } };
}

/** A quantity of the given dimension, converted to SI. */
export function readSettingQuantity(
  setting: SettingNode,
  dimension: Dimension,
  problems: ProblemList,
  what: string,
): Valued<number> | undefined {
  if (unitWithBlank(setting, dimension, problems)) return undefined;
  const part = singlePart(setting, problems, what);
  if (!part) return undefined;
  return readPartQuantity(part, dimension, problems, setting.key.text);
}

/**
 * `gradient = 180 T m`: a unit typed with a blank where its `/` goes. Read apart it gave a wrong
 * dimension and an unused `m`, whose two fixes together wrote `180 T/m m`; one error, one fix.
 */
function unitWithBlank(setting: SettingNode, dimension: Dimension, problems: ProblemList): boolean {
  // Read by index: array destructuring goes through the iterator protocol, slow in a fresh worker, for every setting.
  const only = setting.groups[0];
  if (!only || setting.groups.length > 1 || only.length !== 2) return false;
  const quantity = only[0]!;
  const word = only[1]!;
  if (quantity.kind !== 'quantity' || word.kind !== 'word' || !isUnitText(word.text)) return false;
  const written = quantity.unit.text;
  const meant = `${written}/${word.text}`;
  if (convertSI(1, dimension, written) !== undefined || convertSI(1, dimension, meant) === undefined) return false;
  const range = { start: quantity.unit.range.start, end: word.range.end };
  const needs = listWords(dimensionExamples(dimension));
  problems.push(makeProblem('unit-wrong-dimension', `${setting.key.text} needs ${needs}, got '${written} ${word.text}' (a blank multiplies units): write ${meant}`, range, {
    data: { suggestions: [meant] },
  }));
  return true;
}

export function readPartQuantity(
  part: ValuePart,
  dimension: Dimension,
  problems: ProblemList,
  _key: string,
): Valued<number> | undefined {
  const result = readQuantity(part, dimension);
  if (result.problem) {
    problems.push({ ...result.problem });
    return undefined;
  }
  if (result.si === undefined || !Number.isFinite(result.si)) return undefined;
  if (dimension === 'length' && !withinApparatus(result.si, part.text, part.range, problems)) return undefined;
  const uncertainty = result.siUncertainty;
  const unit = part.kind === 'quantity' ? part.unit.text : undefined;
  // Keys added in the order the spreads gave them, without the spreads' temporary objects.
  const read: Valued<number> = { value: result.si, source: FILE_SOURCE, range: part.range };
  if (uncertainty !== undefined) read.uncertainty = uncertainty;
  if (unit !== undefined) read.unit = unit;
  return read;
}

/** A number that cannot be used (`1e400`), already reported where the value was read: say nothing more. */
export function isUnreadable(part: ValuePart | undefined): boolean {
  return part !== undefined && part.kind === 'word' && part.unreadable === true;
}

/** The word after a number that the value reads as its unit but is no unit (`40 x`), for settings that take no unit. */
export function strayUnit(part: ValuePart): Spanned | undefined {
  return part.kind === 'quantity' && !isUnitText(part.unit.text) ? part.unit : undefined;
}

/** A plain number (no unit). */
export function readSettingNumber(setting: SettingNode, problems: ProblemList, what: string): Valued<number> | undefined {
  const part = singlePart(setting, problems, what);
  if (!part) return undefined;
  const stray = strayUnit(part);
  if (stray && part.kind === 'quantity') {
    // `turns = 40 x`: no unit is meant; the word is left over.
    problems.add('value-extra', `${setting.key.text} takes one plain number (${what}); '${stray.text}' is not used`, stray.range);
    const numberEnd = { line: part.range.start.line, character: part.range.start.character + part.text.search(/\s|$/) };
    return withUncertainty(part.number, { start: part.range.start, end: numberEnd });
  }
  if (part.kind !== 'number') {
    const got = part.kind === 'quantity' ? `a quantity with unit ${part.unit.text}` : `'${part.text}'`;
    problems.add('value-not-number', `${setting.key.text} needs a plain number (${what}), got ${got}`, part.range);
    return undefined;
  }
  return withUncertainty(part.number, part.range);
}

/**
 * An angular momentum written exactly: 0, 1/2, 1, 3/2, … Returns twice the value.
 * Decimals such as 1.5 are accepted when they are exact half-integers.
 */
export function readSettingSpin(setting: SettingNode, problems: ProblemList, what: string): Valued<number> | undefined {
  const part = singlePart(setting, problems, what);
  if (!part) return undefined;
  if (part.kind !== 'number') {
    problems.add('value-not-number', `${setting.key.text} needs a spin such as 0, 1/2, 1 or 3/2 (${what}), got '${part.text}'`, part.range);
    return undefined;
  }
  const twice = 2 * part.number.value;
  if (!Number.isFinite(twice) || Math.abs(twice - Math.round(twice)) > 1e-9) {
    problems.add('spin-not-half-integer', `${setting.key.text} must be a whole or half-whole number such as 1 or 3/2, got ${part.text}`, part.range);
    return undefined;
  }
  if (twice < 0) {
    problems.add('spin-negative', `${setting.key.text} cannot be negative, got ${part.text}`, part.range);
    return undefined;
  }
  if (twice > 40) {
    problems.add('spin-too-large', `${setting.key.text} = ${part.text} is larger than any nuclear spin Sublevel handles (20)`, part.range);
    return undefined;
  }
  return { value: Math.round(twice), source: FILE_SOURCE, range: part.range };
}

/** One word out of a fixed set. */
export function readSettingWord<T extends string>(
  setting: SettingNode,
  allowed: readonly T[],
  problems: ProblemList,
): T | undefined {
  const part = singlePart(setting, problems, allowed.join(' or '));
  if (!part) return undefined;
  const found = allowed.find((a) => a === part.text);
  if (!found) {
    problems.add('value-not-allowed', `${setting.key.text} must be ${allowed.map((a) => `'${a}'`).join(' or ')}, got '${part.text}'`, part.range, {
      data: { suggestions: [...allowed] },
    });
  }
  return found;
}

function withUncertainty(n: ParsedNumber, range: SettingNode['range']): Valued<number> {
  const read: Valued<number> = { value: n.value, source: FILE_SOURCE, range };
  if (n.uncertainty !== undefined) read.uncertainty = n.uncertainty;
  return read;
}
