/**
 * The one piece of mathjs Sublevel uses: its Unit class (unit names, prefixes, SI sizes and base
 * dimensions), built from its factory with plain-number arithmetic. `create(all)` — or even the
 * unit functions' own dependencies — builds typed-functions for every numeric type, which costs
 * a few hundred milliseconds at start-up; our values are always plain JavaScript numbers, so the
 * operations the class asks for are given as the number cases of mathjs' own functions. `fix`,
 * `round` and `format` serve only splitUnit and toString, which Sublevel does not call.
 */
import { createComplexClass, createFractionClass, createUnitClass } from 'mathjs';
import type { Unit } from 'mathjs';

/** mathjs' default configuration (core/config.js), which `create` would have used. */
const CONFIG = {
  relTol: 1e-12,
  absTol: 1e-15,
  matrix: 'Matrix',
  number: 'number',
  numberFallback: 'number',
  precision: 64,
  predictable: false,
  randomSeed: null,
} as const;

/** mathjs' nearlyEqual for numbers (utils/number.js), as its `equal` does with the default tolerances. */
function nearlyEqual(x: number, y: number): boolean {
  if (x === y) return true;
  if (!Number.isFinite(x) || !Number.isFinite(y)) return false;
  const diff = Math.abs(x - y);
  return diff <= CONFIG.absTol || diff <= CONFIG.relTol * Math.max(Math.abs(x), Math.abs(y));
}

/** mathjs' powNumber (plain/number/arithmetic.js): x^±Infinity is a real 0 where it tends to 0. */
function powNumber(x: number, y: number): number {
  if ((x * x < 1 && y === Infinity) || (x * x > 1 && y === -Infinity)) return 0;
  return Math.pow(x, y);
}

/**
 * The class only makes BigNumbers when configured for them (config.number), which we never are;
 * standing in for decimal.js keeps 60 kB of it out of every bundle.
 */
class BigNumber {
  constructor() {
    throw new Error('Sublevel reads units with plain numbers; BigNumber is not available');
  }
}
const Complex = createComplexClass({});
const Fraction = createFractionClass({});

export interface UnitClass {
  new (value: number | null, name: string): Unit;
  isValuelessUnit(name: string): boolean;
  BASE_DIMENSIONS: string[];
  createUnit(definitions: Record<string, { definition: string; prefixes?: string }>, options?: { override?: boolean }): void;
}

export const UnitMath: UnitClass = createUnitClass({
  config: CONFIG,
  addScalar: (a: number, b: number) => a + b,
  subtractScalar: (a: number, b: number) => a - b,
  multiplyScalar: (a: number, b: number) => a * b,
  divideScalar: (a: number, b: number) => a / b,
  pow: powNumber,
  abs: Math.abs,
  fix: Math.trunc,
  round: Math.round,
  equal: nearlyEqual,
  isNumeric: (x: unknown) => typeof x === 'number' || x instanceof BigNumber || x instanceof Fraction,
  format: (x: unknown) => String(x),
  number: (x: unknown) => Number(x),
  Complex,
  BigNumber,
  Fraction,
});
