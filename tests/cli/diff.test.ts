/**
 * `sublevel diff` on version pairs of invented setups (tests/fixtures/diff/): each pair reports
 * exactly the physical changes its edit causes. Expected values: the changed inputs are the edits
 * themselves; the consequences (peak positions, dips, energies) are the engine's, already checked
 * against outside references in tests/physics and tests/eval — here the point is which changes are
 * reported and that nothing else is.
 */
import { execFileSync } from 'child_process';
import * as fs from 'fs';
import * as os from 'os';
import * as path from 'path';
import Ajv2020 from 'ajv/dist/2020';
import { describe, expect, it } from 'vitest';
import schema from '../../docs/schema/diff.schema.json';
import type { SetupDiff } from '../../server/src/diff/diffTypes';
import { cli } from './runCli';

const F = 'tests/fixtures/diff';

const validate = new Ajv2020({ allErrors: true, strict: true, allowUnionTypes: true }).compile(schema);

/** The JSON document, checked against docs/schema/diff.schema.json on every call. */
function diffJson(...args: string[]): { code: number; diff: SetupDiff } {
  const r = cli('diff', '--format', 'json', ...args);
  const diff = JSON.parse(r.out) as SetupDiff;
  expect(validate(diff) ? [] : validate.errors).toEqual([]);
  return { code: r.code, diff };
}

/** Every reported item as one short line: the whole report, to compare exactly. */
function reported(diff: SetupDiff): string[] {
  return diff.things.flatMap((t) => [
    ...(t.status !== 'changed' ? [`${t.kind} ${t.name}: ${t.status}`] : []),
    ...t.changes.map((c) => `${t.kind} ${t.name}: ${c.quantity}${c.subject ? ` [${c.subject}]` : ''}${c.at ? ` at ${c.at}` : ''}: ${c.old} → ${c.new}`),
    ...t.new_diagnostics.map((d) => `${t.kind} ${t.name}: new ${d.severity} ${d.code}`),
    ...t.gone_diagnostics.map((d) => `${t.kind} ${t.name}: gone ${d.severity} ${d.code}`),
  ]);
}

const HIGH_PEAK = 'F=2, m_F=-1 + F=2, m_F=0 + F=2, m_F=+2 + F=2, m_F=+1';
const LOW_PEAK = 'F=1, m_F=-1 + F=2, m_F=-2 + F=1, m_F=0 + F=1, m_F=+1';

describe('sublevel diff: version pairs', () => {
  it('a weaker gradient: the peaks move in and stop being resolved', () => {
    const { code, diff } = diffJson(`${F}/beam-old.sublevel`, `${F}/beam-weak-gradient.sublevel`);
    expect(code).toBe(1);
    expect(reported(diff)).toEqual([
      'magnet selector: gradient: 18 T/m → 10 T/m',
      'magnet selector: new warning beam-unresolved',
      'beam main: all peaks resolved: yes → no',
      `beam main: peak position [${HIGH_PEAK}]: -111.7 µm → -71.56 µm`,
      `beam main: peak position [${LOW_PEAK}]: 111.7 µm → 71.56 µm`,
      `beam main: resolved [${HIGH_PEAK} | ${LOW_PEAK}]: yes → no`,
    ]);
    const peak = diff.things[1]!.changes.find((c) => c.quantity === 'peak position')!;
    expect(peak).toMatchObject({ change: '+40.16 µm', unit: 'm' });
    expect(peak.new_value as number).toBeCloseTo(-71.56e-6, 8);
  });

  it('one merged peak → two peaks, unresolved → resolved: the peak splits, and only the last step resolves', () => {
    // 1 T/m: all eight sublevels in one peak (not resolved); 10 T/m: two peaks that overlap; 18 T/m: resolved.
    const split = diffJson(`${F}/beam-one-peak.sublevel`, `${F}/beam-weak-gradient.sublevel`);
    expect(reported(split.diff)).toEqual([
      'magnet selector: gradient: 1 T/m → 10 T/m',
      'magnet selector: new warning beam-unresolved',
      `beam main: peak [${HIGH_PEAK} + ${LOW_PEAK}]: present → gone`,
      `beam main: peak [${HIGH_PEAK}]: absent → new`,
      `beam main: peak [${LOW_PEAK}]: absent → new`,
      'beam main: gone warning beam-one-peak',
    ]);
    const resolved = diffJson(`${F}/beam-weak-gradient.sublevel`, `${F}/beam-old.sublevel`);
    expect(reported(resolved.diff)).toContain('beam main: all peaks resolved: no → yes');
    const whole = diffJson(`${F}/beam-one-peak.sublevel`, `${F}/beam-old.sublevel`);
    expect(reported(whole.diff)).toEqual([
      'magnet selector: gradient: 1 T/m → 18 T/m',
      'beam main: all peaks resolved: no → yes',
      `beam main: peak [${HIGH_PEAK} + ${LOW_PEAK}]: present → gone`,
      `beam main: peak [${HIGH_PEAK}]: absent → new`,
      `beam main: peak [${LOW_PEAK}]: absent → new`,
      'beam main: gone warning beam-one-peak',
    ]);
  });

  it("a level's A changed: its interval, energies and the clock resonance move; g-factors and moments beyond 1e-4 μ_B do not", () => {
    const { code, diff } = diffJson(`${F}/hydrogen-old.sublevel`, `${F}/hydrogen-A-changed.sublevel`);
    expect(code).toBe(1);
    expect(reported(diff)).toEqual([
      'level H.ground: A: 1.420406 GHz → 1.42 GHz',
      'level H.ground: hyperfine interval [F=0–1]: 1.420406 GHz → 1.42 GHz',
      'level H.ground: energy [F=0, m_F=0] at field bias: -1.06531 GHz → -1.065006 GHz',
      'level H.ground: energy [F=1, m_F=-1] at field bias: 352.3033 MHz → 352.2018 MHz',
      'level H.ground: energy [F=1, m_F=0] at field bias: 355.107 MHz → 355.0055 MHz',
      'level H.ground: energy [F=1, m_F=+1] at field bias: 357.8996 MHz → 357.7982 MHz',
      'resonance hfs: frequency [F=0, m_F=0 → F=1, m_F=0 (pi)] at field bias: 1.420417 GHz → 1.420011 GHz',
      'resonance hfs: frequency [field-insensitive point #1]: 1.420406 GHz → 1.42 GHz',
    ].map((l) => l.replace('point #1', 'point')));
    // The interval of a J = 1/2 level is A(I + 1/2) = A for I = 1/2 (hyperfine interval rule, textbook).
    const a = diff.things[0]!.changes[0]!;
    expect((a.new_value as number) - (a.old_value as number)).toBeCloseTo(-405752, 0);
    // The F = 1 centroid sits at +A/4 and F = 0 at −3A/4 (textbook): their shifts are ΔA/4 and −3ΔA/4.
    const energy = (label: string) => diff.things[0]!.changes.find((c) => c.subject === label)!;
    const shift = (label: string) => (energy(label).new_value as number) - (energy(label).old_value as number);
    expect(shift('F=1, m_F=+1') / -405752).toBeCloseTo(0.25, 3);
    expect(shift('F=0, m_F=0') / -405752).toBeCloseTo(-0.75, 2);
  });

  it('a line written the other way round: only the emission flag and its note', () => {
    const { code, diff } = diffJson(`${F}/beam-old.sublevel`, `${F}/beam-line-reversed.sublevel`);
    expect(code).toBe(1);
    expect(reported(diff)).toEqual(['line D2: written as emission: no → yes', 'line D2: new info line-written-as-emission']);
  });

  it('identical files, and the same setup with blocks moved and units respelled, report no change', () => {
    // beam-moved has the same notes as beam-old on other lines: diagnostics match by code and thing, not by line.
    for (const other of ['beam-old', 'beam-moved']) {
      const { code, diff } = diffJson(`${F}/beam-old.sublevel`, `${F}/${other}.sublevel`);
      expect(reported(diff), other).toEqual([]);
      expect(diff.changed).toBe(false);
      expect(code).toBe(0);
      expect(validate({ ...diff, version: 2 })).toBe(false);
    }
    const text = cli('diff', `${F}/beam-old.sublevel`, `${F}/beam-moved.sublevel`);
    expect(text.out.split('\n')).toEqual([`--- ${F}/beam-old.sublevel`, `+++ ${F}/beam-moved.sublevel`, 'No physical change.']);
  });

  it('a file that became invalid reports its new error and what it can no longer compute', () => {
    const { code, diff } = diffJson(`${F}/beam-old.sublevel`, `${F}/beam-invalid.sublevel`);
    expect(code).toBe(1);
    expect(reported(diff)).toEqual([
      'magnet selector: gradient: 18 T/m → —',
      'magnet selector: new error unit-wrong-dimension',
      'beam main: computed: yes → no',
      'beam main: all peaks resolved: yes → —',
      `beam main: peak [${HIGH_PEAK}]: present → gone`,
      `beam main: peak [${LOW_PEAK}]: present → gone`,
    ]);
    expect(diff.things[0]!.new_diagnostics[0]).toMatchObject({ line: 10, column: 17, message: 'gradient needs T/m or G/cm, got T.' });
    // The other way round the error is gone.
    expect(reported(diffJson(`${F}/beam-invalid.sublevel`, `${F}/beam-old.sublevel`).diff)).toContain('magnet selector: gone error unit-wrong-dimension');
  });
});

describe('sublevel diff: fits and spectra', () => {
  // Expected: the edits are the changed inputs; the fitted values, χ², roots and widths are the
  // fit and line-shape code's own (checked against outside references in tests/physics, tests/eval).
  it('a moved resonance point: χ² jumps and the fit warns; g_J and A move by less than their thresholds', () => {
    const { code, diff } = diffJson(`${F}/fit-old.sublevel`, `${F}/fit-point-moved.sublevel`);
    expect(code).toBe(1);
    expect(reported(diff)).toEqual(['fit constants: χ²: 8.2837 → 61.037', 'fit constants: new warning fit-chi2-high']);
    expect(diff.things[0]!.changes[0]).toMatchObject({ unit: '', change: '+52.754' });
  });

  it('with finer thresholds the fitted values show, each to the digits its threshold resolves', () => {
    const { diff } = diffJson(`${F}/fit-old.sublevel`, `${F}/fit-point-moved.sublevel`, '--frequency-threshold', '10Hz', '--g-threshold', '1e-9');
    expect(reported(diff)).toEqual([
      'fit constants: value [g_J]: 2.0023312572 → 2.0023317042',
      'fit constants: value [A]: 3417.341361 MHz → 3417.341491 MHz',
      'fit constants: χ²: 8.2837 → 61.037',
      'fit constants: new warning fit-chi2-high',
    ]);
    expect(diff.things[0]!.changes[1]).toMatchObject({ change: '+0.00013 MHz', unit: 'Hz' });
  });

  it('a more precise clock point: both fields of the calibration move and their uncertainties shrink, in the unit the range was written in', () => {
    const { diff } = diffJson(`${F}/fit-old.sublevel`, `${F}/fit-clock-moved.sublevel`);
    expect(reported(diff)).toEqual([
      'fit bias: field [root 1]: 2.1454 G → 2.1138 G',
      'fit bias: field uncertainty [root 1]: 0.00535 G → 0.00208 G',
      'fit bias: field [root 2]: 4.3124 G → 4.3441 G',
      'fit bias: field uncertainty [root 2]: 0.00535 G → 0.00208 G',
    ]);
  });

  it('a hotter vapour and a laser width: the spectrum widens and its highest peak moves', () => {
    const { diff } = diffJson(`${F}/spectrum-old.sublevel`, `${F}/spectrum-hotter.sublevel`);
    expect(reported(diff)).toEqual([
      // Peaks refined between the samples (30.6 MHz apart here; physics/lineshape/spectrumPeak.ts).
      'line L: spectrum peak offset at field coil: -1.286831 GHz → -936.9132 MHz',
      'line L: Voigt FWHM at field coil: 2.96257 GHz → 3.420398 GHz',
      'line L: Doppler FWHM at field coil: 2.959429 GHz → 3.417254 GHz',
      'line L: instrument FWHM at field coil: — → 5 MHz',
    ]);
    // Doppler FWHM ∝ √T (textbook): 2.959429 GHz × √(800/600).
    expect(diff.things[0]!.changes[2]!.new_value as number).toBeCloseTo(2.959429e9 * Math.sqrt(800 / 600), -3);
  });

  it('the same line seen along the field: the view changes and the highest peak is another component', () => {
    const { diff } = diffJson(`${F}/spectrum-old.sublevel`, `${F}/spectrum-along.sublevel`);
    expect(reported(diff)).toEqual(['line L: spectrum viewed at field coil: across → along', 'line L: spectrum peak offset at field coil: -1.286831 GHz → 4.284911 GHz']);
  });

  it('a spectrum added to a line is reported as new', () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'sl-diff-spectrum-'));
    const plain = path.join(dir, 'plain.sublevel');
    fs.writeFileSync(plain, fs.readFileSync(`${F}/spectrum-old.sublevel`, 'utf8').replace(/  spectrum = across\n  doppler  = 600 K\n/, ''));
    const { diff } = diffJson(plain, `${F}/spectrum-old.sublevel`);
    expect(reported(diff)).toEqual(['line L: spectrum [spectrum] at field coil: absent → new']);
    fs.rmSync(dir, { recursive: true, force: true });
  });
});

describe('sublevel diff: thresholds, formats, exit codes', () => {
  const H = [`${F}/hydrogen-old.sublevel`, `${F}/hydrogen-A-changed.sublevel`];

  it('reports only changes beyond --frequency-threshold', () => {
    expect(diffJson(...H, '--frequency-threshold', '500 kHz')).toMatchObject({ code: 0, diff: { changed: false, things: [] } });
    const { diff } = diffJson(...H, '--frequency-threshold', '200kHz');
    expect(reported(diff).map((l) => l.split(':').slice(0, 2).join(':'))).toEqual([
      'level H.ground: A',
      'level H.ground: hyperfine interval [F=0–1]',
      'level H.ground: energy [F=0, m_F=0] at field bias',
      'resonance hfs: frequency [F=0, m_F=0 → F=1, m_F=0 (pi)] at field bias',
      'resonance hfs: frequency [field-insensitive point]',
    ]);
    expect(diff.thresholds.frequency_Hz).toBe(200e3);
  });

  it('refuses a threshold of the wrong kind or below zero', () => {
    expect(cli('diff', ...H, '--frequency-threshold', '1 T').code).toBe(2);
    const r = cli('diff', ...H, '--g-threshold', '-1');
    expect(r.code).toBe(2);
    expect(r.err).toContain("--g-threshold must be a number ≥ 0, got '-1'");
  });

  it('writes Markdown for a review comment, with the pipes of labels escaped', () => {
    const r = cli('diff', `${F}/beam-old.sublevel`, `${F}/beam-weak-gradient.sublevel`, '--format', 'markdown');
    const lines = r.out.split('\n');
    expect(lines[0]).toBe(`### Physics diff: \`${F}/beam-old.sublevel\` → \`${F}/beam-weak-gradient.sublevel\``);
    expect(lines).toContain('| gradient | 18 T/m | 10 T/m | -8 T/m |');
    expect(lines).toContain(`| resolved ${HIGH_PEAK} \\| ${LOW_PEAK} | yes | no |  |`);
    expect(lines.filter((l) => l.startsWith('- new: warning beam-unresolved (line 10)'))).toHaveLength(1);
  });

  it('--quiet prints nothing and keeps the exit code', () => {
    expect(cli('diff', ...H, '--quiet')).toEqual({ code: 1, out: '', err: '' });
  });

  it('exit 2 for a usage error or a file that cannot be read', () => {
    expect(cli('diff', H[0]!).code).toBe(2);
    const r = cli('diff', H[0]!, `${F}/no-such.sublevel`);
    expect(r.code).toBe(2);
    expect(r.err).toBe(`${F}/no-such.sublevel:1:1 error file-missing no such file or folder`);
  });
});

describe('sublevel diff with git', () => {
  function repoWith(text: string): string {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'sublevel-diff-git-'));
    const git = (...a: string[]) => execFileSync('git', ['-c', 'user.name=Test', '-c', 'user.email=test@example.invalid', ...a], { cwd: dir, encoding: 'utf8' });
    git('init', '-q');
    fs.writeFileSync(path.join(dir, 'setup.sublevel'), text);
    git('add', 'setup.sublevel');
    git('commit', '-q', '-m', 'first');
    return dir;
  }
  const oldText = fs.readFileSync(`${F}/beam-old.sublevel`, 'utf8');
  const newText = fs.readFileSync(`${F}/beam-weak-gradient.sublevel`, 'utf8');

  it('--git REV reads the old version with git show', () => {
    const dir = repoWith(oldText);
    fs.writeFileSync(path.join(dir, 'setup.sublevel'), newText);
    const file = path.join(dir, 'setup.sublevel');
    const { code, diff } = diffJson('--git', 'HEAD', file);
    expect(code).toBe(1);
    expect(diff.old).toBe(`${file} at HEAD`);
    expect(reported(diff)[0]).toBe('magnet selector: gradient: 18 T/m → 10 T/m');
    const bad = cli('diff', '--git', 'no-such-rev', file);
    expect(bad.code).toBe(2);
    expect(bad.err).toContain('git cannot show');
    // A revision that looks like an option is refused before git sees it.
    expect(cli('diff', '--git=--output=x', file).code).toBe(2);
    fs.rmSync(dir, { recursive: true, force: true });
  });

  it('works as the external diff driver of `git diff` for *.sublevel (built CLI, run `node esbuild.mjs` first)', () => {
    const dir = repoWith(oldText);
    fs.writeFileSync(path.join(dir, '.gitattributes'), '*.sublevel diff=sublevel\n');
    execFileSync('git', ['config', 'diff.sublevel.command', `"${process.execPath}" "${path.resolve('dist/cli.js')}" diff --git-driver`], { cwd: dir });
    fs.writeFileSync(path.join(dir, 'setup.sublevel'), newText);
    const out = execFileSync('git', ['diff'], { cwd: dir, encoding: 'utf8' });
    expect(out.split('\n').slice(0, 4)).toEqual(['--- a/setup.sublevel', '+++ b/setup.sublevel', 'magnet selector', '  gradient: 18 T/m → 10 T/m (-8 T/m)']);
    // A new file: git passes /dev/null for the old side.
    fs.writeFileSync(path.join(dir, 'second.sublevel'), 'field bias = 5 G\n');
    execFileSync('git', ['add', '-N', 'second.sublevel'], { cwd: dir });
    const added = execFileSync('git', ['diff', '--', 'second.sublevel'], { cwd: dir, encoding: 'utf8' });
    expect(added.split('\n').slice(0, 4)).toEqual(['--- a/second.sublevel', '+++ b/second.sublevel', 'field bias (new)', '1 thing changed.']);
    fs.rmSync(dir, { recursive: true, force: true });
  });
});
