/**
 * Model + physics → results. Pure: the same model always gives the same result, so callers
 * (language server, CLI) may cache it per document version.
 */
import type { Problem } from '../format/ast';
import { CONSTANTS_SOURCE } from '../physics/constants';
import type { SetupModel } from '../model/types';
import { beamDiagnostics } from './beamDiagnostics';
import { evaluateBeam } from './beamEvaluation';
import { gJLookup } from './gJLookup';
import { evaluateTerm } from './termEvaluation';
import { evaluateLine } from './lineEvaluation';
import { addSpectra } from './spectrumEvaluation';
import { evaluateResonance } from './resonanceEvaluation';
import { attachUncertainty } from './uncertainty/attach';
import { quoteMagnetTable } from './magnetCautionQuote';
import { evaluateFit } from './fitEvaluation';
import { evaluateFieldSource, sourceEvalInput } from './fieldSourceEvaluation';
import { evaluateSlower } from './slowerEvaluation';
import { evaluateTrap } from './trapEvaluation';
import { EVAL_RULES } from './evalCodes';
import { fieldScope } from './fieldScope';
import { evaluateLevel, type EvaluationNote } from './levelEvaluation';
import { stopIfAsked, type StopCheck } from '../format/stopCheck';
import { endSentence } from '../format/sentenceEnd';
import {
  EVALUATION_FORMAT,
  EVALUATION_VERSION,
  type DiagnosticResult,
  type EvaluationResult,
  type LevelResult,
  type TermResult,
} from './resultTypes';

export { workingFields } from './fieldScope';

/**
 * Evaluates the model. `earlier` are the problems of the parser and model; the returned
 * `problems` add what the evaluation found, and `result.diagnostics` lists them all in order.
 * `stop`, when given, is asked between levels, beams, lines and the other items; once it says
 * stop the evaluation throws `EvaluationStopped` (format/stopCheck.ts) instead of finishing.
 */
export function evaluate(model: SetupModel, earlier: Problem[], stop?: StopCheck): { result: EvaluationResult; problems: Problem[] } {
  const scope = fieldScope(model);
  const fields = scope.all;
  const levels: LevelResult[] = [];
  const notes: EvaluationNote[] = [];
  const terms: TermResult[] = [];
  for (const s of model.species) {
    for (const l of s.levels) {
      stopIfAsked(stop);
      const first = notes.length;
      if (l.kind === 'term') {
        const t = evaluateTerm(l, model.settings, scope.of(s), notes);
        if (t) terms.push(t);
      } else {
        const r = evaluateLevel(l, model.settings, scope.of(s), notes);
        if (r) levels.push(r);
      }
      // A level from a used file has its ranges in that file: its notes go on the `use` path here.
      if (s.origin) for (let i = first; i < notes.length; i++) if (notes[i]!.range === l.nameRange) notes[i] = { ...notes[i]!, range: s.origin.useRange };
    }
  }
  const gJOf = gJLookup(levels);
  const beamProblems: Problem[] = [];
  const beams = model.beams.map((b) => {
    stopIfAsked(stop);
    const e = evaluateBeam(b, gJOf);
    beamProblems.push(...beamDiagnostics(b, e));
    return e.result;
  });
  const lineProblems: Problem[] = [];
  const lines = model.lines.map((l) => (stopIfAsked(stop), addSpectra(l, evaluateLine(l, l.lower ? scope.of(l.lower.species) : [], gJOf, lineProblems, model.settings), lineProblems, model.beams)));
  stopIfAsked(stop);
  const resonances = model.resonances.map((r) => evaluateResonance(r, r.level ? scope.of(r.level.species) : [], model.settings, gJOf, lineProblems));
  const fitProblems: Problem[] = [];
  const fits = model.fits.map((f) => (stopIfAsked(stop), evaluateFit(f, gJOf, fitProblems)));
  const sourceProblems: Problem[] = [];
  // Sources and traps print fields in the unit family the file writes fields in (the first field or magnet that gives a unit).
  const fieldUnit = fields.find((f) => f.unit !== undefined)?.unit;
  stopIfAsked(stop);
  const fieldSources = model.sources.map((s) => evaluateFieldSource(sourceEvalInput(s, fieldUnit), sourceProblems));
  const slowerProblems: Problem[] = [];
  const slowers = model.slowers.map((s) => (stopIfAsked(stop), evaluateSlower(s, gJOf, model.settings, slowerProblems)));
  const trapProblems: Problem[] = [];
  const traps = model.traps.map((t) => {
    stopIfAsked(stop);
    const e = evaluateTrap(t, gJOf, model.settings, fieldUnit);
    trapProblems.push(...e.problems);
    return e.result;
  });
  const result: EvaluationResult = {
    format: EVALUATION_FORMAT,
    version: EVALUATION_VERSION,
    constants: CONSTANTS_SOURCE,
    conventions: {
      energy: 'energies are frequencies E/h in Hz',
      g_I: 'H = mu_B B (g_J J_z + g_I I_z); g_I in units of mu_B, negative for a positive nuclear moment',
      energy_zero: "each level's centre of gravity (hyperfine-free energy)",
    },
    settings: { g_s: model.settings.gS, reduced_mass: model.settings.reducedMass },
    species: model.species.map((s) => ({
      name: s.name,
      builtin: !!s.builtin,
      ...(s.massKg ? { mass_kg: { value: s.massKg.value, source: s.massKg.source } } : {}),
      I: s.twoI.value / 2,
      g_I: { value: s.gI.value, source: s.gI.source, ...(s.gI.uncertainty !== undefined ? { uncertainty: s.gI.uncertainty } : {}) },
      levels: s.levels.map((l) => l.name),
      ...(s.origin ? { defined_in: s.origin.path } : {}),
      ...scope.evaluatedAt(s),
    })),
    levels,
    terms,
    fields: model.fields.map((f) => ({ name: f.name, ...(f.tesla ? { field_T: f.tesla.value, ...unitOf('field_unit', f.tesla) } : {}), ...(f.species ? { species: f.species.map((x) => x.name) } : {}) })),
    magnets: model.magnets.map((m) => ({
      name: m.name,
      ...(m.fieldT ? { field_T: m.fieldT.value, ...unitOf('field_unit', m.fieldT) } : {}),
      ...(m.gradientTPerM ? { gradient_T_per_m: m.gradientTPerM.value, ...unitOf('gradient_unit', m.gradientTPerM) } : {}),
      ...(m.lengthM ? { length_m: m.lengthM.value, ...unitOf('length_unit', m.lengthM) } : {}),
      ...(m.sources ? { sources: m.sources.map((x) => x.name), at_m: [...(m.atM?.value ?? [0, 0, 0])] as [number, number, number] } : {}),
      ...scope.beamsThrough(m),
    })),
    beams,
    lines,
    resonances,
    ...(fits.length > 0 ? { fits } : {}),
    ...(fieldSources.length > 0 ? { fieldSources } : {}),
    ...(slowers.length > 0 ? { slowers } : {}),
    ...(traps.length > 0 ? { traps } : {}),
    diagnostics: [],
  };
  stopIfAsked(stop);
  const uncertainty = attachUncertainty(model, result, gJOf);
  if (uncertainty.inputs) result.uncertainty_inputs = uncertainty.inputs;
  quoteMagnetTable(result);
  // The evaluation's findings get their closing stop here, the one place they are gathered (the parser's and model's have it already).
  const found = [...onceEach(notes).map(noteToProblem), ...beamProblems, ...lineProblems, ...fitProblems, ...sourceProblems, ...slowerProblems, ...trapProblems, ...uncertainty.problems];
  const problems = sortProblems([...earlier, ...found.map((p) => ({ ...p, message: endSentence(p.message) }))]);
  result.diagnostics = problems.map(toDiagnosticResult);
  return { result, problems };
}

/** A note that is the same at every field (same text, same place) is said once. */
function onceEach(notes: EvaluationNote[]): EvaluationNote[] {
  const seen = new Set<string>();
  return notes.filter((n) => {
    const key = `${n.code}|${n.message}|${n.range.start.line}:${n.range.start.character}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

function noteToProblem(n: EvaluationNote): Problem {
  const rule = (EVAL_RULES as Record<string, { severity: Problem['severity'] }>)[n.code];
  return { code: n.code, severity: rule?.severity ?? n.severity ?? 'info', message: n.message, range: n.range, ...(n.related ? { related: n.related } : {}) };
}

export function sortProblems(problems: Problem[]): Problem[] {
  return [...problems].sort(
    (a, b) => a.range.start.line - b.range.start.line || a.range.start.character - b.range.start.character,
  );
}

export function toDiagnosticResult(p: Problem): DiagnosticResult {
  return {
    code: p.code,
    severity: p.severity,
    message: p.message,
    line: p.range.start.line + 1,
    column: p.range.start.character + 1,
    end_line: p.range.end.line + 1,
    end_column: p.range.end.character + 1,
  };
}

/** `{ [key]: unit }` when the file wrote a unit for the value (the unit echo of reports). */
function unitOf<K extends string>(key: K, v: { unit?: string }): Partial<Record<K, string>> {
  return v.unit !== undefined ? ({ [key]: v.unit } as Record<K, string>) : {};
}
