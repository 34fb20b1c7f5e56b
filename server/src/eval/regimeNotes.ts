/**
 * Notes about a level at its working fields: the engine's own errors and notices (per field,
 * merged by the caller when equal), and one regime note per level that lists every field past
 * the weak-field (linear) regime, with the thresholds to 3 significant digits — a file with
 * several fields used to get one six-digit note per level and field.
 */
import type { LevelModel } from '../model/types';
import type { ExactAtField } from './exactAtField';
import type { EvaluationNote, WorkingField } from './levelEvaluation';
import { fieldInUnit } from './writtenUnit';
import { listWords } from '../physics/listWords';

/** A level's exact result at one working field. */
export interface FieldPoint {
  f: WorkingField;
  r: ExactAtField;
}

/** Thresholds are a rough boundary (1 % criterion): 3 significant digits say all there is. */
const THRESHOLD_DIGITS = 3;

export function engineNotes(level: LevelModel, { f, r }: FieldPoint): EvaluationNote[] {
  // Size caps do not depend on the field: the same note at every field is merged into one by the caller.
  const notes: EvaluationNote[] = r.errors.map((e) =>
    e.code === 'basis-too-large' || e.code === 'block-too-large'
      ? { code: 'level-too-large', message: `level '${level.name}': ${e.message}`, range: level.nameRange }
      : { code: 'level-not-computed', message: `level '${level.name}' could not be computed at ${fieldName(f)}: ${e.message}`, range: f.range },
  );
  // Everything else the engine says reaches the diagnostics under its own code (said once by the caller).
  for (const n of r.notices) notes.push({ code: n.code, severity: n.severity, message: `level '${level.name}': ${n.message}`, range: level.nameRange });
  return notes;
}

/** One note for the level, or none when every field is in the weak-field regime. */
export function regimeNote(level: LevelModel, points: readonly FieldPoint[]): EvaluationNote | undefined {
  const strong = points.filter((p) => p.r.regime?.verdict.startsWith('strong'));
  const middle = points.filter((p) => p.r.regime?.verdict === 'intermediate');
  if (strong.length === 0 && middle.length === 0) return undefined;
  // The limits belong to the level, not the field; each is said in the unit family of the fields it is about.
  const limit = (group: readonly FieldPoint[], key: 'strong_limit_T' | 'linear_limit_T'): string | undefined => {
    const t = group[0]!.r.regime?.[key];
    return t === null || t === undefined || !Number.isFinite(t) ? undefined : fieldInUnit(t, { family: group[0]!.f.unit, digits: THRESHOLD_DIGITS });
  };
  const parts: string[] = [];
  if (strong.length > 0) {
    // A whole term with its hyperfine data is computed with its nucleus (termSpec).
    const withNucleus = level.kind === 'term' && (level.levelA !== undefined || level.levelB !== undefined) && level.species.twoI.value > 0;
    const low = withNucleus ? '|J, F, m_F>' : level.kind === 'term' ? '|J, m_J>' : '|F, m_F>';
    const high = withNucleus ? '|m_L, m_S, m_I>' : level.kind === 'term' ? '|m_L, m_S>' : '|m_J, m_I>';
    const above = limit(strong, 'strong_limit_T');
    parts.push(`in the strong-field (decoupled) regime at ${fieldList(strong)}${above ? ` (above ${above})` : ''}: labels ${low} no longer describe the states; read the ${high} labels`);
  }
  if (middle.length > 0) {
    const below = limit(middle, 'linear_limit_T');
    parts.push(`in the intermediate regime at ${fieldList(middle)}${below ? ` (the linear formula holds to 1 % only below ${below})` : ''}; energies come from exact diagonalisation`);
  }
  const fields = [...strong, ...middle];
  return {
    code: strong.length > 0 ? 'zeeman-strong-field' : 'zeeman-not-linear',
    message: `level ${level.species.name}.${level.name} is ${parts.join('; and ')}.`,
    range: level.nameRange,
    related: fields.map((p) => ({ message: `${fieldName(p.f)} is set here`, range: p.f.range })),
  };
}

export function fieldName(f: WorkingField): string {
  // Every level at a field names it in its notes (thousands of times in a large file): made once per field.
  const known = fieldNames.get(f);
  if (known && known.tesla === f.tesla && known.unit === f.unit && known.kind === f.source.kind && known.name === f.source.name) return known.text;
  const text = `${f.source.kind} ${f.source.name} (${fieldInUnit(f.tesla, { unit: f.unit })})`;
  fieldNames.set(f, { tesla: f.tesla, unit: f.unit, kind: f.source.kind, name: f.source.name, text });
  return text;
}

/** `fieldName` by field, with what it was made from (a field changed since is named again). */
const fieldNames = new WeakMap<WorkingField, { tesla: number; unit: string | undefined; kind: string; name: string; text: string }>();

function fieldList(points: readonly FieldPoint[]): string {
  return listWords(points.map((p) => fieldName(p.f)), 'and');
}
