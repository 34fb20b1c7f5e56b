/**
 * One block through every field of a sweep, written into the sweep's output
 * store. Two routes with the same results:
 * - per field: an exact solve at every field;
 * - by series (the default when H is linear in B): an exact solve at anchor fields, and between them
 *   the anchor's Rayleigh–Schrödinger series (perturbationSeries.ts), which
 *   costs a few dozen multiplications per state and field instead of a solve.
 *   Neighbouring anchors' series must agree where their stretches meet, where each
 *   is least accurate; a stretch that fails is halved and tried again, so a
 *   series never stands for a field where it is not checked.
 */
import { PLANCK_H } from '../constants';
import { type BlockWorkspace, curvaturesOf, fieldDerivative, makeWorkspace, solveBlockAt } from './blockSolver';
import type { LevelBlock } from './levelModel';
import {
  SERIES_ORDER,
  evaluateSeries,
  expandAt,
  makeSeriesWorkspace,
  seriesValueAt,
  type SeriesWorkspace,
} from './perturbationSeries';

/** Where the block's states go: state k, point p at base + k·stride + p; moment one row (`points`) later, curvature two. */
export interface BlockOutput {
  store: Float64Array;
  base: number;
  stride: number;
  points: number;
  curvature: boolean;
  /** Scratch of the largest block order. */
  curv: Float64Array;
}

/** Agreement asked of two neighbouring anchors' series where their stretches meet (energy and moment scales of the block). */
const CHECK_TOLERANCE = 1e-12;
/**
 * An exact solve's eigenvectors carry a round-off of about ε·(energy scale)/(gap) (standard
 * perturbation bound for a symmetric eigenproblem), and so do its moments, relative to the
 * Zeeman scale. A block holding several J levels of a whole term (gaps of MHz under energies of
 * THz) reaches 3e-12 this way (⁸⁷Rb 5P, measured), so the moment check asks for no better than
 * ROUND_OFF_MARGIN times that bound, and never for less than MOMENT_CHECK_CAP.
 */
const ROUND_OFF_MARGIN = 4;
const MOMENT_CHECK_CAP = 1e-10;
const EPS = 2.220446049250313e-16;

/** Write the exact solve in `ws` (at `fieldT`) as point p; returns the number of degenerate pairs the curvature left out. */
export function writeSolved(block: LevelBlock, ws: BlockWorkspace, fieldT: number, p: number, out: BlockOutput): number {
  const n = block.size;
  const z = fieldDerivative(block, fieldT, ws.dz);
  const { store, points, curvature, curv } = out;
  const { values, vectors } = ws;
  const skipped = curvature ? curvaturesOf(block, ws, curv, 0, fieldT) : 0;
  for (let k = 0, at = out.base + p; k < n; k++, at += out.stride) {
    // Hellmann–Feynman dE_k/dB = Σ_i v_ik² (∂H/∂B)_i, then μ = −h dE/dB.
    let slope = 0;
    for (let i = 0; i < n; i++) {
      const c = vectors[i * n + k];
      slope += c * c * z[i];
    }
    store[at] = values[k];
    store[at + points] = -slope * PLANCK_H;
    if (curvature) store[at + 2 * points] = curv[k];
  }
  return skipped;
}

/** Every field solved exactly. Returns the degenerate pairs left out of curvatures, or −1 if the solver failed. */
export function sweepBlockPerField(block: LevelBlock, fieldsT: Float64Array, ws: BlockWorkspace, out: BlockOutput): number {
  let skipped = 0;
  for (let p = 0; p < fieldsT.length; p++) {
    if (!solveBlockAt(block, fieldsT[p], ws)) return -1;
    skipped += writeSolved(block, ws, fieldsT[p], p, out);
  }
  return skipped;
}

/**
 * Anchors at p and q: does each series reproduce the other's energies and slopes where their
 * stretches meet, `fromA` from a's anchor and `fromB` from b's (opposite signs)?
 */
function seriesAgree(block: LevelBlock, a: SeriesWorkspace, b: SeriesWorkspace, fromA: number, fromB: number, tmp: Float64Array): boolean {
  const n = block.size;
  const k1 = SERIES_ORDER + 1;
  let scaleE = 0;
  let scaleZ = 0;
  let minGap = Number.POSITIVE_INFINITY;
  for (let k = 0; k < n; k++) {
    scaleE = Math.max(scaleE, Math.abs(a.coef[k * k1]), Math.abs(b.coef[k * k1]));
    scaleZ = Math.max(scaleZ, Math.abs(block.zeeman[k]));
    if (k > 0) minGap = Math.min(minGap, a.coef[k * k1] - a.coef[(k - 1) * k1], b.coef[k * k1] - b.coef[(k - 1) * k1]);
  }
  const momentTolerance = Math.max(CHECK_TOLERANCE, Math.min(MOMENT_CHECK_CAP, (ROUND_OFF_MARGIN * EPS * scaleE) / minGap)) * scaleZ;
  for (let k = 0; k < n; k++) {
    seriesValueAt(a, k, fromA, tmp);
    const e = tmp[0];
    const slope = tmp[1];
    seriesValueAt(b, k, fromB, tmp);
    if (!(Math.abs(tmp[0] - e) <= CHECK_TOLERANCE * scaleE && Math.abs(tmp[1] - slope) <= momentTolerance)) return false;
  }
  return true;
}

/** Points from … to − 1 of every state from the series `sw` anchored at fieldsT[anchor]. */
function writeSeries(block: LevelBlock, sw: SeriesWorkspace, fieldsT: Float64Array, anchor: number, from: number, to: number, out: BlockOutput): void {
  evaluateSeries(sw, block.size, fieldsT, fieldsT[anchor], from, to, out);
}

interface Anchor {
  ws: BlockWorkspace;
  sw: SeriesWorkspace;
  /** Reach of the series in tesla (0: not expanded). */
  reachT: number;
}

/**
 * Where a series reaches less than one step, an anchor's expansion is never used: such
 * steps are solved without expanding, and the expansion is tried again after this many of
 * them (the reach grows with the field, so it may have become worth it).
 */
const SOLVE_ONLY_RUN = 4;

/**
 * Anchor placement: the next anchor is aimed REACH_AIM of the way to where its reach would meet
 * this one's, its reach taken as this one's times the last change of the reach from anchor to
 * anchor when that shrank (a growing reach is not counted on: from anchor to anchor it jitters by
 * some 10 %). Aiming short costs more anchors, aiming long a solve and an expansion thrown away;
 * on the Cs 6P3/2 sweeps this took 190 and 266 expansions where aiming at two reaches took 211
 * and 266 (0–0.1 T, 0–1 T).
 */
const REACH_AIM = 0.97;

function expandAnchor(block: LevelBlock, at: Anchor, curvature: boolean): void {
  expandAt(at.ws.values, at.ws.vectors, block.zeeman, block.size, at.sw, curvature);
  at.reachT = at.sw.reach * at.sw.scaleT;
}

function anchorAt(block: LevelBlock, fieldT: number, at: Anchor, curvature: boolean): boolean {
  if (!solveBlockAt(block, fieldT, at.ws)) return false;
  expandAnchor(block, at, curvature);
  return true;
}

/**
 * The series route (fields in sweep order, monotonic; a block linear in B only, since the
 * series expands in B·Z). Anchors are solved
 * exactly and expanded; the points between two anchors take one or the other's
 * series, each out to the same fraction of its reach. The next anchor is placed where
 * the two reaches should meet (REACH_AIM); if they do not, the stretch is shortened to
 * where they would, and if the two series disagree where they meet (where each is
 * least accurate), the stretch is halved. A neighbouring point is solved but not
 * expanded, and while the last reach is shorter than a step the sweep goes on solving
 * (SOLVE_ONLY_RUN). Returns the degenerate pairs left out of curvatures, or −1 if the
 * solver failed.
 */
export function sweepBlockBySeries(block: LevelBlock, fieldsT: Float64Array, anchors: [Anchor, Anchor], out: BlockOutput): number {
  const last = fieldsT.length - 1;
  const tmp = new Float64Array(2);
  let [here, there] = anchors;
  if (!anchorAt(block, fieldsT[0], here, out.curvature)) return -1;
  let skipped = writeSolved(block, here.ws, fieldsT[0], 0, out);
  let p = 0;
  let expanded = true;
  let lastReachT = here.reachT;
  let solvedOnly = 0;
  let shrink = 1; // reach of the last anchor over the one before, at most 1
  while (p < last) {
    if (!expanded) {
      if (solvedOnly < SOLVE_ONLY_RUN && lastReachT < Math.abs(fieldsT[p + 1] - fieldsT[p])) {
        if (!solveBlockAt(block, fieldsT[p + 1], there.ws)) return -1;
        skipped += writeSolved(block, there.ws, fieldsT[p + 1], p + 1, out);
        [here, there] = [there, here];
        p++;
        solvedOnly++;
        continue;
      }
      expandAnchor(block, here, out.curvature);
      lastReachT = here.reachT;
      solvedOnly = 0;
    }
    // Aim q where p's reach meets the reach q is expected to have (the reach changes smoothly along the sweep).
    const aimT = here.reachT * (1 + REACH_AIM * shrink);
    let q = p + 1;
    while (q < last && Math.abs(fieldsT[q + 1] - fieldsT[p]) <= aimT) q++;
    let splitT = 0; // distance from p to where the stretch passes from p's series to q's
    for (;;) {
      if (!solveBlockAt(block, fieldsT[q], there.ws)) return -1;
      if (q === p + 1) break;
      expandAnchor(block, there, out.curvature);
      const spanT = Math.abs(fieldsT[q] - fieldsT[p]);
      const reachesT = here.reachT + there.reachT;
      if (!(there.reachT > 0)) {
        q = p + Math.max(1, Math.floor((q - p) / 2));
        continue;
      }
      if (!(spanT <= reachesT)) {
        // The reaches fall short: try again where they would meet were q's reach what it is here.
        q = p + Math.max(1, Math.min(q - p - 1, Math.floor((q - p) * REACH_AIM * (reachesT / spanT))));
        continue;
      }
      // Each series is used out to the same fraction of its reach, so the two are least accurate where they meet.
      splitT = (spanT * here.reachT) / reachesT;
      const sign = fieldsT[q] > fieldsT[p] ? 1 : -1;
      if (seriesAgree(block, here.sw, there.sw, sign * splitT, -sign * (spanT - splitT), tmp)) break;
      q = p + Math.max(1, Math.floor((q - p) / 2));
    }
    expanded = q > p + 1;
    if (expanded) {
      shrink = Math.min(1, there.reachT / here.reachT);
      lastReachT = there.reachT;
    }
    let mid = p + 1;
    while (mid < q && Math.abs(fieldsT[mid] - fieldsT[p]) <= splitT) mid++;
    writeSeries(block, here.sw, fieldsT, p, p + 1, mid, out);
    writeSeries(block, there.sw, fieldsT, q, mid, q, out);
    skipped += writeSolved(block, there.ws, fieldsT[q], q, out);
    [here, there] = [there, here];
    p = q;
  }
  return skipped;
}

export function makeAnchors(n: number): [Anchor, Anchor] {
  return [
    { ws: makeWorkspace(n), sw: makeSeriesWorkspace(n), reachT: 0 },
    { ws: makeWorkspace(n), sw: makeSeriesWorkspace(n), reachT: 0 },
  ];
}
