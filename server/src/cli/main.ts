/**
 * The `sublevel` command. Exit codes: 0 clean, 1 when a setup has errors, 2 on usage errors.
 */
import { parseArgs, UsageError } from './args';
import { runCheck } from './checkCommand';
import { runEval } from './evalCommand';
import { runSweep } from './sweepCommand';
import { type CliIO, processIO } from './io';

const USAGE = `usage: sublevel <command> [options]

commands:
  check <files or folders...> [--format text|json]   report problems; exit 1 if any error
  eval <file> [--format text|json]                    every computed quantity
  sweep <file> --level NAME --to FIELD [--from FIELD] [--points N] [--format csv|json] [--out FILE]
                                                      exact sublevel energies over a field range
  help                                                this text`;

export function runCli(argv: string[], io: CliIO): number {
  try {
    const args = parseArgs(argv);
    switch (args.command) {
      case 'check':
        return runCheck(args, io);
      case 'eval':
        return runEval(args, io);
      case 'sweep':
        return runSweep(args, io);
      case 'help':
      case undefined:
        io.out(USAGE);
        return args.command === 'help' ? 0 : 2;
      default:
        throw new UsageError(`unknown command '${args.command}'`);
    }
  } catch (e) {
    if (e instanceof UsageError) {
      io.err(`sublevel: ${e.message}`);
      io.err(USAGE);
      return 2;
    }
    io.err(`sublevel: internal error: ${(e as Error).stack ?? String(e)}`);
    return 3;
  }
}

if (require.main === module) {
  process.exitCode = runCli(process.argv.slice(2), processIO);
}
