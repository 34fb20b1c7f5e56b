/**
 * The CLI on setups that use other files: the bundled shared-species demo (clean, evaluated,
 * JSON valid), and a folder with a broken used file whose errors are reported once.
 */
import Ajv2020 from 'ajv/dist/2020';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'fs';
import { tmpdir } from 'os';
import path from 'path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cli } from './runCli';

const DEMO = 'examples/shared-species-demo.sublevel';

describe('sublevel on the shared-species demo', () => {
  it('checks clean: no errors, no warnings', () => {
    const r = cli('check', DEMO);
    expect(r.code).toBe(0);
    expect(r.out.split('\n').filter((l) => / (error|warning) /.test(l))).toEqual([]);
    expect(r.err).toMatch(/^1 file checked: 0 errors/);
  });

  it('evaluates the used species, says where they are defined, and validates against the schema', () => {
    const r = cli('eval', DEMO, '--format', 'json');
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.out);
    const validate = new Ajv2020({ allErrors: true, strict: true }).compile(JSON.parse(readFileSync('docs/schema/evaluation.schema.json', 'utf8')));
    expect(validate(doc), JSON.stringify(validate.errors)).toBe(true);
    expect(doc.species.map((s: { name: string; defined_in?: string }) => [s.name, s.defined_in])).toEqual([
      ['K39', 'shared/alkali-levels.sublevel'],
      ['Na23', 'shared/alkali-levels.sublevel'],
    ]);
    const ground = doc.levels.find((l: { species: string; level: string }) => l.species === 'K39' && l.level === 'ground');
    // 39K ground-state hyperfine splitting 461.719 720 2 MHz (Tiecke's potassium data compilation, the built-in table's source).
    expect(ground.hyperfine.intervals[0].interval_Hz).toBeCloseTo(461.7197202e6, 0);
    expect(doc.lines.map((l: { name: string }) => l.name)).toEqual(['D1', 'D2']);
  });

  it('prints the origin in the text report', () => {
    expect(cli('eval', DEMO).out).toContain('species K39 (defined in shared/alkali-levels.sublevel, built-in data)');
  });
});

describe('sublevel check on a folder with a broken used file', () => {
  let dir = '';
  beforeAll(() => {
    dir = mkdtempSync(path.join(tmpdir(), 'sublevel-use-'));
    mkdirSync(path.join(dir, 'atoms'));
    writeFileSync(path.join(dir, 'atoms', 'broken.sublevel'), 'species K39\n  level ground: 4s 2S1/2\n  level p: 4p 2P°5/2\n');
    writeFileSync(path.join(dir, 'setup.sublevel'), 'use "atoms/broken.sublevel"\nfield bias = 1 G\nline L: ground -> p\n');
    writeFileSync(path.join(dir, 'typo.sublevel'), 'use "atoms/brokn.sublevel"\n');
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('checked alone, the using file warns at its use line', () => {
    const r = cli('check', path.join(dir, 'setup.sublevel'));
    const found = r.out.split('\n').filter((l) => !/ info /.test(l)).map((l) => l.slice(dir.length + 1));
    expect(found[0]).toMatch(/^setup\.sublevel:1:1 warning use-has-errors atoms\/broken\.sublevel has 1 error; first: line 3: J = 5\/2/);
    expect(found).toHaveLength(1);
    expect(r.code).toBe(0);
  });

  it('checked with the folder, the error is reported once, in the used file', () => {
    const r = cli('check', dir);
    const found = r.out.split('\n').filter((l) => !/ info /.test(l)).map((l) => l.slice(dir.length + 1).split(' ').slice(0, 3).join(' '));
    expect(found).toEqual([
      `${path.join('atoms', 'broken.sublevel')}:3:18 error term-j-out-of-range`,
      'typo.sublevel:1:6 error use-file-missing',
    ]);
    expect(r.out).toContain("cannot read atoms/brokn.sublevel: no such file — did you mean 'atoms/broken.sublevel'?");
    expect(r.err).toMatch(/^3 files checked: 2 errors/);
  });
});
