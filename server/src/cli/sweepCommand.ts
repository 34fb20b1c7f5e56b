/**
 * `sublevel sweep <file> --level NAME --from 0 --to 0.1T --points 2001 [--format csv|json] [--out FILE]`:
 * exact sublevel energies of one level over a field range, for plots and analysis code.
 */
import { writeOutputFile } from './output';
import { analyze } from '../eval/analyze';
import { engineSpec } from '../eval/levelSpec';
import { readQuantityArgument } from '../format/quantityArgument';
import { suggestNames } from '../format/didYouMean';
import { sweepLevel, type SweepResult } from '../physics/engine';
import type { LevelModel, SetupModel } from '../model/types';
import { type ParsedArgs, rejectUnknownOptions, stringOption, UsageError } from './args';
import { readSetupFile } from './files';
import { stateTableCsv } from '../render/csv';
import { diskSources } from '../service/workspaceFiles';
import type { CliIO } from './io';

/** Largest number of points the CLI accepts in one sweep (the engine has its own, larger caps). */
export const MAX_CLI_POINTS = 200_001;

export function runSweep(args: ParsedArgs, io: CliIO): number {
  rejectUnknownOptions(args, ['level', 'from', 'to', 'points', 'format', 'out']);
  if (args.positionals.length !== 1) throw new UsageError('sweep needs exactly one setup file');
  const file = args.positionals[0]!;
  const format = stringOption(args, 'format', ['csv', 'json']) ?? 'csv';
  const fromT = fieldOption(args, 'from', 0);
  const toT = fieldOption(args, 'to');
  const points = pointsOption(args);
  if (fromT === toT) throw new UsageError('--from and --to are the same field; give a range');

  const analysis = analyze(readSetupFile(file), diskSources(file));
  if (!analysis.model || !analysis.result) throw new UsageError(`${file} could not be read`);
  const level = findLevel(analysis.model, stringOption(args, 'level'));
  const gJ = analysis.result.levels.find((l) => l.species === level.species.name && l.level === level.name)?.g_J.used;
  const spec = engineSpec(level, gJ, analysis.model.settings);
  if (!spec) throw new UsageError(`level '${level.name}' has problems to fix first (run: sublevel check ${file})`);

  const sweep = sweepLevel(spec, fromT, toT, points);
  const errors = sweep.issues.filter((i) => i.severity === 'error');
  if (errors.length > 0) {
    for (const e of errors) io.err(`sublevel: ${e.message}`);
    return 1;
  }
  const text = format === 'csv' ? sweepCsv(sweep, file, level) : JSON.stringify(sweepJson(file, level, sweep), null, 1);
  const out = stringOption(args, 'out');
  if (out) {
    writeOutputFile(out, text + '\n');
    io.err(`wrote ${sweep.states.length} sublevels × ${points} fields to ${out}`);
  } else io.out(text);
  return 0;
}

function fieldOption(args: ParsedArgs, name: string, fallback?: number): number {
  const text = stringOption(args, name);
  if (text === undefined) {
    if (fallback !== undefined) return fallback;
    throw new UsageError(`sweep needs --${name}, e.g. --${name} 0.1T`);
  }
  const r = readQuantityArgument(text, 'flux-density', `--${name}`);
  if (r.si === undefined) throw new UsageError(r.message ?? `--${name}: cannot read '${text}'`);
  return r.si;
}

function pointsOption(args: ParsedArgs): number {
  const text = stringOption(args, 'points') ?? '2001';
  const n = Number(text);
  if (!Number.isInteger(n) || n < 2) throw new UsageError(`--points must be a whole number of at least 2, got '${text}'`);
  if (n > MAX_CLI_POINTS) throw new UsageError(`--points ${n} is more than the ${MAX_CLI_POINTS} a sweep may have`);
  return n;
}

function findLevel(model: SetupModel, name: string | undefined): LevelModel {
  const all = model.species.flatMap((s) => s.levels);
  const qualified = (l: LevelModel): string => `${l.species.name}.${l.name}`;
  if (name === undefined) {
    if (all.length === 1) return all[0]!;
    throw new UsageError(`sweep needs --level, one of: ${all.map(qualified).join(', ') || '(no levels in the file)'}`);
  }
  const matches = all.filter((l) => l.name === name || qualified(l) === name);
  if (matches.length === 1) return matches[0]!;
  if (matches.length > 1) throw new UsageError(`level '${name}' is in several species; write one of ${matches.map(qualified).join(', ')}`);
  const hint = suggestNames(name, all.map((l) => l.name));
  throw new UsageError(`no level named '${name}'${hint.length ? ` — did you mean ${hint.map((h) => `'${h}'`).join(' or ')}?` : ''}`);
}

/** CSV in the project's convention (docs/csv.md): field_T, energies and moments of every state, states in the documented order. */
export function sweepCsv(s: SweepResult, file: string, level: LevelModel): string {
  const states = s.states.map((st) => ({ lowLabel: st.low.text, highLabel: st.high.text, energyHz: st.energyHz, momentJT: st.momentJT }));
  return stateTableCsv({ kind: 'sweep', about: [['file', file], ['level', `${level.species.name}.${level.name}`]] }, s.fieldsT, states).trimEnd();
}

function sweepJson(file: string, level: LevelModel, s: SweepResult) {
  return {
    format: 'sublevel-sweep',
    version: 1,
    file,
    species: level.species.name,
    level: level.name,
    field_T: Array.from(s.fieldsT),
    states: s.states.map((st) => ({
      low_label: st.low.text,
      high_label: st.high.text,
      m: st.twoM / 2,
      energy_Hz: Array.from(st.energyHz),
      moment_J_per_T: Array.from(st.momentJT),
    })),
    crossings: s.crossings.map((c) => ({
      a: s.states[c.stateA]!.low.text,
      b: s.states[c.stateB]!.low.text,
      field_T: c.fieldT,
      energy_Hz: c.energyHz,
    })),
  };
}
