/**
 * Which data files a `data` block may read: `.csv` files inside one of the roots, the same rule
 * `use` follows for setup files (model/useConfinement.ts), so that a setup from an untrusted
 * source cannot make Sublevel read other files and quote them in problems.
 */
import { isInside, rootsOf } from './useConfinement';
import type { SetupSources } from './sources';

export const DATA_EXTENSION = '.csv';

/** Why `location` (written as `written`) may not be read, or undefined when it may. */
export function refuseDataFile(location: string, written: string, sources: SetupSources): string | undefined {
  if (!location.toLowerCase().replace(/[?#].*$/, '').endsWith(DATA_EXTENSION)) {
    return `${written} is not read: a data file must be a ${DATA_EXTENSION} file`;
  }
  const roots = rootsOf(sources);
  const where = roots.length === 1 ? roots[0]! : `any of ${roots.join(', ')}`;
  if (!roots.some((r) => isInside(location, r))) {
    return `${written} is not read: it is outside ${where}, and data files are read only inside the workspace folder (or, on the command line, below the checked file's folder or --root)`;
  }
  const target = sources.realLocation?.(location);
  if (target !== undefined && !roots.some((r) => isInside(target, sources.realLocation?.(r) ?? r))) {
    return `${written} is not read: it is a link that leads outside ${where}`;
  }
  return undefined;
}
