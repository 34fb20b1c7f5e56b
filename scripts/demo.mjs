// `npm start`: runs the CLI on the bundled demo setups, as a newcomer would.
import { spawnSync } from 'node:child_process';
import { mkdirSync } from 'node:fs';

const cli = ['dist/cli.js'];
function run(title, args, expectedStatus) {
  console.log(`\n=== ${title}\n$ sublevel ${args.join(' ')}`);
  const r = spawnSync(process.execPath, [...cli, ...args], { stdio: 'inherit' });
  if (r.status !== expectedStatus) {
    console.error(`demo: expected exit ${expectedStatus}, got ${r.status}`);
    process.exit(1);
  }
}

run('Check the demo setups (clean files exit 0)', ['check', 'examples/lithium-beam.sublevel', 'examples/rubidium-bias.sublevel', 'examples/handmade-species.sublevel', 'examples/shared-species-demo.sublevel'], 0);
run('Evaluate the lithium beam demo', ['eval', 'examples/lithium-beam.sublevel'], 0);
run('Evaluate the rubidium bias-field demo', ['eval', 'examples/rubidium-bias.sublevel'], 0);
run('A file with planted mistakes (exit 1 is expected)', ['check', 'examples/mistakes.sublevel'], 1);
mkdirSync('demo-output', { recursive: true });
run('Sublevel energies of Li7 ground against field (SVG)', ['render', 'examples/lithium-beam.sublevel', '--view', 'levels', '--out', 'demo-output/li7-levels.svg'], 0);
run('Predicted detector pattern of the lithium beam (SVG)', ['render', 'examples/lithium-beam.sublevel', '--view', 'pattern', '--out', 'demo-output/li7-pattern.svg'], 0);
run('Zeeman components of the Rb87 D2 line at the trap field (SVG)', ['render', 'examples/rubidium-bias.sublevel', '--view', 'lines', '--out', 'demo-output/rb87-d2-lines.svg'], 0);
run('The same pattern as CSV for analysis code', ['profile', 'examples/lithium-beam.sublevel', '--out', 'demo-output/li7-pattern.csv'], 0);
run('Rb87 ground sublevels from 0 to 0.2 T as CSV', ['sweep', 'examples/rubidium-bias.sublevel', '--level', 'ground', '--to', '0.2 T', '--points', '2001', '--out', 'demo-output/rb87-ground-sweep.csv'], 0);
run('Rb87 ground diagram with the probe field marked (SVG)', ['render', 'examples/rubidium-bias.sublevel', '--level', 'ground', '--field', 'probe', '--out', 'demo-output/rb87-levels.svg'], 0);
run('Li7 2p as one whole term, through both Paschen–Back regimes (SVG)', ['render', 'examples/lithium-whole-term.sublevel', '--view', 'levels', '--level', 'p', '--to', '1 T', '--out', 'demo-output/li7-2p-whole-term.svg'], 0);
run('Rb87 D2 spectrum at 0.6 T seen across the field: Voigt profiles as CSV', ['spectrum', 'examples/rubidium-spectrum.sublevel', '--out', 'demo-output/rb87-d2-spectrum.csv'], 0);
run('Field from one measured resonance, and g_J and A from eight (invented data)', ['fit', 'examples/fit-rubidium.sublevel'], 0);
run('Coils, a two-wire rail and a magnetised block: the field along the pair\'s axis (CSV)', ['field', 'examples/coils-and-wires.sublevel', '--source', 'quad', '--along', '0,0,-6cm:0,0,6cm', '--points', '121', '--format', 'csv', '--out', 'demo-output/quad-axis-field.csv'], 0);
run('The field map of those sources, drawn beside them (SVG)', ['render', 'examples/coils-and-wires.sublevel', '--view', 'fieldmap', '--out', 'demo-output/coils-field-map.svg'], 0);
run('A sodium beam through the real field of a two-wire magnet', ['eval', 'examples/two-wire-magnet.sublevel'], 0);
run('Which Rb87 ground sublevels a quadrupole trap holds, and how deeply', ['trap', 'examples/quadrupole-trap.sublevel'], 0);
run('A spin-flip sodium slower: the ideal profile and a 20-section coil design', ['slower', 'examples/sodium-slower.sublevel'], 0);
run('The slower\'s field and speeds along it (SVG)', ['render', 'examples/sodium-slower.sublevel', '--view', 'slower', '--out', 'demo-output/na-slower.svg'], 0);
run('What a weaker magnet changes physically (exit 1: the setups differ)', ['diff', 'tests/fixtures/diff/beam-old.sublevel', 'tests/fixtures/diff/beam-weak-gradient.sublevel'], 1);
console.log('\ndemo finished: diagrams and CSV files are in demo-output/; see README.md for the format and the CLI.');
