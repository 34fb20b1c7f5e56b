/** `check --fail-on` and `--quiet`: the exit rule and which findings are printed. */
import { describe, expect, it } from 'vitest';
import { cli } from './runCli';

const CLEAN = 'examples/lithium-beam.sublevel'; // three notes (info), no warning, no error
const MISTAKES = 'examples/mistakes.sublevel'; // 7 errors, 4 warnings, notes

describe('check --fail-on', () => {
  it('defaults to error: notes and warnings alone exit 0, as before the option', () => {
    expect(cli('check', CLEAN).code).toBe(0);
    expect(cli('check', CLEAN, '--fail-on', 'error').code).toBe(0);
    expect(cli('check', MISTAKES).code).toBe(1);
  });

  it('fails on notes with --fail-on info, and not on them with --fail-on warning', () => {
    expect(cli('check', CLEAN, '--fail-on', 'warning').code).toBe(0);
    expect(cli('check', CLEAN, '--fail-on', 'info').code).toBe(1);
    expect(cli('check', CLEAN, '--fail-on', 'info', '--format', 'sarif').code).toBe(1);
  });

  it('refuses an unknown level as a usage error', () => {
    const r = cli('check', CLEAN, '--fail-on', 'hint');
    expect(r.code).toBe(2);
    expect(r.err).toContain("--fail-on must be error, warning or info, got 'hint'");
  });
});

describe('check --quiet', () => {
  it('prints only the findings at or above the threshold and no summary line', () => {
    const r = cli('check', MISTAKES, '--quiet', '--fail-on', 'warning');
    expect(r.code).toBe(1);
    expect(r.err).toBe('');
    const severities = r.out.split('\n').map((l) => l.split(' ')[1]);
    expect(severities.filter((s) => s === 'error')).toHaveLength(7);
    expect(severities.filter((s) => s === 'warning')).toHaveLength(4);
    expect(severities).toHaveLength(11);
  });

  it('prints nothing at all for a clean file at the default threshold', () => {
    const r = cli('check', CLEAN, '--quiet');
    expect(r).toEqual({ code: 0, out: '', err: '' });
  });

  it('leaves the same findings out of JSON', () => {
    const r = cli('check', CLEAN, '--quiet', '--format', 'json');
    expect(JSON.parse(r.out).files[0].diagnostics).toEqual([]);
    const all = cli('check', CLEAN, '--format', 'json');
    expect(JSON.parse(all.out).files[0].diagnostics).toHaveLength(3);
  });
});

describe('eval --fail-on', () => {
  it('still prints the report, and exits 1 on notes with --fail-on info', () => {
    const r = cli('eval', CLEAN, '--fail-on', 'info');
    expect(r.code).toBe(1);
    expect(r.out).toContain('selector');
    expect(cli('eval', CLEAN).code).toBe(0);
  });
});
