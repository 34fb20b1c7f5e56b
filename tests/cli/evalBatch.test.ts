/** `sublevel eval` on many files: order, per-file errors, the jsonl shape, and the same results as one file at a time. */
import { spawnSync } from 'child_process';
import { mkdtempSync, writeFileSync } from 'fs';
import os from 'os';
import path from 'path';
import { beforeAll, describe, expect, it } from 'vitest';
import { builtCli, cli } from './runCli';

const RB = 'examples/rubidium-bias.sublevel';
const LI = 'examples/lithium-beam.sublevel';
const MISTAKES = 'examples/mistakes.sublevel';
const DEMO = 'examples/shared-species-demo.sublevel';

const jsonl = (out: string): { file: string; errors: number; result?: { format: string }; diagnostics?: { code: string }[] }[] =>
  out.split('\n').map((l) => JSON.parse(l));

describe('sublevel eval on many files (in-process, one thread)', () => {
  let dir = '';
  let list = '';
  beforeAll(() => {
    dir = mkdtempSync(path.join(os.tmpdir(), 'sublevel-batch-'));
    list = path.join(dir, 'list.txt');
    writeFileSync(list, `${LI}\r\n\n${RB}\n`);
  });

  it('prints one jsonl line per file, in the order given, each the document `eval --format json` gives', () => {
    const files = [MISTAKES, RB, LI, DEMO];
    const r = cli('eval', ...files, '--format', 'jsonl');
    const lines = jsonl(r.out);
    expect(lines.map((l) => l.file)).toEqual(files);
    for (const l of lines) {
      expect(Object.keys(l)).toEqual(['file', 'errors', 'result']);
      expect(l.result).toEqual(JSON.parse(cli('eval', l.file, '--format', 'json').out));
    }
    // mistakes.sublevel has errors (the list in examples.test.ts): its count, and the worst exit code.
    expect(lines[0]!.errors).toBeGreaterThan(0);
    expect(lines.slice(1).map((l) => l.errors)).toEqual([0, 0, 0]);
    expect(r.code).toBe(1);
    expect(r.err).toBe('4 files evaluated: 1 with errors or not read');
  });

  it('reports a missing file in its place and evaluates the others (exit 1)', () => {
    const missing = path.join(dir, 'nope.sublevel');
    const r = cli('eval', RB, missing, LI, '--format', 'jsonl');
    const lines = jsonl(r.out);
    expect(lines.map((l) => [l.file, l.errors])).toEqual([[RB, 0], [missing, 1], [LI, 0]]);
    expect(lines[1]!.diagnostics!.map((d) => d.code)).toEqual(['file-missing']);
    expect(r.code).toBe(1);
    // In text the reports go to stdout and the problem to stderr, in the same order.
    const t = cli('eval', RB, missing, LI);
    expect(t.out.match(/^Sublevel evaluation of .*$/gm)).toEqual([`Sublevel evaluation of ${RB}`, `Sublevel evaluation of ${LI}`]);
    expect(t.out).toContain(`\n\nSublevel evaluation of ${LI}`);
    expect(t.out.split(`\n\nSublevel evaluation of ${LI}`)[0]).toBe(cli('eval', RB).out);
    expect(t.err.split('\n')[0]).toBe(`${missing}:1:1 error file-missing no such file or folder`);
    expect(t.code).toBe(1);
  });

  it('searches a folder as check does, and reads --files-from lists (CRLF and blank lines allowed)', () => {
    const folder = jsonl(cli('eval', 'examples', '--format', 'jsonl').out).map((l) => l.file);
    expect(folder).toEqual([
      'examples/coils-and-wires.sublevel',
      'examples/fit-rubidium.sublevel',
      'examples/handmade-species.sublevel',
      'examples/lithium-beam.sublevel',
      'examples/lithium-whole-term.sublevel',
      'examples/mistakes.sublevel',
      'examples/quadrupole-trap.sublevel',
      'examples/rubidium-bias.sublevel',
      'examples/rubidium-spectrum.sublevel',
      'examples/shared/alkali-levels.sublevel',
      'examples/shared-species-demo.sublevel',
      'examples/sodium-slower.sublevel',
      'examples/two-wire-magnet.sublevel',
    ]);
    expect(jsonl(cli('eval', '--files-from', list, '--format', 'jsonl').out).map((l) => l.file)).toEqual([LI, RB]);
  });

  it.each([
    [['eval', RB, LI, '--format', 'json'], /--format json is one document for one file; for several use --format jsonl/],
    [['eval', RB, '--jobs', '0'], /--jobs must be a whole number from 1 to 64, got '0'/],
    [['eval', RB, '--jobs', '2x'], /--jobs must be a whole number/],
    [['eval', '--files-from', '/nonexistent/list.txt'], /cannot read the list --files-from \/nonexistent\/list.txt/],
  ])('%j is a usage error', (argv, message) => {
    const r = cli(...argv);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(message);
  });
});

describe('sublevel eval on many files (the bundle, worker threads)', () => {
  it('gives the same bytes with two workers as with one, in input order, and reads the list from stdin', () => {
    const files = [LI, MISTAKES, RB, 'examples/nope.sublevel', DEMO, 'examples/handmade-species.sublevel'];
    const one = builtCli('eval', ...files, '--format', 'jsonl', '--jobs', '1');
    const two = builtCli('eval', ...files, '--format', 'jsonl', '--jobs', '2');
    expect(two.out).toBe(one.out);
    expect(two.code).toBe(1);
    expect(jsonl(two.out).map((l) => l.file)).toEqual(files);
    const r = spawnSync(process.execPath, ['dist/cli.js', 'eval', '--files-from', '-', '--format', 'jsonl', '--jobs', '2'], { input: files.join('\n'), encoding: 'utf8' });
    expect(r.stdout.trimEnd()).toBe(one.out);
    // stderr is a pipe here: the summary only, no progress bar.
    expect(r.stderr).toBe('6 files evaluated: 2 with errors or not read\n');
  });
});
