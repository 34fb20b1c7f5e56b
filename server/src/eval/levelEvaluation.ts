/** Everything v1 of the core computes for one level: g-factors, F levels, linear sublevels. */
import { configurationText } from './designationText';
import { ELECTRON_GS } from '../physics/constants';
import { hyperfineGF, landeGJ, landeGJFraction, orbitalGFactor } from '../physics/gFactors';
import { hyperfineLevels } from '../physics/hyperfineZeroField';
import { allowedJ, formatTermSymbol } from '../physics/termSymbol';
import type { Range } from '../format/ast';
import type { LevelModel, SettingsModel, Valued } from '../model/types';
import type { EVAL_RULES } from './evalCodes';
import { exactAtField } from './exactAtField';
import { defineLevelTables, type LinearRecipe } from './levelTables';
import { halfText } from './halves';
import { hyperfineSpec } from './levelSpec';
import { engineNotes, regimeNote, type FieldPoint } from './regimeNotes';
import type { FieldPointResult, GFactorResult, HyperfineResult, LevelResult, SourcedNumber } from './resultTypes';

export interface WorkingField {
  source: { kind: 'field' | 'magnet'; name: string };
  tesla: number;
  /** Where the file sets this field, for diagnostics about it. */
  range: Range;
  /** The unit the file wrote it in, so messages show it back in that unit. */
  unit?: string;
}

/** Something the evaluation wants to tell the user about a level at a field. */
export interface EvaluationNote {
  /** An evaluation code, or an engine code passed on as it is (then `severity` is given). */
  code: keyof typeof EVAL_RULES | (string & {});
  severity?: 'error' | 'warning' | 'info';
  message: string;
  range: Range;
  related?: { message: string; range: Range }[];
}

export function evaluateLevel(level: LevelModel, settings: SettingsModel, fields: WorkingField[], notes: EvaluationNote[]): LevelResult | undefined {
  const term = level.term;
  if (!level.valid || level.kind !== 'level' || !term || term.twoJ === null) return undefined;
  const twoJ = term.twoJ;
  const twoI = level.species.twoI.value;
  const gJ = gFactor(level, settings);
  const hyperfine = twoI > 0 ? hyperfineOf(level, gJ.used, twoJ, twoI) : undefined;
  const points: FieldPoint[] = [];
  // What every field shares is made once: the engine's spec, and the weak-field recipe's constants
  // (one object, so the hand-off to the editor sends it once).
  const spec = hyperfineSpec(level, gJ.used);
  const linear: Omit<LinearRecipe, 'fieldT'> = {
    kind: 'linear',
    gJ: gJ.used,
    gI: level.species.gI.value,
    twoJ,
    twoI,
    ...(hyperfine ? { hyperfine: hyperfine.levels.map((F) => ({ F: F.F, shift_Hz: F.shift_Hz, g_F: F.g_F })) } : {}),
  };
  const atFields = fields.map((f) => pointAt(level, spec, linear, f, notes, points));
  const note = regimeNote(level, points);
  if (note) notes.push(note);
  return {
    species: level.species.name,
    level: level.name,
    designation: {
      text: level.designationText,
      ascii: formatTermSymbol(term, 'ascii'),
      unicode: formatTermSymbol(term, 'unicode'),
      configuration: configurationText(level.configuration),
      parity: level.configuration?.parity ?? term.parityMark,
    },
    S: term.twoS / 2,
    L: term.L,
    J: twoJ / 2,
    J_text: halfText(twoJ),
    allowed_J: allowedJ(term.twoS, term.L).map(halfText),
    I: twoI / 2,
    g_I: sourced(level.species.gI),
    g_J: gJ,
    ...(hyperfine ? { hyperfine } : {}),
    sublevel_count: (twoJ + 1) * (twoI + 1),
    ...(level.energyHz ? { energy_Hz: sourced(level.energyHz) } : {}),
    at_fields: atFields,
  };
}

function gFactor(level: LevelModel, settings: SettingsModel): GFactorResult {
  const term = level.term!;
  const twoJ = term.twoJ!;
  const gS = settings.gS === 2 ? 2 : ELECTRON_GS;
  const gL = settings.reducedMass && level.species.massKg ? orbitalGFactor(level.species.massKg.value) : 1;
  const lande = twoJ === 0 ? 0 : landeGJ(term.twoS, term.L, twoJ, { gS, gL });
  const frac = twoJ === 0 ? { num: 0, den: 1 } : landeGJFraction(term.twoS, term.L, twoJ);
  const measured = level.gJMeasured;
  return {
    used: measured ? measured.value : lande,
    used_source: measured ? measured.source : `Landé formula (LS coupling, g_s = ${settings.gS === 2 ? '2' : '|g_e| CODATA 2022'})`,
    lande,
    lande_fraction: frac.den === 1 ? String(frac.num) : `${frac.num}/${frac.den}`,
    g_s: gS,
    g_L: gL,
    ...(measured ? { measured: sourced(measured) } : {}),
  };
}

function hyperfineOf(level: LevelModel, gJ: number, twoJ: number, twoI: number): HyperfineResult | undefined {
  if (!level.A || twoJ === 0) return undefined; // A cannot act at J = 0 (the model says so)
  const A = level.A.value;
  const B = twoI >= 2 && twoJ >= 2 ? level.B?.value ?? 0 : 0;
  const C = twoI >= 3 && twoJ >= 3 ? level.C?.value ?? 0 : 0;
  const gI = level.species.gI.value;
  const levels = hyperfineLevels(twoJ, twoI, A, B, C).map((h) => ({
    F: h.twoF / 2,
    F_text: halfText(h.twoF),
    shift_Hz: h.shift,
    g_F: h.twoF === 0 ? 0 : hyperfineGF(gJ, gI, twoJ, twoI, h.twoF),
  }));
  const intervals = levels.slice(1).map((u, i) => ({ F_lower: levels[i]!.F, F_upper: u.F, interval_Hz: u.shift_Hz - levels[i]!.shift_Hz }));
  return {
    A_Hz: sourced(level.A),
    ...(level.B ? { B_Hz: sourced(level.B) } : {}),
    ...(level.C ? { C_Hz: sourced(level.C) } : {}),
    levels,
    intervals,
  };
}

function sourced(v: Valued<number>): SourcedNumber {
  return { value: v.value, source: v.source, ...(v.uncertainty !== undefined ? { uncertainty: v.uncertainty } : {}), ...(v.unit !== undefined ? { written_unit: v.unit } : {}) };
}

/**
 * The level at one working field. Its sublevel tables (weak-field and exact, each exact state
 * paired with the linear energy of the same low-field state) are built when first read
 * (eval/levelTables.ts): a large file's editor evaluation reads few of them.
 */
function pointAt(
  level: LevelModel,
  spec: ReturnType<typeof hyperfineSpec>,
  shared: Omit<LinearRecipe, 'fieldT'>,
  f: WorkingField,
  notes: EvaluationNote[],
  points: FieldPoint[],
): FieldPointResult {
  const r = spec ? exactAtField(spec, f.tesla) : undefined;
  if (r) {
    notes.push(...engineNotes(level, { f, r }));
    points.push({ f, r });
  }
  const point: Partial<FieldPointResult> = { source: f.source, field_T: f.tesla };
  defineLevelTables(point, { ...shared, fieldT: f.tesla }, r?.exact ?? []);
  if (r?.regime) point.regime = r.regime;
  return point as FieldPointResult;
}
