/**
 * The report's line for a species evaluated at some of the working fields only: which ones and
 * why, and which are left out (docs/format.md, "Which fields a level is evaluated at").
 */
import type { EvaluationResult, SpeciesResult } from './resultTypes';

type Source = { kind: 'field' | 'magnet'; name: string };

/** At most this many left-out fields are named; more are counted. */
const NAMED_LEFT_OUT = 3;

/** Undefined when the species is evaluated at every working field. */
export function fieldScopeLine(r: Pick<EvaluationResult, 'fields' | 'magnets' | 'beams'>, s: SpeciesResult): string | undefined {
  if (!s.evaluated_at) return undefined;
  const all: Source[] = [
    ...r.fields.filter((f) => f.field_T !== undefined).map((f) => ({ kind: 'field' as const, name: f.name })),
    ...r.magnets.filter((m) => m.field_T !== undefined).map((m) => ({ kind: 'magnet' as const, name: m.name })),
  ];
  const key = (x: Source): string => `${x.kind} ${x.name}`;
  const inside = new Set(s.evaluated_at.map(key));
  const why = (x: Source, own: boolean): string => {
    if (x.kind === 'field') {
      const list = r.fields.find((f) => f.name === x.name)?.species;
      if (!list) return 'every species';
      if (list.length === 0) return 'its species list names no known species';
      return own ? 'its species list' : `species = ${list.length > 3 ? `${list.slice(0, 3).join(', ')}, …` : list.join(', ')}`;
    }
    const beams = r.beams.filter((b) => b.magnet === x.name && b.species !== undefined && (b.species === s.name) === own);
    if (beams.length === 0) return 'no beam: every species';
    const named = beams.slice(0, 3).map((b) => (own ? `beam ${b.name}` : `beam ${b.name} of ${b.species}`));
    return `${named.join(', ')}${beams.length > 3 ? ', …' : ''}`;
  };
  const at = s.evaluated_at.map((x) => `${key(x)} (${why(x, true)})`);
  const out = all.filter((x) => !inside.has(key(x)));
  const head = s.evaluated_at.length === 0 ? `  evaluated at none of the file's ${all.length} working fields` : `  evaluated at ${s.evaluated_at.length} of the file's ${all.length} working fields: ${at.join(', ')}`;
  const rest =
    out.length <= NAMED_LEFT_OUT
      ? `not at ${out.map((x) => `${key(x)} (${why(x, false)})`).join(', ')}`
      : `not at the ${out.length} others, which concern other species (a field's species list, the beams through a magnet)`;
  return `${head}; ${rest}`;
}
