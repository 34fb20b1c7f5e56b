/**
 * The report's line for a species evaluated at some of the working fields only: which ones and
 * why, and which are left out (docs/format.md, "Which fields a level is evaluated at"). It reads
 * what the evaluation recorded, the species' `evaluated_at`, a field's `species` and a magnet's
 * `beams` (eval/fieldScope.ts), and never works the scope out again.
 */
import type { EvaluationResult, SpeciesResult } from './resultTypes';

type Source = { kind: 'field' | 'magnet'; name: string };

/** At most this many left-out fields, and beams or species of one field, are named; more are counted or elided. */
const NAMED = 3;

/** Undefined when the species is evaluated at every working field. */
export function fieldScopeLine(r: Pick<EvaluationResult, 'fields' | 'magnets'>, s: Pick<SpeciesResult, 'name' | 'evaluated_at'>): string | undefined {
  if (!s.evaluated_at) return undefined;
  const all: Source[] = [
    ...r.fields.filter((f) => f.field_T !== undefined).map((f) => ({ kind: 'field' as const, name: f.name })),
    ...r.magnets.filter((m) => m.field_T !== undefined).map((m) => ({ kind: 'magnet' as const, name: m.name })),
  ];
  const key = (x: Source): string => `${x.kind} ${x.name}`;
  const inside = new Set(s.evaluated_at.map(key));
  const out = all.filter((x) => !inside.has(key(x)));
  const why = (x: Source, own: boolean): string => {
    if (x.kind === 'magnet') {
      const beams = r.magnets.find((m) => m.name === x.name)?.beams;
      if (!beams) return 'no beam: every species';
      return few(own ? beams.filter((b) => b.species === s.name).map((b) => `beam ${b.name}`) : beams.map((b) => `beam ${b.name} of ${b.species}`));
    }
    const list = r.fields.find((f) => f.name === x.name)?.species;
    if (!list) return 'every species';
    if (list.length === 0) return 'its species list names no known species';
    return own ? 'its species list' : `species = ${few(list)}`;
  };
  const at = s.evaluated_at.map((x) => `${key(x)} (${why(x, true)})`);
  const head = at.length === 0 ? `  evaluated at none of the file's ${all.length} working fields` : `  evaluated at ${at.length} of the file's ${all.length} working fields: ${at.join(', ')}`;
  const rest =
    out.length <= NAMED
      ? `not at ${out.map((x) => `${key(x)} (${why(x, false)})`).join(', ')}`
      : `not at the ${out.length} others, which concern other species (a field's species list, the beams through a magnet)`;
  return `${head}; ${rest}`;
}

function few(names: string[]): string {
  return `${names.slice(0, NAMED).join(', ')}${names.length > NAMED ? ', …' : ''}`;
}
