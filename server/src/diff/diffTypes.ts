/**
 * What `sublevel diff` reports: the physical changes between two versions of a setup, grouped by
 * the thing they belong to (matched by name, so moving text is not a change). This is also the
 * JSON document (`format: 'sublevel-diff', version: 1`); values are in SI like the evaluation.
 */
import type { DiagnosticResult } from '../eval/resultTypes';

export const DIFF_FORMAT = 'sublevel-diff';
export const DIFF_VERSION = 1;

export type ThingKind = 'field' | 'magnet' | 'level' | 'term' | 'beam' | 'line' | 'resonance' | 'species' | 'settings' | 'data' | 'fit' | 'coil' | 'solenoid' | 'wire' | 'slab' | 'file';

/** Below these differences a number is the same (SI units; dimensionless for g, moments in μ_B, strengths). */
export interface DiffThresholds {
  frequency_Hz: number;
  field_T: number;
  length_m: number;
  g: number;
  moment_bohr: number;
  strength: number;
}

export const DEFAULT_THRESHOLDS: DiffThresholds = {
  frequency_Hz: 1e3,
  field_T: 1e-7,
  length_m: 1e-6,
  g: 1e-6,
  moment_bohr: 1e-4,
  strength: 1e-4,
};

export type ChangeValue = number | string | boolean | null;

export interface QuantityChange {
  /** What changed: 'g_J', 'energy', 'peak position', 'all peaks resolved'. */
  quantity: string;
  /** Which part of the thing, when it has several: a sublevel label, a component, a peak. */
  subject?: string;
  /** The working field it is computed at (`magnet selector`). */
  at?: string;
  /** Both values as the one formatter writes them ('—' when absent). */
  old: string;
  new: string;
  /** The difference, for numbers present on both sides. */
  change?: string;
  old_value: ChangeValue;
  new_value: ChangeValue;
  /** SI unit of old_value and new_value, for numbers. */
  unit?: string;
}

export interface ThingDiff {
  kind: ThingKind;
  name: string;
  status: 'changed' | 'added' | 'removed';
  changes: QuantityChange[];
  /** Diagnostics matched by code and thing: those only in the new version, those only in the old. */
  new_diagnostics: DiagnosticResult[];
  gone_diagnostics: DiagnosticResult[];
}

export interface SetupDiff {
  format: typeof DIFF_FORMAT;
  version: typeof DIFF_VERSION;
  old: string;
  new: string;
  thresholds: DiffThresholds;
  /** True when anything below is reported: the exit code of `sublevel diff` is 1 then. */
  changed: boolean;
  things: ThingDiff[];
}
