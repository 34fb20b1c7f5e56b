/**
 * Readers for the files that `use` statements name: the disk (the CLI, and the server's
 * fallback), and the editor's view of the workspace, which prefers the text of open documents
 * (unsaved edits included) and falls back to the disk. The language server can only read
 * what its own file system holds: `file:` URIs and paths, nothing remote.
 */
import * as fs from 'fs';
import * as path from 'path';
import { fileURLToPath, pathToFileURL } from 'url';
import { MAX_USED_FILE_BYTES } from '../model/limits';
import { isUri, locationKey } from '../model/locations';
import type { FileAnswer, SetupSources } from '../model/sources';
import { isInside } from '../model/useConfinement';

export interface WorkspaceFiles {
  /** The text at a location (a URI or a path); undefined when it cannot be read, FileTooLarge when it is over the cap. */
  readFile(location: string): FileAnswer;
  /** Where a location really leads (symbolic links followed); undefined when it does not exist. */
  realLocation?(location: string): string | undefined;
  /** Names of a folder's entries; undefined when it cannot be listed. */
  listFolder(location: string): string[] | undefined;
  /** The folders `use` may read from for the document at `uri`; undefined: its own folder. */
  rootsFor?(uri: string): string[] | undefined;
}

function diskPath(location: string): string | undefined {
  if (!isUri(location)) return location;
  if (!location.startsWith('file:')) return undefined;
  try {
    return fileURLToPath(location);
  } catch {
    return undefined;
  }
}

/** Reads a file unless it is over the cap; `stat` is the file's, taken just before. */
function readCapped(p: string, stat: fs.Stats): FileAnswer {
  if (!stat.isFile()) return undefined;
  if (stat.size > MAX_USED_FILE_BYTES) return { tooLarge: true, bytes: stat.size };
  return fs.readFileSync(p, 'utf8');
}

function realLocationOnDisk(location: string): string | undefined {
  const p = diskPath(location);
  if (p === undefined) return undefined;
  try {
    const real = fs.realpathSync.native(p);
    return isUri(location) ? pathToFileURL(real).href : real;
  } catch {
    return undefined;
  }
}

function listFolderOnDisk(location: string): string[] | undefined {
  const p = diskPath(location);
  if (p === undefined) return undefined;
  try {
    return fs.readdirSync(p);
  } catch {
    return undefined;
  }
}

export const diskFiles: WorkspaceFiles = {
  readFile(location) {
    const p = diskPath(location);
    if (p === undefined) return undefined;
    try {
      return readCapped(p, fs.statSync(p));
    } catch {
      return undefined;
    }
  },
  realLocation: realLocationOnDisk,
  listFolder: listFolderOnDisk,
};

/**
 * The disk, with each file's text kept while its modification time and size stay the same, so
 * that a document using a large file does not read it again at every keystroke.
 */
export function cachedDiskFiles(): WorkspaceFiles {
  const kept = new Map<string, { mtimeMs: number; size: number; answer: FileAnswer }>();
  return {
    readFile(location) {
      const p = diskPath(location);
      if (p === undefined) return undefined;
      try {
        const stat = fs.statSync(p);
        const hit = kept.get(p);
        if (hit && hit.mtimeMs === stat.mtimeMs && hit.size === stat.size) return hit.answer;
        const answer = readCapped(p, stat);
        kept.set(p, { mtimeMs: stat.mtimeMs, size: stat.size, answer });
        return answer;
      } catch {
        kept.delete(p);
        return undefined;
      }
    },
    realLocation: realLocationOnDisk,
    listFolder: listFolderOnDisk,
  };
}

/**
 * The sources of one file on disk, as the CLI reads it: its absolute path, the disk reader, and
 * the folder `use` may read from (`root`, by default the file's own folder).
 */
export function diskSources(file: string, root?: string): SetupSources {
  const uri = path.resolve(file);
  return {
    uri,
    roots: [path.resolve(root ?? path.dirname(uri))],
    readFile: (l) => diskFiles.readFile(l),
    realLocation: realLocationOnDisk,
    listFolder: (l) => diskFiles.listFolder(l),
  };
}

/**
 * The editor's files: open documents first (found whatever the URI's spelling), then the disk
 * (cached). `use` may read from the workspace folders, or, for a document outside them, from its
 * own folder.
 */
export function editorFiles(
  openDocuments: () => Iterable<{ uri: string; getText(): string }>,
  workspaceFolders: () => readonly string[] = () => [],
): WorkspaceFiles {
  const disk = cachedDiskFiles();
  return {
    readFile(location) {
      const key = locationKey(location);
      for (const d of openDocuments()) if (locationKey(d.uri) === key) return d.getText();
      return disk.readFile(location);
    },
    realLocation: realLocationOnDisk,
    listFolder: (location) => disk.listFolder(location),
    rootsFor(uri) {
      const folders = workspaceFolders();
      return folders.some((f) => isInside(uri, f)) ? [...folders] : undefined;
    },
  };
}
