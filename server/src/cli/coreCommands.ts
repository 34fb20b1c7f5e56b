/**
 * The commands of the small CLI bundle (dist/cli-core.js): the ones a CI job runs on every
 * push, so their start-up should not compile the figures, sweeps, fits and exports of the
 * others (docs/speed.md, "Start-up"). Kept apart from commands.ts so that bundle does not
 * import the rest.
 */
import { checkSpec, runCheck } from './checkCommand';
import type { Command } from './commandTypes';
import { evalSpec, runEval } from './evalCommand';

export const CORE_COMMANDS: readonly Command[] = [
  { spec: checkSpec, run: runCheck },
  { spec: evalSpec, run: runEval },
];
