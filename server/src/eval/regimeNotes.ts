/** Notes for a level whose working field is past the weak-field (linear) regime, and for engine errors. */
import type { LevelModel } from '../model/types';
import type { ExactAtField } from './exactAtField';
import type { EvaluationNote, WorkingField } from './levelEvaluation';
import { fieldInUnit } from './writtenUnit';

export function regimeNotes(level: LevelModel, f: WorkingField, r: ExactAtField): EvaluationNote[] {
  // Size caps do not depend on the field: the same note at every field is merged into one by the caller.
  const notes: EvaluationNote[] = r.errors.map((e) =>
    e.code === 'basis-too-large' || e.code === 'block-too-large'
      ? { code: 'level-too-large', message: `level '${level.name}': ${e.message}`, range: level.nameRange }
      : { code: 'level-not-computed', message: `level '${level.name}' could not be computed at ${f.source.kind} ${f.source.name} (${fieldInUnit(f.tesla, { unit: f.unit })}): ${e.message}`, range: f.range },
  );
  // Everything else the engine says reaches the diagnostics under its own code (said once by the caller).
  for (const n of r.notices) notes.push({ code: n.code, severity: n.severity, message: `level '${level.name}': ${n.message}`, range: level.nameRange });
  const where = `at ${f.source.kind} ${f.source.name} (${fieldInUnit(f.tesla, { unit: f.unit })})`;
  const what = `level ${level.species.name}.${level.name}`;
  const lowLabels = level.kind === 'term' ? '|J, m_J>' : '|F, m_F>';
  const highLabels = level.kind === 'term' ? '|m_L, m_S>' : '|m_J, m_I>';
  if (r.regime?.verdict === 'intermediate') {
    const limit = r.regime.linear_limit_T !== null ? `; the linear formula holds to 1 % only below ${fieldInUnit(r.regime.linear_limit_T, { family: f.unit })}` : '';
    notes.push({ code: 'zeeman-not-linear', message: `${what} is in the intermediate regime ${where}${limit}. Sublevel energies come from exact diagonalisation.`, range: f.range });
  } else if (r.regime?.verdict.startsWith('strong')) {
    notes.push({
      code: 'zeeman-strong-field',
      message: `${what} is in the strong-field (decoupled) regime ${where}: labels ${lowLabels} no longer describe the states; read the ${highLabels} labels.`,
      range: f.range,
    });
  }
  return notes;
}
