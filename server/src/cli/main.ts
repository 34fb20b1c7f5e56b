/**
 * The `sublevel` command. Exit codes (the same for every command, see EXIT_CODES_TEXT):
 * 0 no errors, 1 an error in a setup file or a file that cannot be read, 2 usage error or
 * --out not written, 3 internal error. `diff` follows diff(1): 1 means the setups differ, and a
 * file it cannot read is 2 (see diffCommand.ts).
 */
import { version } from '../../../package.json';
import { type CommandSpec, type ParsedArgs, parseCommandArgs, UsageError } from './args';
import { checkSpec, runCheck } from './checkCommand';
import { diffSpec, runDiff } from './diffCommand';
import { evalSpec, runEval } from './evalCommand';
import { fitSpec, runFit } from './fitCommand';
import { fieldSpec, runField } from './fieldCommand';
import { diagnosticLine, FileProblemError } from './fileProblems';
import type { CliFileSystem } from './fileSystem';
import { commandHelp, overviewHelp, usageHint } from './help';
import { isBatchWorker, serveBatchJobs } from './batchWorker';
import { type CliContext, cliContext, type CliIO, type ProcessExtras, processIO } from './io';
import { OutputError } from './output';
import { profileSpec, runProfile } from './profileCommand';
import { runSpectrum, spectrumSpec } from './spectrumCommand';
import { renderSpec, runRender } from './renderCommand';
import { runSweep, sweepSpec } from './sweepCommand';
import { runSlower, slowerSpec } from './slowerCommand';
import { runTrap, trapSpec } from './trapCommand';
import { suggestNames } from '../format/didYouMean';

interface Command {
  spec: CommandSpec;
  /** A promise only where the command uses worker threads (batch eval with ctx.workerScript). */
  run(args: ParsedArgs, ctx: CliContext): number | Promise<number>;
}

const COMMANDS: readonly Command[] = [
  { spec: checkSpec, run: runCheck },
  { spec: evalSpec, run: runEval },
  { spec: sweepSpec, run: runSweep },
  { spec: profileSpec, run: runProfile },
  { spec: spectrumSpec, run: runSpectrum },
  { spec: renderSpec, run: runRender },
  { spec: diffSpec, run: runDiff },
  { spec: fitSpec, run: runFit },
  { spec: fieldSpec, run: runField },
  { spec: slowerSpec, run: runSlower },
  { spec: trapSpec, run: runTrap },
];

const SPECS = COMMANDS.map((c) => c.spec);

function findCommand(name: string): Command {
  const c = COMMANDS.find((x) => x.spec.name === name);
  if (c) return c;
  const hint = suggestNames(name, [...SPECS.map((s) => s.name), 'help']);
  throw new UsageError(`unknown command '${name}'${hint.length ? ` — did you mean '${hint[0]}'?` : ''}`);
}

function runWords(argv: string[], ctx: CliContext): number | Promise<number> {
  const [first, ...rest] = argv;
  if (first === undefined) {
    ctx.io.err(overviewHelp(SPECS));
    return 2;
  }
  if (first === '--version' || first === '-V') {
    if (rest.length > 0) throw new UsageError(`${first} takes nothing after it`);
    ctx.io.out(`sublevel ${version}`);
    return 0;
  }
  if (first === '--help' || first === '-h' || first === 'help') {
    if (rest.length > 1) throw new UsageError('help takes at most one command name');
    ctx.io.out(rest[0] === undefined ? overviewHelp(SPECS) : commandHelp(findCommand(rest[0]).spec));
    return 0;
  }
  if (first.startsWith('-')) throw new UsageError(`a command comes first, before options such as ${first}`);
  const command = findCommand(first);
  const args = parseCommandArgs(command.spec, rest);
  if (args.options.has('help')) {
    ctx.io.out(commandHelp(command.spec));
    return 0;
  }
  return command.run(args, ctx);
}

/** In-process runs (tests, embedding): no worker threads, so every command finishes before this returns. */
export function runCli(argv: string[], io: CliIO, fsys?: CliFileSystem): number {
  const ctx = cliContext(io, fsys);
  try {
    const code = runWords(argv, ctx);
    if (typeof code !== 'number') throw new Error('a command went asynchronous without worker threads');
    return code;
  } catch (e) {
    return failure(e, argv, ctx);
  }
}

/** The process's run: commands may use worker threads and draw progress on stderr. */
export async function startCli(argv: string[], io: CliIO, extras: ProcessExtras): Promise<number> {
  const ctx = cliContext(io, undefined, extras);
  try {
    return await runWords(argv, ctx);
  } catch (e) {
    return failure(e, argv, ctx);
  }
}

function failure(e: unknown, argv: string[], ctx: CliContext): number {
  if (e instanceof FileProblemError) {
    for (const p of e.problems) ctx.io.err(diagnosticLine(e.file, p));
    return 1;
  }
  if (e instanceof UsageError) {
    ctx.io.err(`sublevel: ${e.message}`);
    const name = argv[0];
    ctx.io.err(usageHint(name !== undefined && COMMANDS.some((c) => c.spec.name === name) ? name : undefined));
    return 2;
  }
  if (e instanceof OutputError) {
    ctx.io.err(`sublevel: ${e.message}`);
    return 2;
  }
  ctx.io.err(`sublevel: internal error (please report it with the command and the file): ${(e as Error).stack ?? String(e)}`);
  return 3;
}

if (isBatchWorker()) {
  serveBatchJobs();
} else if (require.main === module) {
  // A closed pipe (`sublevel profile f | head`) is a normal way to stop reading, not an error.
  process.stdout.on('error', (e: NodeJS.ErrnoException) => {
    if (e.code === 'EPIPE') process.exit(process.exitCode ?? 0);
    throw e;
  });
  void startCli(process.argv.slice(2), processIO, { progress: process.stderr, workerScript: __filename }).then((code) => {
    process.exitCode = code;
  });
}
