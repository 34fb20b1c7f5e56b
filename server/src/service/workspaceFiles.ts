/**
 * Readers for the files that `use` statements name: the disk (the CLI, and the server's
 * fallback), and the editor's view of the workspace, which prefers the text of open documents
 * (unsaved edits included) and falls back to the disk. The language server can only read
 * what its own file system holds: `file:` URIs and paths, nothing remote.
 */
import * as fs from 'fs';
import * as path from 'path';
import { fileURLToPath } from 'url';
import { isUri, locationKey } from '../model/locations';
import type { SetupSources } from '../model/sources';

export interface WorkspaceFiles {
  /** The text at a location (a URI or a path); undefined when it cannot be read. */
  readFile(location: string): string | undefined;
  /** Names of a folder's entries; undefined when it cannot be listed. */
  listFolder(location: string): string[] | undefined;
}

/** A setup file larger than this is not read: it is not a setup. */
const MAX_BYTES = 16 * 1024 * 1024;

function diskPath(location: string): string | undefined {
  if (!isUri(location)) return location;
  if (!location.startsWith('file:')) return undefined;
  try {
    return fileURLToPath(location);
  } catch {
    return undefined;
  }
}

export const diskFiles: WorkspaceFiles = {
  readFile(location) {
    const p = diskPath(location);
    if (p === undefined) return undefined;
    try {
      const stat = fs.statSync(p);
      if (!stat.isFile() || stat.size > MAX_BYTES) return undefined;
      return fs.readFileSync(p, 'utf8');
    } catch {
      return undefined;
    }
  },
  listFolder(location) {
    const p = diskPath(location);
    if (p === undefined) return undefined;
    try {
      return fs.readdirSync(p);
    } catch {
      return undefined;
    }
  },
};

/** The sources of one file on disk, as the CLI reads it: its absolute path and the disk reader. */
export function diskSources(file: string): SetupSources {
  return { uri: path.resolve(file), readFile: (l) => diskFiles.readFile(l), listFolder: (l) => diskFiles.listFolder(l) };
}

/** Open documents first (found whatever the URI's spelling), then the disk. */
export function editorFiles(openDocuments: () => Iterable<{ uri: string; getText(): string }>): WorkspaceFiles {
  return {
    readFile(location) {
      const key = locationKey(location);
      for (const d of openDocuments()) if (locationKey(d.uri) === key) return d.getText();
      return diskFiles.readFile(location);
    },
    listFolder: (location) => diskFiles.listFolder(location),
  };
}
