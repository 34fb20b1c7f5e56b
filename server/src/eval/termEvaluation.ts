/**
 * A whole LS term: its J levels at zero field (from ζ by the Landé interval rule, or the J-level
 * energies E_J), its hyperfine structure when A_J / B_J are given, and the exact sublevels at
 * every working field, from weak field to Paschen–Back.
 */
import { configurationText } from './designationText';
import { allowedJ, formatTermSymbol } from '../physics/termSymbol';
import { diamagneticHzPerT2, fineZeroFieldHz, termLevelConstants, type TermConstants, type WholeTermSpec } from '../physics/engine';
import { landeGJ } from '../physics/gFactors';
import type { LevelModel, SettingsModel } from '../model/types';
import { diamagneticNote } from './diamagneticNote';
import { exactAtField } from './exactAtField';
import { halfText } from './halves';
import type { EvaluationNote, WorkingField } from './levelEvaluation';
import { engineNotes, regimeNote, type FieldPoint } from './regimeNotes';
import { termSpec } from './levelSpec';
import type { TermHyperfineResult, TermResult } from './resultTypes';
import { termHyperfineNote } from './termHyperfineNote';

/** E_J relative to the term's centre of gravity Σ(2J+1)E_J / Σ(2J+1). */
function fineShifts(spec: WholeTermSpec | { zeta: number }, L: number, twoS: number, jValues: number[]): Map<number, number> {
  if (!('levelEnergies' in spec) || !spec.levelEnergies) {
    const zeta = (spec as { zeta: number }).zeta;
    return new Map(jValues.map((twoJ) => [twoJ, fineZeroFieldHz(L, twoS, twoJ, zeta)]));
  }
  let weight = 0;
  let sum = 0;
  for (const e of spec.levelEnergies) {
    weight += e.twoJ + 1;
    sum += (e.twoJ + 1) * e.energyHz;
  }
  return new Map(spec.levelEnergies.map((e) => [e.twoJ, e.energyHz - sum / weight]));
}

function hyperfineResult(constants: TermConstants, notes: EvaluationNote[], level: LevelModel): TermHyperfineResult {
  const note = termHyperfineNote(level, constants.source);
  if (note) notes.push(note);
  return {
    source: constants.source,
    a_orbital_Hz: constants.radial.orbital,
    a_spin_dipolar_Hz: constants.radial.spinDipolar,
    a_contact_Hz: constants.radial.contact,
    b_orbital_Hz: constants.quadrupoleL,
    levels: constants.levels.filter((l) => l.twoJ > 0).map((l) => ({ J: l.twoJ / 2, J_text: halfText(l.twoJ), A_Hz: l.A, B_Hz: l.B })),
  };
}

export function evaluateTerm(level: LevelModel, settings: SettingsModel, fields: WorkingField[], notes: EvaluationNote[]): TermResult | undefined {
  const spec = termSpec(level, settings);
  const term = level.term;
  if (!spec || !term) return undefined;
  // Data the whole-term mode cannot use (no usable A_J, too few) are said once, without a field.
  const resolved = spec.kind === 'term' ? termLevelConstants(spec) : undefined;
  const unusable = resolved?.issues.find((i) => i.severity === 'error');
  if (unusable) notes.push({ code: 'level-not-computed', message: `term '${level.name}' cannot be computed: ${unusable.message}`, range: level.nameRange });
  const points: FieldPoint[] = [];
  const atFields = (unusable ? [] : fields).map((f) => {
    const r = exactAtField(spec, f.tesla);
    notes.push(...engineNotes(level, { f, r }));
    points.push({ f, r });
    // Copies: the memo's states are shared, and the uncertainty pass writes into these.
    return { source: f.source, field_T: f.tesla, exact: r.exact.map((s) => ({ ...s })), ...(r.regime ? { regime: r.regime } : {}) };
  });
  const note = regimeNote(level, points);
  if (note) notes.push(note);
  const diamagnetic = diamagneticNote(level, points);
  if (diamagnetic) notes.push(diamagnetic);
  const jValues = allowedJ(term.twoS, term.L);
  const shifts = fineShifts(spec.kind === 'term' ? spec : { zeta: spec.zeta }, term.L, term.twoS, jValues);
  const hyperfine = resolved?.constants && spec.kind === 'term' && spec.twoI > 0 ? hyperfineResult(resolved.constants, notes, level) : undefined;
  // ζ is reported when it is the fine structure in use (E_J, when given, replaces it).
  const zetaUsed = level.zeta && !(spec.kind === 'term' && spec.levelEnergies);
  return {
    species: level.species.name,
    level: level.name,
    designation: { text: level.designationText, unicode: formatTermSymbol(term, 'unicode'), configuration: configurationText(level.configuration) },
    S: term.twoS / 2,
    L: term.L,
    ...(zetaUsed && level.zeta ? { zeta_Hz: { value: level.zeta.value, source: level.zeta.source, ...(level.zeta.unit !== undefined ? { written_unit: level.zeta.unit } : {}) } } : {}),
    g_s: spec.gS,
    g_L: spec.gL,
    // A J level missing from E_J (already an error) is left out rather than given no number.
    fine_levels: jValues.filter((twoJ) => shifts.has(twoJ)).map((twoJ) => ({
      J: twoJ / 2,
      J_text: halfText(twoJ),
      shift_Hz: shifts.get(twoJ) as number,
      g_J: twoJ === 0 ? 0 : landeGJ(term.twoS, term.L, twoJ, { gS: spec.gS, gL: spec.gL }),
    })),
    ...(hyperfine ? { hyperfine } : {}),
    ...(spec.kind === 'term' && spec.r2M2 !== undefined ? { diamagnetic: { r2_m2: spec.r2M2, Hz_per_T2: diamagneticHzPerT2(spec.r2M2) } } : {}),
    at_fields: atFields,
  };
}
