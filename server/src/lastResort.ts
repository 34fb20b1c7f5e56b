/**
 * The last net under the language server: an exception or a rejected promise that no handler
 * caught is logged as a defect, and the server goes on answering, instead of the process dying
 * and the editor losing every feature until it restarts it. Every known path catches its own
 * failures (evaluationSchedule.ts, the request wrapper in server.ts); this is for the unknown ones.
 */
/** After this many, defects go to stderr only: a connection that fails to send must not feed itself. */
const LOGGED_AT_MOST = 50;

export function lastResort(log: (message: string) => void): void {
  let logged = 0;
  const say = (what: string) => (e: unknown): void => {
    try {
      if (++logged > LOGGED_AT_MOST) throw new Error('too many to log');
      log(`sublevel: ${what} (a defect; please report it): ${e instanceof Error ? (e.stack ?? e.message) : String(e)}`);
    } catch {
      // The connection itself is gone: stderr is all that is left.
      process.stderr.write(`sublevel: ${what}: ${String(e)}\n`);
    }
  };
  process.on('uncaughtException', say('an uncaught exception'));
  process.on('unhandledRejection', say('a promise rejected with no handler'));
}
