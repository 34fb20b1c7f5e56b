/**
 * Text from a setup file never reaches the terminal raw: control characters (an escape code that
 * erases the previous line), C1 controls and bidi controls are printed as visible escapes in
 * every text output, and JSON stays valid JSON with the same strings.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'fs';
import { tmpdir } from 'os';
import path from 'path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { escapeControls, jsonText } from '../../server/src/cli/escape';
import { builtCli, cli } from './runCli';

const RAW = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/;
const NAME = 'b\u001b[2K\u009b31m\u202Eo';
const SETUP = `species X\n  mass = 40 u\n  level g: 2S1/2\nfield ${NAME} = 1 T\nline L: g -> gg\n`;

describe('escapeControls and jsonText', () => {
  it('make controls visible and leave ordinary text alone', () => {
    expect(escapeControls('a\u001b[2Kb\tc\nd\re\u0000\u009b\u202e\u2069 °→²P₃/₂')).toBe('a\\x1b[2Kb\tc\nd\\x0de\\x00\\x9b\\u202e\\u2069 °→²P₃/₂');
  });

  it('JSON keeps its meaning: parsing gives back the original string', () => {
    const text = jsonText({ name: NAME });
    expect(text).not.toMatch(RAW);
    expect(JSON.parse(text)).toEqual({ name: NAME });
  });
});

describe('the CLI on a file with escape codes in a name', () => {
  let dir = '';
  let file = '';
  beforeAll(() => {
    dir = mkdtempSync(path.join(tmpdir(), 'sublevel-esc-'));
    file = path.join(dir, 'esc.sublevel');
    writeFileSync(file, SETUP);
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('eval text report, check lines and the summary carry no raw control character', () => {
    for (const r of [cli('eval', file), cli('check', file)]) {
      expect(r.out + r.err).not.toMatch(RAW);
    }
    expect(cli('eval', file).out).toContain('at field b\\x1b[2K\\x9b31m\\u202eo = 1 T');
    expect(cli('check', file).out).toContain(':4:8 warning text-control-character');
  });

  it('eval and check JSON parse back to the exact name', () => {
    const doc = JSON.parse(cli('eval', file, '--format', 'json').out);
    expect(doc.fields[0].name).toBe(NAME);
    const check = cli('check', file, '--format', 'json');
    expect(check.out).not.toMatch(RAW);
    expect(JSON.parse(check.out).files[0].diagnostics.map((d: { code: string }) => d.code)).toContain('text-bidi-control');
  });

  it('error messages that repeat a name or an argument escape it', () => {
    const r = cli('render', file, '--field', 'x\u001b[2K');
    expect(r.code).toBe(2);
    expect(r.err).toContain("no field named 'x\\x1b[2K'");
    expect(r.err).not.toMatch(RAW);
    const u = cli('\u001b]0;title\u0007');
    expect(u.err).toContain("unknown command '\\x1b]0;title\\x07'");
  });

  it('files written with --out are escaped the same way', () => {
    const out = path.join(dir, 'levels.csv');
    expect(cli('render', file, '--format', 'csv', '--out', out).code).toBe(1); // the line names an unknown level
    expect(readFileSync(out, 'utf8')).not.toMatch(RAW);
  });

  it('the bundled command writes no raw escape to the terminal', () => {
    const r = builtCli('eval', file);
    expect(r.out).toContain('b\\x1b[2K');
    expect(r.out + r.err).not.toMatch(RAW);
  });
});
