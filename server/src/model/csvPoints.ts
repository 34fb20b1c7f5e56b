/**
 * Points of a data CSV file. The first line that is not blank or a `#` comment names the
 * columns, each with its unit in brackets (`frequency [MHz], uncertainty [kHz], field [mT]` or
 * `position [um], counts, error`); every later line is one point. A line that cannot be read is
 * reported with its line number and skipped; nothing throws.
 */
import { converterToSI, type Dimension } from '../format/units';
import type { DataKind } from './fitTypes';

export interface CsvColumns {
  /** Column index of each known name. */
  index: Record<string, number>;
  /** A written cell to SI, per column name (one exact conversion: `3` in a G column is 3e-4 T, not 3.0000000000000003e-4). */
  toSI: Record<string, (value: number) => number>;
  units: Record<string, string>;
}

export interface CsvRow {
  line: number;
  values: Record<string, number>;
}

export interface CsvReading {
  rows: CsvRow[];
  /** Problems by line (1-based; 0 for the file as a whole). */
  problems: { line: number; message: string }[];
  units: Record<string, string>;
}

const COLUMNS: Record<DataKind, Record<string, Dimension | undefined>> = {
  resonance: { frequency: 'frequency-like', uncertainty: 'frequency-like', field: 'flux-density' },
  interval: { frequency: 'frequency-like', uncertainty: 'frequency-like', field: 'flux-density' },
  profile: { position: 'length', counts: undefined, error: undefined },
};
const REQUIRED: Record<DataKind, string[]> = { resonance: ['frequency'], interval: ['frequency'], profile: ['position', 'counts'] };

/** Most rows read from one file. */
export const MAX_CSV_ROWS = 100_000;

function readHeader(cells: string[], kind: DataKind): { columns?: CsvColumns; problem?: string } {
  const allowed = COLUMNS[kind];
  const columns: CsvColumns = { index: {}, toSI: {}, units: {} };
  for (const [i, raw] of cells.entries()) {
    const m = /^\s*([A-Za-z_]+)\s*(?:\[\s*([^\]]*?)\s*\])?\s*$/.exec(raw);
    const name = m?.[1]?.toLowerCase();
    if (!m || !name || !(name in allowed)) {
      return { problem: `the header column '${raw.trim()}' is not one of ${Object.keys(allowed).join(', ')} (a ${kind} file's columns, each with its unit in brackets)` };
    }
    const dim = allowed[name];
    const unit = m[2] ?? '';
    if (dim) {
      if (!unit) return { problem: `the header column '${name}' needs its unit in brackets, e.g. ${name} [${dim === 'length' ? 'um' : dim === 'flux-density' ? 'mT' : 'MHz'}]` };
      const toSI = converterToSI(dim, unit);
      if (toSI === undefined || !(toSI(1) > 0)) return { problem: `the unit '${unit}' of column '${name}' is not a unit of ${dim === 'frequency-like' ? 'frequency' : dim}` };
      columns.toSI[name] = toSI;
      columns.units[name] = unit;
    } else {
      if (unit) return { problem: `the column '${name}' is a plain number; remove '[${unit}]'` };
      columns.toSI[name] = (v) => v;
    }
    columns.index[name] = i;
  }
  const missing = REQUIRED[kind].filter((n) => !(n in columns.index));
  if (missing.length > 0) return { problem: `the header has no ${missing.join(' or ')} column` };
  return { columns };
}

export function readCsvPoints(text: string, kind: DataKind): CsvReading {
  const out: CsvReading = { rows: [], problems: [], units: {} };
  const lines = text.split(/\r\n|\r|\n/);
  let columns: CsvColumns | undefined;
  for (let k = 0; k < lines.length; k++) {
    const line = lines[k]!.replace(/#.*$/, '');
    if (line.trim() === '') continue;
    const cells = line.split(/[,;\t]/);
    if (!columns) {
      const h = readHeader(cells, kind);
      if (!h.columns) {
        out.problems.push({ line: k + 1, message: h.problem! });
        return out;
      }
      columns = h.columns;
      out.units = columns.units;
      continue;
    }
    if (out.rows.length >= MAX_CSV_ROWS) {
      out.problems.push({ line: k + 1, message: `more than ${MAX_CSV_ROWS} points: the rest of the file is not read` });
      break;
    }
    const values: Record<string, number> = {};
    let bad: string | undefined;
    for (const [name, i] of Object.entries(columns.index)) {
      const cell = (cells[i] ?? '').trim();
      if (cell === '' && !REQUIRED[kind].includes(name)) continue;
      const v = cell === '' ? Number.NaN : Number(cell);
      if (!Number.isFinite(v)) {
        bad = cell === '' ? `the ${name} is missing` : `'${cell.length > 20 ? `${cell.slice(0, 17)}…` : cell}' in the ${name} column is not a number`;
        break;
      }
      values[name] = columns.toSI[name]!(v);
    }
    if (bad) out.problems.push({ line: k + 1, message: bad });
    else out.rows.push({ line: k + 1, values });
  }
  if (!columns) out.problems.push({ line: 0, message: 'the file is empty: it needs a header line naming its columns and one line per point' });
  return out;
}
