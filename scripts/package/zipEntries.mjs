// Lists the file names inside a zip archive (a .vsix is one) by reading its central directory,
// so checking the package needs no `unzip` on the machine.
import { readFileSync } from 'node:fs';

const END_OF_DIRECTORY = 0x06054b50;
const DIRECTORY_ENTRY = 0x02014b50;

/** @returns {{ name: string, size: number }[]} names and uncompressed sizes, in archive order */
export function zipEntries(file) {
  const buf = readFileSync(file);
  // The end record sits in the last 22 bytes plus an optional comment of up to 64 KiB.
  let end = -1;
  for (let i = buf.length - 22; i >= Math.max(0, buf.length - 22 - 0xffff); i--) {
    if (buf.readUInt32LE(i) === END_OF_DIRECTORY) {
      end = i;
      break;
    }
  }
  if (end < 0) throw new Error(`${file} is not a zip archive (no end-of-directory record)`);
  const count = buf.readUInt16LE(end + 10);
  let at = buf.readUInt32LE(end + 16);
  const entries = [];
  for (let n = 0; n < count; n++) {
    if (buf.readUInt32LE(at) !== DIRECTORY_ENTRY) throw new Error(`${file}: damaged central directory`);
    const size = buf.readUInt32LE(at + 24);
    const nameLength = buf.readUInt16LE(at + 28);
    const extraLength = buf.readUInt16LE(at + 30);
    const commentLength = buf.readUInt16LE(at + 32);
    entries.push({ name: buf.toString('utf8', at + 46, at + 46 + nameLength), size });
    at += 46 + nameLength + extraLength + commentLength;
  }
  return entries;
}
