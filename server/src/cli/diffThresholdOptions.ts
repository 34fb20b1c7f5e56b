/** The thresholds of `sublevel diff` as options: quantities in the file's units, plain numbers for g, moments and strengths. */
import { readQuantityArgument } from '../format/quantityArgument';
import type { Dimension } from '../format/units';
import { DEFAULT_THRESHOLDS, type DiffThresholds } from '../diff/diffTypes';
import { type ParsedArgs, stringOption, UsageError } from './args';

interface ThresholdOption {
  key: keyof DiffThresholds;
  /** Absent: a plain number. */
  dimension?: Dimension;
  help: string;
}

const THRESHOLDS: Readonly<Record<string, ThresholdOption>> = {
  'frequency-threshold': { key: 'frequency_Hz', dimension: 'frequency-like', help: 'smallest change of an energy or frequency reported (default 1 kHz)' },
  'field-threshold': { key: 'field_T', dimension: 'flux-density', help: 'smallest change of a resonance field reported (default 1 mG)' },
  'length-threshold': { key: 'length_m', dimension: 'length', help: 'smallest change of a peak position reported (default 1 um)' },
  'g-threshold': { key: 'g', help: 'smallest change of a g-factor reported (default 1e-6)' },
  'moment-threshold': { key: 'moment_bohr', help: 'smallest change of a sublevel moment reported, in Bohr magnetons (default 1e-4)' },
  'strength-threshold': { key: 'strength', help: 'smallest change of a line component strength reported (default 1e-4)' },
  'chi2-threshold': { key: 'chi2', help: "smallest change of a fit's chi-squared reported (default 1e-3)" },
  'fraction-threshold': { key: 'fraction', help: 'smallest relative change of a fitted value with no threshold of its own, e.g. a temperature (default 1e-6)' },
};

export const DIFF_THRESHOLD_OPTIONS = Object.fromEntries(
  Object.entries(THRESHOLDS).map(([name, o]) => [name, { value: o.dimension ? 'QUANTITY' : 'NUMBER', help: o.help }]),
) as Readonly<Record<string, { value: string; help: string }>>;

function readThreshold(name: string, o: ThresholdOption, text: string): number {
  let value: number | undefined;
  if (o.dimension) {
    const r = readQuantityArgument(text, o.dimension, `--${name}`);
    if (r.si === undefined) throw new UsageError(r.message ?? `--${name}: cannot read '${text}'`);
    value = r.si;
  } else value = /^\s*[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?\s*$/.test(text) ? Number(text) : undefined;
  if (value === undefined || !Number.isFinite(value) || value < 0) throw new UsageError(`--${name} must be ${o.dimension ? 'a quantity' : 'a number'} ≥ 0, got '${text}'`);
  return value;
}

export function diffThresholds(args: ParsedArgs): DiffThresholds {
  const out = { ...DEFAULT_THRESHOLDS };
  for (const [name, o] of Object.entries(THRESHOLDS)) {
    const text = stringOption(args, name);
    if (text !== undefined) out[o.key] = readThreshold(name, o, text);
  }
  return out;
}
