/**
 * The `sublevel` command. Exit codes: 0 clean, 1 when a setup has errors, 2 on usage errors.
 */
import { parseArgs, UsageError } from './args';
import { runCheck } from './checkCommand';
import { runEval } from './evalCommand';
import { runProfile } from './profileCommand';
import { runRender } from './renderCommand';
import { runSweep } from './sweepCommand';
import { type CliIO, processIO } from './io';

const USAGE = `usage: sublevel <command> [options]

commands:
  check <files or folders...> [--format text|json]   report problems; exit 1 if any error
  eval <file> [--format text|json]                    every computed quantity
  sweep <file> --level NAME --to FIELD [--from FIELD] [--points N] [--format csv|json] [--out FILE]
                                                      exact sublevel energies over a field range
  profile <file> [--beam NAME] [--out FILE.csv]       the predicted detector pattern (position, total, each sublevel)
  render <file> [--view levels|pattern|lines|resonance] [--level NAME] [--field NAME] [--beam NAME] [--line NAME]
         [--resonance NAME] [--from FIELD] [--to FIELD] [--unit G|mT|T]
         [--format svg|csv|png] [--out FILE]          a diagram as SVG or PNG, or its numbers as CSV
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
      case 'profile':
        return runProfile(args, io);
      case 'render':
        return runRender(args, io);
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
  // A closed pipe (`sublevel profile f | head`) is a normal way to stop reading, not an error.
  process.stdout.on('error', (e: NodeJS.ErrnoException) => {
    if (e.code === 'EPIPE') process.exit(process.exitCode ?? 0);
    throw e;
  });
  process.exitCode = runCli(process.argv.slice(2), processIO);
}
