/**
 * Writing a command's result to --out without ever leaving a cut-off file: the text goes to a
 * temporary file in the same folder, is flushed to the disk (fsync), and then renamed over the
 * target in one step. If anything fails (a full disk, a read-only folder) the temporary file is
 * removed, the old file is left as it was, and the message says so.
 */
import * as path from 'path';
import { escapeControls } from './escape';
import { type CliFileSystem, reasonOf } from './fileSystem';

/** --out could not be written: exit 2 with one line, without the usage text. */
export class OutputError extends Error {}

/**
 * Output made in pieces: it hands each piece's bytes to `put`, which has written them when it
 * returns (so a piece may be a view of a buffer the maker reuses).
 */
export type OutputPieces = (put: (bytes: Uint8Array) => void) => void;

/** Text is written with control characters escaped; bytes (a PNG) as they are; pieces as they come. */
export function writeOutputFile(target: string, content: string | Uint8Array | OutputPieces, fsys: CliFileSystem): void {
  let existing: { mode: number } | undefined;
  let final = target;
  try {
    const stat = fsys.statSync(target);
    if (stat.isDirectory()) throw new OutputError(`cannot write ${target}: it is a folder`);
    existing = { mode: stat.mode & 0o7777 };
    // Through a symbolic link, replace the file it points to, not the link.
    final = fsys.realpathSync(target);
  } catch (e) {
    if (e instanceof OutputError) throw e;
    // No such file yet (or not visible): it is created.
  }
  const tmp = path.join(path.dirname(final), `.${path.basename(final)}.${process.pid}-${uniqueSuffix()}.tmp`);
  let fd: number | undefined;
  try {
    const opened = fsys.openSync(tmp, 'wx', existing?.mode ?? 0o666);
    fd = opened;
    let writeFailed = false;
    const put = (bytes: Uint8Array): void => {
      try {
        for (let done = 0; done < bytes.length; ) done += fsys.writeSync(opened, bytes, done, bytes.length - done);
      } catch (e) {
        writeFailed = true;
        throw e;
      }
    };
    if (typeof content === 'function') {
      try {
        content(put);
      } catch (e) {
        // A failure of the pieces' maker, not of the file system, is a bug: passed on unchanged
        // (an internal error, exit 3), after the temporary file is removed.
        if (!writeFailed) throw new MakerFailure(e);
        throw e;
      }
    } else put(typeof content === 'string' ? Buffer.from(escapeControls(content), 'utf8') : content);
    fsys.fsyncSync(fd);
    fsys.closeSync(fd);
    fd = undefined;
    fsys.renameSync(tmp, final);
  } catch (e) {
    if (fd !== undefined) ignoreFailure(() => fsys.closeSync(fd!));
    ignoreFailure(() => fsys.unlinkSync(tmp));
    if (e instanceof MakerFailure) throw e.cause;
    throw new OutputError(`cannot write ${target}: ${reasonOf(e)}; ${existing ? 'the old file is unchanged' : 'no file was written'}`);
  }
  syncFolder(path.dirname(final), fsys);
}

/** A failure of the pieces' maker, carried past the file-system handler unchanged. */
class MakerFailure {
  constructor(readonly cause: unknown) {}
}

/**
 * A name no other writer uses: the pid and a random part, checked by the exclusive create ('wx').
 * Math.random rather than crypto, whose loading costs the CLI's start-up more than the write.
 */
function uniqueSuffix(): string {
  return Math.floor(Math.random() * 0x100000000).toString(16).padStart(8, '0');
}

/** Makes the rename itself durable where the platform allows it; a failure here loses no data. */
function syncFolder(dir: string, fsys: CliFileSystem): void {
  ignoreFailure(() => {
    const fd = fsys.openSync(dir, 'r');
    try {
      fsys.fsyncSync(fd);
    } finally {
      fsys.closeSync(fd);
    }
  });
}

function ignoreFailure(f: () => void): void {
  try {
    f();
  } catch {
    // see the callers
  }
}
