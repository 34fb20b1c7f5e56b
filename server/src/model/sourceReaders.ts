/** Readers shared by the field-source builders: current, turns, centre, axis. */
import type { SettingNode } from '../format/ast';
import type { Vec3 } from '../physics/fields/types';
import type { ProblemList } from './problems';
import { readSettingNumber, readSettingQuantity } from './settingReaders';
import type { Valued } from './types';
import { readDirection, readVector } from './vectorReader';

/** Above this a current in one laboratory conductor is taken as a typing slip (common practice: lab coils run at most a few hundred A). */
export const ABSURD_CURRENT_A = 10_000;

export const ORIGIN: Valued<Vec3> = { value: [0, 0, 0], source: 'default' };
export const PLUS_Z: Valued<Vec3> = { value: [0, 0, 1], source: 'default' };

export function readCurrent(s: SettingNode, what: string, problems: ProblemList): Valued<number> | undefined {
  const v = readSettingQuantity(s, 'current', problems, 'current, e.g. 15 A');
  if (!v) return undefined;
  const range = v.range ?? s.valueText.range;
  if (v.value === 0) problems.add('source-current-zero', `${what} carries no current, so it adds no field`, range);
  else if (Math.abs(v.value) > ABSURD_CURRENT_A) {
    problems.add('source-current-absurd', `${s.valueText.text} is more than 10 kA in one conductor, far beyond laboratory coils and wires; check the unit (mA, A, kA)`, range);
  }
  return v;
}

export function readTurns(s: SettingNode, problems: ProblemList): Valued<number> | undefined {
  const v = readSettingNumber(s, problems, 'number of turns, e.g. 120');
  if (!v) return undefined;
  const range = v.range ?? s.valueText.range;
  if (!Number.isFinite(v.value) || v.value <= 0) {
    problems.add('value-out-of-range', `turns must be at least 1, got ${s.valueText.text}`, range);
    return undefined;
  }
  if (!Number.isInteger(v.value)) {
    problems.add('source-turns-not-whole', `turns must be a whole number, got ${s.valueText.text}`, range, { data: { suggestions: [String(Math.max(1, Math.round(v.value)))] } });
    return undefined;
  }
  return v;
}

export function readPoint(s: SettingNode, problems: ProblemList): Valued<Vec3> | undefined {
  return readVector(s, 'length', problems);
}

export function readAxis(s: SettingNode, problems: ProblemList): Valued<Vec3> | undefined {
  return readDirection(s, problems);
}

/** The keys of `required` the block does not set. */
export function missingKeys(settings: readonly SettingNode[], required: readonly string[]): string[] {
  return required.filter((k) => !settings.some((s) => s.key.text === k));
}
