/**
 * RF/microwave (magnetic-dipole) questions about one level: the transitions at each working
 * field with their field sensitivity, the fields where a given frequency is resonant, and the
 * field-insensitive points of a chosen pair.
 */
import type { GJLookup } from './gJLookup';
import type { Problem } from '../format/ast';
import {
  fieldInsensitivePoints,
  magneticTransitions,
  resonanceFields,
  type MagneticTransition,
  type SublevelPair,
  type SublevelRef,
} from '../physics/transitions';
import type { ResonanceModel, SettingsModel, SublevelName } from '../model/types';
import type { WorkingField } from './levelEvaluation';
import { forwardIssues } from './forwardIssues';
import { engineSpec } from './levelSpec';
import { polarizationName } from './polarizationName';
import { frequencyText } from './quantityText';
import { fieldInUnit } from './writtenUnit';
import type { MagneticTransitionResult, ResonanceResult } from './resultTypes';

/** Field points scanned for roots over the search range. */
const SCAN_POINTS = 2001;

export function evaluateResonance(
  r: ResonanceModel,
  fields: WorkingField[],
  settings: SettingsModel,
  gJOf: GJLookup,
  problems: Problem[],
): ResonanceResult {
  const result: ResonanceResult = {
    name: r.name,
    ...(r.level ? { species: r.level.species.name, level: r.level.name } : {}),
    range_T: [r.rangeT.fromT, r.rangeT.toT],
    ...(r.rangeT.fromUnit && r.rangeT.toUnit ? { range_units: [r.rangeT.fromUnit, r.rangeT.toUnit] as [string, string] } : {}),
    at_fields: [],
  };
  const level = r.level;
  const spec = level ? engineSpec(level, gJOf(level), settings) : undefined;
  if (!level || !spec) return result;
  const term = level.kind === 'term';
  const pair: SublevelPair | undefined = r.lower && r.upper ? { lower: ref(r.lower, term), upper: ref(r.upper, term) } : undefined;
  const inPair = (t: MagneticTransition): boolean => !pair || samePair(t, r.lower!, r.upper!, term);
  const range = { fromT: r.rangeT.fromT, toT: r.rangeT.toT, points: SCAN_POINTS };
  // 'no-resonance' and 'pair-not-found' are said below in this block's own words.
  const report = forwardIssues(`resonance '${r.name}'`, r.nameRange, problems, ['no-resonance', 'pair-not-found']);

  for (const f of fields) {
    const m = magneticTransitions(spec, f.tesla, { twoPhoton: r.twoPhoton || !!pair });
    report(m.issues);
    result.at_fields.push({ source: f.source, field_T: f.tesla, transitions: m.transitions.filter(inPair).map(toJson) });
  }
  if (pair) {
    const known = magneticTransitions(spec, r.rangeT.fromT, { twoPhoton: true }).transitions.some(inPair);
    if (!known) {
      problems.push({
        code: 'resonance-no-such-pair',
        severity: 'error',
        message: sameSublevel(r)
          ? `resonance '${r.name}': lower and upper name one sublevel; a transition joins two different sublevels`
          : `resonance '${r.name}': level ${level.name} has no magnetic-dipole or two-photon transition between these sublevels`,
        range: r.lower!.range,
        related: [{ message: 'the other sublevel', range: r.upper!.range }],
      });
    } else {
      const fi = fieldInsensitivePoints(spec, pair, range);
      report(fi.issues);
      result.field_insensitive = fi.points.map((p) => ({ field_T: p.fieldT, frequency_Hz: Math.abs(p.frequencyHz), d2f_dB2_Hz_per_T2: p.d2fdB2 }));
    }
  }
  if (r.frequencyHz) {
    const found = resonanceFields(spec, r.frequencyHz.value, range, { ...(pair ? { pair } : {}), twoPhoton: r.twoPhoton || !!pair });
    report(found.issues);
    result.resonances = found.resonances.map((x) => ({ field_T: x.fieldT, transition: toJson(x.transition) }));
    if (result.resonances.length === 0) {
      problems.push({
        code: 'resonance-unreachable',
        severity: 'warning',
        message: `resonance '${r.name}': no ${pair ? 'transition of this pair' : `transition of level ${level.name}`} is at ${frequencyText(r.frequencyHz.value, 8)} between ${fieldInUnit(r.rangeT.fromT, { unit: r.rangeT.fromUnit })} and ${fieldInUnit(r.rangeT.toT, { unit: r.rangeT.toUnit })}`,
        range: r.frequencyHz.range ?? r.nameRange,
      });
    }
  }
  return result;
}

function ref(n: SublevelName, term: boolean): SublevelRef {
  return term ? { twoJ: n.twoF, twoMJ: n.twoM } : { twoF: n.twoF, twoMF: n.twoM };
}

function lowOf(label: MagneticTransition['lower']['low']): [number, number] {
  return label.scheme === 'F' ? [label.twoF, label.twoMF] : [label.twoJ, label.twoMJ];
}

function samePair(t: MagneticTransition, a: SublevelName, b: SublevelName, _term: boolean): boolean {
  const [lf, lm] = lowOf(t.lower.low);
  const [uf, um] = lowOf(t.upper.low);
  const is = (f: number, m: number, n: SublevelName): boolean => f === n.twoF && m === n.twoM;
  return (is(lf, lm, a) && is(uf, um, b)) || (is(lf, lm, b) && is(uf, um, a));
}

function toJson(t: MagneticTransition): MagneticTransitionResult {
  return {
    lower_label: t.lower.low.text,
    upper_label: t.upper.low.text,
    kind: polarizationName(t.kind),
    frequency_Hz: t.frequencyHz,
    df_dB_Hz_per_T: t.dfdB,
    d2f_dB2_Hz_per_T2: t.d2fdB2,
    strength: t.strength,
    rabi_Hz_per_T: t.rabiHzPerT,
  };
}

function sameSublevel(r: ResonanceModel): boolean {
  return !!r.lower && !!r.upper && r.lower.twoF === r.upper.twoF && r.lower.twoM === r.upper.twoM;
}
