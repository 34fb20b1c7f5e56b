/** Entry of dist/cli-core.js: `check`, `eval` and the version (bundleRoute.ts), without the other commands' code. */
import { CORE_COMMANDS } from '../coreCommands';
import { startProcess } from '../processStart';

startProcess(CORE_COMMANDS, __filename);
