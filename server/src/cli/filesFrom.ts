/** `--files-from LIST`: the paths to work on, one per line, from a file or (`-`) standard input. */
import { readFileSync } from 'fs';
import { UsageError } from './args';
import { reasonOf } from './fileSystem';

/** The non-empty lines of the list, as written (a trailing CR of a CRLF list dropped). */
export function pathsInList(text: string): string[] {
  return text
    .split('\n')
    .map((l) => l.replace(/\r$/, ''))
    .filter((l) => l.trim() !== '');
}

export function readPathList(source: string, readStdin: () => string = () => readFileSync(0, 'utf8')): string[] {
  try {
    return pathsInList(source === '-' ? readStdin() : readFileSync(source, 'utf8'));
  } catch (e) {
    throw new UsageError(`cannot read the list --files-from ${source}: ${reasonOf(e)}`);
  }
}
