/**
 * Splits a line's Zeeman components into groups that a figure can show one panel each: at a
 * low field the hyperfine groups sit hundreds of MHz apart while each group's Zeeman structure
 * spans a few μ_B·B/h, so one shared axis would stack every group into one spike.
 */
import { BOHR_MAGNETON_HZ_PER_T } from '../physics/constants';
import type { LineComponent } from './viewData';

/** Groups split where neighbouring components are further apart than this many μ_B·B/h (common practice for display). */
const GAP_IN_ZEEMAN_UNITS = 8;
/** More groups than this are drawn on one axis (panels would be too narrow to read). */
export const MAX_PANELS = 8;

export interface LineGroup {
  /** Strength-weighted mean offset of the group, Hz: the origin of its panel. */
  centreHz: number;
  lowHz: number;
  highHz: number;
  components: LineComponent[];
}

/** μ_B·B/h in Hz, the natural unit of Zeeman offsets at this field; 0 when there is no field. */
export function zeemanUnitHz(fieldT: number | undefined): number {
  return fieldT !== undefined && Number.isFinite(fieldT) ? Math.abs(fieldT) * BOHR_MAGNETON_HZ_PER_T : 0;
}

/** The groups, in order of offset; one group when the field is zero or the groups are not separate. */
export function lineGroups(components: readonly LineComponent[], fieldT: number | undefined): LineGroup[] {
  const sorted = [...components].sort((a, b) => a.offsetHz - b.offsetHz);
  if (sorted.length === 0) return [];
  const z = zeemanUnitHz(fieldT);
  const gap = GAP_IN_ZEEMAN_UNITS * z;
  const runs: LineComponent[][] = [[sorted[0]]];
  for (let i = 1; i < sorted.length; i++) {
    if (z > 0 && sorted[i].offsetHz - sorted[i - 1].offsetHz > gap) runs.push([sorted[i]]);
    else runs[runs.length - 1].push(sorted[i]);
  }
  const groups = runs.length > MAX_PANELS ? [sorted] : runs;
  return groups.map((g) => {
    const w = g.reduce((s, c) => s + Math.max(c.strength, 0), 0);
    const centre = w > 0 ? g.reduce((s, c) => s + Math.max(c.strength, 0) * c.offsetHz, 0) / w : g[0].offsetHz;
    return { centreHz: centre, lowHz: g[0].offsetHz, highHz: g[g.length - 1].offsetHz, components: g };
  });
}
