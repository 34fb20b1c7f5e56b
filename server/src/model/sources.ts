/**
 * How the pipeline reaches other files for `use` statements. The core does no I/O: the caller
 * passes a reader (the CLI one on the disk, the language server one that prefers open
 * documents, tests an in-memory map). A recording wrapper keeps every answer, so that the
 * same analysis can be repeated elsewhere (the evaluation worker) on exactly the same texts,
 * and so that the language server knows which files a document depends on.
 */

export interface SetupSources {
  /** Where the analysed text lives: a URI (`file:///…`) or an absolute path. Relative `use` paths start from its folder. */
  uri?: string;
  /** The text of the file at a location (a URI or a path, as `uri` is); undefined when it cannot be read. */
  readFile?: (location: string) => string | undefined;
  /** The names of the entries of a folder, for "did you mean" on a missing file; optional. */
  listFolder?: (location: string) => readonly string[] | undefined;
}

/** Every answer a reader gave during one analysis; plain data, so it can be posted to a worker. */
export interface SourceSnapshot {
  uri?: string;
  files: Record<string, string | null>;
  folders: Record<string, string[] | null>;
}

export interface RecordingSources {
  sources: SetupSources;
  snapshot(): SourceSnapshot;
}

/** Wraps a reader so that every location it is asked for, and its answer, is kept. */
export function recordSources(inner: SetupSources): RecordingSources {
  const files: Record<string, string | null> = {};
  const folders: Record<string, string[] | null> = {};
  const sources: SetupSources = { ...(inner.uri !== undefined ? { uri: inner.uri } : {}) };
  const read = inner.readFile;
  if (read) {
    sources.readFile = (location) => {
      if (!Object.prototype.hasOwnProperty.call(files, location)) files[location] = read(location) ?? null;
      return files[location] ?? undefined;
    };
  }
  const list = inner.listFolder;
  if (list) {
    sources.listFolder = (location) => {
      if (!Object.prototype.hasOwnProperty.call(folders, location)) {
        const names = list(location);
        folders[location] = names ? [...names] : null;
      }
      return folders[location] ?? undefined;
    };
  }
  return { sources, snapshot: () => ({ ...(inner.uri !== undefined ? { uri: inner.uri } : {}), files: { ...files }, folders: { ...folders } }) };
}

/** A reader that gives back exactly what a snapshot recorded (and nothing else). */
export function replaySources(snapshot: SourceSnapshot): SetupSources {
  const own = (o: object, k: string): boolean => Object.prototype.hasOwnProperty.call(o, k);
  return {
    ...(snapshot.uri !== undefined ? { uri: snapshot.uri } : {}),
    readFile: (location) => (own(snapshot.files, location) ? (snapshot.files[location] ?? undefined) : undefined),
    listFolder: (location) => (own(snapshot.folders, location) ? (snapshot.folders[location] ?? undefined) : undefined),
  };
}

/** An in-memory reader over a map of location → text (tests, and callers that hold the texts already). */
export function memorySources(uri: string, files: Readonly<Record<string, string>>): SetupSources {
  return {
    uri,
    readFile: (location) => (Object.prototype.hasOwnProperty.call(files, location) ? files[location] : undefined),
    listFolder: (folder) => {
      const prefix = folder.endsWith('/') ? folder : `${folder}/`;
      const names = Object.keys(files)
        .filter((k) => k.startsWith(prefix))
        .map((k) => k.slice(prefix.length).split('/')[0]!);
      return names.length > 0 ? [...new Set(names)] : undefined;
    },
  };
}
