/** The SARIF log of a `check` run: the tool's version and the root its paths are relative to. */
import type * as Sarif from 'sarif';
import { version } from '../../../../package.json';
import type { Problem } from '../../format/ast';
import { gitTopLevel } from '../git';
import { sarifLog } from './sarifLog';

/** --root if given, else the git work tree holding the current folder, else the current folder. */
export function sarifRoot(root: string | undefined, cwd: string): string {
  return root ?? gitTopLevel(cwd) ?? cwd;
}

export function sarifReport(files: readonly { file: string; problems: readonly Problem[] }[], root: string | undefined): Sarif.Log {
  const cwd = process.cwd();
  return sarifLog(
    files.map((f) => ({ path: f.file, problems: f.problems })),
    { toolVersion: version, root: sarifRoot(root, cwd), cwd },
  );
}
