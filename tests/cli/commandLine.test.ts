/**
 * The command line itself: --help for every command, --version, strict options, and exit codes
 * that follow the README (0 no errors, 1 an error in a file, 2 usage error, 3 internal error),
 * with file problems as file:line:col lines instead of the usage text.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'fs';
import { tmpdir } from 'os';
import path from 'path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { EXIT_CODES_TEXT } from '../../server/src/cli/help';
import { builtCli, cli } from './runCli';

const RB = 'examples/rubidium-bias.sublevel';
const LI = 'examples/lithium-beam.sublevel';
const COMMANDS = ['check', 'eval', 'sweep', 'profile', 'render'];

describe('help and version', () => {
  it.each(COMMANDS)('sublevel %s --help (and -h) prints its own usage and options, exit 0', (command) => {
    for (const flag of ['--help', '-h']) {
      const r = cli(command, flag);
      expect(r.code).toBe(0);
      expect(r.out.split('\n')[0]).toMatch(new RegExp(`^usage: sublevel ${command} `));
      expect(r.out).toContain('-h, --help');
      expect(r.out).toMatch(/\nexit codes: 0 no errors \(warnings and notes allowed(; see --fail-on)?\), 1 an error in a setup file/);
    }
  });

  it('each help page gives only its own exit codes: --fail-on, --out and diff(1) codes where they apply', () => {
    const last = (...argv: string[]) => cli(...argv).out.trimEnd().split('\n').pop();
    expect(last('check', '--help')).toBe('exit codes: 0 no errors (warnings and notes allowed; see --fail-on), 1 an error in a setup file or a file that cannot be read, 2 usage error, 3 internal error');
    expect(last('sweep', '--help')).toBe('exit codes: 0 no errors (warnings and notes allowed), 1 an error in a setup file or a file that cannot be read, 2 usage error or --out not written, 3 internal error');
    expect(last('diff', '--help')).toBe('exit codes: 0 no physical change, 1 changes, 2 usage error or a file that cannot be read, 3 internal error');
    expect(cli('--help').out).toContain(EXIT_CODES_TEXT);
  });

  it('--root says it bounds data CSV files as well as used setups, and folders only where a command takes them', () => {
    const root = (command: string) => cli(command, '--help').out.split('\n').find((l) => l.trimStart().startsWith('--root'));
    expect(root('fit')).toContain('used .sublevel files and data .csv files');
    expect(root('fit')).not.toContain('folder named on the command line');
    expect(root('check')).toContain('the folder named on the command line');
  });

  it('a command\'s help lists each of its options, and help works after other words too', () => {
    const sweep = cli('sweep', RB, '--to', '1T', '--help').out;
    for (const o of ['--level NAME', '--from FIELD', '--to FIELD', '--points N', '--format csv|json', '--out FILE']) expect(sweep).toContain(o);
    expect(cli('help', 'render').out).toContain('--view levels|pattern|lines');
  });

  it('--version prints the package version, in-process and from the bundle', () => {
    const { version } = JSON.parse(readFileSync('package.json', 'utf8')) as { version: string };
    expect(cli('--version')).toEqual({ code: 0, out: `sublevel ${version}`, err: '' });
    expect(builtCli('--version')).toEqual({ code: 0, out: `sublevel ${version}`, err: '' });
  });

  it('the overview goes to stderr with exit 2 when no command is given, to stdout with exit 0 when asked for', () => {
    const none = cli();
    expect([none.code, none.out]).toEqual([2, '']);
    expect(none.err).toContain('usage: sublevel <command>');
    expect(cli('--help').out).toContain('usage: sublevel <command>');
  });
});

describe('options', () => {
  it.each([
    [['eval', RB, '--fromat', 'json'], /^sublevel: eval has no option --fromat — did you mean --format\?\n\(sublevel eval --help lists its options\)$/],
    [['eval', RB, '--format', 'json', '--format', 'text'], /--format is given more than once/],
    [['eval', RB, '--format'], /--format needs a value/],
    [['eval', RB, '--format='], /--format needs a value/],
    [['eval', RB, '--help=yes'], /--help takes no value/],
    [['check', '--format', 'xml', RB], /--format must be text, json or sarif, got 'xml'/],
    [['render', RB, '--unit', 'Gauss'], /--unit must be G, mT, uT, µT, μT, nT or T, got 'Gauss'$/m],
    [['sweep', RB, '--to', '1G', '--level', 'zzz'], /no level named 'zzz'; the file has 'Rb87\.ground', 'Rb87\.p32'$/m],
    [['sweep', RB, '--to', '1G', '--level', 'groud'], /no level named 'groud' — did you mean 'ground'\?$/m],
    [['profile', LI, '--beam', 'xyz'], /no beam named 'xyz'; the file has 'main'$/m],
    [['chekc', RB], /unknown command 'chekc' — did you mean 'check'\?/],
    [['--format', 'json', 'check', RB], /a command comes first/],
  ])('%j is a one-line usage error with a hint, not the whole usage text', (argv, message) => {
    const r = cli(...argv);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(message);
    expect(r.err).not.toContain('commands:');
  });

  it('a bare 0 is a field without a unit (as README writes it); any other bare number needs one', () => {
    const r = cli('sweep', RB, '--level', 'ground', '--from', '0', '--to', '5mT', '--points', '2');
    expect(r.code).toBe(0);
    expect(r.out.split('\n').slice(2).map((l) => Number(l.split(',')[0]))).toEqual([0, 0.005]);
    const bad = cli('sweep', RB, '--level', 'ground', '--from', '2', '--to', '5mT');
    expect(bad.code).toBe(2);
    expect(bad.err).toContain('--from needs a unit');
  });

  it('a negative field may follow its option as a separate word', () => {
    const r = cli('sweep', RB, '--level', 'ground', '--from', '-5 mT', '--to', '5mT', '--points', '3');
    expect(r.code).toBe(0);
    // Lines: the '# sublevel sweep' comment, the header, then one row per field (docs/csv.md).
    expect(r.out.split('\n').slice(2).map((l) => Number(l.split(',')[0]))).toEqual([-0.005, 0, 0.005]);
  });

  it('a word after -- is a file even if it starts with a dash', () => {
    const r = cli('check', '--', '-missing.sublevel');
    expect(r.code).toBe(1);
    expect(r.out).toBe('-missing.sublevel:1:1 error file-missing no such file or folder');
  });
});

describe('exit codes and file problems', () => {
  let dir = '';
  let broken = '';
  beforeAll(() => {
    dir = mkdtempSync(path.join(tmpdir(), 'sublevel-exit-'));
    broken = path.join(dir, 'broken-beam.sublevel');
    // The lithium demo with one error added: a line to a level that does not exist.
    writeFileSync(broken, readFileSync(LI, 'utf8') + '\nline bad: ground -> nowhere\n');
    writeFileSync(path.join(dir, 'nothing.sublevel'), '# an empty setup\n');
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('render and profile still write their output but exit 1 when the file has errors, naming them on stderr', () => {
    for (const argv of [['render', broken], ['render', broken, '--view', 'pattern'], ['profile', broken]]) {
      const r = cli(...argv);
      expect(r.code, argv.join(' ')).toBe(1);
      expect(r.out.length).toBeGreaterThan(100);
      expect(r.err).toMatch(new RegExp(`^${broken.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&')}:\\d+:\\d+ error name-unknown `));
    }
    expect(cli('render', LI).code).toBe(0);
    expect(cli('profile', LI).code).toBe(0);
  });

  it('profile on a file without a beam: one line naming the problem, exit 1', () => {
    const r = cli('profile', RB);
    expect(r).toEqual({
      code: 1,
      out: '',
      err: `${RB}:1:1 error nothing-to-compute the file has no beam; profile needs a \`beam\` block with level, source, slits, magnet and drift`,
    });
  });

  it('render with nothing to draw is a file problem (exit 1, file:line:col), not a usage error', () => {
    const file = path.join(dir, 'nothing.sublevel');
    for (const view of ['levels', 'pattern', 'lines']) {
      const r = cli('render', file, '--view', view);
      expect(r.code, view).toBe(1);
      expect(r.err.split('\n'), view).toHaveLength(1);
      expect(r.err, view).toMatch(new RegExp(`^${file.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&')}:1:1 error nothing-to-compute No \\w+ to draw`));
    }
    expect(cli('sweep', file, '--to', '1T').err).toMatch(/:1:1 error nothing-to-compute the file has no level to sweep/);
  });

  it('a missing file for eval, sweep, profile or render is a file problem: exit 1', () => {
    for (const command of ['eval', 'profile', 'render']) {
      expect(cli(command, 'no/such.sublevel')).toEqual({ code: 1, out: '', err: 'no/such.sublevel:1:1 error file-missing no such file or folder' });
    }
    expect(cli('sweep', 'no/such.sublevel', '--to', '1T').code).toBe(1);
  });

  it('naming something the file does not have stays a usage error (exit 2)', () => {
    expect(cli('profile', LI, '--beam', 'nope').code).toBe(2);
    expect(cli('render', LI, '--view', 'lines', '--line', 'nope').code).toBe(2);
  });

  it('the README states the same exit codes as --help', () => {
    const readme = readFileSync('README.md', 'utf8');
    expect(readme).toContain('`0` no errors (warnings and notes allowed), `1` an error in a setup file or a file that cannot be read, `2` usage error or `--out` not written, `3` internal error');
  });
});
