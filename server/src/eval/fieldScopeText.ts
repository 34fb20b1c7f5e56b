/**
 * The report's line for a species evaluated at some of the working fields only: which ones and
 * why, and which are left out (docs/format.md, "Which fields a level is evaluated at"). It reads
 * the reasons the evaluation recorded (`evaluated_at`, `not_at`), never works them out again.
 */
import type { FieldScopeEntry, SpeciesResult } from './resultTypes';

/** At most this many left-out fields, and beams or species of one field, are named; more are counted or elided. */
const NAMED = 3;

/** Undefined when the species is evaluated at every working field. */
export function fieldScopeLine(s: Pick<SpeciesResult, 'name' | 'evaluated_at' | 'not_at'>): string | undefined {
  if (!s.evaluated_at) return undefined;
  const out = s.not_at ?? [];
  const total = s.evaluated_at.length + out.length;
  const key = (x: FieldScopeEntry): string => `${x.kind} ${x.name}`;
  const at = s.evaluated_at.map((x) => `${key(x)} (${whyAt(x, s.name)})`);
  const head = at.length === 0 ? `  evaluated at none of the file's ${total} working fields` : `  evaluated at ${at.length} of the file's ${total} working fields: ${at.join(', ')}`;
  const rest =
    out.length <= NAMED
      ? `not at ${out.map((x) => `${key(x)} (${whyNotAt(x)})`).join(', ')}`
      : `not at the ${out.length} others, which concern other species (a field's species list, the beams through a magnet)`;
  return `${head}; ${rest}`;
}

/** Why a working field concerns the species. */
function whyAt(x: FieldScopeEntry, species: string): string {
  if (x.beams) return few(x.beams.filter((b) => b.species === species).map((b) => `beam ${b.name}`));
  if (x.species) return 'its species list';
  return x.kind === 'magnet' ? 'no beam: every species' : 'every species';
}

/** Why a working field does not concern the species (it concerns others only). */
function whyNotAt(x: FieldScopeEntry): string {
  if (x.beams) return few(x.beams.map((b) => `beam ${b.name} of ${b.species}`));
  if (x.species && x.species.length > 0) return `species = ${few(x.species)}`;
  return 'its species list names no known species';
}

function few(names: string[]): string {
  return `${names.slice(0, NAMED).join(', ')}${names.length > NAMED ? ', …' : ''}`;
}
