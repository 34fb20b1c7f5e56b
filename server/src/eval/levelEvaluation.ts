/** Everything v1 of the core computes for one level: g-factors, F levels, linear sublevels. */
import { configurationText } from './designationText';
import { ELECTRON_GS } from '../physics/constants';
import { hyperfineGF, landeGJ, landeGJFraction, orbitalGFactor } from '../physics/gFactors';
import { hyperfineLevels } from '../physics/hyperfineZeroField';
import { linearSublevels } from '../physics/linearZeeman';
import { allowedJ, formatTermSymbol } from '../physics/termSymbol';
import type { Range } from '../format/ast';
import type { LevelModel, SettingsModel, Valued } from '../model/types';
import type { EVAL_RULES } from './evalCodes';
import { exactAtField } from './exactAtField';
import { halfText, signedHalfText } from './halves';
import { hyperfineSpec } from './levelSpec';
import { engineNotes, regimeNote, type FieldPoint } from './regimeNotes';
import type { ExactSublevelResult, FieldPointResult, GFactorResult, HyperfineResult, LevelResult, SourcedNumber, SublevelResult } from './resultTypes';

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
  const atFields = fields.map((f) => pairLinear({ ...linearAt(f, gJ.used, level.species.gI.value, twoJ, twoI, hyperfine), ...exactAt(level, gJ.used, f, notes, points) }));
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

/** Attach to each exact state the linear energy of the state with the same low-field quantum numbers. */
function pairLinear(p: FieldPointResult): FieldPointResult {
  const linear = new Map(p.linear.map((s) => [lowFieldKey(s), s.energy_Hz]));
  for (const s of p.exact) {
    const e = linear.get(lowFieldKey(s));
    if (e !== undefined) s.linear_energy_Hz = e;
  }
  return p;
}

/**
 * F, J, m and m_I (halves, or absent) packed into one number: a map keyed by it pairs the states
 * without building two strings per state (6,500 level–field pairs in a large file). Quantum numbers
 * beyond ±255 fall back to a string key.
 */
function lowFieldKey(s: SublevelResult | ExactSublevelResult): number | string {
  const parts = [s.F, s.J, s.m, s.m_I];
  let key = 0;
  for (const x of parts) {
    const twice = x === undefined ? -512 : 2 * x;
    if (!(Number.isInteger(twice) && Math.abs(twice) <= 511)) return `${s.F ?? ''}|${s.J ?? ''}|${s.m}|${s.m_I ?? ''}`;
    key = key * 1024 + (twice + 512);
  }
  return key;
}

function exactAt(level: LevelModel, gJ: number, f: WorkingField, notes: EvaluationNote[], points: FieldPoint[]): Pick<FieldPointResult, 'exact' | 'regime'> {
  const spec = hyperfineSpec(level, gJ);
  if (!spec) return { exact: [] };
  const r = exactAtField(spec, f.tesla);
  notes.push(...engineNotes(level, { f, r }));
  points.push({ f, r });
  return { exact: r.exact, ...(r.regime ? { regime: r.regime } : {}) };
}

function linearAt(f: WorkingField, gJ: number, gI: number, twoJ: number, twoI: number, hf: HyperfineResult | undefined): Omit<FieldPointResult, 'exact' | 'regime'> {
  const linear: SublevelResult[] = [];
  if (twoI === 0) {
    for (const s of linearSublevels(gJ, twoJ, f.tesla)) {
      linear.push({ label: `m_J=${signedHalfText(s.twoM)}`, J: twoJ / 2, m: s.twoM / 2, m_text: signedHalfText(s.twoM), energy_Hz: s.energyHz });
    }
  } else if (!hf) {
    linear.push(...uncoupledLinear(gJ, gI, twoJ, twoI, f.tesla));
  } else {
    for (const F of hf.levels) {
      const twoF = Math.round(2 * F.F);
      for (const s of linearSublevels(F.g_F, twoF, f.tesla)) {
        linear.push({
          label: hyperfineLabel(twoF, s.twoM),
          F: F.F,
          m: s.twoM / 2,
          m_text: signedHalfText(s.twoM),
          energy_Hz: F.shift_Hz + s.energyHz,
        });
      }
    }
  }
  linear.sort((a, b) => a.energy_Hz - b.energy_Hz);
  return { source: f.source, field_T: f.tesla, linear };
}

/** Linear-state labels by 2F and 2m: the same few strings recur in every level with a nucleus, so each is made once. */
const hyperfineLabels = new Map<number, string>();
export function hyperfineLabel(twoF: number, twoM: number): string {
  // (2F)² + (2m + 2F)/2 numbers the 2F + 1 states of each F after those of every smaller F, so no two (F, m) share a key.
  const key = Math.abs(twoM) <= twoF ? twoF * twoF + (twoM + twoF) / 2 : -1;
  let label = hyperfineLabels.get(key);
  if (label === undefined) {
    label = `F=${halfText(twoF)}, m_F=${signedHalfText(twoM)}`;
    if (key >= 0 && hyperfineLabels.size < 4096) hyperfineLabels.set(key, label);
  }
  return label;
}

function sourced(v: Valued<number>): SourcedNumber {
  return { value: v.value, source: v.source, ...(v.uncertainty !== undefined ? { uncertainty: v.uncertainty } : {}) };
}

/**
 * A nucleus without hyperfine constants: E/h = (μ_B B/h)(g_J m_J + g_I m_I) for every (m_J, m_I).
 * For J = 0 the states are |F = I, m_F = m_I>, labelled like the exact engine does.
 */
function uncoupledLinear(gJ: number, gI: number, twoJ: number, twoI: number, fieldT: number): SublevelResult[] {
  const out: SublevelResult[] = [];
  for (const j of linearSublevels(gJ, twoJ, fieldT)) {
    for (const n of linearSublevels(gI, twoI, fieldT)) {
      const twoM = j.twoM + n.twoM;
      const energy_Hz = j.energyHz + n.energyHz + 0;
      const m = { m: twoM / 2, m_text: signedHalfText(twoM), energy_Hz };
      if (twoJ === 0) out.push({ label: `F=${halfText(twoI)}, m_F=${signedHalfText(n.twoM)}`, F: twoI / 2, ...m });
      else out.push({ label: `m_J=${signedHalfText(j.twoM)}, m_I=${signedHalfText(n.twoM)}`, J: twoJ / 2, m_I: n.twoM / 2, ...m });
    }
  }
  return out;
}
