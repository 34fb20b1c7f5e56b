/**
 * The summed detector pattern: for each sublevel the distribution of deflections
 * over speeds, convolved with the two-slit image (two boxes) and the detector
 * aperture (a third box), weighted by population; then peaks, their members and a
 * resolvability verdict per neighbouring pair. Never throws: problems are issues.
 */
import { boxOperator, convolveBox, shareToCentres, type BinRange } from './boxConvolve';
import { deflectAlike } from './deflectAlike';
import { deflectionCoefficient } from './deflection';
import { depositDeflections, type BinnedMasses } from './depositDeflections';
import { detectorGrid } from './detectorGrid';
import { scratchFloat64 } from './scratchBuffers';
import { groupByPeakPosition } from './groupSublevels';
import { pairDips, type PairVerdict } from './pairDips';
import { resolveOptions, type PatternOptions } from './patternOptions';
import { localMaxima, peakShape, sampleAt, type LocalMaximum } from './peakShape';
import { refinePeak } from './peakRefine';
import { slitImage, type SlitImage } from './slitImage';
import { speedLawFor } from './speedLawFor';
import { gridScaleM, inverseSquareRange, sublevelExtent } from './sublevelExtent';
import { beamIssue, hasBeamError, type BeamGeometry, type BeamIssue, type BeamSublevel, type SpeedDistribution } from './types';
import { validateGeometry } from './validateGeometry';
import { validateSource } from './validateSource';
import { validateSublevels } from './validateSublevels';

export interface PatternInput extends PatternOptions {
  massKg: number;
  geometry: BeamGeometry;
  source: SpeedDistribution;
  sublevels: readonly BeamSublevel[];
}

export interface SublevelDeflection {
  label: string;
  /** Population normalised over all sublevels. */
  weight: number;
  /** k in z = k/v², m³/s². */
  coefficientM3PerS2: number;
  /** Flux-averaged deflection k⟨1/v²⟩, m. */
  meanDeflectionM: number;
  /** Maximum of this sublevel's own (image- and aperture-broadened) profile, m. */
  peakM: number;
}

export interface PatternPeak {
  positionM: number;
  /** FWHM of the peak's own profile (its members only), m; null if it runs off the grid. */
  fwhmM: number | null;
  /** Maximum of the peak's own profile, per metre. */
  height: number;
  /** The summed pattern at positionM, per metre. */
  totalHeight: number;
  members: string[];
  memberIndices: number[];
}

export interface SpeedSummary {
  meanSpeed: number;
  rmsSpread: number;
  mostProbableSpeed: number;
  meanInverseSquare: number;
}

export interface DetectorPattern {
  /** Bin centres, m from the undeflected axis (bins widen away from the axis for spread-out beams). */
  positionsM: Float64Array;
  /** Bin edges, n + 1 values, m. */
  edgesM: Float64Array;
  /**
   * Summed pattern at the bin centres: flux fraction per metre of detector position,
   * averaged over the aperture (× detector width = fraction of atoms a detector centred
   * there receives). Bin j holds total[j] × (edges[j+1] − edges[j]) of the flux.
   */
  total: Float64Array;
  /**
   * Population-weighted contributions, same units; they add up to `total`. These and
   * `total` are views into one buffer: copy them (slice) before transferring a buffer.
   */
  perSublevel: Float64Array[];
  sublevels: SublevelDeflection[];
  /** Population-weighted flux fraction that falls outside the grid (mostly the slow tail). */
  offGridFraction: number;
  image: SlitImage | null;
  speed: SpeedSummary | null;
  /** One entry per group of sublevels, sorted by position. */
  peaks: PatternPeak[];
  /** Verdict for each pair of neighbouring peaks. */
  pairs: PairVerdict[];
  /**
   * One lone peak of sublevels that deflect differently (deflectAlike.ts): merged, not resolved.
   * Decided here once; the advice, the diagnostics and the reports read it (or `all_resolved`).
   */
  mergedLonePeak: boolean;
  /**
   * Every pair passes the dip criterion, and the pattern is not a merged lone peak. A lone peak
   * whose sublevels all deflect alike has nothing to resolve and counts as resolved.
   */
  allResolved: boolean;
  /** Local maxima of the summed pattern (what a scan shows). */
  maxima: LocalMaximum[];
  /** Fraction of the atoms entering a detector at geometry.detectorOffsetM (when given). */
  detectorFraction?: number;
  issues: BeamIssue[];
}

function emptyPattern(issues: BeamIssue[]): DetectorPattern {
  return {
    positionsM: new Float64Array(0),
    edgesM: new Float64Array(0),
    total: new Float64Array(0),
    perSublevel: [],
    sublevels: [],
    offGridFraction: 0,
    image: null,
    speed: null,
    peaks: [],
    pairs: [],
    mergedLonePeak: false,
    allResolved: false,
    maxima: [],
    issues,
  };
}

// The per-bin loops live in small functions of their own: the optimiser compiles them
// on their own, so they stay fast even while the long computePattern runs in
// unoptimised code (where every intermediate double is a garbage object).

/** Turns a sublevel's bin masses into weighted densities and adds them to total; returns the mass on the grid. */
function weighInto(out: Float64Array, total: Float64Array, weight: number, inverseWidth: Float64Array, range: BinRange): number {
  let inside = 0;
  for (let j = range.from; j < range.to; j++) {
    inside += out[j];
    const v = out[j] * weight * inverseWidth[j];
    out[j] = v;
    total[j] += v;
  }
  return inside;
}

function addInto(sum: Float64Array, part: Float64Array, range: BinRange): void {
  for (let j = range.from; j < range.to; j++) sum[j] += part[j];
}

export function detectorPattern(input: PatternInput): DetectorPattern {
  return computePattern(input);
}

/**
 * As detectorPattern, optionally with the grouping of sublevels fixed by the caller (used by the
 * solvers, which judge dips and need no off-grid peak positions: `refine` false skips that step).
 * `verdictOnly` is for callers that read only the verdicts (peaks, pairs, allResolved, the errors
 * among the issues), such as the advice's coarse screen: the arrays are then work arrays that the
 * next such call overwrites, and the maxima and the detector's warnings are not computed. The
 * verdicts are the same numbers as without it.
 */
export function computePattern(given: PatternInput, fixedGroups?: number[][], refine = true, verdictOnly = false): DetectorPattern {
  const input = sameShapeInput(given);
  const { options, issues: optionIssues } = resolveOptions(input);
  const issues = [
    ...optionIssues,
    ...validateGeometry(input.geometry),
    ...validateSource(input.source, input.massKg),
    ...validateSublevels(input.sublevels),
  ];
  if (hasBeamError(issues)) return emptyPattern(issues);

  const { geometry, massKg, sublevels } = input;
  const law = speedLawFor(input.source, massKg, options.speedPanels);
  const image = slitImage(geometry);
  const popSum = sublevels.reduce((s, x) => s + x.population, 0);
  const weights = sublevels.map((s) => s.population / popSum);
  const ks = sublevels.map((s) => deflectionCoefficient(s.momentJT, massKg, geometry));
  const range = inverseSquareRange(law, options.tailFraction);
  const extents = ks.map((k) => sublevelExtent(k, range, image.halfSupportM));
  let span = options.spanM;
  if (!span) {
    span = { startM: Infinity, endM: -Infinity };
    extents.forEach((e, i) => {
      if (weights[i] === 0) return;
      span!.startM = Math.min(span!.startM, e.startM);
      span!.endM = Math.max(span!.endM, e.endM);
    });
  }
  const n = options.bins;
  const landing = extents.filter((_, i) => weights[i] > 0);
  const { edgesM, centresM } = detectorGrid(span.startM, span.endM, n, landing, gridScaleM(image.kernelFwhmM, law));

  // One allocation for the total and every sublevel's contribution (views into one block).
  const size = (sublevels.length + 1) * n;
  const block = verdictOnly ? scratchFloat64('pattern.verdictBlock', size).fill(0) : new Float64Array(size);
  const total = block.subarray(0, n);
  const perSublevel: Float64Array[] = [];
  const inverseWidth = scratchFloat64('pattern.inverseWidth', n);
  for (let j = 0; j < n; j++) inverseWidth[j] = 1 / (edgesM[j + 1] - edgesM[j]);
  const stageA: BinnedMasses = { mass: scratchFloat64('pattern.mass', n), centroid: scratchFloat64('pattern.centroid', n) };
  const flat = scratchFloat64('pattern.flat', n);
  const slitA = boxOperator(edgesM, image.boxAM, 'slitA');
  const slitB = boxOperator(edgesM, image.boxBM, 'slitB');
  const aperture = boxOperator(edgesM, image.detectorM, 'aperture');
  let offGrid = 0;
  const summaries: SublevelDeflection[] = [];
  const ownPeaks: number[] = [];
  // Bins where each sublevel's contribution may be nonzero (the rest of it stays 0): the
  // loops below run over these only. An oven sublevel fills about a third of the grid.
  const supports: BinRange[] = [];
  for (let i = 0; i < sublevels.length; i++) {
    const out = block.subarray((i + 1) * n, (i + 2) * n);
    perSublevel.push(out);
    const meanDeflectionM = ks[i] * law.meanInverseSquare;
    const support: BinRange = { from: 0, to: n };
    supports.push(support);
    if (weights[i] === 0) {
      support.to = 0;
      summaries.push({ label: sublevels[i].label, weight: 0, coefficientM3PerS2: ks[i], meanDeflectionM, peakM: NaN });
      ownPeaks.push(NaN);
      continue;
    }
    // Deflections (exact bin masses and centroids, shared onto bin centres) → slit box a → slit box b → aperture.
    depositDeflections(stageA, edgesM, ks[i], law);
    shareToCentres(stageA, edgesM, flat);
    convolveBox(flat, slitA, out, support);
    convolveBox(out, slitB, flat, support);
    convolveBox(flat, aperture, out, support);
    const inside = weighInto(out, total, weights[i], inverseWidth, support);
    // A sum of (to − from) bins is exact to about that many ε (standard summation bound, from memory):
    // a loss below it is a pattern wholly on the grid, written with the sum's round-off.
    const lost = 1 - inside;
    offGrid += lost > (support.to - support.from) * Number.EPSILON ? weights[i] * lost : 0;
    const own = peakShape(out, centresM, support.from, support.to);
    const peakM = !own ? NaN : refine ? refinePeak(own.positionM, binWidth(edgesM, own.index), [{ k: ks[i], weight: 1 }], law, image) : own.positionM;
    ownPeaks.push(peakM);
    summaries.push({ label: sublevels[i].label, weight: weights[i], coefficientM3PerS2: ks[i], meanDeflectionM, peakM });
  }

  // Plain loops: map-then-filter here deoptimised this function on most calls of some runs (wrong
  // array map, over 1,000 times in a large file's evaluation), leaving the rest of each call to the interpreter.
  const activeIdx: number[] = [];
  for (let i = 0; i < weights.length; i++) if (weights[i] > 0 && Number.isFinite(ownPeaks[i])) activeIdx.push(i);
  let groups: number[][];
  if (fixedGroups) {
    groups = [];
    for (const g of fixedGroups) {
      const kept = g.filter((i) => activeIdx.includes(i));
      if (kept.length > 0) groups.push(kept);
    }
  } else groups = groupByPeakPosition(ownPeaks, activeIdx, options.mergeFraction * image.kernelFwhmM);
  const peaks: PatternPeak[] = [];
  const profile = scratchFloat64('pattern.profile', n);
  for (const g of groups) {
    profile.fill(0);
    let from = n;
    let to = 0;
    for (const i of g) {
      addInto(profile, perSublevel[i], supports[i]);
      from = Math.min(from, supports[i].from);
      to = Math.max(to, supports[i].to);
    }
    const shape = peakShape(profile, centresM, from, to);
    if (!shape) continue;
    const members = g.map((i) => ({ k: ks[i], weight: weights[i] }));
    const positionM = refine ? refinePeak(shape.positionM, binWidth(edgesM, shape.index), members, law, image) : shape.positionM;
    peaks.push({
      positionM,
      fwhmM: shape.fwhmM,
      height: shape.height,
      totalHeight: sampleAt(total, centresM, edgesM, positionM),
      members: g.map((i) => sublevels[i].label),
      memberIndices: [...g],
    });
  }
  peaks.sort((a, b) => a.positionM - b.positionM);
  const pairs = pairDips(
    total,
    centresM,
    edgesM,
    peaks.map((p) => p.positionM),
    options.dipCriterion,
  );
  const mergedLonePeak = peaks.length === 1 && !deflectAlike(ks, peaks[0]!.memberIndices, image.kernelFwhmM / law.meanInverseSquare);
  const result: DetectorPattern = {
    positionsM: centresM,
    edgesM,
    total,
    perSublevel,
    sublevels: summaries,
    offGridFraction: offGrid,
    image,
    speed: {
      meanSpeed: law.meanSpeed,
      rmsSpread: law.rmsSpread,
      mostProbableSpeed: law.mostProbableSpeed,
      meanInverseSquare: law.meanInverseSquare,
    },
    peaks,
    pairs,
    mergedLonePeak,
    allResolved: pairs.every((p) => p.resolved) && !mergedLonePeak,
    maxima: verdictOnly ? [] : localMaxima(total, centresM, options.minRelativeProminence),
    issues,
  };
  if (!verdictOnly) addDetectorChecks(result, geometry);
  if (offGrid > 0.05) {
    issues.push(
      beamIssue(
        'warning',
        'beam-pattern-off-grid',
        `${(100 * offGrid).toFixed(1)} % of the atoms land outside the computed range; widen the span or lower the tail fraction.`,
      ),
    );
  }
  return result;
}

/**
 * The input copied into objects of one fixed shape. Callers build inputs in several shapes
 * (the advice's trials spread a changed geometry or bin count over the beam's input), and each
 * new shape seen by the optimised computePattern threw its compiled code away (a "wrong map"
 * deoptimisation) and compiled it again, four times in the generated 20,000-line file's
 * evaluation (`--trace-deopt`); now once.
 * Absent options stay undefined, which every reader treats as absent. The literals are typed
 * with every key required (EveryKey), so a field added to PatternInput or BeamGeometry and not
 * copied here fails the type check instead of being dropped.
 */
export function sameShapeInput(i: PatternInput): PatternInput {
  const g = i.geometry;
  const geometry: EveryKey<BeamGeometry> = {
    slit1M: g.slit1M,
    slit2M: g.slit2M,
    slitSeparationM: g.slitSeparationM,
    magnetLengthM: g.magnetLengthM,
    driftM: g.driftM,
    detectorWidthM: g.detectorWidthM,
    gradientTPerM: g.gradientTPerM,
    detectorOffsetM: g.detectorOffsetM,
  };
  const copy: EveryKey<PatternInput> = {
    massKg: i.massKg,
    geometry,
    source: i.source,
    sublevels: i.sublevels,
    bins: i.bins,
    speedPanels: i.speedPanels,
    tailFraction: i.tailFraction,
    mergeFraction: i.mergeFraction,
    dipCriterion: i.dipCriterion,
    spanM: i.spanM,
    minRelativeProminence: i.minRelativeProminence,
  };
  return copy;
}

/** T with its optional keys made required (their values may still be undefined). */
type EveryKey<T> = { [K in keyof Required<T>]: T[K] };

/** Width of grid bin i: the refinement's first step. */
function binWidth(edgesM: Float64Array, i: number): number {
  return edgesM[i + 1] - edgesM[i];
}

function addDetectorChecks(result: DetectorPattern, geometry: BeamGeometry): void {
  if (geometry.detectorOffsetM === undefined) return;
  const x = geometry.detectorOffsetM;
  const { edgesM } = result;
  const density = sampleAt(result.total, result.positionsM, edgesM, x);
  const w = geometry.detectorWidthM;
  result.detectorFraction = w > 0 ? density * w : 0;
  let highest = 0;
  for (const v of result.total) highest = Math.max(highest, v);
  if (!(density > 1e-9 * highest)) {
    result.issues.push(
      beamIssue(
        'warning',
        'beam-misses-detector',
        `No atoms reach a detector centred at ${x} m: the computed pattern lies between ${edgesM[0].toPrecision(4)} m and ${edgesM[
          edgesM.length - 1
        ].toPrecision(4)} m.`,
      ),
    );
  }
}
