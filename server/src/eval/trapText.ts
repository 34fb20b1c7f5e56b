/**
 * Words and numbers for trap results, shared by the CLI report and the hover: fields and gradients
 * in one unit family per trap (trapFieldUnit), temperatures with a prefix, the depth three ways.
 */
import { BOLTZMANN_K, PLANCK_H } from '../physics/constants';
import { ZERO_FIELD_FRACTION } from '../physics/traps';
import { fieldText, frequencyText, GAUSS_TESLA_SWITCH_T, gradientText, lengthText, MISSING, trimNumber, type FieldFamily } from './quantityText';
import type { TrapResult, TrapSublevelResult } from './trapResultTypes';
import { pointText } from './fieldSourceText';
import { lengthUnitFor, type LengthUnit } from './lengthUnit';
import { displayUnit, inWrittenUnit, isGaussUnit } from './writtenUnit';

/** The one field unit family of a trap's lines: gauss with G/cm, or tesla (with a prefix) with T/m. */
export type TrapFieldUnit = FieldFamily;

/**
 * A trap's fields (minimum, largest, turning, cut) and gradients read in one unit family, so 0.05 T
 * never sits beside 1200 G. The family is the one the file writes fields in elsewhere (its first
 * `field` block or magnet's `field` with a unit, as for field sources: docs/fields.md); in the gauss
 * family (and when the file writes no field) the shared switch applies: tesla once the largest |B|
 * in the trap's region reaches GAUSS_TESLA_SWITCH_T. A trap block writes no field of its own, so the
 * region's field chooses; a turning field past it (⁸⁷Rb |1,−1⟩ at 1220.9 G) follows the region's unit.
 */
export function trapFieldUnit(t: TrapResult): TrapFieldUnit {
  return trapFieldUnitFor(Math.max(Math.abs(t.field_max_T ?? 0), Math.abs(t.field_at_centre_T ?? 0)), t.field_unit);
}

/** The unit family of a trap whose largest |B| is `largestT`, in a file that writes fields in `fieldUnit`. */
export function trapFieldUnitFor(largestT: number, fieldUnit?: string): TrapFieldUnit {
  if (fieldUnit !== undefined && !isGaussUnit(fieldUnit)) return 'T';
  return Number.isFinite(largestT) && Math.abs(largestT) >= GAUSS_TESLA_SWITCH_T ? 'T' : 'G';
}

/** A temperature in K, mK, µK or nK. */
export function temperatureText(k: number | null | undefined, digits = 4): string {
  if (k === null || k === undefined || !Number.isFinite(k)) return MISSING;
  const a = Math.abs(k);
  if (a === 0 || a >= 1) return `${trimNumber(k, digits)} K`;
  if (a >= 1e-3) return `${trimNumber(k * 1e3, digits)} mK`;
  if (a >= 1e-6) return `${trimNumber(k * 1e6, digits)} µK`;
  return `${trimNumber(k * 1e9, digits)} nK`;
}

/** Depth as a temperature and a frequency, with what sets it. */
export function depthText(s: TrapSublevelResult): string {
  if (s.depth_K === undefined) return MISSING;
  const limit = s.depth_limit === 'turning' ? 'turning point' : 'edge';
  return `${temperatureText(s.depth_K)} = h·${frequencyText(s.depth_Hz, 4)} (${limit})`;
}

/** Frequencies or linear gradients of a trapped sublevel. */
export function shapeText(s: TrapSublevelResult, unit: TrapFieldUnit = 'G'): string {
  if (s.shape === 'harmonic' && s.frequencies_Hz) return `harmonic ${s.frequencies_Hz.map((f) => frequencyText(f, 4)).join(', ')}`;
  if (s.shape === 'linear' && s.gradients_T_per_m) return `linear (no harmonic frequency): |B| gradients ${s.gradients_T_per_m.map((g) => gradientText(g, 4, undefined, unit)).join(', ')}`;
  return MISSING;
}

/** One line about a sublevel: held or not, and why. */
export function sublevelVerdict(s: TrapSublevelResult, unit: TrapFieldUnit = 'G'): string {
  if (s.trapped) return 'trapped';
  if (!s.low_field_seeking) return 'not low-field seeking';
  return s.levitation_T_per_m !== undefined ? `not held (needs ${gradientText(s.levitation_T_per_m, 4, undefined, unit)} along gravity)` : 'not held';
}

/** The trap's cloud temperature and cut as the file wrote them. */
export function trapInputsText(t: TrapResult): string[] {
  const out: string[] = [];
  if (t.temperature_K !== undefined) out.push(`temperature ${inWrittenUnit(t.temperature_K, 'temperature', t.temperature_unit, 5) ?? temperatureText(t.temperature_K)}`);
  if (t.cut_J !== undefined) out.push(`cut ${t.cut_unit ? `${cutInUnit(t)}` : `${trimNumber(t.cut_J, 5)} J`}`);
  return out;
}

function cutInUnit(t: TrapResult): string {
  return cutEnergyText(t.cut_J!, t.cut_unit);
}

/**
 * An energy beside a trap's cut, in the unit the cut was written in (a temperature or a frequency-like
 * unit), else as a temperature with a prefix; 5 significant digits.
 */
export function cutEnergyText(joules: number, unit: string | undefined): string {
  if (unit === undefined) return temperatureText(joules / BOLTZMANN_K, 5);
  const asT = inWrittenUnit(joules / BOLTZMANN_K, 'temperature', unit, 5);
  if (asT) return asT;
  const asF = inWrittenUnit(joules / PLANCK_H, 'frequency-like', unit, 5);
  return asF ?? `${trimNumber(joules, 5)} J (${displayUnit(unit)})`;
}

/** Significant digits of a turning field, in the report's line and in trap-turning-point alike. */
export const TURNING_FIELD_DIGITS = 5;

/** Significant digits of the region's radius, and of a conductor's distance from its centre (trap-region-reaches-source). */
export const REGION_DIGITS = 4;

/**
 * The one length unit of a trap's region, shared by the report line and the region's finding: the
 * unit the file wrote (`region`'s, else `centre`'s: a quantity echoes in the unit the user wrote),
 * else the length rule on the larger of the radius and the centre's coordinates.
 */
export function regionLengthUnit(radiusM: number, centreM: readonly number[], written?: string): LengthUnit {
  return lengthUnitFor(Math.max(Math.abs(radiusM), ...centreM.map(Math.abs)), written);
}

/** A length of the region (its radius, a conductor's distance) in the region's unit, REGION_DIGITS digits. */
export function regionLengthText(m: number, u: LengthUnit): string {
  return `${trimNumber(m / u.metres, REGION_DIGITS)} ${u.symbol}`;
}

/** The region's radius and centre in one length unit (regionLengthUnit): `region 60 mm about (0, 0, 0) mm`. */
export function regionText(radiusM: number, centreM: readonly number[], written?: string): string {
  const u = regionLengthUnit(radiusM, centreM, written);
  return `region ${regionLengthText(radiusM, u)} about ${pointText(centreM, u)}`;
}

/** The trap's summary in a few lines (hover and report header). */
export function trapSummaryLines(t: TrapResult): string[] {
  const out: string[] = [];
  const what = [t.species && t.level ? `${t.species}.${t.level}` : undefined, t.sources.length > 0 ? `sources ${t.sources.join(', ')}` : undefined].filter(Boolean).join('; ');
  out.push(`trap ${t.name}${what ? ` — ${what}` : ''}`);
  const gravity = t.gravity === 'off' ? 'gravity off' : `gravity along (${t.gravity.map((x) => trimNumber(x, 3)).join(', ')})`;
  const region = t.region ? `${regionText(t.region.radius_m, t.region.centre_m, t.region.unit)}${t.region.from === 'sources' ? ' (90 % of the way to the nearest conductor)' : ''}` : 'no region';
  out.push([gravity, region, ...trapInputsText(t)].join('; '));
  if (!t.computed) {
    out.push('not computed: see the diagnostics');
    return out;
  }
  // |B| below ZERO_FIELD_FRACTION of the largest |B| is the search's round-off: a zero of the field.
  const floor = { scale: t.field_max_T ?? 0, relative: ZERO_FIELD_FRACTION };
  const unit = trapFieldUnit(t);
  out.push(
    `field minimum ${fieldText(t.field_at_centre_T, 5, floor, unit)} at ${pointText(t.field_centre_m!)}; up to ${fieldText(t.field_max_T, 5, undefined, unit)} in the region; |B| gradient along gravity up to ${gradientText(t.gravity_gradient_T_per_m, 4, undefined, unit)}`,
  );
  const held = t.sublevels.filter((s) => s.trapped).map((s) => `|${s.label}⟩`);
  out.push(held.length > 0 ? `trapped: ${held.join(', ')}` : 'trapped: none');
  return out;
}

/**
 * One line per trapped sublevel with what the table has no column for: |B| at the minimum, the
 * turning field, Larmor frequency, cloud sizes, the RF cut and the Majorana estimate.
 */
export function trappedSublevelNotes(t: TrapResult): string[] {
  const out: string[] = [];
  const unit = trapFieldUnit(t);
  for (const s of t.sublevels.filter((x) => x.trapped)) {
    const notes: string[] = [];
    if (s.field_at_minimum_T !== undefined) notes.push(`|B| at the minimum ${fieldText(s.field_at_minimum_T, 5, { scale: t.field_max_T ?? 0, relative: 1e-6 }, unit)}`);
    if (s.turning_field_T !== undefined) notes.push(`turns high-field seeking at ${fieldText(s.turning_field_T, TURNING_FIELD_DIGITS, undefined, unit)}`);
    if (s.larmor_Hz !== undefined) notes.push(`Larmor ${frequencyText(s.larmor_Hz, 4)}`);
    if (s.cloud_sizes_m) notes.push(`cloud 1/e sizes ${s.cloud_sizes_m.map((x) => lengthText(x, 3)).join(', ')}`);
    if (s.rf_cut) notes.push(`RF cut ${frequencyText(s.rf_cut.frequency_Hz, 7)} to |${s.rf_cut.to}⟩ at ${fieldText(s.rf_cut.field_T, 5, undefined, unit)} (linear rule ${frequencyText(s.rf_cut.linear_Hz, 7)})`);
    if (s.majorana) notes.push(`Majorana loss ≈ ${trimNumber(s.majorana.rate_per_s, 2)} /s (lifetime ${lifetime(s.majorana.rate_per_s)})`);
    if (notes.length > 0) out.push(`|${s.label}⟩: ${notes.join('; ')}`);
  }
  return out;
}

/** The inlay hint after the trap's header: how many sublevels it holds and the span of their depths. */
export function trapHint(t: TrapResult): string | undefined {
  if (!t.computed) return undefined;
  const held = t.sublevels.filter((s) => s.trapped);
  if (held.length === 0) return 'holds no sublevel';
  const depths = held.map((s) => s.depth_K).filter((d): d is number => d !== undefined && Number.isFinite(d));
  const count = `holds ${held.length} sublevel${held.length === 1 ? '' : 's'}`;
  if (depths.length === 0) return count;
  const lo = Math.min(...depths);
  const hi = Math.max(...depths);
  return `${count}, depth ${temperatureText(lo)}${hi > lo ? ` … ${temperatureText(hi)}` : ''}`;
}

/** Said when a trapped sublevel's depth is below 5 × the cloud temperature. */
export function shallowDepthNote(t: TrapResult): string | undefined {
  if (t.temperature_K === undefined || !t.sublevels.some((s) => s.trapped && s.depth_K !== undefined && s.depth_K < 5 * t.temperature_K!)) return undefined;
  return `some depths are below 5 × the cloud temperature ${temperatureText(t.temperature_K)}: the hottest atoms leave (common practice: depth ≳ 5–10 k_B T)`;
}

function lifetime(rate: number): string {
  if (!(rate > 0) || !Number.isFinite(rate)) return MISSING;
  const s = 1 / rate;
  return s >= 3600 ? `${trimNumber(s / 3600, 2)} h` : s >= 1 ? `${trimNumber(s, 2)} s` : `${trimNumber(s * 1e3, 2)} ms`;
}
