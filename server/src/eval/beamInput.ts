/**
 * From a beam in the model to the beam engine's input: geometry in SI, the speed law, and each
 * sublevel's exact magnetic moment at the magnet's field.
 */
import type { GJLookup } from './gJLookup';
import type { BeamGeometry, PatternInput, SpeedDistribution } from '../physics/beam';
import { solveLevel, type HyperfineLevelSpec, type SublevelState } from '../physics/engine';
import type { Range } from '../format/ast';
import type { BeamModel, BeamSource } from '../model/types';
import { halfText, signedHalfText } from './halves';
import { hyperfineSpec } from './levelSpec';

export interface BeamInputs {
  input: PatternInput;
  /** High-field label of each sublevel, same order as input.sublevels. */
  highLabels: string[];
  /** The level as the engine sees it (a magnet built from sources flies its sublevels through the field). */
  spec: HyperfineLevelSpec;
  /** `populations` entries that match no sublevel of the level (they would be dropped without a word). */
  unmatchedPopulations: UnmatchedPopulation[];
}

export interface UnmatchedPopulation {
  range: Range;
  /** `F = 3` or `F = 2, m_F = +5`, and the F (or J) values the level has. */
  named: string;
  has: string;
}

/** Undefined when the beam lacks something it needs (the model has reported what). */
export function beamInputs(beam: BeamModel, gJOf: GJLookup): BeamInputs | undefined {
  const { level, magnet, source, slits, driftM } = beam;
  const massKg = beam.species?.massKg?.value;
  if (!level || !magnet || !source || !slits || !driftM || massKg === undefined) return undefined;
  if (!magnet.fieldT || !magnet.gradientTPerM || !magnet.lengthM) return undefined;
  const gJ = gJOf(level);
  const spec = gJ !== undefined ? hyperfineSpec(level, gJ) : undefined;
  if (!spec) return undefined;
  const solved = solveLevel(spec, magnet.fieldT.value);
  if (solved.states.length === 0) return undefined;
  const geometry: BeamGeometry = {
    slit1M: slits.value.firstM,
    slit2M: slits.value.secondM,
    slitSeparationM: slits.value.separationM,
    magnetLengthM: magnet.lengthM.value,
    driftM: driftM.value,
    detectorWidthM: beam.detectorM?.value ?? 0,
    gradientTPerM: magnet.gradientTPerM.value,
    ...(beam.detectorOffsetM ? { detectorOffsetM: beam.detectorOffsetM.value } : {}),
  };
  const speed = speedDistributionOf(source.value);
  return {
    input: {
      massKg,
      geometry,
      source: speed,
      sublevels: solved.states.map((s) => ({ label: s.low.text, momentJT: s.momentJT, population: populationOf(beam, s) })),
    },
    highLabels: solved.states.map((s) => s.high.text),
    spec,
    unmatchedPopulations: unmatchedPopulations(beam, solved.states),
  };
}

function lowPair(s: SublevelState): [twoF: number, twoM: number, letter: string] {
  return s.low.scheme === 'F' ? [s.low.twoF, s.low.twoMF, 'F'] : [s.low.twoJ, s.low.twoMJ, 'J'];
}

function unmatchedPopulations(beam: BeamModel, states: SublevelState[]): UnmatchedPopulation[] {
  if (!beam.populations || states.length === 0) return [];
  const pairs = states.map(lowPair);
  const letter = pairs[0]![2];
  const totals = [...new Set(pairs.map(([twoF]) => twoF))].sort((a, b) => a - b);
  return beam.populations
    .filter((p) => !pairs.some(([twoF, twoM]) => names(p, twoF, twoM)))
    .map((p) => ({
      range: p.range,
      named: `${letter} = ${halfText(p.twoF)}${p.twoM !== undefined ? `, m_${letter} = ${signedHalfText(p.twoM)}` : ''}`,
      has: `${letter} = ${totals.map((t) => halfText(t)).join(', ')}`,
    }));
}

/** Whether a population entry (F, or F and m_F) names this low-field pair. */
function names(p: NonNullable<BeamModel['populations']>[number], twoF: number, twoM: number): boolean {
  return p.twoF === twoF && (p.twoM === undefined || p.twoM === twoM);
}

/** The file's population for a state, matched on its low-field label (F, m_F or J, m_J); 1 when the file sets none. */
function populationOf(beam: BeamModel, s: SublevelState): number {
  if (!beam.populations) return 1;
  const [twoF, twoM] = lowPair(s);
  const hit = beam.populations.find((p) => names(p, twoF, twoM));
  return hit ? hit.weight : 0;
}

/** The physics core's speed law for a beam's `source`. */
export function speedDistributionOf(src: BeamSource): SpeedDistribution {
  return src.kind === 'oven'
    ? { kind: 'effusive', temperatureK: src.temperatureK }
    : src.kind === 'jet'
      ? { kind: 'jet', meanSpeed: src.speedMPerS, relativeSpread: src.spreadFraction }
      : { kind: 'single', speed: src.speedMPerS };
}
