// `npm start`: runs the CLI on the bundled demo setups, as a newcomer would.
import { spawnSync } from 'node:child_process';

const cli = ['dist/cli.js'];
function run(title, args, expectedStatus) {
  console.log(`\n=== ${title}\n$ sublevel ${args.join(' ')}`);
  const r = spawnSync(process.execPath, [...cli, ...args], { stdio: 'inherit' });
  if (r.status !== expectedStatus) {
    console.error(`demo: expected exit ${expectedStatus}, got ${r.status}`);
    process.exit(1);
  }
}

run('Check the demo setups (clean files exit 0)', ['check', 'examples/lithium-beam.sublevel', 'examples/rubidium-bias.sublevel', 'examples/handmade-species.sublevel'], 0);
run('Evaluate the lithium beam demo', ['eval', 'examples/lithium-beam.sublevel'], 0);
run('Evaluate the rubidium bias-field demo', ['eval', 'examples/rubidium-bias.sublevel'], 0);
run('A file with planted mistakes (exit 1 is expected)', ['check', 'examples/mistakes.sublevel'], 1);
console.log('\ndemo finished: see README.md for the format and the CLI.');
