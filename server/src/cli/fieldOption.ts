/** A magnetic field given on the command line (`--to 0.1T`, `--to "500 G"`), read with the file's units and checked. */
import { readQuantityArgument } from '../format/quantityArgument';
import { MAX_FIELD_T } from '../model/fieldRange';
import { UsageError } from './args';

/** Largest |B| the CLI accepts, in tesla: the same bound as for fields in a file (model/fieldRange.ts says why). */
export const MAX_CLI_FIELD_T = MAX_FIELD_T;

export function readFieldOption(name: string, text: string): number {
  // Zero is zero in every unit: `--from 0` needs none (as the help and README write it).
  if (/^\s*[+-]?(?:0+(?:\.0*)?|\.0+)\s*$/.test(text)) return 0;
  const r = readQuantityArgument(text, 'flux-density', `--${name}`);
  if (r.si === undefined) throw new UsageError(r.message ?? `--${name}: cannot read '${text}'`);
  if (!Number.isFinite(r.si) || Math.abs(r.si) > MAX_CLI_FIELD_T) {
    throw new UsageError(`--${name} ${text} is outside the fields Sublevel computes (|B| up to ${MAX_CLI_FIELD_T.toExponential().replace('+', '')} T)`);
  }
  return r.si;
}
