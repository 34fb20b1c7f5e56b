/** Validate a spec and build its block model in one step. */
import { buildFineModel } from './fineModel';
import { hasError } from './issues';
import { buildHyperfineModel } from './hyperfineModel';
import { buildWholeTermModel } from './wholeTermModel';
import type { LevelModel } from './levelModel';
import type { EngineIssue, LevelSpec } from './types';
import { validateSpec } from './validateSpec';

export interface ModelResult {
  model: LevelModel | null;
  issues: EngineIssue[];
}

export function buildLevelModel(spec: LevelSpec): ModelResult {
  const { spec: clean, issues } = validateSpec(spec);
  if (!clean || hasError(issues)) return { model: null, issues };
  const model = clean.kind === 'hyperfine' ? buildHyperfineModel(clean) : clean.kind === 'term' ? buildWholeTermModel(clean) : buildFineModel(clean);
  return { model, issues };
}
