/**
 * Entry of dist/cli.js, the `sublevel` bin: loads the bundle that answers this command line
 * (bundleRoute.ts) from beside itself. It imports nothing else, so deciding costs no start-up.
 */
import { bundleFor } from '../bundleRoute';

if (bundleFor(process.argv[2]) === 'core') require('./cli-core.js');
else require('./cli-full.js');
