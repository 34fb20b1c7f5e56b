/**
 * The numbers behind each diagram as CSV for analysis code: SI units named in the header,
 * full double precision, text cells quoted when needed and defused against spreadsheet
 * formula injection (labels come from users' files).
 */
import type { LevelsViewData, LinesViewData, PatternViewData } from './viewData';

function textCell(s: string): string {
  let v = String(s);
  if (/^[=+@\t\r]/.test(v) || /^-(?![\d.])/.test(v)) v = `'${v}`;
  return /[",\r\n]|^\s|\s$/.test(v) ? `"${v.replace(/"/g, '""')}"` : v;
}

function numCell(v: number | undefined): string {
  return v === undefined || !Number.isFinite(v) ? '' : String(v);
}

function rows(header: string[], body: string[][]): string {
  return [header.map(textCell).join(','), ...body.map((r) => r.join(','))].join('\n') + '\n';
}

export function levelsCsv(d: LevelsViewData): string {
  const header = ['B (T)'];
  for (const c of d.curves) header.push(`E/h ${c.lowLabel} / ${c.highLabel} (Hz)`);
  const withMoment = d.curves.filter((c) => c.momentJT);
  for (const c of withMoment) header.push(`mu ${c.lowLabel} / ${c.highLabel} (J/T)`);
  const body: string[][] = [];
  for (let k = 0; k < d.fieldsT.length; k++) {
    body.push([
      numCell(d.fieldsT[k]),
      ...d.curves.map((c) => numCell(c.energyHz[k])),
      ...withMoment.map((c) => numCell(c.momentJT?.[k])),
    ]);
  }
  return rows(header, body);
}

export function patternCsv(d: PatternViewData): string {
  const header = ['position (m)', 'total', ...d.parts.map((p) => p.label)];
  const body: string[][] = [];
  for (let k = 0; k < d.positionsM.length; k++) {
    body.push([numCell(d.positionsM[k]), numCell(d.total[k]), ...d.parts.map((p) => numCell(p.values[k]))]);
  }
  return rows(header, body);
}

export function linesCsv(d: LinesViewData): string {
  const header = ['offset (Hz)', 'strength', 'polarization', 'label'];
  return rows(
    header,
    d.components.map((c) => [numCell(c.offsetHz), numCell(c.strength), textCell(c.polarization), textCell(c.label)]),
  );
}
