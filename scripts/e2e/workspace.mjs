// A throwaway copy of examples/ for each host to open, so edits made by the tests (the quick
// fix) never touch the repository.
import { cpSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';

export function copyExamples(root, dir) {
  const folder = join(dir, 'examples');
  mkdirSync(dir, { recursive: true });
  cpSync(join(root, 'examples'), folder, { recursive: true });
  return folder;
}
