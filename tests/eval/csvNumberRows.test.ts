/**
 * The whole-table writer writes every cell exactly as the one CSV number formatter, csvNumber,
 * does: on random doubles across the whole exponent range, the boundaries where the layout
 * switches to exponent notation (1e-7, 1e21), subnormals, integers past 2^53, signed zeros,
 * tables with missing or non-finite cells, and tables larger than one of its output chunks.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { csvNumber, csvNumberRow, csvNumberRows, csvNumberRowsBytes } from '../../server/src/eval/machineText';

const cellByCell = (rows: (number | null | undefined)[][]): string => rows.map((r) => r.map(csvNumber).join(',')).join('\n');

const EDGES = [
  0, -0, 1, -1, 0.1, 1e-7, 9.999999999999999e-8, 1e-6, 1e21, 9.999999999999999e20, 1e20, 123456789012345680000, 2 ** 53, 2 ** 53 + 2,
  Number.MIN_VALUE, -Number.MIN_VALUE, 2.2250738585072014e-308, Number.MAX_VALUE, -Number.MAX_VALUE, Number.EPSILON,
  0.014206868690652684, -0.05893148244853466, 6834682610.904, 9.2740100657e-24, 5e-324, 1.7976931348623157e308,
];

describe('csvNumberRows', () => {
  it('matches csvNumber on the notation boundaries and extremes', () => {
    expect(csvNumberRows([EDGES])).toBe(cellByCell([EDGES]));
    expect(csvNumberRow(EDGES)).toBe(EDGES.map(csvNumber).join(','));
    expect(csvNumberRows([[-0, 1e21, 1e-7, 0.1 + 0.2, 9.999999999999999e-8]])).toBe('0,1e+21,1e-7,0.3,1e-7');
  });

  it('matches csvNumber cell for cell on random tables of doubles', () => {
    const anyDouble = fc.double({ noNaN: true, noDefaultInfinity: true });
    fc.assert(
      fc.property(fc.array(fc.array(anyDouble, { minLength: 1, maxLength: 12 }), { maxLength: 20 }), (rows) => {
        expect(csvNumberRows(rows)).toBe(cellByCell(rows));
      }),
      { numRuns: Number(process.env['FUZZ_RUNS'] ?? 500) },
    );
  });

  it('leaves missing and non-finite cells empty, keeping the other rows and cells', () => {
    const rows = [[1.5, NaN, 2], [Infinity, -Infinity, undefined], [3, 4, 5], [null, 6]];
    expect(csvNumberRows(rows)).toBe('1.5,,2\n,,\n3,4,5\n,6');
    expect(csvNumberRows(rows)).toBe(cellByCell(rows));
    expect(csvNumberRows([])).toBe('');
    expect(csvNumberRows([[], []])).toBe('\n');
  });

  it('writes tables far larger than one output chunk, and long runs of empty rows', () => {
    let seed = 7;
    const next = (): number => ((seed = (seed * 16807) % 2147483647) / 2147483647 - 0.5) * 10 ** ((seed % 60) - 30);
    const rows = Array.from({ length: 5000 }, (_, k) => (k % 97 === 0 ? [] : Array.from({ length: 10 }, next)));
    expect(csvNumberRows(rows)).toBe(cellByCell(rows));
    const empty = Array.from({ length: 100_000 }, () => [] as number[]);
    expect(csvNumberRows(empty)).toBe('\n'.repeat(99_999));
    const wide = [Array.from({ length: 20_000 }, (_, k) => -k / 3)];
    expect(csvNumberRows(wide)).toBe(cellByCell(wide));
  });

  it('gives the same text as bytes, a chunk at a time, for a file writer', () => {
    const asBytes = (rows: (number | null | undefined)[][]): { text: string; chunks: number } => {
      const parts: Buffer[] = [];
      csvNumberRowsBytes(rows, (b) => parts.push(Buffer.from(b)));
      return { text: Buffer.concat(parts).toString('latin1'), chunks: parts.length };
    };
    const rows = Array.from({ length: 3000 }, (_, k) => [k / 7, -k * 1e-9, k % 5 === 0 ? NaN : 2 ** k, 0.1 + 0.2]);
    const r = asBytes(rows);
    expect(r.text).toBe(csvNumberRows(rows));
    expect(r.chunks).toBeGreaterThan(3);
    expect(asBytes([])).toEqual({ text: '', chunks: 0 });
    expect(asBytes([[], []])).toEqual({ text: '\n', chunks: 1 });
  });
});
