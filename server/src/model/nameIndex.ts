/**
 * Declarations of named things and the lookup of references to them, with
 * "did you mean" suggestions for names that are not found.
 */
import type { Range, Spanned } from '../format/ast';
import { suggestNames } from '../format/didYouMean';
import { findSpecies } from '../physics/species/lookup';
import type { ProblemList } from './problems';
import type { LevelModel, NameUse, SpeciesModel, SpeciesOrigin } from './types';

export type NamedKind = NameUse['kind'];

export class NameIndex<T extends { name: string; nameRange: Range; origin?: SpeciesOrigin }> {
  private readonly byName = new Map<string, T>();
  /** Grows with every indexed item, so `derived` knows when to rebuild. */
  private revision = 0;
  private memo: { revision: number; value: unknown } | undefined;

  /**
   * `carry`, when given, may hand back what an earlier version derived from the same items
   * (`BlockMemo.carry`); `derived` then skips the work.
   */
  constructor(
    private readonly kind: NamedKind,
    private readonly uses: NameUse[],
    private readonly carry?: <V>(items: T[], build: (items: T[]) => V) => V,
  ) {}

  /** Declare; a second declaration of the same name is reported and not indexed. */
  declare(item: T, problems: ProblemList): boolean {
    this.uses.push({ kind: this.kind, name: item.name, range: item.nameRange, isDeclaration: true });
    const first = this.byName.get(item.name);
    if (first) {
      problems.add('name-duplicate', `there is already a ${this.kind} named '${item.name}'`, item.nameRange, {
        related: [{ message: `first ${this.kind} '${item.name}' is here`, range: first.nameRange }],
      });
      return false;
    }
    this.byName.set(item.name, item);
    this.revision++;
    return true;
  }

  /**
   * Take in a declaration made in another file (no name use is recorded: its range is not in
   * this file). Gives the item already holding the name, if any, and then does not index it.
   */
  adopt(item: T): T | undefined {
    const first = this.byName.get(item.name);
    if (first) return first;
    this.byName.set(item.name, item);
    this.revision++;
    return undefined;
  }

  /** A value computed from the indexed items, kept until another item is indexed (one per index). */
  derived<V>(build: (items: T[]) => V): V {
    if (this.memo?.revision !== this.revision) this.memo = { revision: this.revision, value: this.carry ? this.carry(this.all(), build) : build(this.all()) };
    return this.memo.value as V;
  }

  get(name: string): T | undefined {
    return this.byName.get(name);
  }

  all(): T[] {
    return [...this.byName.values()];
  }

  /** Resolve a reference, recording the use; unknown names get a problem with suggestions. */
  resolve(ref: Spanned, problems: ProblemList): T | undefined {
    const found = this.byName.get(ref.text);
    this.uses.push({
      kind: this.kind,
      name: ref.text,
      range: ref.range,
      isDeclaration: false,
      ...(found ? { target: { kind: this.kind, name: found.name, range: found.nameRange, ...(found.origin ? { uri: found.origin.uri } : {}) } } : {}),
    });
    if (!found) reportUnknown(this.kind, ref, [...this.byName.keys()], problems);
    return found;
  }
}

export function reportUnknown(kind: NamedKind, ref: Spanned, candidates: string[], problems: ProblemList): void {
  if (kind === 'species') return reportUnknownSpecies(ref, candidates, problems);
  const suggestions = suggestNames(ref.text, candidates);
  const hint = suggestions.length > 0 ? ` — did you mean ${suggestions.map((s) => `'${s}'`).join(' or ')}?` : '';
  const none = candidates.length === 0 ? ` (no ${kind} is defined in this file)` : '';
  problems.add('name-unknown', `no ${kind} named '${ref.text}'${hint}${none}`, ref.range, { data: { suggestions } });
}

/**
 * A species is named by its block's name, so `39K` or `k39` misses `species K39`, and a built-in
 * name misses when the file has no block for it: both are said as such.
 */
function reportUnknownSpecies(ref: Spanned, candidates: string[], problems: ProblemList): void {
  const builtin = findSpecies(ref.text);
  const sameAtom = builtin ? candidates.filter((c) => findSpecies(c) === builtin) : [];
  const suggestions = sameAtom.length > 0 ? sameAtom : suggestNames(ref.text, candidates);
  let message = `no species named '${ref.text}'`;
  if (suggestions.length > 0) message += ` — did you mean ${suggestions.map((s) => `'${s}'`).join(' or ')}?`;
  if (sameAtom.length > 0) message += ' A species is named as its block names it.';
  else if (builtin) message += `${suggestions.length > 0 ? ' ' : ': '}${builtin.id} is built in, but a file uses a species only through its own block; add \`species ${builtin.id}\` with the levels you need`;
  else if (candidates.length === 0) message += ' (no species is defined in this file)';
  problems.add('name-unknown', message, ref.range, { data: { suggestions } });
}

/**
 * Resolve a level reference: `name` searches every species (must be unique unless a species
 * is implied by context), `Species.name` searches one species.
 */
export function resolveLevel(
  ref: { qualifier?: Spanned; name: Spanned },
  species: NameIndex<SpeciesModel>,
  context: SpeciesModel | undefined,
  uses: NameUse[],
  problems: ProblemList,
): LevelModel | undefined {
  // Without a qualifier or a context the pool is every species: listed only when a name is
  // unknown (listing it for every reference made the model quadratic in the file).
  let only: SpeciesModel | undefined = context;
  if (ref.qualifier) {
    only = species.resolve(ref.qualifier, problems);
    if (!only) return undefined;
  }
  const matches = only ? levelsNamed(only, ref.name.text) : (levelsByName(species).get(ref.name.text) ?? []);
  if (matches.length > 1) {
    problems.add(
      'name-ambiguous',
      `level '${ref.name.text}' exists in ${matches.map((m) => m.species.name).join(' and ')}; write it as ${matches
        .map((m) => `'${m.species.name}.${m.name}'`)
        .join(' or ')}`,
      ref.name.range,
      { data: { suggestions: matches.map((m) => `${m.species.name}.${m.name}`) } },
    );
    uses.push({ kind: 'level', name: ref.name.text, range: ref.name.range, isDeclaration: false });
    return undefined;
  }
  const found = matches[0];
  // Written out rather than spread: this runs for every level reference of every keystroke.
  const use: NameUse = { kind: 'level', name: ref.name.text, range: ref.name.range, isDeclaration: false };
  if (found) {
    const origin = found.species.origin;
    use.target = origin ? { kind: 'level', name: found.name, range: found.nameRange, uri: origin.uri } : { kind: 'level', name: found.name, range: found.nameRange };
  }
  uses.push(use);
  if (!found) {
    reportUnknown('level', ref.name, (only ? [only] : species.all()).flatMap((s) => s.levels.map((l) => l.name)), problems);
  }
  return found;
}

function levelsNamed(species: SpeciesModel, name: string): LevelModel[] {
  const out: LevelModel[] = [];
  for (const l of species.levels) if (l.name === name) out.push(l);
  return out;
}

/**
 * Level name → its levels in every species (species order, then level order). Built once per
 * species index (again only if a species was added since), so an unqualified level reference
 * costs a lookup instead of a scan of every level of every species.
 */
function levelsByName(species: NameIndex<SpeciesModel>): Map<string, LevelModel[]> {
  return species.derived((all) => {
    const map = new Map<string, LevelModel[]>();
    for (const s of all) {
      for (const l of s.levels) {
        const list = map.get(l.name);
        if (list) list.push(l);
        else map.set(l.name, [l]);
      }
    }
    return map;
  });
}
