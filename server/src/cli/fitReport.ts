/** The readable report of `sublevel fit`: best values, χ², correlations, every root of a calibration, the residuals. */
import type { FitResult } from '../eval/fitResultTypes';
import { measuredText, parameterText, residualText, fittedText } from '../eval/fitText';
import { lengthText, prefixedText, sensitivityText, trimNumber } from '../eval/quantityText';
import { inWrittenUnit } from '../eval/writtenUnit';

const STATUS: Record<FitResult['status'], string> = {
  converged: '',
  'not-converged': ' — NOT CONVERGED: the values are where the fit stopped, not a best fit',
  failed: ' — not fitted (see the problems)',
};

export function fitReportLines(file: string, fits: readonly FitResult[]): string[] {
  const out: string[] = [`${file}: ${fits.length} fit${fits.length === 1 ? '' : 's'}`];
  for (const f of fits) {
    out.push('', `fit ${f.name} (${f.kind === 'calibration' ? 'field from one resonance' : f.kind === 'profile' ? 'detector profile' : 'resonances and intervals'})${STATUS[f.status]}`);
    if (f.kind === 'calibration') {
      const p = f.points[0];
      if (p) out.push(`  measured ${fittedText(p.measured, p.uncertainty, 'Hz', p.written_unit ?? f.measured_written_unit)}`);
      if (!f.roots?.length) out.push('  no field in the range is resonant at this frequency');
      // The first (lowest) root is the fit's value; any others are resonant too and said so.
      (f.roots ?? []).forEach((r, k) => out.push(`  ${k === 0 ? 'field =' : 'also resonant at'} ${fittedText(r.field_T, r.uncertainty_T, 'T', f.parameters[0]?.written_unit)}   (df/dB = ${sensitivityText(r.df_dB_Hz_per_T, 5)})`));
      continue;
    }
    if (f.status === 'failed') continue;
    const width = Math.max(...f.parameters.map((p) => p.name.length));
    for (const p of f.parameters) out.push(`  ${p.name.padEnd(width)} = ${parameterText(p)}   (start ${fittedText(p.start, undefined, p.unit, p.written_unit)})`);
    const basis = f.uncertainty_basis === 'data' ? "from the points' own uncertainties" : 'scaled by χ²/dof: the points carry no uncertainties';
    out.push(`  χ² = ${trimNumber(f.chi2, 4)}, dof = ${f.dof}${f.reduced_chi2 !== undefined ? `, χ²/dof = ${trimNumber(f.reduced_chi2, 3)}` : ''}; uncertainties ${basis}`);
    if (f.correlation && f.parameters.length > 1) {
      const pairs: string[] = [];
      f.correlation.forEach((row, i) => row.forEach((c, j) => j > i && pairs.push(`${f.parameters[i]!.name}–${f.parameters[j]!.name} ${trimNumber(c, 3)}`)));
      out.push(`  correlations: ${pairs.join(', ')}`);
    }
    const scale = Math.max(...f.points.map((p) => Math.abs(p.measured)));
    out.push(`  residuals (measured − model), ${f.points.length} points:`);
    for (const p of f.points.slice(0, 200)) {
      const where = p.csv_line !== undefined ? `${p.data} csv line ${p.csv_line}` : `${p.data} line ${p.line + 1}`;
      const z = p.uncertainty && p.residual !== undefined ? `  (${trimNumber(p.residual / p.uncertainty, 3)} σ)` : '';
      // Where the point was taken, so a residual pattern can be read without the CSV beside it.
      const at = p.position_m !== undefined ? `  at ${atText(p.position_m, 'm', f.at_written_unit, lengthText)}` : p.field_T !== undefined ? `  at ${atText(p.field_T, 'T', f.at_written_unit, (v) => prefixedText(v, 'T'))}` : '';
      out.push(`    ${where.padEnd(24)} ${measuredText(p.measured, f.measured_unit, p.written_unit ?? f.measured_written_unit).padStart(18)}  ${residualText(p.residual, f.measured_unit, scale).padStart(12)}${z}${at}`);
    }
    if (f.points.length > 200) out.push(`    … ${f.points.length - 200} more (--format csv lists every point)`);
  }
  return out;
}

/** Where a point was taken, in the unit its data wrote (0.5 mT stays 0.5 mT), else the formatter's own choice. */
function atText(si: number, base: 'T' | 'm', unit: string | undefined, fallback: (v: number) => string): string {
  return inWrittenUnit(si, base === 'T' ? 'flux-density' : 'length', unit) ?? fallback(si);
}
