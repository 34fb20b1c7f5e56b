/**
 * Finds setup files for `check`: paths named on the command line are taken as they are (any
 * name); folders are searched recursively for *.sublevel, skipping hidden entries and
 * node_modules. Symbolic links are followed, to files and to folders; every folder and file is
 * visited once (by device and inode, so a link loop or a second path to the same place ends
 * there, with a note). Paths that cannot be searched or read are problems of their own, and the
 * search goes on.
 */
import * as path from 'path';
import type { Problem } from '../format/ast';
import { UsageError } from './args';
import { cliProblem } from './fileProblems';
import { type CliFileSystem, reasonOf } from './fileSystem';

export const SETUP_EXTENSION = '.sublevel';
/** Folders nested deeper than this below a named folder are not searched. */
export const MAX_FOLDER_DEPTH = 64;

/** A setup file to check, or a path with a problem that stands in for it. */
export interface FoundPath {
  path: string;
  problem?: Problem;
  /** The command-line path it was found under (itself, or a folder that holds it). */
  input: string;
}

interface Search {
  fsys: CliFileSystem;
  out: Omit<FoundPath, 'input'>[];
  /** device:inode of every folder searched and file found → the path it was found under. */
  seen: Map<string, string>;
}

const keyOf = (s: { dev: number; ino: number }): string => `${s.dev}:${s.ino}`;

export function findSetupFiles(inputs: string[], fsys: CliFileSystem): FoundPath[] {
  const search: Search = { fsys, out: [], seen: new Map() };
  const found: FoundPath[] = [];
  for (const input of inputs) {
    search.out = [];
    visit(search, input, 0, true, false);
    for (const f of search.out) found.push({ ...f, input });
  }
  return found;
}

/** `--root DIR`: the folder whose setup files `use` may read; undefined when not given. */
export function rootOption(value: string | undefined, fsys: CliFileSystem): string | undefined {
  if (value === undefined) return undefined;
  let folder = false;
  try {
    folder = fsys.statSync(value).isDirectory();
  } catch {
    folder = false;
  }
  if (!folder) throw new UsageError(`--root must be a folder: ${value}`);
  return path.resolve(value);
}

/** `--out FILE`, shared by the commands that write data. */
export const OUT_OPTION = {
  out: { value: 'FILE', help: 'write to FILE (atomically: the old file stays if writing fails) instead of stdout' },
} as const;

/** The option, shared by every command that reads one setup file: `use` and data `file` both read below it. */
export const ROOT_OPTION = {
  root: { value: 'DIR', help: "the folder below which the setup may read other files: used .sublevel files and data .csv files (default: the setup file's own folder)" },
} as const;

/** The same for check and eval, which also take folders. */
export const FOLDERS_ROOT_OPTION = {
  root: { value: 'DIR', help: "the folder below which setups may read other files: used .sublevel files and data .csv files (default: the folder named on the command line, else the setup file's own folder)" },
} as const;

/**
 * One path: a folder to search, a file to check, or a problem. `named`: given on the command
 * line; `folder`: listed as a folder by its parent.
 */
function visit(s: Search, p: string, depth: number, named: boolean, folder: boolean): void {
  const isSetupName = named || p.endsWith(SETUP_EXTENSION);
  let stat;
  try {
    stat = s.fsys.statSync(p);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (folder) {
      s.out.push({ path: p, problem: cliProblem('folder-unreadable', `cannot search this folder: ${reasonOf(e)}`) });
      return;
    }
    if (!isSetupName) return; // a broken link that is not named as a setup is none of ours
    if (code === 'ENOENT' || code === 'ELOOP') {
      const isLink = isSymbolicLink(s, p);
      if (isLink) s.out.push({ path: p, problem: cliProblem('link-broken', `a symbolic link to ${linkTarget(s, p)}, which ${code === 'ELOOP' ? 'leads back to itself' : 'does not exist'}`) });
      else s.out.push({ path: p, problem: cliProblem('file-missing', 'no such file or folder') });
    } else s.out.push({ path: p, problem: cliProblem('file-unreadable', `cannot read it: ${reasonOf(e)}`) });
    return;
  }
  const key = keyOf(stat);
  const earlier = s.seen.get(key);
  if (stat.isDirectory()) {
    if (earlier !== undefined) {
      s.out.push({ path: p, problem: cliProblem('link-repeated', `the same folder as ${earlier}, already searched; not searched again`) });
      return;
    }
    s.seen.set(key, p);
    searchFolder(s, p, depth);
    return;
  }
  if (!isSetupName) return;
  if (earlier !== undefined) {
    s.out.push({ path: p, problem: cliProblem('link-repeated', `the same file as ${earlier}, checked there`) });
    return;
  }
  s.seen.set(key, p);
  // Regular or not: reading it decides (a FIFO or device is refused there, without blocking).
  s.out.push({ path: p });
}

function searchFolder(s: Search, dir: string, depth: number): void {
  if (depth >= MAX_FOLDER_DEPTH) {
    s.out.push({ path: dir, problem: cliProblem('folder-too-deep', `more than ${MAX_FOLDER_DEPTH} folders deep; not searched`) });
    return;
  }
  let entries: { name: string; link: boolean; folder: boolean }[];
  try {
    entries = s.fsys.readdirSync(dir, { withFileTypes: true }).map((e) => ({ name: String(e.name), link: e.isSymbolicLink(), folder: e.isDirectory() }));
  } catch (e) {
    s.out.push({ path: dir, problem: cliProblem('folder-unreadable', `cannot search this folder: ${reasonOf(e)}`) });
    return;
  }
  // Links last, so a file is checked under its own name and a link to it in the same folder is the repeat.
  entries.sort((a, b) => Number(a.link) - Number(b.link) || a.name.localeCompare(b.name));
  for (const { name, folder } of entries) {
    if (name === 'node_modules' || name.startsWith('.')) continue;
    visit(s, path.join(dir, name), depth + 1, false, folder);
  }
}

function isSymbolicLink(s: Search, p: string): boolean {
  try {
    return s.fsys.lstatSync(p).isSymbolicLink();
  } catch {
    return false;
  }
}

function linkTarget(s: Search, p: string): string {
  try {
    return `'${s.fsys.readlinkSync(p)}'`;
  } catch {
    return 'a path';
  }
}
