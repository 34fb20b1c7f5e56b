/**
 * `sublevel sweep <file> --level NAME --from 0 --to 0.1T --points 2001 [--format csv|json] [--crossings] [--out FILE]`:
 * exact sublevel energies of one level over a field range, for plots and analysis code. The
 * crossing search costs 1.4–1.6× the sweep itself (docs/speed.md) and only the JSON can carry
 * its answer, so it runs when asked for (`--crossings`), not on every sweep.
 */
import { csvNumberTableText, type CsvNumberTable, stateTable } from '../render/csv';
import { csvTablePieces } from './csvTablePieces';
import { sweepEnergyUnc } from '../eval/uncertainty/sweepPass';
import { engineSpec } from '../eval/levelSpec';
import { selectLevel } from './selectors';
import { type EngineIssue, sweepLevel, type SweepResult } from '../physics/engine';
import type { Problem, Range } from '../format/ast';
import type { LevelModel, SetupModel } from '../model/types';
import { type CommandSpec, type ParsedArgs, stringOption, UsageError } from './args';
import { createProgress, type Progress } from './progress';
import { OUT_OPTION, ROOT_OPTION, rootOption } from './files';
import { analyzeFile, listErrorsFirst, reportErrors } from './analyzeFile';
import { jsonText } from './escape';
import { readFieldOption, MAX_CLI_FIELD_T } from './fieldOption';
import { cliProblem, diagnosticLine, FileProblemError } from './fileProblems';
import type { CliContext } from './io';
import { writeOutputFile } from './output';

/** Largest number of points the CLI accepts in one sweep (the engine has its own, larger caps). */
export const MAX_CLI_POINTS = 200_001;
const FORMATS = ['csv', 'json'] as const;

export const sweepSpec: CommandSpec = {
  name: 'sweep',
  operands: '<file>',
  summary: 'exact sublevel energies of one level over a field range',
  options: {
    ...ROOT_OPTION,
    level: { value: 'NAME', help: 'the level (species.level when the name is in several species); needed when the file has more than one' },
    from: { value: 'FIELD', help: 'first field, e.g. 0 or -50G (default 0)' },
    to: { value: 'FIELD', help: 'last field, e.g. 0.1T or "500 G" (required)' },
    points: { value: 'N', help: `number of fields, a whole number from 2 to ${MAX_CLI_POINTS} in decimal digits (default 2001)` },
    format: { value: 'FORMAT', choices: FORMATS, help: 'csv: field_T, then energy and moment columns per state (default; docs/csv.md); json: field_T and, per state, its labels, m, energy_Hz and moment_J_per_T (and the crossings with --crossings)' },
    crossings: { help: 'also find where sublevels of different m cross (listed in the JSON; the sweep then takes about 2.5× as long)' },
    ...OUT_OPTION,
  },
  notes: [`Fields use the file's units (T, mT, G, ...); |B| may be at most ${MAX_CLI_FIELD_T.toExponential().replace('+', '')} T.`],
};

export function runSweep(args: ParsedArgs, ctx: CliContext): number {
  if (args.positionals.length !== 1) throw new UsageError('sweep needs exactly one setup file');
  const file = args.positionals[0]!;
  const format = stringOption(args, 'format', FORMATS) ?? 'csv';
  const fromT = fieldOption(args, 'from', 0);
  const toT = fieldOption(args, 'to');
  const points = pointsOption(args);
  const out = stringOption(args, 'out');
  const crossings = args.options.has('crossings');
  if (crossings && format !== 'json') throw new UsageError('--crossings lists the crossings in the JSON document; add --format json');
  if (fromT === toT) throw new UsageError('--from and --to are the same field; give a range');

  const analysis = analyzeFile(file, ctx, rootOption(stringOption(args, 'root'), ctx.fsys));
  if (!analysis.model || !analysis.result) throw new FileProblemError(file, analysis.problems);
  const level = findLevel(file, analysis.model, stringOption(args, 'level'));
  const gJ = analysis.result.levels.find((l) => l.species === level.species.name && l.level === level.name)?.g_J.used;
  const spec = engineSpec(level, gJ, analysis.model.settings);
  // Where the level is written, when it is in this file (a used file's ranges are in that file).
  const at = level.species.origin ? undefined : level.nameRange;
  if (!spec) {
    const listed = listErrorsFirst(file, analysis, ctx);
    throw new FileProblemError(file, [cliProblem('nothing-to-compute', `level '${level.name}' has problems to fix before it can be swept${listed}`, at)]);
  }

  // A bar on a terminal for long sweeps (per m block); the bar hides itself when stderr is piped.
  let progress: Progress | undefined;
  const onProgress = (done: number, total: number): void => {
    progress ??= createProgress(ctx.progress, 'sweep', total);
    progress.update(done);
  };
  const sweep = sweepLevel(spec, fromT, toT, points, { crossings, onProgress });
  progress?.clear();
  const errors = sweep.issues.filter((i) => i.severity === 'error');
  if (errors.length > 0) {
    throw new FileProblemError(file, errors.map((e) => ({ ...cliProblem('nothing-to-compute', e.message, at), code: e.code })));
  }
  // Warnings and notes of the sweep (a capped crossing search) on stderr, and in the JSON.
  for (const i of sweep.issues) ctx.io.err(diagnosticLine(file, issueProblem(i, at)));
  // A CSV file gets the table in pieces, never as one string (csvTablePieces); the rows start
  // with the field, so the table's text ends in one newline, as the printed text plus one does.
  const table = format === 'csv' ? sweepTable(sweep, file, level, sweepEnergyUnc(analysis.model, level, spec, sweep)) : undefined;
  if (out) {
    writeOutputFile(out, table ? csvTablePieces(table) : jsonText(sweepJson(file, level, sweep, crossings), 1) + '\n', ctx.fsys);
    ctx.io.err(`wrote ${sweep.states.length} sublevels × ${points} fields to ${out}`);
  } else ctx.io.out(table ? csvNumberTableText(table).trimEnd() : jsonText(sweepJson(file, level, sweep, crossings), 1));
  return reportErrors(file, analysis, ctx) > 0 ? 1 : 0;
}

function issueProblem(i: EngineIssue, at: Range | undefined): Problem {
  return { ...cliProblem('nothing-to-compute', i.message, at), code: i.code, severity: i.severity };
}

function fieldOption(args: ParsedArgs, name: string, fallback?: number): number {
  const text = stringOption(args, name);
  if (text === undefined) {
    if (fallback !== undefined) return fallback;
    throw new UsageError(`sweep needs --${name}, e.g. --${name} 0.1T`);
  }
  return readFieldOption(name, text);
}

function pointsOption(args: ParsedArgs): number {
  const text = stringOption(args, 'points') ?? '2001';
  // Decimal digits only: Number() would read 0x10 as 16, 1e3 as 1000 and ' 5' as 5.
  const n = /^[0-9]+$/.test(text) ? Number(text) : NaN;
  if (!Number.isInteger(n) || n < 2) throw new UsageError(`--points must be a whole number of at least 2 in decimal digits, got '${text}'`);
  if (n > MAX_CLI_POINTS) throw new UsageError(`--points ${n} is more than the ${MAX_CLI_POINTS} a sweep may have`);
  return n;
}

function findLevel(file: string, model: SetupModel, name: string | undefined): LevelModel {
  const all = model.species.flatMap((s) => s.levels);
  const qualified = (l: LevelModel): string => `${l.species.name}.${l.name}`;
  if (name === undefined) {
    if (all.length === 1) return all[0]!;
    if (all.length === 0) throw new FileProblemError(file, [cliProblem('nothing-to-compute', 'the file has no level to sweep; add a species with a level, e.g. `level ground: 2S1/2`')]);
    throw new UsageError(`sweep needs --level, one of: ${all.map(qualified).join(', ')}`);
  }
  return selectLevel(model, name); // the matching every command uses (qualified or bare name, ambiguity, did you mean)
}

/** CSV in the project's convention (docs/csv.md): field_T, energies and moments of every state, states in the documented order. */
function sweepTable(s: SweepResult, file: string, level: LevelModel, energyUnc?: Float64Array[]): CsvNumberTable {
  const states = s.states.map((st, i) => ({ lowLabel: st.low.text, highLabel: st.high.text, energyHz: st.energyHz, momentJT: st.momentJT, ...(energyUnc?.[i] ? { energyUncHz: energyUnc[i] } : {}) }));
  return stateTable({ kind: 'sweep', about: [['file', file], ['level', `${level.species.name}.${level.name}`]] }, s.fieldsT, states);
}

/** Version 2: `crossings` is there only when the search was asked for (`--crossings`); `notes` added. */
function sweepJson(file: string, level: LevelModel, s: SweepResult, crossings: boolean) {
  return {
    format: 'sublevel-sweep',
    version: 2,
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
    ...(crossings
      ? {
          crossings: s.crossings.map((c) => ({
            a: s.states[c.stateA]!.low.text,
            b: s.states[c.stateB]!.low.text,
            field_T: c.fieldT,
            energy_Hz: c.energyHz,
          })),
        }
      : {}),
    notes: s.issues.map((i) => ({ severity: i.severity, code: i.code, message: i.message })),
  };
}
