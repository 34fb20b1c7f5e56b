/** Picking a level, field or beam of an analysed file by name for the CLI, with did-you-mean. */
import { suggestNames } from '../format/didYouMean';
import { workingFields } from '../eval/evaluate';
import type { WorkingField } from '../eval/levelEvaluation';
import type { BeamModel, LevelModel, SetupModel } from '../model/types';
import { UsageError } from './args';

function pick<T>(kind: string, items: T[], nameOf: (t: T) => string[], wanted: string | undefined, fallback?: T): T {
  if (wanted === undefined) {
    if (fallback !== undefined) return fallback;
    if (items.length === 1) return items[0]!;
    const all = items.map((t) => nameOf(t)[0]!).join(', ');
    throw new UsageError(items.length === 0 ? `the file has no ${kind}` : `say which ${kind} with --${kind}: ${all}`);
  }
  const matches = items.filter((t) => nameOf(t).includes(wanted));
  if (matches.length === 1) return matches[0]!;
  if (matches.length > 1) throw new UsageError(`${kind} '${wanted}' is ambiguous; write one of ${matches.map((m) => nameOf(m)[0]).join(', ')}`);
  const hint = suggestNames(wanted, items.flatMap(nameOf));
  throw new UsageError(`no ${kind} named '${wanted}'${hint.length ? ` — did you mean ${hint.map((h) => `'${h}'`).join(' or ')}?` : namesOnFile(kind, items.map((t) => nameOf(t)[0]!))}`);
}

/** With no near name to suggest, the names the file does have (a few), so the next try need not guess. */
function namesOnFile(kind: string, names: string[]): string {
  const SHOWN = 8;
  if (names.length === 0) return `: the file has no ${kind}`;
  const listed = names.slice(0, SHOWN).map((n) => `'${n}'`).join(', ');
  return `; the file has ${listed}${names.length > SHOWN ? ` and ${names.length - SHOWN} more` : ''}`;
}

/** A level by `Species.level` or by its bare name (ambiguous when several species have it). */
export function selectLevel(model: SetupModel, wanted: string): LevelModel {
  const all = model.species.flatMap((s) => s.levels);
  return pick('level', all, (l) => [`${l.species.name}.${l.name}`, l.name], wanted);
}

export function selectBeam(model: SetupModel, wanted: string | undefined): BeamModel {
  return pick('beam', model.beams, (b) => [b.name], wanted);
}

/** A named field or magnet of the file, or the first working field when none is named. */
export function selectField(model: SetupModel, wanted: string | undefined): WorkingField | undefined {
  const fields = workingFields(model);
  if (wanted === undefined) return fields[0];
  return pick('field', fields, (f) => [f.source.name], wanted);
}

/** The name of a line (or resonance) of the file, checked; undefined when none is asked for. */
export function selectName(kind: 'line' | 'resonance' | 'fit' | 'slower' | 'trap', names: string[], wanted: string | undefined): string | undefined {
  return wanted === undefined ? undefined : pick(kind, names, (n) => [n], wanted);
}

/** Field sources named on the command line (`--source a,b`), each checked; their names in the order given. */
export function selectSources(model: SetupModel, wanted: string): string[] {
  return wanted.split(',').map((n) => pick('source', model.sources, (s) => [s.name], n.trim()).name);
}
