/**
 * `*_unc` of one level's results: g_J, g_F, zero-field shifts and intervals, and every exact
 * sublevel's energy and moment at each working field (chain rule through the engine's exact
 * parameter derivatives).
 */
import { BOHR_MAGNETON, PLANCK_H } from '../../physics/constants';
import { hyperfineGF } from '../../physics/gFactors';
import { hyperfineLevels } from '../../physics/hyperfineZeroField';
import type { LevelSpec } from '../../physics/engine';
import { combine, hasSensitivity, levelDerivatives, scaled, throughParams, type InputTable, type ParamSensitivities, type Sensitivities } from '../../physics/uncertainty';
import type { LevelModel, SettingsModel } from '../../model/types';
import type { Problem } from '../../format/ast';
import { fineSpec, hyperfineSpec } from '../levelSpec';
import type { ExactSublevelResult, LevelResult, TermResult } from '../resultTypes';
import { fieldKey, type SetupInputs } from './inputs';
import { setUnc } from './uncField';

function anyUncertain(params: ParamSensitivities): boolean {
  return Object.values(params).some((s) => s && hasSensitivity(s));
}

/** Energies and moments of the exact states at one field; true when some uncertain state is degenerate. */
export function exactUncertainty(exact: ExactSublevelResult[], spec: LevelSpec, fieldT: number, params: ParamSensitivities, inputs: InputTable): boolean {
  if (!anyUncertain(params) || exact.length === 0) return false;
  const d = levelDerivatives(spec, fieldT);
  if (d.states.length !== exact.length) return false;
  let oneSided = false;
  d.states.forEach((s, k) => {
    const e = exact[k]!;
    if (s.energyHz !== e.energy_Hz) return; // not the same solve: leave the value without an uncertainty rather than misattribute one
    const sE = throughParams(s.dE, params);
    setUnc(e, 'energy_Hz', sE, inputs);
    const sMu = scaled(-PLANCK_H, throughParams(s.dSlope, params));
    setUnc(e, 'moment_J_per_T', sMu, inputs);
    setUnc(e, 'moment_bohr', scaled(1 / BOHR_MAGNETON, sMu), inputs);
    if (s.degenerate && hasSensitivity(sE)) oneSided = true;
  });
  return oneSided;
}

function oneSidedNote(level: LevelModel, field: string): Problem {
  return {
    code: 'uncertainty-one-sided',
    severity: 'info',
    message: `level ${level.name}: some sublevels are degenerate inside one m block at ${field}; the uncertainty shown for them is the one-sided value for increasing inputs (first-order propagation does not hold at an exact degeneracy)`,
    range: level.nameRange,
  };
}

export function levelUncertainty(r: LevelResult, level: LevelModel, inp: SetupInputs, problems: Problem[]): void {
  const params = inp.levelParams(level);
  const twoJ = Math.round(2 * r.J);
  const twoI = Math.round(2 * r.I);
  setUnc(r.g_J, 'used', params.gJ, inp.table);
  if (r.hyperfine) {
    const unit = (A: number, B: number, C: number): Map<number, number> => new Map(hyperfineLevels(twoJ, twoI, A, B, C).map((h) => [h.twoF, h.shift]));
    const perA = unit(1, 0, 0);
    const perB = unit(0, 1, 0);
    const perC = unit(0, 0, 1);
    const shiftSens = new Map<number, Sensitivities>();
    for (const F of r.hyperfine.levels) {
      const twoF = Math.round(2 * F.F);
      const s = throughParams({ A: perA.get(twoF) ?? 0, B: r.hyperfine.B_Hz ? perB.get(twoF) ?? 0 : 0, C: r.hyperfine.C_Hz ? perC.get(twoF) ?? 0 : 0 }, params);
      shiftSens.set(twoF, s);
      setUnc(F, 'shift_Hz', s, inp.table);
      setUnc(F, 'g_F', throughParams({ gJ: hyperfineGF(1, 0, twoJ, twoI, twoF), gI: hyperfineGF(0, 1, twoJ, twoI, twoF) }, params), inp.table);
    }
    for (const iv of r.hyperfine.intervals) {
      const up = shiftSens.get(Math.round(2 * iv.F_upper));
      const lo = shiftSens.get(Math.round(2 * iv.F_lower));
      if (up && lo) setUnc(iv, 'interval_Hz', combine([[1, up], [-1, lo]]), inp.table);
    }
  }
  const spec = hyperfineSpec(level, r.g_J.used);
  if (!spec) return;
  for (const fp of r.at_fields) {
    const field = inp.fieldSens.get(fieldKey(fp.source));
    setUnc(fp, 'field_T', field, inp.table);
    const p: ParamSensitivities = { ...params, ...(field ? { field } : {}) };
    // Checked before reading `exact`: a level's tables are built when first read (eval/levelTables.ts).
    if (anyUncertain(p) && exactUncertainty(fp.exact, spec, fp.field_T, p, inp.table)) problems.push(oneSidedNote(level, `${fp.source.kind} ${fp.source.name}`));
  }
}

export function termUncertainty(r: TermResult, level: LevelModel, settings: SettingsModel, inp: SetupInputs, problems: Problem[]): void {
  const params = inp.levelParams(level);
  const zeta = params.zeta;
  // Whole terms with their nucleus (and terms given by E_J) are not propagated yet (docs/uncertainty.md).
  if (!r.zeta_Hz || r.hyperfine) return;
  const zetaHz = r.zeta_Hz.value;
  const spec = fineSpec(level, settings);
  if (!spec) return;
  for (const f of r.fine_levels) {
    // E_J = ζ/2 [J(J+1) − L(L+1) − S(S+1)] is linear in ζ.
    if (zeta && zetaHz !== 0) setUnc(f, 'shift_Hz', scaled(f.shift_Hz / zetaHz, zeta), inp.table);
  }
  for (const fp of r.at_fields) {
    const field = inp.fieldSens.get(fieldKey(fp.source));
    setUnc(fp, 'field_T', field, inp.table);
    const p: ParamSensitivities = { ...(zeta ? { zeta } : {}), ...(params.gI ? { gI: params.gI } : {}), ...(field ? { field } : {}) };
    if (exactUncertainty(fp.exact, spec, fp.field_T, p, inp.table)) problems.push(oneSidedNote(level, `${fp.source.kind} ${fp.source.name}`));
  }
}
