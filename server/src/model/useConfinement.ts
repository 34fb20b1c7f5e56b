/**
 * Which files a `use` statement may read: setup files (`.sublevel`) inside one of the roots —
 * the workspace folders in the editor, the checked file's folder or `--root` in the CLI. Anything
 * else is refused before it is opened, so that a setup from an untrusted source cannot make
 * Sublevel read (and quote) other files. A symbolic link counts where it leads.
 */
import * as path from 'path';
import { folderOf, isUri } from './locations';
import type { SetupSources } from './sources';

export const SETUP_EXTENSION = '.sublevel';

export interface UseRefusal {
  code: 'use-not-setup-file' | 'use-outside-root';
  message: string;
}

/** The roots that apply to `sources`: the given ones, else the folder of the analysed file. */
export function rootsOf(sources: SetupSources): readonly string[] {
  if (sources.roots) return sources.roots;
  const own = sources.uri !== undefined ? folderOf(sources.uri) : undefined;
  return own !== undefined ? [own] : [];
}

/**
 * A location as a scheme (with authority) and a plain path with `/` separators, escapes decoded
 * and the drive letter in lower case. Undefined when decoding changes the path's shape (an
 * escaped `/` or `..`), which is never a legitimate setup file and could slip past the test.
 */
function placeOf(location: string): { scheme: string; path: string } | undefined {
  if (!isUri(location)) {
    const p = path.resolve(location).replace(/\\/g, '/').replace(/^([A-Za-z]):/, (_, d: string) => `${d.toLowerCase()}:`);
    return { scheme: '', path: p };
  }
  try {
    const url = new URL(location);
    const decoded = decodeURIComponent(url.pathname);
    if (decoded !== path.posix.normalize(decoded) || decoded.includes('\\')) return undefined;
    return { scheme: `${url.protocol}//${url.host}`, path: decoded.replace(/^\/([A-Za-z]):/, (_, d: string) => `/${d.toLowerCase()}:`) };
  } catch {
    return undefined;
  }
}

/** True when `location` is `folder` or lies below it. */
export function isInside(location: string, folder: string): boolean {
  const l = placeOf(location);
  const f = placeOf(folder);
  if (!l || !f || l.scheme !== f.scheme) return false;
  const prefix = f.path.endsWith('/') ? f.path : `${f.path}/`;
  return l.path === f.path || l.path.startsWith(prefix);
}

/** Why `use` may not read `location` (written as `written`), or undefined when it may. */
export function refuseUse(location: string, written: string, sources: SetupSources): UseRefusal | undefined {
  if (!location.toLowerCase().replace(/[?#].*$/, '').endsWith(SETUP_EXTENSION)) {
    return { code: 'use-not-setup-file', message: `${written} is not read: \`use\` reads only setup files ending in ${SETUP_EXTENSION}` };
  }
  const roots = rootsOf(sources);
  const where = roots.length === 1 ? roots[0]! : `any of ${roots.join(', ')}`;
  const outside: UseRefusal = {
    code: 'use-outside-root',
    message: `${written} is not read: it is outside ${where}, and \`use\` reads only files inside the workspace folder (or, on the command line, below the checked file's folder or --root)`,
  };
  if (!roots.some((r) => isInside(location, r))) return outside;
  const real = sources.realLocation;
  if (real) {
    const target = real(location);
    // A file that does not exist is reported as missing when it is read.
    if (target !== undefined && !roots.some((r) => isInside(target, real(r) ?? r))) {
      return { ...outside, message: `${written} is not read: it is a link that leads outside ${where}; \`use\` reads only files inside it` };
    }
  }
  return undefined;
}
