/**
 * The numbers behind the residuals figure (docs/csv.md): one row per fitted point, in the units the
 * file wrote them in, as the figure reads them: the points' fields (or detector positions) in their
 * written unit, the measured values, uncertainties, model and residuals in the data's written unit.
 * Each column's header names its unit (`field_mT`, `measured_kHz`). A residual and its ratio to σ
 * keep only the digits the subtraction holds (csvDigits/heldDigits.ts). `sublevel fit --format csv`
 * stays the long SI table (fitCsv.ts).
 */
import type { FitPointResult, FitResult } from '../eval/fitResultTypes';
import { convertSI, type Dimension } from '../format/units';
import { csvTable, textCell } from './csv';
import { csvNumber as numCell } from '../eval/machineText';
import { heldDigits, ulpOf } from '../eval/csvDigits/heldDigits';

/** A column's unit and how an SI value reads in it. */
interface ColumnUnit {
  unit: string;
  read: (si: number) => number | undefined;
}

/** `written` when the dimension can express it, else the SI unit itself. */
function columnUnit(written: string | undefined, si: string, d: Dimension | undefined): ColumnUnit {
  if (d && written !== undefined && written !== si && convertSI(1, d, written) !== undefined) return { unit: written, read: (v) => convertSI(v, d, written) };
  return { unit: si, read: (v) => v };
}

function cell(v: number | undefined): string {
  return v === undefined || !Number.isFinite(v) ? '' : numCell(v);
}

export function residualsCsv(f: FitResult, file: string): string {
  const points = f.points.filter((p) => p.model !== undefined);
  const profile = f.kind === 'profile';
  const allFields = points.length > 0 && points.every((p) => p.field_T !== undefined);
  const x: { name: string; of: (p: FitPointResult, k: number) => number | undefined } = profile
    ? withUnit('position', columnUnit(f.at_written_unit, 'm', 'length'), (p) => p.position_m)
    : allFields
      ? withUnit('field', columnUnit(f.at_written_unit, 'T', 'flux-density'), (p) => p.field_T)
      : { name: 'point', of: (_p, k) => k + 1 };
  const y = columnUnit(f.measured_written_unit, f.measured_unit, f.measured_unit === 'Hz' ? 'frequency-like' : undefined);
  const header = ['data', x.name, ...['measured', 'uncertainty', 'model', 'residual'].map((n) => `${n}_${y.unit}`), 'residual_per_sigma', 'line'];
  const body = points.map((p, k) => {
    const sigma = p.uncertainty !== undefined && p.uncertainty > 0 ? p.uncertainty : undefined;
    const residual = p.residual ?? p.measured - p.model!;
    const inY = (v: number | undefined): string => cell(v === undefined ? undefined : y.read(v));
    // measured − model holds digits down to about one ulp of the larger of the two, in the column's unit.
    const quantumSI = ulpOf(Math.max(Math.abs(p.measured), Math.abs(p.model!)));
    const residualCell = (): string => {
      const r = y.read(residual);
      const q = y.read(quantumSI);
      return cell(r === undefined || q === undefined ? undefined : heldDigits(r, Math.abs(q)));
    };
    // The ratio holds the residual's relative precision: the quantum over σ.
    const perSigma = sigma !== undefined ? heldDigits(residual / sigma, quantumSI / sigma) : undefined;
    return [
      textCell(p.data),
      cell(x.of(p, k)),
      inY(p.measured),
      inY(p.uncertainty),
      inY(p.model),
      residualCell(),
      cell(perSigma),
      textCell(p.csv_line !== undefined ? `csv ${p.csv_line}` : String(p.line + 1)),
    ];
  });
  return csvTable({ kind: 'residuals', about: [['file', file], ['fit', f.name]] }, header, body);
}

function withUnit(quantity: string, u: ColumnUnit, si: (p: FitPointResult) => number | undefined): { name: string; of: (p: FitPointResult) => number | undefined } {
  return {
    name: `${quantity}_${u.unit}`,
    of: (p) => {
      const v = si(p);
      return v === undefined ? undefined : u.read(v);
    },
  };
}
