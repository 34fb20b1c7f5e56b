/** Entry of dist/cli-full.js: every command. */
import { ALL_COMMANDS } from '../commands';
import { startProcess } from '../processStart';

startProcess(ALL_COMMANDS, __filename);
