/**
 * A fit's result in hovers and inline hints: the fitted values with their standard
 * uncertainties, χ², correlations, every field of a one-resonance calibration, and each data
 * point's residual. Computed in the evaluation (the worker), only read here.
 */
import type { FitPointResult, FitResult } from '../../eval/fitResultTypes';
import { parameterText, residualText, fittedText } from '../../eval/fitText';
import { sensitivityText, trimNumber } from '../../eval/quantityText';
import { md, mdTable, mdTitle } from '../shared/markdown';

/** One line: the fitted values, or every field of a calibration. */
export function fitSummary(f: FitResult): string | undefined {
  if (f.kind === 'calibration') {
    const roots = f.roots ?? [];
    return roots.length > 0 ? `field ${roots.map((r) => fittedText(r.field_T, r.uncertainty_T, 'T', f.parameters[0]?.written_unit)).join(' or ')}` : undefined;
  }
  if (f.status === 'failed') return undefined;
  const values = f.parameters.filter((p) => p.name !== 'amplitude').map((p) => `${p.name} ${parameterText(p)}`);
  return `${values.join(', ')}${f.status === 'not-converged' ? ' (not converged)' : ''}`;
}

export function fitSection(f: FitResult): string {
  const lines = [mdTitle(`fit ${md(f.name)}`)];
  if (f.kind === 'calibration') {
    const roots = f.roots ?? [];
    if (roots.length === 0) lines.push('no field in the range is resonant at the measured frequency');
    else lines.push(mdTable(['field', 'df/dB'], roots.map((r) => [fittedText(r.field_T, r.uncertainty_T, 'T', f.parameters[0]?.written_unit), sensitivityText(r.df_dB_Hz_per_T, 5)])));
    return lines.join('\n\n');
  }
  if (f.status === 'failed') return [...lines, 'not fitted: see the problems on this block'].join('\n\n');
  if (f.status === 'not-converged') lines.push('**not converged**: the values are where the fit stopped, not a best fit');
  lines.push(mdTable(['parameter', 'value', 'start'], f.parameters.map((p) => [md(p.name), parameterText(p), fittedText(p.start, undefined, p.unit, p.written_unit)])));
  const basis = f.uncertainty_basis === 'data' ? "standard uncertainties from the points' own" : 'standard uncertainties scaled by χ²/dof (the points carry none)';
  lines.push(`χ² ${trimNumber(f.chi2, 4)} for ${f.dof} degrees of freedom${f.reduced_chi2 !== undefined ? ` (χ²/dof ${trimNumber(f.reduced_chi2, 3)})` : ''}; ${basis}`);
  if (f.correlation && f.parameters.length > 1) {
    const pairs: string[] = [];
    f.correlation.forEach((row, i) => row.forEach((c, j) => j > i && pairs.push(`${md(f.parameters[i]!.name)}–${md(f.parameters[j]!.name)} ${trimNumber(c, 3)}`)));
    lines.push(`correlations: ${pairs.join(', ')}`);
  }
  return lines.join('\n\n');
}

/** `r = −165.6 Hz (−0.55 σ)`: a point's residual, measured − model. */
export function residualLabel(f: FitResult, p: FitPointResult): string | undefined {
  if (p.residual === undefined) return undefined;
  const scale = Math.abs(p.measured);
  const z = p.uncertainty ? ` (${trimNumber(p.residual / p.uncertainty, 2)} σ)` : '';
  return `r ${residualText(p.residual, f.measured_unit, scale)}${z}`;
}
