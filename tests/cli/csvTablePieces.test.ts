/**
 * `profile --out` writes the table in pieces (the head as text, the number rows as the CSV
 * writer's bytes): the file holds the same bytes as the text the command prints, and no piece is
 * the whole table.
 */
import { mkdtempSync, readFileSync, rmSync } from 'fs';
import { tmpdir } from 'os';
import path from 'path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { csvTablePieces } from '../../server/src/cli/csvTablePieces';
import { escapeControls } from '../../server/src/cli/escape';
import { type CliFileSystem, nodeFileSystem } from '../../server/src/cli/fileSystem';
import { csvNumberTableText, type CsvNumberTable } from '../../server/src/render/csv';
import { cli, cliOn } from './runCli';

const LI = 'examples/lithium-beam.sublevel';

/** The bytes the pieces give, joined. */
function piecesBytes(t: CsvNumberTable): { bytes: Buffer; sizes: number[] } {
  const parts: Buffer[] = [];
  csvTablePieces(t)((b) => parts.push(Buffer.from(b))); // copied: a piece is a view of a reused buffer
  return { bytes: Buffer.concat(parts), sizes: parts.map((p) => p.length) };
}

/** The real file system, recording the length of every write. */
function countingWrites(): { counting: CliFileSystem; sizes: number[] } {
  const sizes: number[] = [];
  const write = nodeFileSystem.writeSync as (fd: number, b: Uint8Array, o: number, l: number) => number;
  const counting: CliFileSystem = {
    ...nodeFileSystem,
    writeSync: ((fd: number, buf: Uint8Array, offset: number, length: number) => {
      sizes.push(length);
      return write(fd, buf, offset, length);
    }) as CliFileSystem['writeSync'],
  };
  return { counting, sizes };
}

describe('a table of numbers written in pieces', () => {
  let dir = '';
  beforeEach(() => {
    dir = mkdtempSync(path.join(tmpdir(), 'sublevel-pieces-'));
  });
  afterEach(() => rmSync(dir, { recursive: true, force: true }));

  it('profile --out: the same bytes as the printed text, written in chunks of at most 33 KiB', () => {
    const { counting, sizes } = countingWrites();
    const target = path.join(dir, 'pattern.csv');
    const r = cliOn(counting, 'profile', LI, '--out', target);
    expect(r.code).toBe(0);
    const printed = cli('profile', LI).out;
    const written = readFileSync(target);
    expect(written.equals(Buffer.from(printed + '\n', 'utf8'))).toBe(true);
    expect(written.length).toBeGreaterThan(500_000); // 4,096 positions × 10 columns
    expect(sizes.length).toBeGreaterThan(10);
    expect(Math.max(...sizes)).toBeLessThanOrEqual(32 * 1024 + 2 * 23);
    expect(sizes.reduce((a, b) => a + b, 0)).toBe(written.length);
  });

  it('sweep --out (CSV): the same bytes as the printed text, in pieces; JSON as before', () => {
    const args = ['sweep', 'examples/rubidium-bias.sublevel', '--level', 'ground', '--to', '0.1T', '--points', '3001'];
    const { counting, sizes } = countingWrites();
    const csv = path.join(dir, 'sweep.csv');
    expect(cliOn(counting, ...args, '--out', csv).code).toBe(0);
    expect(readFileSync(csv, 'utf8')).toBe(cli(...args).out + '\n');
    expect(sizes.length).toBeGreaterThan(3);
    const json = path.join(dir, 'sweep.json');
    expect(cli(...args, '--format', 'json', '--out', json).code).toBe(0);
    expect(readFileSync(json, 'utf8')).toBe(cli(...args, '--format', 'json').out + '\n');
  });

  it('gives the bytes of the table text: head escaped like any text, empty tables and empty cells', () => {
    const head = '# sublevel profile: file=odd\x1bname.sublevel\nposition_m,total_per_m\n';
    const tables: CsvNumberTable[] = [
      { head, rows: [] },
      { head, rows: [[1e-7, 0.1 + 0.2], [-0, 2 ** 53]] },
      { head, rows: [[NaN, 1], [Infinity]] },
    ];
    for (const t of tables) expect(piecesBytes(t).bytes.toString('utf8')).toBe(escapeControls(csvNumberTableText(t)));
    expect(piecesBytes(tables[1]!).bytes.toString('utf8')).toBe(`${escapeControls(head)}1e-7,0.3\n0,9007199254740990\n`);
  });
});
