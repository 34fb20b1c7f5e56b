/**
 * Reading one setup file for a command. Never throws for a file problem: a path that is missing,
 * unreadable, not a regular file or too large comes back as a problem for that path, so `check`
 * can report it and go on. A FIFO is opened without blocking and refused, instead of hanging.
 */
import { constants } from 'fs';
import type { Problem } from '../format/ast';
import { decodeSetupBytes } from '../format/textDecoding';
import { MAX_DOCUMENT_CHARS } from '../model/limits';
import { cliProblem } from './fileProblems';
import { type CliFileSystem, reasonOf } from './fileSystem';

/**
 * A file larger than this is not even read. UTF-8 spends at most 3 bytes per UTF-16 unit, so a
 * file of more than 3 × MAX_DOCUMENT_CHARS bytes is over the document cap whatever it holds;
 * one below it is read and the document cap (`document-too-large`) decides.
 */
export const MAX_SETUP_BYTES = 3 * MAX_DOCUMENT_CHARS;

export type SetupRead = { ok: true; text: string; problems: Problem[] } | { ok: false; problem: Problem };

function kindOf(stat: { isDirectory(): boolean; isFIFO(): boolean; isSocket(): boolean }): string {
  if (stat.isDirectory()) return 'a folder';
  if (stat.isFIFO()) return 'a FIFO (named pipe)';
  if (stat.isSocket()) return 'a socket';
  return 'a device or other special file';
}

export function readSetup(file: string, fsys: CliFileSystem): SetupRead {
  let fd: number;
  try {
    fd = fsys.openSync(file, constants.O_RDONLY | (constants.O_NONBLOCK ?? 0));
  } catch (e) {
    const missing = (e as NodeJS.ErrnoException).code === 'ENOENT';
    return { ok: false, problem: cliProblem(missing ? 'file-missing' : 'file-unreadable', missing ? 'no such file or folder' : `cannot read it: ${reasonOf(e)}`) };
  }
  try {
    const stat = fsys.fstatSync(fd);
    if (!stat.isFile()) return { ok: false, problem: cliProblem('file-not-regular', `this is ${kindOf(stat)}, not a setup file`) };
    if (stat.size > MAX_SETUP_BYTES) return { ok: false, problem: tooLarge(stat.size) };
    // Read to the end rather than trusting the size: the file may grow while it is read.
    const chunks: Buffer[] = [];
    let total = 0;
    for (;;) {
      const chunk = Buffer.alloc(64 * 1024);
      const n = fsys.readSync(fd, chunk, 0, chunk.length, null);
      if (n === 0) break;
      chunks.push(chunk.subarray(0, n));
      total += n;
      if (total > MAX_SETUP_BYTES) return { ok: false, problem: tooLarge(total) };
    }
    return { ok: true, ...decodeSetupBytes(Buffer.concat(chunks, total)) };
  } catch (e) {
    return { ok: false, problem: cliProblem('file-unreadable', `cannot read it: ${reasonOf(e)}`) };
  } finally {
    try {
      fsys.closeSync(fd);
    } catch {
      // Nothing was written; a failed close of a read-only descriptor loses nothing.
    }
  }
}

function tooLarge(bytes: number): Problem {
  return cliProblem('file-too-large', `this file is not read: it has ${bytes} bytes, more than the ${MAX_SETUP_BYTES} a setup file of at most ${MAX_DOCUMENT_CHARS} characters can have`);
}
