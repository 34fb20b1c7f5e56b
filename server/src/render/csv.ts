/**
 * The numbers behind each diagram, and the sweep and profile exports, as CSV in one convention
 * (docs/csv.md): a first comment line that says what the table is, `quantity_unit` column names
 * in SI (`field_T`, `energy_Hz[state]`, `moment_J_per_T[state]`, `position_m`, `offset_Hz`),
 * states sorted in one documented order, 15 significant digits, and text cells quoted when
 * needed and defused against spreadsheet formula injection (labels come from users' files).
 */
import { csvNumber as numCell, csvNumberRows } from '../eval/machineText';
import type { LevelsViewData, LinesViewData, PatternViewData, ResonanceViewData } from './viewData';

/** What a table is about; written as `# sublevel <kind>: key=value; …` on the first line. */
export interface CsvContext {
  kind: 'levels' | 'sweep' | 'pattern' | 'profile' | 'lines' | 'resonance' | 'fit' | 'residuals' | 'spectrum' | 'field' | 'fieldmap' | 'slower' | 'trap';
  /** key/value pairs in order, e.g. ['file', 'a.sublevel'], ['level', 'Rb87.ground'], ['field', 'trap 3.23e-4 T']. */
  about: [string, string | undefined][];
}

export function textCell(s: string): string {
  let v = String(s);
  if (/^[=+@\t\r]/.test(v) || /^-(?![\d.])/.test(v)) v = `'${v}`;
  return /[",\r\n]|^\s|\s$/.test(v) ? `"${v.replace(/"/g, '""')}"` : v;
}

/** The comment line: newlines and semicolons inside values would break it, so they become spaces and commas. */
export function csvCommentLine(c: CsvContext): string {
  const pairs = c.about
    .filter((p): p is [string, string] => p[1] !== undefined && p[1] !== '')
    .map(([k, v]) => `${k}=${v.replace(/[\r\n]+/g, ' ').replace(/;/g, ',')}`);
  return `# sublevel ${c.kind}${pairs.length ? ': ' + pairs.join('; ') : ''}`;
}

export function csvTable(c: CsvContext, header: string[], body: string[][]): string {
  return csvText(c, header, body.map((r) => r.join(',')).join('\n'), body.length);
}

/** The table from its body of `rows` lines, already joined by newlines. */
function csvText(c: CsvContext, header: string[], body: string, rows: number): string {
  return `${csvCommentLine(c)}\n${header.map(textCell).join(',')}\n${rows > 0 ? body + '\n' : ''}`;
}

/**
 * A CSV table of numbers in two parts: the text above them (comment line and header, each ending
 * in a newline) and the rows of numbers. Its text is `csvNumberTableText`; a file writer may
 * instead take the rows as bytes (csvNumberRowsBytes) after the head, and a newline after them.
 */
export interface CsvNumberTable {
  head: string;
  rows: number[][];
}

export function csvNumberTableText(t: CsvNumberTable): string {
  return t.rows.length > 0 ? `${t.head}${csvNumberRows(t.rows)}\n` : t.head;
}

/** A table of numbers, `rows` lines made by `rowAt`. */
function numberTable(c: CsvContext, header: string[], rows: number, rowAt: (k: number) => number[]): CsvNumberTable {
  const table = new Array<number[]>(rows);
  for (let k = 0; k < rows; k++) table[k] = rowAt(k);
  return { head: `${csvCommentLine(c)}\n${header.map(textCell).join(',')}\n`, rows: table };
}

/** A state as it is named in column headers: its low-field label, and where it goes at high field. */
export function stateColumn(quantity: string, low: string, high: string): string {
  return low === high ? `${quantity}[${low}]` : `${quantity}[${low} -> ${high}]`;
}

export interface StateSeries {
  lowLabel: string;
  highLabel: string;
  energyHz: ArrayLike<number>;
  momentJT?: ArrayLike<number>;
  /** Standard uncertainty of the energy at each field, when the level has uncertain constants. */
  energyUncHz?: ArrayLike<number>;
}

/**
 * The documented state order: by energy at the first field of the table (lowest first), ties
 * (degenerate states at zero field) broken by energy at the last field. Stable, so the order
 * does not depend on how the engine happened to list its blocks.
 */
export function sortedStates<T extends StateSeries>(states: readonly T[]): T[] {
  const first = (s: T): number => s.energyHz[0] ?? NaN;
  const last = (s: T): number => s.energyHz[s.energyHz.length - 1] ?? NaN;
  const key = (v: number): number => (Number.isFinite(v) ? v : Infinity);
  const tie = (a: number, b: number): boolean => a === b || (Number.isFinite(a - b) && Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a), Math.abs(b)));
  return states
    .map((s, i) => ({ s, i }))
    .sort((a, b) => {
      const fa = key(first(a.s));
      const fb = key(first(b.s));
      if (!tie(fa, fb)) return fa - fb;
      return key(last(a.s)) - key(last(b.s)) || a.i - b.i;
    })
    .map((x) => x.s);
}

/** Energies and moments of every state at each field: one row per field. */
export function stateTableCsv(c: CsvContext, fieldsT: ArrayLike<number>, states: readonly StateSeries[]): string {
  return csvNumberTableText(stateTable(c, fieldsT, states));
}

/** stateTableCsv in parts (CsvNumberTable). */
export function stateTable(c: CsvContext, fieldsT: ArrayLike<number>, states: readonly StateSeries[]): CsvNumberTable {
  const sorted = sortedStates(states);
  const withMoment = sorted.filter((s) => s.momentJT);
  const withUnc = sorted.filter((s) => s.energyUncHz);
  const header = [
    'field_T',
    ...sorted.map((s) => stateColumn('energy_Hz', s.lowLabel, s.highLabel)),
    ...withMoment.map((s) => stateColumn('moment_J_per_T', s.lowLabel, s.highLabel)),
    ...withUnc.map((s) => stateColumn('energy_Hz_unc', s.lowLabel, s.highLabel)),
  ];
  return numberTable(c, header, fieldsT.length, (k) => {
    const row = [fieldsT[k]!];
    for (const s of sorted) row.push(s.energyHz[k]!);
    for (const s of withMoment) row.push(s.momentJT![k]!);
    for (const s of withUnc) row.push(s.energyUncHz![k]!);
    return row;
  });
}

export function levelsCsv(d: LevelsViewData, about: CsvContext['about'] = []): string {
  const field = d.markerT !== undefined ? `${d.markerLabel ? d.markerLabel + ' ' : ''}${numCell(d.markerT)} T` : undefined;
  return stateTableCsv({ kind: 'levels', about: [...about, ['field', field]] }, d.fieldsT, d.curves);
}

/** Positions and the summed and per-sublevel shares (fraction of all atoms per metre); sublevels in the beam report's order. */
export function patternCsv(d: PatternViewData, about: CsvContext['about'] = [], kind: 'pattern' | 'profile' = 'pattern'): string {
  return csvNumberTableText(patternTable(d, about, kind));
}

/** patternCsv in parts (CsvNumberTable). */
export function patternTable(d: PatternViewData, about: CsvContext['about'] = [], kind: 'pattern' | 'profile' = 'pattern'): CsvNumberTable {
  const header = ['position_m', 'total_per_m', ...d.parts.map((p) => `share_per_m[${p.label}]`)];
  return numberTable({ kind, about }, header, d.positionsM.length, (k) => {
    const row = [d.positionsM[k]!, d.total[k]!];
    for (const p of d.parts) row.push(p.values[k]!);
    return row;
  });
}

/** Components sorted by offset (then polarisation π, σ+, σ−), at the field the comment line names. */
export function linesCsv(d: LinesViewData, about: CsvContext['about'] = []): string {
  const rank = { pi: 0, 'sigma+': 1, 'sigma-': 2 } as const;
  const sorted = [...d.components].sort((a, b) => a.offsetHz - b.offsetHz || rank[a.polarization] - rank[b.polarization]);
  const field = d.fieldT !== undefined ? `${d.fieldName ? d.fieldName + ' ' : ''}${numCell(d.fieldT)} T` : undefined;
  return csvTable(
    { kind: 'lines', about: [...about, ['field', field]] },
    ['offset_Hz', 'strength', 'polarization', 'transition'],
    sorted.map((c) => [numCell(c.offsetHz), numCell(c.strength), textCell(c.polarization), textCell(c.label.replace(/ → /g, ' -> '))]),
  );
}

/** The transition frequency and its field slope at each field. */
export function resonanceCsv(d: ResonanceViewData, about: CsvContext['about'] = []): string {
  const c: CsvContext = { kind: 'resonance', about: [...about, ['transition', d.pairLabel.replace(/ → /g, ' -> ')]] };
  return csvNumberTableText(numberTable(c, ['field_T', 'frequency_Hz', 'df_dB_Hz_per_T'], d.fieldsT.length, (k) => [d.fieldsT[k]!, d.frequencyHz[k]!, d.slopeHzPerT[k]!]));
}

/** Columns of a synthesized spectrum; the frequency and wavelength columns only when they are known. */
export interface SpectrumColumns {
  offsetHz: ArrayLike<number>;
  intensity: ArrayLike<number>;
  absoluteHz?: ArrayLike<number>;
  vacuumWavelengthM?: ArrayLike<number>;
  airWavelengthM?: ArrayLike<number>;
}

/** A line's synthesized spectrum, one row per sample in ascending frequency (docs/csv.md). */
export function spectrumCsv(d: SpectrumColumns, about: CsvContext['about'] = []): string {
  const cols: [string, ArrayLike<number>][] = [['offset_Hz', d.offsetHz]];
  if (d.absoluteHz) cols.push(['frequency_Hz', d.absoluteHz]);
  if (d.vacuumWavelengthM) cols.push(['vacuum_wavelength_m', d.vacuumWavelengthM]);
  if (d.airWavelengthM) cols.push(['air_wavelength_m', d.airWavelengthM]);
  cols.push(['intensity_per_Hz', d.intensity]);
  const body: string[][] = [];
  for (let i = 0; i < d.offsetHz.length; i++) body.push(cols.map(([, v]) => numCell(v[i])));
  return csvTable({ kind: 'spectrum', about }, cols.map(([h]) => h), body);
}
