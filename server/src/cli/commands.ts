/** Every `sublevel` command, in the order the overview help lists them. */
import type { Command } from './commandTypes';
import { CORE_COMMANDS } from './coreCommands';
import { diffSpec, runDiff } from './diffCommand';
import { fitSpec, runFit } from './fitCommand';
import { fieldSpec, runField } from './fieldCommand';
import { profileSpec, runProfile } from './profileCommand';
import { runSpectrum, spectrumSpec } from './spectrumCommand';
import { renderSpec, runRender } from './renderCommand';
import { runSweep, sweepSpec } from './sweepCommand';
import { runSlower, slowerSpec } from './slowerCommand';
import { runTrap, trapSpec } from './trapCommand';

export const ALL_COMMANDS: readonly Command[] = [
  ...CORE_COMMANDS,
  { spec: sweepSpec, run: runSweep },
  { spec: profileSpec, run: runProfile },
  { spec: spectrumSpec, run: runSpectrum },
  { spec: renderSpec, run: runRender },
  { spec: diffSpec, run: runDiff },
  { spec: fitSpec, run: runFit },
  { spec: fieldSpec, run: runField },
  { spec: slowerSpec, run: runSlower },
  { spec: trapSpec, run: runTrap },
];
