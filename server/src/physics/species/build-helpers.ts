/**
 * Small constructors that keep the data files terse while making every value carry its
 * source, and that record how derived numbers were obtained.
 */
import { nuclearGFromMoment, publishedEnergyToHz } from './conversions';
import { FROM_MEMORY } from './sources';
import type { PublishedEnergy, PublishedEnergyUnit, Sourced, UncertainPart } from './types';

/**
 * Wraps a value with its citation (and the uncertainty the citation publishes, if any; with
 * `uncertaintySource` when that uncertainty was not read in the citation, e.g. FROM_MEMORY).
 */
export function sourced<T>(value: T, source: string, uncertainty?: number, uncertaintySource?: string): Sourced<T> {
  if (uncertainty === undefined) return { value, source };
  return uncertaintySource !== undefined ? { value, source, uncertainty, uncertaintySource } : { value, source, uncertainty };
}

/** A frequency published in MHz, stored in Hz; the published uncertainty is in MHz too. */
export function mhz(value: number, source: string, uncertaintyMHz?: number, uncertaintySource?: string): Sourced<number> {
  return sourced(value * 1e6, source, uncertaintyMHz !== undefined ? uncertaintyMHz * 1e6 : undefined, uncertaintySource);
}

/**
 * The citation a derived number shows for a built-in value: the value's source, and where its
 * uncertainty comes from when that differs.
 */
export function citationOf(v: Sourced<unknown>): string {
  return v.uncertaintySource !== undefined ? `${v.source}; uncertainty ${v.uncertaintySource}` : v.source;
}

/** A lifetime published in ns, stored in s. */
export function ns(value: number, source: string): Sourced<number> {
  return sourced(value * 1e-9, source);
}

/** Energy fields of a level from a published frequency or wavenumber (and its uncertainty, in the same unit). */
export function energy(
  value: number,
  unit: PublishedEnergyUnit,
  source: string,
  uncertainty?: number,
  uncertaintySource?: string,
): { energyHz: Sourced<number>; energyPublished: PublishedEnergy } {
  return {
    // A recalled value stays just "from memory"; the exact unit conversion adds nothing to cite.
    energyHz: sourced(
      publishedEnergyToHz(value, unit),
      source === FROM_MEMORY ? FROM_MEMORY : `${source} [${value} ${unit}, converted to Hz]`,
      uncertainty !== undefined ? publishedEnergyToHz(uncertainty, unit) : undefined,
      uncertaintySource,
    ),
    energyPublished: { value, unit, source },
  };
}

/**
 * Energy fields of a level whose value is a sum of separately measured pieces (`parts`, in the published unit),
 * some shared with other levels: its uncertainty is theirs in quadrature, and each piece stays one input
 * wherever it recurs (types.ts, `Sourced.parts`).
 */
export function energyFromParts(
  value: number,
  unit: PublishedEnergyUnit,
  source: string,
  uncertaintySource: string | undefined,
  parts: readonly UncertainPart[],
): { energyHz: Sourced<number>; energyPublished: PublishedEnergy } {
  const fields = energy(value, unit, source, Math.hypot(...parts.map((p) => p.u)), uncertaintySource);
  const inHz = parts.map((p) => ({ ...p, value: publishedEnergyToHz(p.value, unit), u: publishedEnergyToHz(p.u, unit) }));
  return { ...fields, energyHz: { ...fields.energyHz, parts: inHz } };
}

/** The ground level's energy, zero by definition of the scale. */
export const GROUND_ENERGY: Sourced<number> = sourced(0, 'definition: energies are measured from the ground level');

/** g_I derived from μ_I when no atomic compilation lists it (no shielding correction). */
export function derivedNuclearG(mu: Sourced<number>, twoI: number): Sourced<number> {
  const value = nuclearGFromMoment(mu.value, twoI) ?? Number.NaN;
  return sourced(
    value,
    `derived: g_I = −(μ_I/μ_N)(μ_N/μ_B)/I with μ_I ${mu.source === FROM_MEMORY ? FROM_MEMORY : `from ${mu.source}`} and CODATA 2022 magnetons; ` +
      'bare-nucleus value, diamagnetic shielding not applied',
  );
}
