/**
 * Reading a `sublevel` command line against a set of commands: the version, the help pages, the
 * command's options, and the exit code and message of whatever goes wrong. Exit codes (the same
 * for every command, see help.ts): 0 no errors, 1 an error in a setup file or a file
 * that cannot be read, 2 usage error or --out not written, 3 internal error. `diff` follows
 * diff(1): 1 means the setups differ, and a file it cannot read is 2 (see diffCommand.ts).
 */
import { version } from '../../../package.json';
import { parseCommandArgs, UsageError } from './args';
import type { Command } from './commandTypes';
import { diagnosticLine, FileProblemError } from './fileProblems';
import { commandHelp, overviewHelp, usageHint } from './help';
import { type CliContext, cliContext, type CliIO, type ProcessExtras } from './io';
import { OutputError } from './output';
import { suggestNames } from '../format/didYouMean';

function findCommand(name: string, commands: readonly Command[]): Command {
  const c = commands.find((x) => x.spec.name === name);
  if (c) return c;
  const hint = suggestNames(name, [...commands.map((x) => x.spec.name), 'help']);
  throw new UsageError(`unknown command '${name}'${hint.length ? ` — did you mean '${hint[0]}'?` : ''}`);
}

function runWords(argv: string[], ctx: CliContext, commands: readonly Command[]): number | Promise<number> {
  const specs = commands.map((c) => c.spec);
  const [first, ...rest] = argv;
  if (first === undefined) {
    ctx.io.err(overviewHelp(specs));
    return 2;
  }
  if (first === '--version' || first === '-V') {
    if (rest.length > 0) throw new UsageError(`${first} takes nothing after it`);
    ctx.io.out(`sublevel ${version}`);
    return 0;
  }
  if (first === '--help' || first === '-h' || first === 'help') {
    if (rest.length > 1) throw new UsageError('help takes at most one command name');
    ctx.io.out(rest[0] === undefined ? overviewHelp(specs) : commandHelp(findCommand(rest[0], commands).spec));
    return 0;
  }
  if (first.startsWith('-')) throw new UsageError(`a command comes first, before options such as ${first}`);
  const command = findCommand(first, commands);
  const args = parseCommandArgs(command.spec, rest);
  if (args.options.has('help')) {
    ctx.io.out(commandHelp(command.spec));
    return 0;
  }
  return command.run(args, ctx);
}

/** Runs one command line with `commands`; a promise only where a command uses worker threads. */
export function runCommandLine(argv: string[], ctx: CliContext, commands: readonly Command[]): number | Promise<number> {
  try {
    const code = runWords(argv, ctx, commands);
    return typeof code === 'number' ? code : code.catch((e: unknown) => failure(e, argv, ctx, commands));
  } catch (e) {
    return failure(e, argv, ctx, commands);
  }
}

/**
 * The process's run: commands may use worker threads and draw progress on stderr. `commands`
 * are the ones the running bundle has (bundleRoute.ts sends it only command lines they answer).
 */
export async function startCommandLine(argv: string[], io: CliIO, extras: ProcessExtras, commands: readonly Command[]): Promise<number> {
  return runCommandLine(argv, cliContext(io, undefined, extras), commands);
}

/** The exit code of a command line that threw `e`, after printing what went wrong. */
export function failure(e: unknown, argv: string[], ctx: CliContext, commands: readonly Command[]): number {
  if (e instanceof FileProblemError) {
    for (const p of e.problems) ctx.io.err(diagnosticLine(e.file, p));
    return 1;
  }
  if (e instanceof UsageError) {
    ctx.io.err(`sublevel: ${e.message}`);
    const name = argv[0];
    ctx.io.err(usageHint(name !== undefined && commands.some((c) => c.spec.name === name) ? name : undefined));
    return 2;
  }
  if (e instanceof OutputError) {
    ctx.io.err(`sublevel: ${e.message}`);
    return 2;
  }
  ctx.io.err(`sublevel: internal error (please report it with the command and the file): ${(e as Error).stack ?? String(e)}`);
  return 3;
}
