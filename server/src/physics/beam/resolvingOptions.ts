/**
 * Which changes to an unresolved setup actually deepen the dips, each one computed: the
 * pattern is recomputed with the change (peaks fixed as the present pattern groups them, so
 * every option is judged on the same pairs) and kept only when its worst dip ratio is lower
 * than the present one by a visible margin. This is what keeps advice honest: when the
 * overlap comes from the speed spread (peaks broadened ∝ 1/v², as wide as they are far
 * apart), narrower slits or a stronger magnet change nothing, and only a narrower speed
 * spread helps — the computation shows it instead of a rule of thumb.
 *
 * Most of a search's patterns usually show that a change cannot help (the generated benchmark
 * file: 38 per beam, all of them). So each kind of change is first screened on a coarse grid
 * (trialScreen.ts); when every value it would try certainly leaves the worst dip above the bar
 * (not resolved, no visible improvement), none can be an option and the full patterns are
 * skipped. Otherwise the values are computed in full as before, so any option found is the same.
 */
import { computePattern, type DetectorPattern, type PatternInput } from './detectorPattern';
import { EFFUSIVE_RELATIVE_SPREAD } from './jetLaw';
import { DEFAULT_DIP_CRITERION, worstDip } from './pairDips';
import { smallestResolvingValue } from './resolvingSolver';
import { certainlyAbove, screenable } from './trialScreen';
import { hasBeamError, type SpeedDistribution } from './types';

export type AdviceParameter = 'gradient' | 'magnetLength' | 'drift' | 'slits' | 'detector' | 'speedSpread';

export interface ResolvingOption {
  parameter: AdviceParameter;
  /**
   * The changed value: T/m for the gradient (sign of the input), m for magnet length and drift,
   * the factor both slit widths (or the detector width) are multiplied by, and the relative rms
   * speed spread for a velocity-selected source at the same mean speed.
   */
  value: number;
  /** Worst dip ratio of the neighbouring pairs with the change. */
  worstDipRatio: number;
  /** Every pair passes the dip criterion with the change. */
  resolvesAll: boolean;
}

export type GrownParameter = 'gradient' | 'magnetLength' | 'drift';

/** How far a grown change was searched: T/m for the gradient (magnitude), m for magnet length and drift. */
export interface SearchReach {
  limit: number;
  /**
   * 'present': 100 times the file's value; 'magnet': a drift of 0 searched up to 10 times the magnet
   * length (from a tenth of it); 'lab': what a laboratory magnet or beam line gives (LAB_REACH).
   */
  by: 'present' | 'magnet' | 'lab';
}

export interface ResolvingOptions {
  /** Worst dip ratio of the setup as it is. */
  presentWorstDipRatio: number;
  /** Changes that improve the worst dip, in the order gradient, magnet, drift, slits, detector, speed spread. */
  options: ResolvingOption[];
  /** How far gradient, magnet length and drift were searched (those tried; none when nothing was searched). */
  reach: Partial<Record<GrownParameter, SearchReach>>;
  /**
   * Every change was tried — gradient, magnet length and drift up to their reach, slits, detector,
   * speed spread — and none improves the worst dip: nothing the user can turn within reach helps.
   * False when nothing was searched or some changes were left out (a magnet built from sources).
   */
  nothingWithinReach: boolean;
}

/** An option must lower the worst dip ratio by at least this much (2 points of a per-cent display). */
export const VISIBLE_IMPROVEMENT = 0.02;
/** Options whose dip is within this of the best one tried count as equally good; the smallest change wins. */
const SATURATION_MARGIN = 0.02;

const GROWTH = [1.5, 2, 3, 5, 10, 20, 50, 100];
/**
 * What a laboratory deflection magnet and beam line give, whatever the file's values: gradient,
 * magnet length and drift are searched up to the larger of 100 times the present value and these,
 * so a very weak magnet that an ordinary one would split is not read as "nothing to do".
 * Common practice (docs/beam.md, "Advice reach"): T/m, m, m.
 */
export const LAB_REACH: Readonly<Record<GrownParameter, number>> = { gradient: 1000, magnetLength: 1, drift: 3 };
const NARROWING = [0.7, 0.5, 0.3, 0.2, 0.1];
const SPREADS = [0.2, 0.1, 0.05, 0.02];

interface Trial {
  value: number;
  pattern: DetectorPattern;
}

/** `only` limits the changes tried (a magnet built from sources: its flights fix the deflections, see trajectory/fieldMapPattern.ts). */
export function resolvingOptions(input: PatternInput, present: DetectorPattern, only?: readonly AdviceParameter[]): ResolvingOptions {
  const tried = (p: AdviceParameter): boolean => !only || only.includes(p);
  // One merged peak (sublevels that deflect differently): each trial is judged on the peaks it
  // shows itself (no fixed groups), which is what the file would show with the change; no dip now.
  const merged = present.mergedLonePeak;
  const groups = merged ? undefined : present.peaks.map((p) => p.memberIndices);
  const presentWorst = merged ? 1 : worstDip(present);
  const out: ResolvingOptions = { presentWorstDipRatio: presentWorst, options: [], reach: {}, nothingWithinReach: false };
  if (present.allResolved || (!merged && present.peaks.length < 2)) return out;
  search(input, present, groups, presentWorst, tried, out);
  out.nothingWithinReach = out.options.length === 0 && (['gradient', 'magnetLength', 'drift'] as const).every(tried);
  return out;
}

/** Tries each change and adds those that help to `out.options` (and the grown changes' reach to `out.reach`). */
function search(input: PatternInput, present: DetectorPattern, groups: number[][] | undefined, presentWorst: number, tried: (p: AdviceParameter) => boolean, out: ResolvingOptions): void {
  const geo = input.geometry;
  const sign = geo.gradientTPerM < 0 ? -1 : 1;
  const keep = (parameter: AdviceParameter, pick: Trial | undefined, value = pick?.value): void => {
    if (pick && value !== undefined) out.options.push({ parameter, value, worstDipRatio: worstDip(pick.pattern), resolvesAll: pick.pattern.allResolved });
  };
  const changed = (change: Partial<PatternInput['geometry']>, source?: SpeedDistribution): PatternInput => ({ ...input, geometry: { ...geo, ...change }, ...(source ? { source } : {}) });
  const at = (change: Partial<PatternInput['geometry']>, source?: SpeedDistribution): DetectorPattern => computePattern(changed(change, source), groups, false);
  // A trial is an option only if it resolves (worst dip ≤ criterion) or visibly lowers the worst dip.
  const bar = Math.max(presentWorst - VISIBLE_IMPROVEMENT, input.dipCriterion ?? DEFAULT_DIP_CRITERION);
  // The screen needs fixed groups: a coarse grid could group a trial's sublevels differently.
  const screen = groups !== undefined && screenable(input);
  /** Every one of these changes certainly leaves the worst dip above the bar: no option among them. */
  const hopeless = (inputs: readonly PatternInput[]): boolean => screen && inputs.length > 0 && inputs.every((i) => certainlyAbove(i, groups!, bar));

  const grown = (parameter: 'gradient' | 'magnetLength' | 'drift', base: number, fromMagnet = false): void => {
    if (!tried(parameter)) return;
    const key = parameter === 'gradient' ? 'gradientTPerM' : parameter === 'magnetLength' ? 'magnetLengthM' : 'driftM';
    const scale = parameter === 'gradient' ? sign : 1;
    const values = grownValues(parameter, base, out, fromMagnet);
    if (hopeless(values.map((v) => changed({ [key]: scale * v })))) return;
    const trials = scan(values, (v) => at({ [key]: scale * v }));
    const pick = choose(trials, presentWorst);
    if (!pick) return;
    const hitIndex = trials.indexOf(pick);
    if (pick.pattern.allResolved) {
      // Narrow the step below the first resolving value down to the smallest resolving value.
      const below = hitIndex > 0 ? trials[hitIndex - 1]!.value : parameter === 'drift' && geo.driftM === 0 ? 0 : base;
      const exact = smallestResolvingValue(input, parameter, { upperBound: pick.value, lowerBound: below, scanPoints: 2, relativeTolerance: 1e-3, groups });
      if (exact.value !== undefined) {
        out.options.push({ parameter, value: exact.value, worstDipRatio: Math.max(...exact.dipRatios), resolvesAll: true });
        return;
      }
    }
    keep(parameter, pick, scale * pick.value);
  };
  grown('gradient', Math.abs(geo.gradientTPerM));
  grown('magnetLength', geo.magnetLengthM);
  grown('drift', geo.driftM > 0 ? geo.driftM : geo.magnetLengthM / 10, !(geo.driftM > 0));

  const narrowed = (parameter: 'slits' | 'detector', change: (f: number) => Partial<PatternInput['geometry']>): void => {
    if (!tried(parameter) || hopeless(NARROWING.map((f) => changed(change(f))))) return;
    keep(parameter, choose(scan(NARROWING, (f) => at(change(f))), presentWorst));
  };
  narrowed('slits', (f) => ({ slit1M: geo.slit1M * f, slit2M: geo.slit2M * f }));
  if (geo.detectorWidthM > 0) narrowed('detector', (f) => ({ detectorWidthM: geo.detectorWidthM * f }));

  const spread = presentSpread(input.source);
  const mean = present.speed?.meanSpeed;
  if (tried('speedSpread') && spread !== undefined && mean !== undefined && mean > 0) {
    const values = SPREADS.filter((s) => s < spread * 0.9);
    const jet = (s: number): SpeedDistribution => ({ kind: 'jet', meanSpeed: mean, relativeSpread: s });
    if (hopeless(values.map((s) => changed({}, jet(s))))) return;
    keep('speedSpread', choose(scan(values, (s) => at({}, jet(s))), presentWorst));
  }
}

/**
 * The values a grown change tries: 1.5 … 100 times the present one, then, when a laboratory
 * magnet or beam line reaches further, one a decade on up to that reach (the solver narrows the
 * step below a resolving one). Records the reach used.
 */
function grownValues(parameter: GrownParameter, base: number, out: ResolvingOptions, fromMagnet: boolean): number[] {
  const values = GROWTH.map((f) => f * base);
  const relative = values[values.length - 1]!;
  const lab = LAB_REACH[parameter];
  if (!(base > 0) || relative >= lab) {
    out.reach[parameter] = { limit: relative, by: fromMagnet ? 'magnet' : 'present' };
    return values;
  }
  for (let v = relative * 10; v < lab; v *= 10) values.push(v);
  values.push(lab);
  out.reach[parameter] = { limit: lab, by: 'lab' };
  return values;
}

function presentSpread(source: SpeedDistribution): number | undefined {
  if (source.kind === 'effusive') return EFFUSIVE_RELATIVE_SPREAD;
  return source.kind === 'jet' ? source.relativeSpread : undefined;
}

/** Patterns for the values in order of growing change; stops at the first that resolves every pair. */
function scan(values: readonly number[], pattern: (v: number) => DetectorPattern): Trial[] {
  const trials: Trial[] = [];
  for (const value of values) {
    const p = pattern(value);
    if (hasBeamError(p.issues) || p.pairs.length === 0) continue;
    trials.push({ value, pattern: p });
    if (p.allResolved) break;
  }
  return trials;
}

/** The smallest change that resolves everything, else the smallest whose dip is near the best tried; only if it visibly improves. */
function choose(trials: readonly Trial[], presentWorst: number): Trial | undefined {
  const resolving = trials.find((t) => t.pattern.allResolved);
  if (resolving) return resolving;
  if (trials.length === 0) return undefined;
  const best = Math.min(...trials.map((t) => worstDip(t.pattern)));
  if (presentWorst - best < VISIBLE_IMPROVEMENT) return undefined;
  return trials.find((t) => worstDip(t.pattern) <= best + SATURATION_MARGIN);
}
