/** A magnetic field given on the command line (`--to 0.1T`, `--to "500 G"`), read with the file's units and checked. */
import { readQuantityArgument } from '../format/quantityArgument';
import { UsageError } from './args';

/**
 * Largest |B| the CLI accepts, in tesla. The atomic unit of magnetic flux density is
 * 2.350 517 570 × 10^5 T (CODATA 2022); near it the Zeeman term is as large as the binding of
 * the atom and the Hamiltonian used here (no diamagnetic term) has no meaning. Laboratory
 * fields stay below about 10^3 T (from memory). A field above this bound is a typing error.
 */
export const MAX_CLI_FIELD_T = 1e5;

export function readFieldOption(name: string, text: string): number {
  const r = readQuantityArgument(text, 'flux-density', `--${name}`);
  if (r.si === undefined) throw new UsageError(r.message ?? `--${name}: cannot read '${text}'`);
  if (!Number.isFinite(r.si) || Math.abs(r.si) > MAX_CLI_FIELD_T) {
    throw new UsageError(`--${name} ${text} is outside the fields Sublevel computes (|B| up to ${MAX_CLI_FIELD_T.toExponential().replace('+', '')} T)`);
  }
  return r.si;
}
