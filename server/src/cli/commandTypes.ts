/** What a `sublevel` command is: its options and help, and the function that runs it. */
import type { CommandSpec, ParsedArgs } from './args';
import type { CliContext } from './io';

export interface Command {
  spec: CommandSpec;
  /** A promise only where the command uses worker threads (batch eval with ctx.workerScript). */
  run(args: ParsedArgs, ctx: CliContext): number | Promise<number>;
}
