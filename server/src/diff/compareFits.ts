/** Fits: status, each fitted value and its uncertainty, χ² and the calibration's fields. */
import { fittedText } from '../eval/fitText';
import type { FitParameterResult, FitResult } from '../eval/fitResultTypes';
import { trimNumber } from '../eval/quantityText';
import { ChangeList, pairByKey, type Writer } from './changeList';
import type { DiffThresholds } from './diffTypes';

/** The threshold of a fitted quantity by its SI unit; quantities without their own (K, T/m) by `fraction` of the value. */
function thresholdOf(p: FitParameterResult, other: FitParameterResult, t: DiffThresholds): number {
  switch (p.unit) {
    case 'Hz':
      return t.frequency_Hz;
    case 'T':
      return t.field_T;
    case 'm':
      return t.length_m;
    case '':
      return t.g;
    default:
      return t.fraction * Math.max(Math.abs(p.value), Math.abs(other.value));
  }
}

/**
 * Written like the fit report (in the unit the file wrote, through the one formatter), each number
 * to the digits that resolve `threshold`, so values that differ by more never read the same.
 */
function inFitUnit(unit: string, written: string | undefined, threshold: number): Writer {
  return (x) => {
    const digits = threshold > 0 && x !== 0 ? Math.min(15, Math.max(3, Math.ceil(Math.log10(Math.abs(x) / threshold)) + 1)) : 7;
    return fittedText(x, undefined, unit, written, digits);
  };
}

const chi2Text: Writer = (x) => trimNumber(x, 5);

export function compareFit(a: FitResult, b: FitResult, t: DiffThresholds): ChangeList {
  const list = new ChangeList();
  list.value('kind', a.kind, b.kind);
  list.value('status', a.status, b.status);
  // A calibration's one parameter is its first field; its fields are compared below, as its report lists them.
  const fitted = (f: FitResult): FitParameterResult[] => (f.kind === 'calibration' ? [] : f.parameters);
  const params = pairByKey(fitted(a), fitted(b), (p) => p.name);
  list.presence('parameter', params.oldKeys, params.newKeys);
  for (const [pa, pb] of params.pairs) {
    const threshold = thresholdOf(pa, pb, t);
    const write = inFitUnit(pb.unit, pb.written_unit ?? pa.written_unit, threshold);
    list.number('value', pa.value, pb.value, threshold, write, pb.unit, { subject: pa.name });
    list.number('uncertainty', pa.uncertainty, pb.uncertainty, threshold, write, pb.unit, { subject: pa.name });
  }
  list.number('χ²', a.chi2, b.chi2, t.chi2, chi2Text, '');
  list.number('degrees of freedom', a.dof, b.dof, 0, (x) => trimNumber(x), '');
  list.value('uncertainty basis', a.uncertainty_basis, b.uncertainty_basis);
  // A calibration's fields: several roots may solve one resonance, so they are paired in order.
  const written = b.parameters[0]?.written_unit ?? a.parameters[0]?.written_unit;
  const numbered = (f: FitResult) => (f.roots ?? []).map((r, i) => ({ r, key: `root ${i + 1}` }));
  const roots = pairByKey(numbered(a), numbered(b), (x) => x.key);
  list.presence('field', roots.oldKeys, roots.newKeys);
  for (const [ra, rb] of roots.pairs) {
    const write = inFitUnit('T', written, t.field_T);
    list.number('field', ra.r.field_T, rb.r.field_T, t.field_T, write, 'T', { subject: ra.key });
    list.number('field uncertainty', ra.r.uncertainty_T, rb.r.uncertainty_T, t.field_T, write, 'T', { subject: ra.key });
  }
  return list;
}
