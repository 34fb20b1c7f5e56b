/**
 * Fits as one CSV table in long form (docs/fit.md): one row per fitted parameter, statistic,
 * calibration root and data point, values in SI with their unit, 15 significant digits.
 */
import type { FitResult } from '../eval/fitResultTypes';
import { csvCommentLine, textCell } from './csv';
import { csvNumber as numCell } from '../eval/machineText';

const HEADER = 'fit,item,name,x,x_unit,value,uncertainty,model,residual,unit,line';

export function fitCsv(fits: readonly FitResult[], file: string): string {
  const rows: string[] = [csvCommentLine({ kind: 'fit', about: [['file', file]] }), HEADER];
  const row = (cells: (string | number | undefined)[]): void => {
    rows.push(cells.map((c) => (typeof c === 'number' ? numCell(c) : c === undefined ? '' : textCell(c))).join(','));
  };
  for (const f of fits) {
    for (const p of f.parameters) if (f.kind !== 'calibration') row([f.name, 'parameter', p.name, undefined, undefined, p.value, p.uncertainty, undefined, undefined, p.unit, undefined]);
    for (const r of f.roots ?? []) row([f.name, 'root', 'field', undefined, undefined, r.field_T, r.uncertainty_T, undefined, undefined, 'T', undefined]);
    if (f.chi2 !== undefined) row([f.name, 'statistic', 'chi2', undefined, undefined, f.chi2, undefined, undefined, undefined, '', undefined]);
    row([f.name, 'statistic', 'dof', undefined, undefined, f.dof ?? undefined, undefined, undefined, undefined, '', undefined]);
    for (const p of f.points) {
      const [x, xUnit] = p.position_m !== undefined ? [p.position_m, 'm'] : p.field_T !== undefined ? [p.field_T, 'T'] : [undefined, undefined];
      row([f.name, 'point', p.data, x, xUnit, p.measured, p.uncertainty, p.model, p.residual, f.measured_unit, p.csv_line !== undefined ? `csv ${p.csv_line}` : p.line + 1]);
    }
  }
  return `${rows.join('\n')}\n`;
}
