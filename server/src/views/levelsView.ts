/**
 * Levels diagram data for one level: an exact sweep from zero field to a field that shows the
 * change of regime, with the file's working field marked.
 */
import { levelDesignationText } from '../eval/designationText';
import { inWrittenUnit } from '../eval/writtenUnit';
import { fieldAxisUnit } from '../render/fieldAxisUnit';
import { regime, sweepLevel, type HighFieldLabel, type LevelSpec, type LowFieldLabel, type RegimeResult, type SweepResult } from '../physics/engine';
import { halfText } from '../physics/engine/halfIntegers';
import { BOHR_MAGNETON_HZ_PER_T } from '../physics/constants';
import type { LevelModel, SettingsModel } from '../model/types';
import { engineSpec } from '../eval/levelSpec';
import type { WorkingField } from '../eval/levelEvaluation';
import { levelBands, type FieldUnit, type LevelLanes, type LevelsViewData, type NamedFieldMark } from '../render';

export const LEVELS_VIEW_POINTS = 401;

export interface LevelsView {
  data: LevelsViewData;
  sweep: SweepResult;
}

/**
 * A file whose largest field is below this fraction of the change of regime works in the weak
 * field (a bias of a few gauss, a magnetometer's µT): the whole Breit–Rabi sweep would press its
 * fields against the left edge, so the range is drawn around them instead (own display rule).
 */
export const WEAK_WORK_FRACTION = 0.1;

/**
 * Upper end of the plotted field range. Files working in the weak field: twice their largest
 * field, so its sublevels sit mid-figure. Otherwise: well past x = 1 and past the largest field.
 */
export function levelsViewRangeT(spec: LevelSpec, largestFieldT: number | undefined): number {
  const r = regime(spec, largestFieldT ?? 1e-4);
  const spread = r.zeroFieldSpreadHz;
  const gDiff = spec.kind === 'hyperfine' ? Math.abs(spec.gJ - spec.gI) : Math.abs(spec.gS - spec.gL);
  const crossover = spread > 0 ? spread / (Math.max(gDiff, 1e-3) * BOHR_MAGNETON_HZ_PER_T) : 0;
  const largest = largestFieldT !== undefined ? Math.abs(largestFieldT) : 0;
  if (largest > 0 && largest < WEAK_WORK_FRACTION * crossover) return 2 * largest;
  const upper = Math.max(largest * 1.25, 3 * crossover);
  return upper > 0 ? upper : 1;
}

/** The largest magnitude among the working field and the file's named fields (undefined: none written). */
function largestFieldT(marker: WorkingField | undefined, marks: WorkingField[] | undefined): number | undefined {
  const all = [...(marker ? [marker] : []), ...(marks ?? [])].map((f) => Math.abs(f.tesla)).filter((t) => Number.isFinite(t));
  return all.length > 0 ? Math.max(...all) : undefined;
}

/** What the caller may choose: the field range and the unit of the field axis (the CLI's --from/--to/--unit, the panel's range control). */
export interface LevelsViewOptions {
  fromT?: number;
  toT?: number;
  fieldUnit?: FieldUnit;
  /** Every named field of the file, marked on the figure. */
  fieldMarks?: WorkingField[];
}

export function levelsView(
  level: LevelModel,
  gJ: number | undefined,
  settings: SettingsModel,
  marker?: WorkingField,
  options: LevelsViewOptions = {},
): LevelsView | undefined {
  const spec = engineSpec(level, gJ, settings);
  if (!spec) return undefined;
  const lower = options.fromT ?? 0;
  const upper = options.toT ?? Math.max(levelsViewRangeT(spec, largestFieldT(marker, options.fieldMarks)), lower > 0 ? lower * 2 : 0);
  if (!(upper > lower)) return undefined;
  const sweep = sweepLevel(spec, lower, upper, LEVELS_VIEW_POINTS);
  if (sweep.issues.some((i) => i.severity === 'error')) return undefined;
  const noNucleus = spec.kind === 'hyperfine' && spec.twoI === 0;
  const bands = levelBands(
    sweep.states.map((s) => ({ manifold: manifoldOf(s.low, noNucleus), energyHz: s.energyHz })),
    sweep.fieldsT.length,
  );
  const data: LevelsViewData = {
    title: `${level.species.name} ${level.name}: ${levelDesignationText(level)} — sublevel energies`,
    fieldUnit: options.fieldUnit ?? fieldAxisUnit(upper, marker?.unit),
    fieldsT: sweep.fieldsT,
    curves: sweep.states.map((s, i) => ({
      id: `s${i}`,
      lowLabel: s.low.text,
      highLabel: s.high.text,
      energyHz: s.energyHz,
      momentJT: s.momentJT,
    })),
    // A range that ends before the change of regime (a magnetometer's µT, a bias of a few gauss) names its states by F, m_F on the right too.
    ...(sweep.states.length > 0 ? { lanes: lanesAt(regime(spec, upper), sweep.states[0]!, noNucleus) } : {}),
    crossings: sweep.crossings.map((c) => ({
      fieldT: c.fieldT,
      energyHz: c.energyHz,
      curveA: c.stateA,
      a: sweep.states[c.stateA]!.low.text,
      b: sweep.states[c.stateB]!.low.text,
    })),
    ...(bands.length > 0 ? { bands } : {}),
  };
  if (marker) {
    data.markerT = marker.tesla;
    data.markerLabel = `${marker.source.kind} ${marker.source.name}`;
    data.markerText = writtenFieldText(marker);
  }
  if (options.fieldMarks) data.fieldMarks = options.fieldMarks.map(namedFieldMark);
  return { data, sweep };
}

/**
 * The manifold a state belongs to at low field, from its quantum numbers: "F=2", "J=3/2, F=2" (a
 * whole term), "J=3/2" (fine structure, or a level without a nucleus, where F is J).
 */
export function manifoldOf(low: LowFieldLabel, noNucleus = false): string {
  if (low.scheme === 'J') return `J=${halfText(low.twoJ)}`;
  if (noNucleus) return `J=${halfText(low.twoF)}`;
  return low.twoJ !== undefined ? `J=${halfText(low.twoJ)}, F=${halfText(low.twoF)}` : `F=${halfText(low.twoF)}`;
}

/** The bases the lanes name, and where the range ends relative to the change of regime (the engine's limits). */
export function lanesAt(end: RegimeResult, state: { low: LowFieldLabel; high: HighFieldLabel }, noNucleus: boolean): LevelLanes {
  // Past the change of regime (x ≥ 1) each state is mostly its uncoupled state, which names it better than F, m_F.
  const ends = end.verdict === 'weak field (linear)' ? 'weak' : end.verdict !== 'intermediate' ? 'strong' : end.x >= 1 ? 'uncoupling' : 'intermediate';
  // The strong limit is already known unless the range ends weak (regime.ts searches it only when asked).
  const limit = ends === 'weak' ? Number.NaN : end.strongLimitT;
  return {
    low: lowBasis(state.low, noNucleus),
    high: highBasis(state.high, noNucleus),
    ends,
    ...(Number.isFinite(limit) && limit > 0 ? { strongLimitT: limit } : {}),
    ...(ends === 'uncoupling' && Number.isFinite(end.x) ? { endX: end.x } : {}),
  };
}

/** The quantum numbers of a low-field name: "F, m_F", "J, F, m_F" (a whole term), "J, m_J" (no nucleus), "J, m_J, m_I". */
function lowBasis(low: LowFieldLabel, noNucleus: boolean): string {
  if (low.scheme === 'J') return low.twoMI === null ? 'J, m_J' : 'J, m_J, m_I';
  if (noNucleus) return 'J, m_J';
  return low.twoJ !== undefined ? 'J, F, m_F' : 'F, m_F';
}

/** The quantum numbers of a high-field name: "m_J, m_I", "m_J" (no nucleus), "m_L, m_S" (and m_I). */
function highBasis(high: HighFieldLabel, noNucleus: boolean): string {
  if (high.scheme === 'mJ,mI') return noNucleus ? 'm_J' : 'm_J, m_I';
  return high.twoMI === null ? 'm_L, m_S' : 'm_L, m_S, m_I';
}

/** The field as the file wrote it (`1 nT`), or undefined when the file gave no unit to echo. */
export function writtenFieldText(f: WorkingField): string | undefined {
  return inWrittenUnit(f.tesla, 'flux-density', f.unit, 6);
}

/** A working field as a labelled rule on a field axis, its value in the unit the file wrote. */
export function namedFieldMark(f: WorkingField): NamedFieldMark {
  const valueText = writtenFieldText(f);
  return { fieldT: f.tesla, label: `${f.source.kind} ${f.source.name}`, ...(valueText !== undefined ? { valueText } : {}) };
}
