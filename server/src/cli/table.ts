/** Plain-text table with columns padded to their widest cell (numbers right-aligned). */
export function table(header: string[], rows: string[][]): string[] {
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => (r[i] ?? '').length)));
  // A column of numbers stays right-aligned when some cells say in words that the value is missing.
  const isNumber = (c: string): boolean => /^[-+]?[0-9]/.test(c);
  const numeric = header.map((_, i) => rows.some((r) => isNumber(r[i] ?? '')) && rows.every((r) => isNumber(r[i] ?? '') || !/[0-9]/.test(r[i] ?? '')));
  const fmt = (cells: string[], isHeader: boolean): string =>
    cells
      .map((c, i) => (numeric[i] && !isHeader ? c.padStart(widths[i]!) : c.padEnd(widths[i]!)))
      .join('  ')
      .trimEnd();
  return [fmt(header, true), widths.map((w) => '-'.repeat(w)).join('  '), ...rows.map((r) => fmt(r, false))];
}
