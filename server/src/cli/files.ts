/** Finds setup files: explicit files as given, folders searched recursively for *.sublevel. */
import * as fs from 'fs';
import * as path from 'path';
import { UsageError } from './args';

export const SETUP_EXTENSION = '.sublevel';

export function collectSetupFiles(inputs: string[]): string[] {
  const out: string[] = [];
  for (const input of inputs) {
    let stat: fs.Stats;
    try {
      stat = fs.statSync(input);
    } catch {
      throw new UsageError(`no such file or folder: ${input}`);
    }
    if (stat.isDirectory()) out.push(...walk(input));
    else out.push(input);
  }
  return out;
}

function walk(dir: string): string[] {
  const entries = fs.readdirSync(dir, { withFileTypes: true }).sort((a, b) => a.name.localeCompare(b.name));
  const out: string[] = [];
  for (const e of entries) {
    if (e.name === 'node_modules' || e.name.startsWith('.')) continue;
    const p = path.join(dir, e.name);
    if (e.isDirectory()) out.push(...walk(p));
    else if (e.isFile() && e.name.endsWith(SETUP_EXTENSION)) out.push(p);
  }
  return out;
}

/** `--root DIR`: the folder `use` may read from, checked to be one; undefined when not given. */
export function rootOption(value: string | undefined): string | undefined {
  if (value === undefined) return undefined;
  let folder = false;
  try {
    folder = fs.statSync(value).isDirectory();
  } catch {
    folder = false;
  }
  if (!folder) throw new UsageError(`--root must be a folder: ${value}`);
  return path.resolve(value);
}

export function readSetupFile(file: string): string {
  try {
    return fs.readFileSync(file, 'utf8');
  } catch (e) {
    throw new UsageError(`cannot read ${file}: ${(e as Error).message}`);
  }
}
