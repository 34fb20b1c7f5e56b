/**
 * `*_unc` of RF/microwave results. Transition frequencies and sensitivities at a working field
 * follow from the two sublevels; a resonance field B* solves f(B, θ) = ν and a field-insensitive
 * point B₀ solves ∂f/∂B (B, θ) = 0, so both move with the inputs by the implicit-function theorem:
 *   dB*∕dθ = (∂ν/∂θ − ∂f/∂θ) / (∂f/∂B),   dB₀/dθ = −(∂²f/∂B∂θ) / (∂²f/∂B²).
 * At B₀ the frequency's total derivative is ∂f/∂θ alone (∂f/∂B = 0 there).
 */
import type { Problem } from '../../format/ast';
import {
  combine,
  difference,
  hasSensitivity,
  implicitRoot,
  NO_SENSITIVITY,
  type InputTable,
  type Sensitivities,
} from '../../physics/uncertainty';
import type { ResonanceModel, SettingsModel } from '../../model/types';
import type { GJLookup } from '../gJLookup';
import { engineSpec } from '../levelSpec';
import { fieldText } from '../quantityText';
import type { MagneticTransitionResult, ResonanceResult } from '../resultTypes';
import { fieldKey, type SetupInputs } from './inputs';
import { statesAt, type StateSens } from './stateSens';
import { setUnc } from './uncField';

function transitionUnc(t: MagneticTransitionResult, states: Map<string, StateSens>, inputs: InputTable, shift?: { dB: Sensitivities }): void {
  const u = states.get(t.upper_label);
  const l = states.get(t.lower_label);
  if (!u || !l) return;
  // Along a root the field moves too: total derivative = ∂/∂θ + ∂/∂B · dB/dθ.
  const dB = shift?.dB ?? NO_SENSITIVITY;
  setUnc(t, 'frequency_Hz', combine([[1, difference(u.energy, l.energy)], [t.df_dB_Hz_per_T, dB]]), inputs);
  setUnc(t, 'df_dB_Hz_per_T', combine([[1, difference(u.slope, l.slope)], [t.d2f_dB2_Hz_per_T2, dB]]), inputs);
}

export function resonanceUncertainty(
  r: ResonanceResult,
  model: ResonanceModel,
  settings: SettingsModel,
  gJOf: GJLookup,
  inp: SetupInputs,
  problems: Problem[],
): void {
  const level = model.level;
  const spec = level ? engineSpec(level, gJOf(level), settings) : undefined;
  if (!level || !spec) return;
  const params = inp.levelParams(level);
  const nu = inp.resonanceFrequency.get(model.name) ?? NO_SENSITIVITY;
  const anyParam = Object.values(params).some((s) => s && hasSensitivity(s));
  let undefinedAt: string | undefined;
  for (const fp of r.at_fields) {
    const field = inp.fieldSens.get(fieldKey(fp.source));
    setUnc(fp, 'field_T', field, inp.table);
    if (!anyParam && !(field && hasSensitivity(field))) continue;
    const { byText } = statesAt(spec, fp.field_T, { ...params, ...(field ? { field } : {}) });
    for (const t of fp.transitions) transitionUnc(t, byText, inp.table);
  }
  if (r.field_insensitive && anyParam && model.lower && model.upper) {
    const term = level.kind === 'term';
    const key = (n: { twoF: number; twoM: number }): string => (term ? `J:${n.twoF}:${n.twoM}:x` : `F:${n.twoF}:${n.twoM}`);
    for (const p of r.field_insensitive) {
      const { byKey } = statesAt(spec, p.field_T, params);
      const u = byKey.get(key(model.upper));
      const l = byKey.get(key(model.lower));
      if (!u || !l) continue;
      // The point's frequency is reported as |E_u − E_l|.
      const sign = Math.sign(u.energyHz - l.energyHz) || 1;
      const fSens = difference(u.energy, l.energy);
      const dB0 = implicitRoot(p.d2f_dB2_Hz_per_T2, difference(u.slope, l.slope));
      if (!dB0) {
        undefinedAt ??= `the field-insensitive point near ${fieldText(p.field_T)}`;
        continue;
      }
      setUnc(p, 'field_T', dB0, inp.table);
      setUnc(p, 'frequency_Hz', combine([[sign, fSens]]), inp.table);
    }
  }
  if (r.resonances && (anyParam || hasSensitivity(nu))) {
    for (const x of r.resonances) {
      const { byText } = statesAt(spec, x.field_T, params);
      const u = byText.get(x.transition.upper_label);
      const l = byText.get(x.transition.lower_label);
      if (!u || !l) continue;
      const dB = implicitRoot(x.transition.df_dB_Hz_per_T, difference(difference(u.energy, l.energy), nu));
      if (!dB) {
        undefinedAt ??= `the resonance near ${fieldText(x.field_T)}`;
        continue;
      }
      setUnc(x, 'field_T', dB, inp.table);
      transitionUnc(x.transition, byText, inp.table, { dB });
    }
  }
  if (undefinedAt) {
    problems.push({
      code: 'uncertainty-undefined',
      severity: 'warning',
      message: `resonance '${model.name}': ${undefinedAt} is a double root (the slope is zero there), so it has no first-order uncertainty; none is shown`,
      range: model.nameRange,
    });
  }
}
