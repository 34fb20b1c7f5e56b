/**
 * Zeeman components of an electric-dipole line when one end or both are a whole LS term (the
 * engine's term modes), at any field: every eigenstate is written on |m_L, m_S, m_I>
 * (lsStateVector.ts) and, as the dipole acts on the orbital part only (LS coupling, ΔS = 0,
 * m_S and m_I conserved), by the Wigner–Eckart theorem in L
 *   <L_u m_L' S m_S I m_I| d_q |L_l m_L S m_S I m_I> = (−1)^(L_u−m_L') (L_u 1 L_l; −m_L' q m_L) <L_u||d||L_l>.
 * strength = (2L_u + 1)|<u|d_q|l>|² / |<L_u||d||L_l>|². Sum rules, exact at every field:
 * out of every upper sublevel the strengths to a whole lower term add up to 1; into every
 * lower sublevel those from a whole upper term add up to (2L_u + 1)/(2L_l + 1) (a J level of a
 * term with one J, L = 0 or S = 0, is its whole term).
 */
import { solveLevel, type LevelSpec, type SublevelState } from '../engine';
import { addToCentroid, emptyCentroidSums, landeFromSums } from './effectiveLande';
import { uncoupledDipoleFactor } from './electricDipoleElement';
import { acrossFieldWeight, alongFieldWeight, polarizationOf } from './emissionPattern';
import { fromLevel, issue } from './issueValues';
import { lsComponents, lsIndex, lsKey, type LsComponent } from './lsStateVector';
import { tagOf } from './sublevelTag';
import type { DipoleComponent, TransitionIssue } from './types';

/** One end of the line: an engine spec with its LS term (a J level needs L and S to be expanded). */
export interface TermLineEnd {
  spec: LevelSpec;
  twoS: number;
  L: number;
  /** Energy of the end's origin above a common one (J level: its energy; term: its centre of gravity), Hz. */
  energyHz?: number;
}

export interface TermLineResult {
  fieldT: number;
  components: DipoleComponent[];
  /** From the σ± centroids, (c₊ − c₋)/(2 μ_B B/h); null without σ components or at zero field. */
  gEffCentroid: number | null;
  lineCentreHz: number | null;
  /** Largest miss of the sum rules that apply (see above). */
  sumRuleDeviation: number;
  issues: TransitionIssue[];
}

const SUM_RULE_TOLERANCE = 1e-9;

/** A whole term, or a J level that is its whole term (L = 0 or S = 0: one J only). */
function isWholeTerm(end: TermLineEnd): boolean {
  return end.spec.kind !== 'hyperfine' || end.L === 0 || end.twoS === 0;
}

function nucleusOf(spec: LevelSpec): number {
  return spec.kind === 'fine' ? spec.twoI ?? 0 : spec.twoI;
}

function checkEnds(lower: TermLineEnd, upper: TermLineEnd, issues: TransitionIssue[]): boolean {
  if (lower.twoS !== upper.twoS) {
    issues.push(issue('error', 'line-spin-change', 'In LS coupling an electric-dipole line keeps S: these terms have different spin, so the line has no components here.'));
    return false;
  }
  if (Math.abs(lower.L - upper.L) > 1 || (lower.L === 0 && upper.L === 0)) {
    issues.push(issue('error', 'line-term-delta-l', 'In LS coupling an electric-dipole line needs ΔL = 0 or ±1, and not L = 0 ↔ 0; these terms have no components here.'));
    return false;
  }
  if (nucleusOf(lower.spec) !== nucleusOf(upper.spec)) {
    issues.push(issue('error', 'line-nucleus-mismatch', 'Both ends of a line belong to one atom: their nuclear spins I must be equal (a whole term without hyperfine data has no nucleus here).'));
    return false;
  }
  return true;
}

/** Energies relative to the end's origin: a term given by J-level energies is shifted to its centre of gravity. */
function originShift(spec: LevelSpec): number {
  if (spec.kind !== 'term' || !spec.levelEnergies) return 0;
  let w = 0;
  let s = 0;
  for (const e of spec.levelEnergies) {
    w += e.twoJ + 1;
    s += (e.twoJ + 1) * e.energyHz;
  }
  return s / w;
}

interface Prepared {
  state: SublevelState;
  comps: LsComponent[];
  index: Map<string, number>;
}

function prepare(states: SublevelState[], end: TermLineEnd): Prepared[] {
  const twoJ = end.spec.kind === 'hyperfine' ? end.spec.twoJ : null;
  return states.map((state) => {
    const comps = lsComponents(state, 2 * end.L, end.twoS, twoJ);
    return { state, comps, index: lsIndex(comps) };
  });
}

export function termDipoleLine(lower: TermLineEnd, upper: TermLineEnd, fieldT: number, dropBelow = 1e-12): TermLineResult {
  const issues: TransitionIssue[] = [];
  const empty = (): TermLineResult => ({ fieldT, components: [], gEffCentroid: null, lineCentreHz: null, sumRuleDeviation: 0, issues });
  if (!checkEnds(lower, upper, issues)) return empty();
  const lo = solveLevel(lower.spec, fieldT);
  const up = solveLevel(upper.spec, fieldT);
  issues.push(...fromLevel('Lower level', lo.issues), ...fromLevel('Upper level', up.issues));
  if (lo.states.length === 0 || up.states.length === 0) return empty();

  const lows = prepare(lo.states, lower);
  const ups = prepare(up.states, upper);
  const twoLl = 2 * lower.L;
  const twoLu = 2 * upper.L;
  const norm = twoLu + 1;
  const shiftL = originShift(lower.spec);
  const shiftU = originShift(upper.spec);
  const centre = lower.energyHz !== undefined && upper.energyHz !== undefined ? upper.energyHz - lower.energyHz : null;
  const all: DipoleComponent[] = [];
  const centroid = emptyCentroidSums();
  const outOfUpper = new Float64Array(ups.length);
  const intoLower = new Float64Array(lows.length);
  ups.forEach((u, iu) => {
    lows.forEach((l, il) => {
      const twoQ = u.state.twoM - l.state.twoM;
      if (Math.abs(twoQ) > 2) return;
      const q = twoQ / 2;
      let amp = 0;
      for (const x of l.comps) {
        const cu = u.index.get(lsKey(x.twoML + twoQ, x.twoMS, x.twoMI));
        if (cu === undefined) continue;
        amp += x.c * cu * uncoupledDipoleFactor(twoLu, x.twoML + twoQ, twoLl, x.twoML, q);
      }
      const strength = norm * amp * amp;
      if (strength === 0) return;
      outOfUpper[iu] += strength;
      intoLower[il] += strength;
      const offsetHz = u.state.energyHz - shiftU - (l.state.energyHz - shiftL);
      const polarization = polarizationOf(q);
      addToCentroid(centroid, q, strength, offsetHz);
      all.push({
        lower: tagOf(l.state),
        upper: tagOf(u.state),
        polarization,
        q: q as -1 | 0 | 1,
        offsetHz,
        absoluteHz: centre === null ? null : centre + offsetHz,
        strength,
        alongField: strength * alongFieldWeight(polarization),
        acrossField: strength * acrossFieldWeight(polarization),
      });
    });
  });
  let deviation = 0;
  if (isWholeTerm(lower)) for (const s of outOfUpper) deviation = Math.max(deviation, Math.abs(s - 1));
  if (isWholeTerm(upper)) for (const s of intoLower) deviation = Math.max(deviation, Math.abs(s - norm / (twoLl + 1)));
  if (deviation > SUM_RULE_TOLERANCE) {
    issues.push(issue('warning', 'line-sum-rule', `The strengths add up to their sum rule only within ${deviation.toExponential(1)}; the eigenvectors may be inaccurate.`));
  }
  const largest = all.reduce((m, c) => Math.max(m, c.strength), 0);
  const components = all.filter((c) => c.strength >= dropBelow * largest).sort((a, b) => a.offsetHz - b.offsetHz || a.q - b.q);
  return { fieldT, components, gEffCentroid: landeFromSums(centroid, fieldT), lineCentreHz: centre, sumRuleDeviation: deviation, issues };
}
