/**
 * --out replaces a file in one step: a failed write (full disk, injected) leaves the old file as
 * it was and no temporary file behind, and says so; exit 2 without the usage text.
 */
import * as fs from 'fs';
import { mkdtempSync, readdirSync, readFileSync, rmSync, statSync, symlinkSync, writeFileSync } from 'fs';
import { tmpdir } from 'os';
import path from 'path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { type CliFileSystem, nodeFileSystem } from '../../server/src/cli/fileSystem';
import { OutputError, writeOutputFile } from '../../server/src/cli/output';
import { cli, cliOn } from './runCli';

const LI = 'examples/lithium-beam.sublevel';
const OLD = 'old,contents\n'.repeat(100); // 1,300 bytes that must survive a failed write

/** A disk that fills up after `room` bytes: the first write is cut short, the next one fails. */
function fullDisk(room: number): CliFileSystem {
  let left = room;
  return {
    ...nodeFileSystem,
    writeSync: ((fd: number, buf: Uint8Array, offset: number, length: number) => {
      if (left <= 0) throw Object.assign(new Error('ENOSPC: no space left on device, write'), { code: 'ENOSPC' });
      const n = Math.min(left, length);
      left -= n;
      return (nodeFileSystem.writeSync as (fd: number, b: Uint8Array, o: number, l: number) => number)(fd, buf, offset, n);
    }) as CliFileSystem['writeSync'],
  };
}

describe('atomic --out', () => {
  let dir = '';
  beforeEach(() => {
    dir = mkdtempSync(path.join(tmpdir(), 'sublevel-out-'));
  });
  afterEach(() => rmSync(dir, { recursive: true, force: true }));

  it('a failure of the pieces\' maker is passed on as it is (an internal error), not as a write failure; the old file stays', () => {
    const target = path.join(dir, 'pattern.csv');
    writeFileSync(target, OLD);
    const bug = new Error('writer bug');
    let thrown: unknown;
    try {
      writeOutputFile(target, (put) => {
        put(new Uint8Array([65, 66]));
        throw bug;
      }, nodeFileSystem);
    } catch (e) {
      thrown = e;
    }
    expect(thrown).toBe(bug);
    expect(thrown).not.toBeInstanceOf(OutputError);
    expect(readFileSync(target, 'utf8')).toBe(OLD);
    expect(readdirSync(dir)).toEqual(['pattern.csv']);
  });

  it('on a full disk the old file is untouched, no temporary file is left, and the message says so', () => {
    const target = path.join(dir, 'pattern.csv');
    writeFileSync(target, OLD);
    const r = cliOn(fullDisk(4096), 'profile', LI, '--out', target);
    expect(r.code).toBe(2);
    expect(r.err).toBe(`sublevel: cannot write ${target}: no space left on the device (ENOSPC); the old file is unchanged`);
    expect(readFileSync(target, 'utf8')).toBe(OLD);
    expect(readdirSync(dir)).toEqual(['pattern.csv']);
  });

  it('a failure at the rename (read-only folder, injected) also keeps the old file and cleans up', () => {
    const target = path.join(dir, 'levels.svg');
    writeFileSync(target, OLD);
    const readOnly: CliFileSystem = {
      ...nodeFileSystem,
      renameSync: (() => {
        throw Object.assign(new Error('EROFS: read-only file system, rename'), { code: 'EROFS' });
      }) as CliFileSystem['renameSync'],
    };
    const r = cliOn(readOnly, 'render', LI, '--out', target);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/the file system is read-only \(EROFS\); the old file is unchanged$/);
    expect(readFileSync(target, 'utf8')).toBe(OLD);
    expect(readdirSync(dir)).toEqual(['levels.svg']);
  });

  it('a new file that cannot be written is not created', () => {
    const target = path.join(dir, 'sweep.csv');
    const r = cliOn(fullDisk(100), 'sweep', 'examples/rubidium-bias.sublevel', '--level', 'ground', '--to', '0.1T', '--out', target);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/; no file was written$/);
    expect(readdirSync(dir)).toEqual([]);
  });

  it('a successful write replaces the whole file, keeps its permissions, and writes through a symbolic link', () => {
    const real = path.join(dir, 'real.csv');
    writeFileSync(real, OLD, { mode: 0o640 });
    fs.chmodSync(real, 0o640);
    const link = path.join(dir, 'link.csv');
    symlinkSync(real, link);
    const r = cli('profile', LI, '--out', link);
    expect(r.code).toBe(0);
    const text = readFileSync(real, 'utf8');
    expect(text.split('\n')[1]!.startsWith('position_m,total_per_m,')).toBe(true);
    expect(text).toBe(cli('profile', LI).out + '\n');
    expect(statSync(real).mode & 0o777).toBe(0o640);
    expect(fs.lstatSync(link).isSymbolicLink()).toBe(true);
    expect(readdirSync(dir).sort()).toEqual(['link.csv', 'real.csv']);
  });

  it('a folder as --out is refused without touching it', () => {
    const r = cli('profile', LI, '--out', dir);
    expect(r.code).toBe(2);
    expect(r.err).toBe(`sublevel: cannot write ${dir}: it is a folder`);
  });
});
