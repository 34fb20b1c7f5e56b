/**
 * The CLI against hostile inputs: `use` confined to .sublevel files below the checked file's
 * folder or `--root` (links count where they lead), and the size caps ending a huge file at
 * once with a diagnostic instead of running out of memory.
 */
import { mkdirSync, mkdtempSync, rmSync, symlinkSync, writeFileSync } from 'fs';
import { tmpdir } from 'os';
import path from 'path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cli } from './runCli';

const SECRET = 'API_TOKEN=very-secret-value';
const ATOMS = 'species K39\n  level ground: 4s 2S1/2\n';
let dir: string;
let outside: string;

beforeAll(() => {
  dir = mkdtempSync(path.join(tmpdir(), 'sublevel-hostile-'));
  outside = mkdtempSync(path.join(tmpdir(), 'sublevel-outside-'));
  mkdirSync(path.join(dir, 'project', 'sub'), { recursive: true });
  writeFileSync(path.join(outside, 'secret.sublevel'), `${SECRET}\n`);
  writeFileSync(path.join(outside, 'secret.env'), `${SECRET}\n`);
  writeFileSync(path.join(dir, 'project', 'atoms.sublevel'), ATOMS);
  writeFileSync(path.join(dir, 'project', 'sub', 'climb.sublevel'), 'use "../atoms.sublevel"\n');
  symlinkSync(path.join(outside, 'secret.sublevel'), path.join(dir, 'project', 'link.sublevel'));
});
afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
  rmSync(outside, { recursive: true, force: true });
});

function setup(name: string, text: string): string {
  const file = path.join(dir, 'project', name);
  writeFileSync(file, text);
  return file;
}

describe('use on the command line', () => {
  const refused: { name: string; use: () => string; code: string }[] = [
    { name: 'an absolute path to a file of another kind', use: () => path.join(outside, 'secret.env'), code: 'use-not-setup-file' },
    { name: 'a system file', use: () => '/etc/passwd', code: 'use-not-setup-file' },
    { name: 'a setup file outside the folder', use: () => path.join(outside, 'secret.sublevel'), code: 'use-outside-root' },
    { name: 'a climb out of the folder', use: () => `../../${path.basename(outside)}/secret.sublevel`, code: 'use-outside-root' },
    { name: 'a link inside the folder that leads outside', use: () => 'link.sublevel', code: 'use-outside-root' },
  ];
  for (const c of refused) {
    it(`refuses ${c.name}: an error naming the path, nothing of the file quoted, exit 1`, () => {
      const file = setup('hostile.sublevel', `use "${c.use()}"\n`);
      const r = cli('check', file);
      expect(r.code).toBe(1);
      expect(r.out).toContain(`error ${c.code} ${c.use()} is not read`);
      expect(r.out + r.err).not.toContain('secret-value');
      expect(r.out + r.err).not.toContain('API_TOKEN');
    });
  }

  it('reads a setup file below the checked file’s folder', () => {
    const r = cli('check', setup('fine.sublevel', 'use "atoms.sublevel"\n'));
    expect(r.out).toBe('');
    expect(r.code).toBe(0);
  });

  it('lets a file in a subfolder climb up to --root, or to the folder given to check, but not further', () => {
    const climb = path.join(dir, 'project', 'sub', 'climb.sublevel');
    expect(cli('check', climb).out).toContain('use-outside-root');
    expect(cli('check', climb, '--root', path.join(dir, 'project'))).toMatchObject({ code: 0, out: '' });
    expect(cli('eval', climb, '--root', path.join(dir, 'project')).code).toBe(0);
    const folder = cli('check', path.join(dir, 'project', 'sub'));
    expect(folder.out).toContain('use-outside-root');
  });

  it('rejects a --root that is not a folder', () => {
    const r = cli('check', setup('fine.sublevel', 'use "atoms.sublevel"\n'), '--root', path.join(dir, 'nowhere'));
    expect(r.code).toBe(2);
    expect(r.err).toContain('--root must be a folder');
  });
});

describe('size caps on the command line', () => {
  it('ends a file over the document cap at once, with one diagnostic', () => {
    // About 50 MB of realistic lines: far over the 500,000-character cap.
    const line = 'species K39\n  level ground: 4s 2S1/2\n';
    const file = setup('huge.sublevel', line.repeat(Math.ceil(50e6 / line.length)));
    const started = Date.now();
    const r = cli('check', file, '--format', 'json');
    expect(Date.now() - started).toBeLessThan(20_000); // before the cap: out of memory after minutes
    expect(r.code).toBe(1);
    const report = JSON.parse(r.out) as { files: { diagnostics: { code: string; message: string; line: number }[] }[] };
    expect(report.files[0]!.diagnostics).toEqual([
      expect.objectContaining({ code: 'file-too-large', line: 1, message: expect.stringMatching(/^this file is not read: it has 50000\d{3} bytes, more than the 3000000 a setup file of at most 1000000 characters can have$/) }),
    ]);
  });

  it('reads a file between the character cap and the byte guard, and reports the character cap', () => {
    const line = 'species K39\n  level ground: 4s 2S1/2\n';
    const file = setup('large.sublevel', line.repeat(Math.ceil(1_100_000 / line.length)));
    const r = cli('check', file, '--format', 'json');
    expect(r.code).toBe(1);
    const report = JSON.parse(r.out) as { files: { diagnostics: { code: string; message: string; line: number }[] }[] };
    expect(report.files[0]!.diagnostics).toEqual([
      expect.objectContaining({ code: 'document-too-large', line: 1, message: expect.stringMatching(/^this file is not checked: it has 11000\d\d characters, more than the 1000000 a setup file may have\.$/) }),
    ]);
  });

  it('ends a file over the statement cap at once', () => {
    const file = setup('many.sublevel', 'field f = 1 G\n'.repeat(20_001));
    const r = cli('check', file);
    expect(r.code).toBe(1);
    expect(r.out).toBe(`${file}:1:1 error too-many-statements this file is not checked: it has more than 20000 statements, the most a setup file may have.`);
  });

  it('refuses a used file over the used-file cap without reading it', () => {
    setup('bigatoms.sublevel', `${ATOMS}${'# filler line\n'.repeat(80_000)}`);
    const r = cli('check', setup('usesbig.sublevel', 'use "bigatoms.sublevel"\n'));
    expect(r.out).toMatch(/error use-file-too-large bigatoms\.sublevel is not read: it has 1120\d{3} bytes, more than the 500000 a used file may have\.$/);
  });
});
