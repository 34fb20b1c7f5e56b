/**
 * Locations of setup files, as URIs (`file:///ws/a.sublevel`, what the editor uses) or as
 * paths (`/ws/a.sublevel`, what the CLI uses): resolving a `use` path against the using
 * file, a key that says whether two locations are the same file, and short names for messages.
 * String work only; no file is touched.
 */
import * as path from 'path';

/** A scheme of two or more letters, so that a Windows drive (`C:`) is not taken for one. */
const SCHEME = /^[A-Za-z][A-Za-z0-9+.-]+:/;
const WINDOWS_DRIVE = /^[A-Za-z]:\//;

export function isUri(location: string): boolean {
  return SCHEME.test(location);
}

/** Characters that mean something in a URL but may be part of a file name. */
function escapeForUrl(p: string): string {
  return p.replace(/%/g, '%25').replace(/#/g, '%23').replace(/\?/g, '%3F');
}

/**
 * The location a `use` path leads to from the file at `base`: relative paths start from its
 * folder; absolute paths and URIs are taken as they are. Undefined when it cannot be worked
 * out (a base such as `untitled:Untitled-1` has no folder).
 */
export function resolveLocation(base: string | undefined, written: string): string | undefined {
  const w = written.replace(/\\/g, '/');
  if (isUri(w)) return w;
  if (base !== undefined && isUri(base)) {
    try {
      if (WINDOWS_DRIVE.test(w)) return new URL(`file:///${escapeForUrl(w)}`).href;
      const url = new URL(escapeForUrl(w), base);
      return url.href;
    } catch {
      return undefined;
    }
  }
  if (path.isAbsolute(w) || WINDOWS_DRIVE.test(w)) return path.normalize(w);
  return base === undefined ? path.normalize(w) : path.join(path.dirname(base), w);
}

/** The folder that holds a location (with a trailing `/` for a URI). */
export function folderOf(location: string): string | undefined {
  if (!isUri(location)) return path.dirname(location);
  try {
    return new URL('.', location).href;
  } catch {
    return undefined;
  }
}

function decoded(s: string): string {
  try {
    return decodeURIComponent(s);
  } catch {
    return s;
  }
}

/** The last part of a location: `alkalis.sublevel`. */
export function baseName(location: string): string {
  const p = isUri(location) ? decoded(location.replace(/[?#].*$/, '')) : location.replace(/\\/g, '/');
  const parts = p.split('/').filter((x) => x !== '');
  return parts[parts.length - 1] ?? location;
}

/**
 * One string per file, whatever the spelling: URIs with their escapes decoded and a Windows
 * drive letter in lower case (editors differ on both), paths normalised.
 */
export function locationKey(location: string): string {
  if (!isUri(location)) return path.normalize(location).replace(/\\/g, '/').replace(/^([A-Za-z]):/, (_, d: string) => `${d.toLowerCase()}:`);
  return decoded(location).replace(/^file:\/\/\/([A-Za-z]):/, (_, d: string) => `file:///${d.toLowerCase()}:`);
}

/** The path segments of a location, decoded, for relative names. */
function segments(location: string): { root: string; parts: string[] } {
  if (isUri(location)) {
    try {
      const u = new URL(location);
      return { root: `${u.protocol}//${u.host}`, parts: decoded(u.pathname).split('/').filter((x) => x !== '') };
    } catch {
      return { root: location, parts: [] };
    }
  }
  const p = location.replace(/\\/g, '/');
  const root = p.startsWith('/') ? '/' : (/^[A-Za-z]:/.exec(p)?.[0]?.toLowerCase() ?? '');
  return { root, parts: p.split('/').filter((x) => x !== '' && !/^[A-Za-z]:$/.test(x)) };
}

/** `to` as seen from the folder of `from`: `shared/alkalis.sublevel`, `../atoms/x.sublevel`; `to` itself when they share no root. */
export function relativeName(from: string | undefined, to: string): string {
  if (from === undefined) return isUri(to) ? baseName(to) : to;
  const a = segments(from);
  const b = segments(to);
  if (a.root !== b.root) return isUri(to) ? decoded(to) : to;
  const folder = a.parts.slice(0, -1);
  let common = 0;
  while (common < folder.length && common < b.parts.length - 1 && folder[common] === b.parts[common]) common++;
  return [...folder.slice(common).map(() => '..'), ...b.parts.slice(common)].join('/');
}
