/**
 * `sublevel check --format sarif`, validated against the OASIS SARIF 2.1.0 JSON schema as shipped
 * by the npm package @microsoft/jest-sarif (lib/schemas/sarif-2.1.0-rtm.5.json, a draft-04
 * schema, hence ajv-draft-04 with ajv-formats for the uri and date-time formats).
 */
import * as fs from 'fs';
import * as os from 'os';
import * as path from 'path';
import { pathToFileURL } from 'url';
import Ajv from 'ajv-draft-04';
import addFormats from 'ajv-formats';
import type * as Sarif from 'sarif';
import { describe, expect, it } from 'vitest';
import { version } from '../../package.json';
import { analyze } from '../../server/src/eval/analyze';
import { sarifLog } from '../../server/src/cli/sarif/sarifLog';
import { ruleCatalogue } from '../../server/src/cli/sarif/ruleCatalogue';
import { findSetupFiles } from '../../server/src/cli/files';
import { nodeFileSystem } from '../../server/src/cli/fileSystem';
import { cli } from './runCli';

const schema = JSON.parse(fs.readFileSync(require.resolve('@microsoft/jest-sarif/lib/schemas/sarif-2.1.0-rtm.5.json'), 'utf8'));
// unicodeRegExp off: the schema's `language` pattern has a stray `]` that only non-unicode regular expressions accept.
const ajv = new Ajv({ allErrors: true, strict: false, unicodeRegExp: false });
addFormats(ajv);
const validate = ajv.compile(schema);

function sarifOf(...args: string[]): { code: number; log: Sarif.Log } {
  const r = cli('check', '--format', 'sarif', ...args);
  return { code: r.code, log: JSON.parse(r.out) as Sarif.Log };
}

function expectValid(log: unknown, what: string): void {
  const ok = validate(log);
  expect(ok ? [] : validate.errors, what).toEqual([]);
}

describe('check --format sarif', () => {
  it('every example validates against the SARIF 2.1.0 schema', () => {
    const files = findSetupFiles(['examples'], nodeFileSystem).map((f) => f.path);
    expect(files.length).toBeGreaterThanOrEqual(6);
    for (const f of files) expectValid(sarifOf(f).log, f);
    expectValid(sarifOf('examples').log, 'examples/');
  });

  it('the schema check can fail: a log without a version is refused', () => {
    const { log } = sarifOf('examples/lithium-beam.sublevel');
    expect(validate({ ...log, version: undefined })).toBe(false);
    expect(validate({ ...log, runs: [{ ...log.runs[0], columnKind: 'characters' }] })).toBe(false);
  });

  it('pins the log of examples/mistakes.sublevel (golden file; root and version as placeholders)', () => {
    const { code, log } = sarifOf('examples/mistakes.sublevel', '--root', 'examples');
    expect(code).toBe(1);
    const run = log.runs[0]!;
    expect(run.tool.driver.version).toBe(version);
    expect(run.originalUriBaseIds).toEqual({ SRCROOT: { uri: pathToFileURL(path.resolve('examples')).href + '/' } });
    const text = JSON.stringify(log, null, 2).split(version).join('<version>').split(pathToFileURL(path.resolve('examples')).href).join('<root>');
    const golden = 'tests/fixtures/sarif/mistakes.sarif.json';
    if (process.env['UPDATE_GOLDEN'] === '1') fs.writeFileSync(golden, text + '\n');
    expect(text + '\n').toBe(fs.readFileSync(golden, 'utf8'));
  });

  it('one rule per code of every registry, each with descriptions, help and a default level', () => {
    const { log } = sarifOf('examples/lithium-beam.sublevel');
    const rules = log.runs[0]!.tool.driver.rules!;
    expect(rules.map((r) => r.id)).toEqual(ruleCatalogue().map((r) => r.id));
    for (const id of ['syntax-unknown-statement', 'unit-wrong-dimension', 'name-unknown', 'beam-unresolved', 'term-j-out-of-range', 'line-delta-j', 'file-missing', 'internal-error']) {
      expect(rules.some((r) => r.id === id), id).toBe(true);
    }
    for (const r of rules) {
      expect(r.shortDescription?.text, r.id).toMatch(/\S/);
      expect(r.fullDescription?.text, r.id).toContain('default severity');
      expect(r.help?.text, r.id).toMatch(/\S/);
      expect(['error', 'warning', 'note'], r.id).toContain(r.defaultConfiguration?.level);
    }
    const byId = new Map(rules.map((r) => [r.id, r]));
    expect(byId.get('beam-unresolved')!.defaultConfiguration!.level).toBe('warning');
    expect(byId.get('zeeman-not-linear')!.defaultConfiguration!.level).toBe('note');
    expect(byId.get('syntax-missing-equals')!.defaultConfiguration!.level).toBe('error');
  });

  it('results point at exact 1-based regions, by rule id and index', () => {
    const { log } = sarifOf('examples/mistakes.sublevel');
    const run = log.runs[0]!;
    const unit = run.results!.find((r) => r.ruleId === 'unit-wrong-dimension')!;
    expect(run.tool.driver.rules![unit.ruleIndex!]!.id).toBe('unit-wrong-dimension');
    expect(unit.level).toBe('error');
    // `  gradient = 3.2 T` on line 12: the value starts at column 17 (check's text output says 12:17).
    expect(unit.locations![0]!.physicalLocation!.region).toMatchObject({ startLine: 12, startColumn: 17, endLine: 12 });
    expect(unit.locations![0]!.physicalLocation!.artifactLocation).toEqual({ uri: 'examples/mistakes.sublevel', uriBaseId: 'SRCROOT' });
    expect(run.columnKind).toBe('utf16CodeUnits');
  });

  it('counts columns in UTF-16 code units (a character outside the BMP is two)', () => {
    const text = 'field \u{1D510} = 5 T/m\n';
    const a = analyze(text);
    const log = sarifLog([{ path: 'astral.sublevel', problems: a.problems }], { toolVersion: '0', root: '/repo', cwd: '/repo' });
    const r = log.runs[0]!.results!.find((x) => x.ruleId === 'unit-wrong-dimension')!;
    // "field " is 6 units, the letter 2, " = 5 " 5: the unit T/m starts at offset 13, column 14 (13 in code points).
    expect(r.locations![0]!.physicalLocation!.region).toEqual({ startLine: 1, startColumn: 14, endLine: 1, endColumn: 17 });
  });

  it('paths outside the root are absolute file URIs; names are percent-encoded', () => {
    const settings = { toolVersion: '0', root: '/repo', cwd: '/repo/sub' };
    const p = { code: 'file-missing', severity: 'error' as const, message: 'x', range: { start: { line: 0, character: 0 }, end: { line: 0, character: 0 } } };
    const log = sarifLog([{ path: 'a b#.sublevel', problems: [p] }, { path: '/elsewhere/c.sublevel', problems: [p] }], settings);
    const uris = log.runs[0]!.results!.map((r) => r.locations![0]!.physicalLocation!.artifactLocation);
    expect(uris).toEqual([{ uri: 'sub/a%20b%23.sublevel', uriBaseId: 'SRCROOT' }, { uri: 'file:///elsewhere/c.sublevel' }]);
  });

  it('a related place in a used file points at that file', () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'sublevel-sarif-'));
    fs.writeFileSync(path.join(dir, 'shared.sublevel'), 'species Li7\n  level ground: 2s 2S1/2\n');
    fs.writeFileSync(path.join(dir, 'main.sublevel'), 'use "shared.sublevel"\nspecies Li7\n  level ground: 2s 2S1/2\n');
    const { log } = sarifOf(path.join(dir, 'main.sublevel'), '--root', dir);
    expectValid(log, 'use');
    const related = log.runs[0]!.results!.flatMap((r) => r.relatedLocations ?? []).map((l) => l.physicalLocation!.artifactLocation!.uri);
    expect(related).toContain('shared.sublevel');
    fs.rmSync(dir, { recursive: true, force: true });
  });

  it('paths are relative to the git work tree holding the current folder', () => {
    const { log } = sarifOf('examples/lithium-beam.sublevel');
    const top = path.resolve(require('child_process').execFileSync('git', ['rev-parse', '--show-toplevel'], { encoding: 'utf8' }).trim());
    expect(log.runs[0]!.originalUriBaseIds!['SRCROOT']!.uri).toBe(pathToFileURL(top).href + '/');
  });
});
