/**
 * Collects the changes of one thing: numbers beyond their threshold, words and flags that differ,
 * parts present on one side only. Every value is written by the caller's formatter (the one in
 * eval/quantityText.ts or the unit echo), so the diff reads like the reports.
 */
import { MISSING } from '../eval/quantityText';
import type { ChangeValue, QuantityChange } from './diffTypes';

/** Writes a value (or a difference) of one kind of number; undefined/null → MISSING. */
export type Writer = (x: number) => string;

export interface Where {
  subject?: string;
  at?: string;
}

export class ChangeList {
  readonly changes: QuantityChange[] = [];

  /** A number that moved by more than `threshold` (or appeared, or went away). */
  number(quantity: string, a: number | null | undefined, b: number | null | undefined, threshold: number, write: Writer, unit: string, where: Where = {}): void {
    const has = (x: number | null | undefined): x is number => x !== null && x !== undefined && Number.isFinite(x);
    if (!has(a) && !has(b)) return;
    if (has(a) && has(b) && !(Math.abs(b - a) > threshold)) return;
    const change = has(a) && has(b) ? signed(write(b - a)) : undefined;
    this.push(quantity, has(a) ? write(a) : MISSING, has(b) ? write(b) : MISSING, has(a) ? a : null, has(b) ? b : null, where, unit, change);
  }

  /** A word or flag that differs. */
  value(quantity: string, a: string | boolean | undefined, b: string | boolean | undefined, where: Where = {}): void {
    if (a === b) return;
    const text = (x: string | boolean | undefined): string => (x === undefined ? MISSING : typeof x === 'boolean' ? (x ? 'yes' : 'no') : x);
    this.push(quantity, text(a), text(b), a ?? null, b ?? null, where);
  }

  /** Parts of a thing present on one side only (sublevels, components, peaks), by their keys. */
  presence(quantity: string, oldKeys: readonly string[], newKeys: readonly string[], where: Where = {}): void {
    const added = newKeys.filter((k) => !oldKeys.includes(k));
    const gone = oldKeys.filter((k) => !newKeys.includes(k));
    for (const k of gone) this.push(quantity, 'present', 'gone', k, null, { ...where, subject: k });
    for (const k of added) this.push(quantity, 'absent', 'new', null, k, { ...where, subject: k });
  }

  private push(quantity: string, old: string, now: string, oldValue: ChangeValue, newValue: ChangeValue, where: Where, unit?: string, change?: string): void {
    this.changes.push({
      quantity,
      ...(where.subject !== undefined ? { subject: where.subject } : {}),
      ...(where.at !== undefined ? { at: where.at } : {}),
      old,
      new: now,
      ...(change !== undefined ? { change } : {}),
      old_value: oldValue,
      new_value: newValue,
      ...(unit !== undefined ? { unit } : {}),
    });
  }
}

/** A difference with its sign in front ('+30 T/m', '-1.2 mm'). */
function signed(text: string): string {
  return /^[-−]/.test(text) || /^0(?:\s|$)/.test(text) || text === MISSING ? text : `+${text}`;
}

/** Items of two lists paired by a key; each key once (a later repeat is ignored). */
export function pairByKey<T>(a: readonly T[], b: readonly T[], key: (x: T) => string): { pairs: [T, T][]; oldKeys: string[]; newKeys: string[] } {
  const mapA = new Map<string, T>();
  const mapB = new Map<string, T>();
  for (const x of a) if (!mapA.has(key(x))) mapA.set(key(x), x);
  for (const x of b) if (!mapB.has(key(x))) mapB.set(key(x), x);
  const pairs: [T, T][] = [];
  for (const [k, x] of mapA) {
    const y = mapB.get(k);
    if (y !== undefined) pairs.push([x, y]);
  }
  return { pairs, oldKeys: [...mapA.keys()], newKeys: [...mapB.keys()] };
}
