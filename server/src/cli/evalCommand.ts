/**
 * `sublevel eval <file>`: every computed quantity, as a readable report or the versioned JSON
 * document. `sublevel eval <files or folders…>` and `--files-from LIST` evaluate many files in
 * one process (worker threads, `--jobs`), printed in the order given; a file that cannot be read
 * or evaluated is reported in its place and the run goes on; the exit code is the worst file's.
 */
import * as path from 'path';
import { type CommandSpec, type ParsedArgs, stringOption, UsageError } from './args';
import { EVAL_FORMATS, type EvalFormat, type EvalJob, type EvalOutcome, evaluateForOutput, jsonLine } from './evalFile';
import { toDiagnosticResult } from '../eval/evaluate';
import { diagnosticLine } from './fileProblems';
import { readPathList } from './filesFrom';
import { lazyBuiltin } from './lazyBuiltin';
import { findSetupFiles, FOLDERS_ROOT_OPTION, type FoundPath, rootOption, SETUP_EXTENSION } from './files';
import { nodeFileSystem } from './fileSystem';
import type { CliContext } from './io';
import { createProgress } from './progress';
import { runInWorkers } from './workerPool';
import { FAIL_ON_OPTION, type FailOn, failOnOption } from './severityThreshold';

/** Most worker threads `--jobs` may ask for. */
export const MAX_JOBS = 64;

export const evalSpec: CommandSpec = {
  name: 'eval',
  operands: '<file> | <files or folders...>',
  summary: 'every computed quantity of setup files: g-factors, sublevels, beams, lines, resonances',
  options: {
    format: {
      value: 'FORMAT',
      choices: EVAL_FORMATS,
      help: 'text: a readable report (default); json: the versioned document (docs/schema; one file); jsonl: one line per file {file, errors, result}',
    },
    'files-from': { value: 'LIST', help: 'also evaluate the paths listed in LIST, one per line (- reads the list from stdin)' },
    jobs: { value: 'N', help: `worker threads for many files, 1 to ${MAX_JOBS} (default: one per core)` },
    ...FAIL_ON_OPTION,
    ...FOLDERS_ROOT_OPTION,
  },
  notes: [
    'Several files, a folder (searched for *.sublevel like check) or --files-from: each file is evaluated and printed in the order given;',
    'one that cannot be read is reported in its place (stderr, or its jsonl line) and the others still run. Exit code: the worst file\'s.',
  ],
};

export function runEval(args: ParsedArgs, ctx: CliContext): number | Promise<number> {
  const format = (stringOption(args, 'format', EVAL_FORMATS) ?? 'text') as EvalFormat;
  const root = rootOption(stringOption(args, 'root'), ctx.fsys);
  const list = stringOption(args, 'files-from');
  const jobs = jobsOption(args);
  const failOn = failOnOption(args);
  const inputs = [...args.positionals, ...(list === undefined ? [] : readPathList(list))];
  if (inputs.length === 0) throw new UsageError(list === undefined ? 'eval needs a setup file (or several, or a folder, or --files-from)' : `the list --files-from ${list} names no file`);
  if (!isBatch(inputs, list !== undefined, format, ctx)) {
    const outcome = evaluateForOutput({ file: inputs[0]!, format, failOn, ...(root ? { root } : {}) }, ctx.fsys);
    print(outcome, ctx);
    return outcome.code;
  }
  if (format === 'json') throw new UsageError('--format json is one document for one file; for several use --format jsonl (one line per file)');
  return runBatch(findSetupFiles(inputs, ctx.fsys), root, format, failOn, jobs, ctx);
}

/** One operand naming a file (or any *.sublevel path) is the one-file command; anything else is a batch. */
function isBatch(inputs: string[], listed: boolean, format: EvalFormat, ctx: CliContext): boolean {
  if (listed || inputs.length > 1 || format === 'jsonl') return true;
  const only = inputs[0]!;
  if (only.endsWith(SETUP_EXTENSION)) return false;
  try {
    return ctx.fsys.statSync(only).isDirectory();
  } catch {
    return false;
  }
}

function jobsOption(args: ParsedArgs): number | undefined {
  const text = stringOption(args, 'jobs');
  if (text === undefined) return undefined;
  const n = /^[0-9]+$/.test(text) ? Number(text) : NaN;
  if (!Number.isInteger(n) || n < 1 || n > MAX_JOBS) throw new UsageError(`--jobs must be a whole number from 1 to ${MAX_JOBS}, got '${text}'`);
  return n;
}

function print(o: EvalOutcome, ctx: CliContext): void {
  for (const line of o.out) ctx.io.out(line);
  for (const line of o.err) ctx.io.err(line);
}

/** A path the search could not turn into a file (missing, a link loop): its outcome, in its place. */
function searchOutcome(found: FoundPath, format: EvalFormat): EvalOutcome {
  const p = found.problem!;
  const code = p.severity === 'error' ? 1 : 0;
  if (format === 'jsonl') return { out: [jsonLine({ file: found.path, errors: code, diagnostics: [toDiagnosticResult(p)] })], err: [], code };
  return { out: [], err: [diagnosticLine(found.path, p)], code };
}

function runBatch(found: FoundPath[], root: string | undefined, format: EvalFormat, failOn: FailOn, jobs: number | undefined, ctx: CliContext): number | Promise<number> {
  // `use` reads below --root, else below the folder named on the command line, else the file's own folder (as check does).
  const rootOf = (f: FoundPath): string | undefined => root ?? (f.input === f.path ? undefined : path.resolve(f.input));
  const outcomes: (EvalOutcome | undefined)[] = found.map((f) => (f.problem ? searchOutcome(f, format) : undefined));
  const work: { index: number; job: EvalJob }[] = [];
  found.forEach((f, index) => {
    if (f.problem) return;
    const r = rootOf(f);
    work.push({ index, job: { file: f.path, format, failOn, ...(r ? { root: r } : {}) } });
  });

  const progress = createProgress(ctx.progress, 'eval', found.length);
  let printed = 0;
  let worst = 0;
  let withErrors = 0;
  let done = found.length - work.length;
  let reports = 0;
  // Prints every outcome that is next in input order; later ones wait for the earlier.
  const flush = (): void => {
    progress.clear();
    for (; printed < found.length && outcomes[printed]; printed++) {
      const o = outcomes[printed]!;
      // Text reports one after another, a blank line between them.
      if (format === 'text' && o.out.length > 0 && reports++ > 0) ctx.io.out('');
      print(o, ctx);
      worst = Math.max(worst, o.code);
      if (o.code !== 0) withErrors++;
      outcomes[printed] = undefined; // printed: let it go
    }
    progress.update(done);
  };
  const finish = (): number => {
    progress.clear();
    ctx.io.err(`${found.length} file${found.length === 1 ? '' : 's'} evaluated: ${withErrors} with errors or not read`);
    return worst;
  };
  flush();

  const threads = Math.min(jobs ?? lazyBuiltin<typeof import('os')>('os').availableParallelism(), work.length);
  if (threads <= 1 || !ctx.workerScript || ctx.fsys !== nodeFileSystem) {
    for (const { index, job } of work) {
      outcomes[index] = evaluateForOutput(job, ctx.fsys);
      done++;
      flush();
    }
    return finish();
  }
  return runInWorkers(ctx.workerScript, work.map((w) => w.job), threads, (k, outcome) => {
    outcomes[work[k]!.index] = outcome;
    done++;
    flush();
  }).then(finish);
}
