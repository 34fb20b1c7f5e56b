/** Writing a command's result to --out, with a plain message instead of a stack trace when it fails. */
import * as fs from 'fs';
import { UsageError } from './args';

export function writeOutputFile(path: string, text: string | Uint8Array): void {
  try {
    fs.writeFileSync(path, text);
  } catch (e) {
    throw new UsageError(`cannot write ${path}: ${(e as Error).message}`);
  }
}
