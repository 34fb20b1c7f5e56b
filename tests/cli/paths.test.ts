/**
 * `check` on folders with symbolic links, link loops, special files and paths that cannot be
 * read: every path ends in the report, the rest of the run goes on. Root can read everything,
 * so permission errors are injected through the CLI's file-system object.
 */
import { execFileSync } from 'child_process';
import * as fs from 'fs';
import { mkdirSync, mkdtempSync, rmSync, symlinkSync, writeFileSync } from 'fs';
import { tmpdir } from 'os';
import path from 'path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CliFileSystem } from '../../server/src/cli/fileSystem';
import { nodeFileSystem } from '../../server/src/cli/fileSystem';
import { cli, cliOn } from './runCli';

const BROKEN = 'species X\n  mass = 40 u\n  level g: 2P7/2\n'; // J = 7/2 is impossible for 2P
const CLEAN = 'species X\n  mass = 40 u\n  level g: 2S1/2\n';

function denied(syscall: string, p: string): NodeJS.ErrnoException {
  return Object.assign(new Error(`EACCES: permission denied, ${syscall} '${p}'`), { code: 'EACCES' });
}

/** Lines of a text report with the temporary folder taken off. */
function lines(out: string, dir: string): string[] {
  return out.split('\n').filter(Boolean).map((l) => l.split(dir + path.sep).join(''));
}

describe('check follows symbolic links', () => {
  let dir = '';
  beforeAll(() => {
    dir = mkdtempSync(path.join(tmpdir(), 'sublevel-links-'));
    mkdirSync(path.join(dir, 'shared'));
    mkdirSync(path.join(dir, 'proj'));
    writeFileSync(path.join(dir, 'shared', 'bad.sublevel'), BROKEN);
    symlinkSync(path.join(dir, 'shared', 'bad.sublevel'), path.join(dir, 'proj', 'linked.sublevel'));
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('a linked file with an error fails the run (it used to be skipped: "0 files checked", exit 0)', () => {
    const r = cli('check', path.join(dir, 'proj'));
    expect(r.code).toBe(1);
    expect(lines(r.out, dir)).toEqual([`${path.join('proj', 'linked.sublevel')}:3:14 error term-j-out-of-range J = 7/2 is impossible for 2P (S = 1/2, L = 1): J runs from |L − S| to L + S, so 1/2 or 3/2.`]);
    expect(r.err).toMatch(/^1 file checked: 1 error/);
  });

  it('a linked folder is searched; a link back to an ancestor is a loop noted once, not followed', () => {
    const root = mkdtempSync(path.join(tmpdir(), 'sublevel-loop-'));
    mkdirSync(path.join(root, 'a', 'b'), { recursive: true });
    writeFileSync(path.join(root, 'a', 'b', 'deep.sublevel'), BROKEN);
    symlinkSync(path.join(root, 'a'), path.join(root, 'a', 'b', 'back')); // a/b/back -> a: a loop
    symlinkSync(path.join(dir, 'shared'), path.join(root, 'elsewhere')); // a folder outside
    try {
      const r = cli('check', root, '--format', 'json');
      expect(r.code).toBe(1);
      const doc = JSON.parse(r.out) as { files: { file: string; diagnostics: { code: string; severity: string; message: string }[] }[] };
      expect(doc.files.map((f) => [path.relative(root, f.file), f.diagnostics.map((d) => `${d.severity} ${d.code}`)])).toEqual([
        [path.join('a', 'b', 'deep.sublevel'), ['error term-j-out-of-range']],
        [path.join('a', 'b', 'back'), ['info link-repeated']],
        [path.join('elsewhere', 'bad.sublevel'), ['error term-j-out-of-range']],
      ]);
      expect(doc.files[1]!.diagnostics[0]!.message).toContain('already searched; not searched again');
    } finally {
      rmSync(root, { recursive: true, force: true });
    }
  });

  it('a file reached twice (itself and a link in the same folder) is checked once, under its own name', () => {
    const root = mkdtempSync(path.join(tmpdir(), 'sublevel-twice-'));
    writeFileSync(path.join(root, 'real.sublevel'), BROKEN);
    symlinkSync('real.sublevel', path.join(root, 'alias.sublevel'));
    try {
      const r = cli('check', root);
      expect(lines(r.out, root).map((l) => l.split(' ').slice(0, 3).join(' '))).toEqual([
        'real.sublevel:3:14 error term-j-out-of-range',
        'alias.sublevel:1:1 info link-repeated',
      ]);
      expect(r.out).toContain(`the same file as ${path.join(root, 'real.sublevel')}, checked there`);
      expect(r.err).toMatch(/^1 file checked \(1 other path not read\): 1 error/);
    } finally {
      rmSync(root, { recursive: true, force: true });
    }
  });

  it('a dangling link named *.sublevel is an error of that path; other dangling links are ignored', () => {
    const root = mkdtempSync(path.join(tmpdir(), 'sublevel-dangling-'));
    writeFileSync(path.join(root, 'ok.sublevel'), CLEAN);
    symlinkSync('gone.sublevel', path.join(root, 'dangling.sublevel'));
    symlinkSync('gone.txt', path.join(root, 'notes'));
    symlinkSync('self.sublevel', path.join(root, 'self.sublevel'));
    try {
      const r = cli('check', root);
      expect(r.code).toBe(1);
      expect(lines(r.out, root).filter((l) => !/ info /.test(l))).toEqual([
        "dangling.sublevel:1:1 error link-broken a symbolic link to 'gone.sublevel', which does not exist",
        "self.sublevel:1:1 error link-broken a symbolic link to 'self.sublevel', which leads back to itself",
      ]);
    } finally {
      rmSync(root, { recursive: true, force: true });
    }
  });
});

describe('paths that cannot be read are problems of their own; the run goes on', () => {
  let dir = '';
  beforeAll(() => {
    dir = mkdtempSync(path.join(tmpdir(), 'sublevel-unreadable-'));
    mkdirSync(path.join(dir, 'locked'));
    writeFileSync(path.join(dir, 'locked', 'hidden.sublevel'), CLEAN);
    writeFileSync(path.join(dir, 'a.sublevel'), CLEAN);
    writeFileSync(path.join(dir, 'b.sublevel'), BROKEN);
    writeFileSync(path.join(dir, 'secret.sublevel'), CLEAN);
    mkdirSync(path.join(dir, 'folder.sublevel'));
    execFileSync('mkfifo', [path.join(dir, 'pipe.sublevel')]);
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  const locked: CliFileSystem = {
    ...nodeFileSystem,
    readdirSync: ((p: fs.PathLike, o?: unknown) => {
      if (String(p).endsWith('locked')) throw denied('scandir', String(p));
      return (nodeFileSystem.readdirSync as (p: fs.PathLike, o?: unknown) => unknown)(p, o);
    }) as CliFileSystem['readdirSync'],
    openSync: ((p: fs.PathLike, ...rest: unknown[]) => {
      if (String(p).endsWith('secret.sublevel')) throw denied('open', String(p));
      return (nodeFileSystem.openSync as (p: fs.PathLike, ...r: unknown[]) => number)(p, ...rest);
    }) as CliFileSystem['openSync'],
  };

  it('an unreadable folder and an unreadable file: per-path errors in text, exit 1, the other files checked', () => {
    const r = cliOn(locked, 'check', dir);
    expect(r.code).toBe(1);
    expect(lines(r.out, dir)).toEqual([
      'b.sublevel:3:14 error term-j-out-of-range J = 7/2 is impossible for 2P (S = 1/2, L = 1): J runs from |L − S| to L + S, so 1/2 or 3/2.',
      'locked:1:1 error folder-unreadable cannot search this folder: permission denied (EACCES)',
      'pipe.sublevel:1:1 error file-not-regular this is a FIFO (named pipe), not a setup file',
      'secret.sublevel:1:1 error file-unreadable cannot read it: permission denied (EACCES)',
    ]);
    expect(r.err).toBe('2 files checked (3 other paths not read): 4 errors, 0 other findings');
    expect(r.err).not.toMatch(/internal error|at .*\.ts/);
  });

  it('the same run as JSON: a document with every path, not an abort', () => {
    const r = cliOn(locked, 'check', dir, '--format', 'json');
    expect(r.code).toBe(1);
    const doc = JSON.parse(r.out) as { files: { file: string; diagnostics: { code: string }[] }[] };
    expect(doc.files.map((f) => [path.basename(f.file), f.diagnostics.map((d) => d.code)])).toEqual([
      ['a.sublevel', []],
      ['b.sublevel', ['term-j-out-of-range']],
      ['locked', ['folder-unreadable']],
      ['pipe.sublevel', ['file-not-regular']],
      ['secret.sublevel', ['file-unreadable']],
    ]);
  });

  it('a subfolder whose status cannot be read (EACCES on stat) is reported, not skipped', () => {
    const noStat: CliFileSystem = {
      ...nodeFileSystem,
      statSync: ((p: fs.PathLike, o?: unknown) => {
        if (String(p).endsWith('locked')) throw denied('stat', String(p));
        return (nodeFileSystem.statSync as (p: fs.PathLike, o?: unknown) => unknown)(p, o);
      }) as CliFileSystem['statSync'],
    };
    const r = cliOn(noStat, 'check', dir);
    expect(lines(r.out, dir)).toContain('locked:1:1 error folder-unreadable cannot search this folder: permission denied (EACCES)');
  });

  it('a folder named *.sublevel is searched, not read; named as a file for eval it is a file problem (exit 1)', () => {
    const r = cli('eval', path.join(dir, 'folder.sublevel'));
    expect(r.code).toBe(1);
    expect(r.err).toBe(`${path.join(dir, 'folder.sublevel')}:1:1 error file-not-regular this is a folder, not a setup file`);
  });

  it('a missing path on the command line is a file problem of that path; the other paths are still checked', () => {
    const r = cli('check', path.join(dir, 'nope.sublevel'), path.join(dir, 'b.sublevel'));
    expect(r.code).toBe(1);
    expect(r.out.split('\n').map((l) => l.split(' ').slice(1, 3).join(' '))).toEqual(['error file-missing', 'error term-j-out-of-range']);
    expect(r.err).toMatch(/^1 file checked \(1 other path not read\)/);
  });

  it('a read that fails half-way (EIO) is a file problem, not an internal error', () => {
    const failing: CliFileSystem = {
      ...nodeFileSystem,
      readSync: (() => {
        throw Object.assign(new Error('EIO: i/o error, read'), { code: 'EIO' });
      }) as CliFileSystem['readSync'],
    };
    const r = cliOn(failing, 'eval', path.join(dir, 'a.sublevel'));
    expect(r.code).toBe(1);
    expect(r.err).toBe(`${path.join(dir, 'a.sublevel')}:1:1 error file-unreadable cannot read it: input/output error (EIO)`);
  });
});

describe('limits of the search and the reader', () => {
  let dir = '';
  beforeAll(() => {
    dir = mkdtempSync(path.join(tmpdir(), 'sublevel-limits-'));
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('a file over 3,000,000 bytes (3 bytes × the 1,000,000-character cap) is not read (a sparse file, so the test is quick)', () => {
    const big = path.join(dir, 'big.sublevel');
    writeFileSync(big, '');
    fs.truncateSync(big, 3_000_001);
    const r = cli('check', big);
    expect(r.code).toBe(1);
    expect(r.out).toBe(`${big}:1:1 error file-too-large this file is not read: it has 3000001 bytes, more than the 3000000 a setup file of at most 1000000 characters can have`);
    rmSync(big);
  });

  it('folders nested deeper than 64 levels are reported, not searched', () => {
    let deep = path.join(dir, 'nest');
    const top = deep;
    for (let i = 0; i < 65; i++) deep = path.join(deep, 'd');
    mkdirSync(deep, { recursive: true });
    writeFileSync(path.join(deep, 'x.sublevel'), BROKEN);
    const r = cli('check', top);
    expect(r.code).toBe(1);
    expect(r.out.split(' ').slice(1, 3).join(' ')).toBe('error folder-too-deep');
    expect(r.out).toContain('more than 64 folders deep; not searched');
    expect(r.out.split('\n')).toHaveLength(1);
  });

  it('NUL and invalid UTF-8 in a checked file are diagnostics with line and column, in text and JSON', () => {
    const bad = path.join(dir, 'bytes.sublevel');
    writeFileSync(bad, Buffer.concat([Buffer.from(CLEAN + 'field b = 1 T # '), Buffer.from([0xe9]), Buffer.from(' \u0000\n')]));
    const r = cli('check', bad);
    expect(r.out.split('\n').map((l) => l.slice(bad.length + 1).split(' ').slice(0, 3).join(' '))).toEqual([
      '4:17 error text-invalid-encoding',
      '4:19 error text-nul-character',
    ]);
    expect(r.code).toBe(1);
    const doc = JSON.parse(cli('eval', bad, '--format', 'json').out) as { diagnostics: { code: string; line: number; column: number }[] };
    expect(doc.diagnostics.filter((d) => d.code.startsWith('text-')).map((d) => [d.code, d.line, d.column])).toEqual([
      ['text-invalid-encoding', 4, 17],
      ['text-nul-character', 4, 19],
    ]);
  });
});
