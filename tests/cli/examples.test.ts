import { describe, expect, it } from 'vitest';
import { cli } from './runCli';
import { PLANTED } from '../e2e/planted';

describe('sublevel check on the bundled examples', () => {
  it('reports exactly the planted mistakes in examples/mistakes.sublevel', () => {
    const r = cli('check', 'examples/mistakes.sublevel');
    expect(r.code).toBe(1);
    const found = r.out.split('\n').filter((l) => !/ info /.test(l)).map((l) => l.replace(/^examples\/mistakes\.sublevel:/, '').split(' ').slice(0, 3).join(' '));
    // The editor-host tests check the same list (tests/e2e/planted.ts): kept equal here, where a change shows at once.
    expect(PLANTED.map((p) => `${p.line}:${p.column} ${p.severity} ${p.code}`)).toEqual(found);
    expect(found).toEqual([
      '5:31 warning quadrupole-cannot-act',
      '6:23 error term-j-out-of-range',
      '7:19 error term-j-parity-of-spin',
      '12:17 error unit-wrong-dimension',
      '15:1 error syntax-unknown-statement',
      '17:20 error name-unknown',
      '18:9 error line-parity-unchanged',
      '18:9 warning line-l-zero-zero',
      '22:13 error source-turns-not-whole',
      '24:3 warning source-sense-without-spacing',
      '27:19 warning term-blank-inside',
    ]);
    expect(r.out).toContain("did you mean 'magnet'");
    expect(r.out).toContain("did you mean 'upper'");
    expect(r.out).toContain('gradient needs T/m or G/cm, got T');
  });

  it('finds the demo setups clean (no errors, no warnings; notes allowed)', () => {
    for (const f of ['lithium-beam', 'rubidium-bias', 'handmade-species', 'shared-species-demo', 'shared/alkali-levels', 'lithium-whole-term', 'fit-rubidium', 'rubidium-spectrum', 'coils-and-wires', 'sodium-slower', 'quadrupole-trap', 'two-wire-magnet']) {
      const r = cli('check', `examples/${f}.sublevel`);
      expect(r.out.split('\n').filter((l) => / (error|warning) /.test(l)), f).toEqual([]);
      expect(r.code, f).toBe(0);
    }
  });

  it('searches folders recursively and exits 1 because of the mistakes file', () => {
    const r = cli('check', 'examples');
    expect(r.code).toBe(1);
    // Seven setups and the shared species file they may use (examples/shared/).
    expect(r.err).toMatch(/^13 files checked: 7 errors, \d+ other findings/);
  });

  it('writes check results as JSON', () => {
    const r = cli('check', 'examples/mistakes.sublevel', '--format', 'json');
    const doc = JSON.parse(r.out);
    expect(doc.format).toBe('sublevel-check');
    expect(doc.files[0].diagnostics.filter((d: { severity: string }) => d.severity !== 'info')).toHaveLength(11);
    // One regime note for the level (on its name), then the quadrupole on the same line.
    expect(doc.files[0].diagnostics.slice(0, 2)).toMatchObject([
      { code: 'zeeman-not-linear', line: 5, column: 9 },
      { code: 'quadrupole-cannot-act', line: 5, column: 31 },
    ]);
    // One regime note per level it concerns: the Na23 ground level and the K39 level at the end.
    expect(doc.files[0].diagnostics.filter((d: { code: string }) => d.code.startsWith('zeeman-')).map((d: { line: number }) => d.line)).toEqual([5, 27]);
  });
});

describe('CLI usage errors exit with 2', () => {
  it.each([
    [['frobnicate'], /unknown command 'frobnicate'/],
    [['check'], /at least one file/],
    [['eval', 'examples/rubidium-bias.sublevel', '--format', 'xml'], /--format must be text, json or jsonl/],
    [['eval', 'examples/rubidium-bias.sublevel', '--bogus'], /eval has no option --bogus/],
    [['eval'], /eval needs a setup file \(or several, or a folder, or --files-from\)/],
  ])('%j', (argv, message) => {
    const r = cli(...argv);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(message);
  });

  it('prints help with exit 0', () => {
    const r = cli('help');
    expect(r.code).toBe(0);
    expect(r.out).toContain('usage: sublevel');
  });
});
