/**
 * How the pipeline reaches other files for `use` statements. The core does no I/O: the caller
 * passes a reader (the CLI one on the disk, the language server one that prefers open
 * documents, tests an in-memory map). A recording wrapper keeps every answer, so that the
 * same analysis can be repeated elsewhere (the evaluation worker) on exactly the same texts,
 * and so that the language server knows which files a document depends on.
 */

/** A reader's answer for a file larger than MAX_USED_FILE_BYTES (model/limits.ts): it was not read. */
export interface FileTooLarge {
  tooLarge: true;
  bytes: number;
}

/** The text of a file, or why there is none: too large, or unreadable (undefined). */
export type FileAnswer = string | FileTooLarge | undefined;

export interface SetupSources {
  /** Where the analysed text lives: a URI (`file:///…`) or an absolute path. Relative `use` paths start from its folder. */
  uri?: string;
  /**
   * The folders `use` may read from (the workspace folders, or a CLI `--root`), as locations of
   * the same kind as `uri`. Without them, the folder of `uri` is the only one.
   */
  roots?: readonly string[];
  /** The text of the file at a location (a URI or a path, as `uri` is); undefined when it cannot be read. */
  readFile?: (location: string) => FileAnswer;
  /** Where a location really leads, symbolic links followed (undefined when it does not exist); optional, the disk readers give it. */
  realLocation?: (location: string) => string | undefined;
  /** The names of the entries of a folder, for "did you mean" on a missing file; optional. */
  listFolder?: (location: string) => readonly string[] | undefined;
}

/** Every answer a reader gave during one analysis; plain data, so it can be posted to a worker. */
export interface SourceSnapshot {
  uri?: string;
  roots?: string[];
  files: Record<string, string | FileTooLarge | null>;
  real?: Record<string, string | null>;
  folders: Record<string, string[] | null>;
}

export interface RecordingSources {
  sources: SetupSources;
  snapshot(): SourceSnapshot;
}

/** Answers of `ask`, each asked once and kept in `kept` (null for undefined). */
function remembered<A>(kept: Record<string, A | null>, ask: (location: string) => A | undefined): (location: string) => A | undefined {
  return (location) => {
    if (!Object.prototype.hasOwnProperty.call(kept, location)) kept[location] = ask(location) ?? null;
    return kept[location] ?? undefined;
  };
}

/** Wraps a reader so that every location it is asked for, and its answer, is kept. */
export function recordSources(inner: SetupSources): RecordingSources {
  const files: Record<string, string | FileTooLarge | null> = {};
  const real: Record<string, string | null> = {};
  const folders: Record<string, string[] | null> = {};
  const fixed = { ...(inner.uri !== undefined ? { uri: inner.uri } : {}), ...(inner.roots ? { roots: [...inner.roots] } : {}) };
  const sources: SetupSources = { ...fixed };
  const read = inner.readFile;
  if (read) sources.readFile = remembered(files, read);
  const resolveReal = inner.realLocation;
  if (resolveReal) sources.realLocation = remembered(real, resolveReal);
  const list = inner.listFolder;
  if (list) {
    sources.listFolder = remembered(folders, (l) => {
      const names = list(l);
      return names ? [...names] : undefined;
    });
  }
  return {
    sources,
    snapshot: () => ({ ...fixed, files: { ...files }, ...(resolveReal ? { real: { ...real } } : {}), folders: { ...folders } }),
  };
}

/** A reader that gives back exactly what a snapshot recorded (and nothing else). */
export function replaySources(snapshot: SourceSnapshot): SetupSources {
  const own = (o: object, k: string): boolean => Object.prototype.hasOwnProperty.call(o, k);
  const real = snapshot.real;
  return {
    ...(snapshot.uri !== undefined ? { uri: snapshot.uri } : {}),
    ...(snapshot.roots ? { roots: snapshot.roots } : {}),
    readFile: (location) => (own(snapshot.files, location) ? (snapshot.files[location] ?? undefined) : undefined),
    ...(real ? { realLocation: (location: string) => (own(real, location) ? (real[location] ?? undefined) : undefined) } : {}),
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
