/**
 * The file-system calls the CLI makes, as one object, so tests can make any of them fail
 * (a full disk, a permission error) even when they run as root.
 */
import * as fs from 'fs';

export type CliFileSystem = Pick<
  typeof fs,
  | 'statSync'
  | 'lstatSync'
  | 'readdirSync'
  | 'readlinkSync'
  | 'realpathSync'
  | 'openSync'
  | 'fstatSync'
  | 'readSync'
  | 'writeSync'
  | 'fsyncSync'
  | 'closeSync'
  | 'renameSync'
  | 'unlinkSync'
>;

export const nodeFileSystem: CliFileSystem = fs;

/** A short reason for a failed file-system call: the error code's meaning in plain words. */
export function reasonOf(e: unknown): string {
  const code = (e as NodeJS.ErrnoException | undefined)?.code;
  switch (code) {
    case 'ENOENT':
      return 'no such file or folder';
    case 'EACCES':
    case 'EPERM':
      return `permission denied (${code})`;
    case 'ENOSPC':
      return 'no space left on the device (ENOSPC)';
    case 'EDQUOT':
      return 'disk quota exceeded (EDQUOT)';
    case 'EROFS':
      return 'the file system is read-only (EROFS)';
    case 'ELOOP':
      return 'too many symbolic links (a loop?) (ELOOP)';
    case 'ENOTDIR':
      return 'a part of the path is not a folder (ENOTDIR)';
    case 'EISDIR':
      return 'it is a folder (EISDIR)';
    case 'EIO':
      return 'input/output error (EIO)';
    default:
      return code ? `${(e as Error).message.split(',')[0]} (${code})` : String((e as Error)?.message ?? e);
  }
}
