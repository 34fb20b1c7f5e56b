/**
 * The summary of a magnetic trap for every sublevel of one level: trapped or not, the levitation
 * gradient, the minimum with its gravity sag, the depth, the harmonic frequencies or the linear
 * gradients, the RF knife and the Majorana estimate, with problems as values. docs/traps.md.
 */
import { BOHR_MAGNETON_HZ_PER_T, BOLTZMANN_K, PLANCK_H } from '../constants';
import { conductorOf } from '../fields/onSource';
import type { FieldIssue } from '../fields/issues';
import type { Vec3 } from '../fields/types';
import type { LowFieldLabel } from '../engine';
import { energyCurves, rfPartner, type EnergyCurve } from './energyCurves';
import { surveyField, type FieldSurvey } from './fieldSurvey';
import { ADIABATIC_MARGIN, MAJORANA_NOTE_RATE, majoranaRate } from './majorana';
import { trapPotential } from './potential';
import { rfCut } from './rfCut';
import { trapDepth, type RayCache } from './trapDepth';
import { findMinimum } from './trapMinimum';
import { harmonicShape, linearShape } from './trapShape';
import { figureIssue, finding, issue } from './issues';
import type { SublevelFinding, SublevelTrap, TrapInput, TrapIssue, TrapSummary } from './types';
import { norm, sub } from './vec3';

/** Below this fraction of the largest |B| in the region a minimum counts as a zero of the field. */
export const ZERO_FIELD_FRACTION = 1e-6;
/**
 * dE/dB below 10⁻⁴ μ_B (an m = 0 state at a zero of the field, whose energy only starts
 * quadratically) is not counted as low-field seeking: no gradient could hold it up.
 */
const SEEKING_SLOPE_HZ_PER_T = 1e-4 * BOHR_MAGNETON_HZ_PER_T;
/** Minima closer than this fraction of the region's radius to the field's minimum are taken to be at it. */
const SAME_POINT_FRACTION = 1e-9;
/**
 * A minimum found within this fraction of the region's radius whose energy is not measurably below
 * the energy at the field's minimum is that point: the potential carries the hyperfine energy
 * (GHz), so near a zero of a weak field (nT) its round-off hides offsets of ~1e-10 m.
 */
const UNRESOLVED_POINT_FRACTION = 1e-6;
/** Energies closer than this fraction of their size are not told apart (a few hundred ε of the eigen-solve). */
const ENERGY_ROUNDOFF = 1e-13;
/** The swept range reaches this far past the largest |B| sampled (rays can pass a little higher). */
const CURVE_HEADROOM = 1.5;

function invalid(input: TrapInput): TrapIssue | undefined {
  const r = input.region;
  if (!(r.radiusM > 0) || !Number.isFinite(r.radiusM) || !r.centre.every(Number.isFinite)) {
    return issue('error', 'trap-region-invalid', 'The trap region needs a finite centre and a radius above 0.');
  }
  if (!(input.massKg > 0) || !Number.isFinite(input.massKg)) return issue('error', 'trap-mass-invalid', 'The trap needs the atom’s mass, a positive number of kg.');
  if (!input.gravity.every(Number.isFinite)) return issue('error', 'trap-gravity-invalid', 'Gravity must be a finite vector.');
  if (input.temperatureK !== undefined && !(input.temperatureK > 0 && Number.isFinite(input.temperatureK))) {
    return issue('error', 'trap-temperature-invalid', 'A cloud temperature must be above 0 K.');
  }
  if (input.cutJ !== undefined && !(input.cutJ > 0 && Number.isFinite(input.cutJ))) {
    return issue('error', 'trap-cut-invalid', 'The RF cut must be an energy above 0.');
  }
  return undefined;
}

function emptySummary(issues: TrapIssue[], survey?: FieldSurvey): TrapSummary {
  return {
    fieldCentre: survey?.centre ?? [0, 0, 0],
    fieldAtCentreT: survey?.fieldAtCentreT ?? 0,
    fieldRangeT: [0, survey?.maxFieldT ?? 0],
    gravityGradientTPerM: survey?.gravityGradientTPerM ?? 0,
    sublevels: [],
    issues,
    sublevelFindings: [],
  };
}

/** A trap point on a conductor: the thin-conductor field has no value there, so no trap is computed. */
function onConductorIssue(at: 'centre' | 'inside', on: FieldIssue): TrapIssue {
  const where = at === 'centre' ? `The trap's centre lies on ${conductorOf(on)} of its sources` : `The trap region meets ${conductorOf(on)} of its sources`;
  const found = issue('error', 'trap-on-conductor', `${where}, where the field has no value: no trap is computed. ${at === 'centre' ? 'Move the centre or the source.' : 'Make the region smaller or move the source.'}`);
  return { ...found, conductor: { meets: at === 'centre' ? 'centre' : 'region', ...(on.partIndex !== undefined ? { partIndex: on.partIndex } : {}) } };
}

export function summariseTrap(input: TrapInput): TrapSummary {
  // First, so that a centre on a wire (a default region of radius 0) says so rather than "radius 0".
  const atCentre = input.region.centre.every(Number.isFinite) ? input.field(input.region.centre).leftOut : undefined;
  if (atCentre) return emptySummary([onConductorIssue('centre', atCentre[0]!)]);
  const bad = invalid(input);
  if (bad) return emptySummary([bad]);
  const survey = surveyField(input.field, input.region, input.gravity);
  if (survey.onConductor) return emptySummary([onConductorIssue('inside', survey.onConductor.issue)], survey);
  const curves = energyCurves(input.level, CURVE_HEADROOM * Math.max(survey.maxFieldT, survey.fieldAtCentreT));
  const issues: TrapIssue[] = curves.issues.map((i) => ({ ...i }));
  if (curves.curves.length === 0) return emptySummary(issues, survey);
  const gravityG = norm(input.gravity);
  const rays: RayCache = new Map();
  const findings: SublevelFinding[] = [];
  // Listed as a physicist reads them: by F (or J), then by m.
  const ordered = [...curves.curves].sort((a, b) => lowFieldRank(a.low) - lowFieldRank(b.low) || a.twoM - b.twoM);
  const sublevels = ordered.map((c) => sublevelTrap(input, survey, curves.curves, c, curves.topT, gravityG, issues, findings, rays));
  if (!sublevels.some((s) => s.trapped)) {
    issues.push(issue('warning', 'trap-holds-nothing', 'The trap holds no sublevel of this level.'));
  } else if (input.cutJ !== undefined && !sublevels.some((s) => s.rfCut)) {
    issues.push(issue('warning', 'trap-cut-above-depth', 'The RF cut is above the depth of every trapped sublevel: the knife cuts nothing. Lower the cut.'));
  }
  return {
    fieldCentre: survey.centre,
    fieldAtCentreT: survey.fieldAtCentreT,
    fieldRangeT: [survey.fieldAtCentreT, survey.maxFieldT],
    gravityGradientTPerM: survey.gravityGradientTPerM,
    sublevels,
    issues,
    sublevelFindings: findings,
  };
}

function sublevelTrap(
  input: TrapInput,
  survey: FieldSurvey,
  all: readonly EnergyCurve[],
  c: EnergyCurve,
  topT: number,
  gravityG: number,
  issues: TrapIssue[],
  findings: SublevelFinding[],
  rays: RayCache,
): SublevelTrap {
  const name = labelText(c.low);
  // The engine's moment is −dE/dB (negative for a low-field seeker); what holds an atom up is dE/dB.
  const moment = (b: number): number => -PLANCK_H * c.slopeHzPerT(b);
  const levitation = (mu: number): number | undefined => (mu < 0 && gravityG > 0 ? (input.massKg * gravityG) / -mu : undefined);
  const centreField = survey.fieldAtCentreT;
  const base = {
    low: c.low,
    twoM: c.twoM,
    turningFieldT: c.turningFieldT(centreField),
  };
  const muCentre = moment(centreField);
  const seeking = c.slopeHzPerT(centreField) > SEEKING_SLOPE_HZ_PER_T;
  if (!seeking) {
    return { ...base, lowFieldSeeking: false, momentJT: muCentre, trapped: false };
  }
  const gravityIssue = (lev: number): void => {
    issues.push(figureIssue('warning', { code: 'trap-gravity-too-strong', needTPerM: lev, hasTPerM: survey.gravityGradientTPerM }, name));
  };
  // Gravity wins everywhere when even the largest dE/dB over the region's fields cannot hold the
  // atom with the steepest |B| rise along gravity: no minimum to search for.
  if (gravityG > 0 && input.massKg * gravityG > PLANCK_H * largestSlope(c, centreField, survey.maxFieldT) * survey.gravityGradientTPerM) {
    const out: SublevelTrap = { ...base, lowFieldSeeking: true, momentJT: muCentre, trapped: false };
    const lev = levitation(muCentre);
    if (lev !== undefined) {
      out.levitationTPerM = lev;
      gravityIssue(lev);
    }
    return out;
  }
  const u = trapPotential(input.field, c, input.massKg, input.gravity);
  // A length over which |B| rounds off at the minimum: B/|∇B|; none at a zero of the field.
  const smooth = (r: Vec3): number => {
    const s = input.field(r);
    const b = norm(s.B);
    if (!(b > ZERO_FIELD_FRACTION * survey.maxFieldT)) return 0;
    let g = 0;
    for (const row of s.gradient) g = Math.max(g, norm(row));
    return Math.min(input.region.radiusM, g > 0 ? b / g : input.region.radiusM);
  };
  let found = findMinimum(u, survey.centre, input.region, smooth);
  // A minimum at the field's own minimum (to the search's tolerance) is that point: sublevels held
  // there then share it exactly (and their depth rays), and the sag reads 0, not round-off.
  const offsetM = norm(sub(found.position, survey.centre));
  const centreEnergyJ = u.energy(survey.centre);
  const notLower = found.energyJ >= centreEnergyJ - ENERGY_ROUNDOFF * Math.abs(centreEnergyJ);
  if (offsetM < SAME_POINT_FRACTION * input.region.radiusM || (offsetM < UNRESOLVED_POINT_FRACTION * input.region.radiusM && notLower)) {
    found = { ...found, position: survey.centre, energyJ: centreEnergyJ, fieldT: u.fieldT(survey.centre) };
  }
  const mu = moment(found.fieldT);
  const turningFieldT = c.turningFieldT(found.fieldT);
  const out: SublevelTrap = { ...base, turningFieldT, lowFieldSeeking: c.slopeHzPerT(found.fieldT) > SEEKING_SLOPE_HZ_PER_T, momentJT: mu, trapped: false };
  // Held: the moment at the minimum; not held: the moment at the field centre, where it would have to be held.
  const lev = levitation(found.onEdge ? muCentre : mu);
  if (lev !== undefined) out.levitationTPerM = lev;
  // Gravity wins where the sublevel needs more |B| gradient along gravity than the trap has anywhere below its centre.
  const gravityWins = lev !== undefined && survey.gravityGradientTPerM < lev;
  if (found.onEdge) {
    if (gravityWins) gravityIssue(lev!);
    else issues.push(issue('info', 'trap-sublevel-escapes', `${name} is low-field seeking but has no minimum inside the trap region: it is pushed out to the edge.`, name));
    return out;
  }
  const depth = trapDepth(input.field, c, input.massKg, input.gravity, input.region, found, turningFieldT, rays);
  out.minimum = { position: found.position, fieldT: found.fieldT, energyJ: found.energyJ };
  out.sagM = norm(sub(found.position, survey.centre));
  out.depthJ = depth.depthJ;
  out.depthLimit = depth.limit;
  out.trapped = depth.depthJ > 0;
  if (!out.trapped) {
    if (gravityWins) gravityIssue(lev!);
    else issues.push(issue('info', 'trap-sublevel-escapes', `${name} finds no barrier on its way out: the trap has no depth for it.`, name));
    return out;
  }
  if (depth.limit === 'turning' && turningFieldT !== null) {
    issues.push(figureIssue('info', { code: 'trap-turning-point', turningFieldT }, name));
  }
  const partner = rfPartner(all, c);
  const at = input.field(found.position);
  const zeroField = found.fieldT <= ZERO_FIELD_FRACTION * survey.maxFieldT;
  // At a zero of the field there is no precession to speak of: no Larmor frequency.
  if (partner && !zeroField) out.larmorHz = Math.abs(c.energyHz(found.fieldT) - partner.energyHz(found.fieldT));
  if (zeroField) {
    const shape = linearShape(at.gradient);
    const pull0 = -moment(0);
    if (input.temperatureK !== undefined) {
      const kT = BOLTZMANN_K * input.temperatureK;
      shape.cloudSizesM = [kT / (pull0 * shape.gradientsTPerM[0]), kT / (pull0 * shape.gradientsTPerM[1]), kT / (pull0 * shape.gradientsTPerM[2])];
      out.majorana = majoranaRate(pull0, shape.gradientsTPerM[0], input.massKg, input.temperatureK);
    }
    out.shape = shape;
    const m = out.majorana;
    if (m && m.rateHz < MAJORANA_NOTE_RATE) {
      findings.push(finding('info', 'trap-majorana-slow', name, { majoranaRateHz: m.rateHz }));
    } else {
      findings.push(finding('warning', 'trap-zero-field', name, m ? { majoranaRateHz: m.rateHz } : {}));
    }
  } else {
    const step = 1e-4 * Math.max(smooth(found.position), 1e-9 * input.region.radiusM);
    const shape = harmonicShape(u.gradient, found.position, step, input.massKg);
    if (shape) {
      out.shape = shape;
      const top = shape.frequenciesHz[2];
      if (out.larmorHz !== undefined && out.larmorHz < ADIABATIC_MARGIN * top) {
        issues.push(figureIssue('warning', { code: 'trap-bias-too-small', larmorHz: out.larmorHz, topHz: top, margin: ADIABATIC_MARGIN }, name));
      }
    } else {
      issues.push(issue('info', 'trap-not-harmonic', `The minimum for ${name} is flat in some direction: no harmonic frequencies.`, name));
    }
  }
  if (input.cutJ !== undefined && partner) {
    const limit = turningFieldT ?? topT;
    const cut = input.cutJ <= depth.depthJ ? rfCut(c, partner, found.fieldT, input.cutJ, limit) : null;
    if (cut) out.rfCut = cut;
    else findings.push(finding('info', 'trap-cut-outside', name, { depthJ: depth.depthJ }));
  }
  return out;
}

/** The largest dE/dB (Hz/T) between two fields, on a grid fine enough for the smooth E(B). */
function largestSlope(c: EnergyCurve, fromT: number, toT: number): number {
  let top = c.slopeHzPerT(fromT);
  for (let k = 1; k <= 64; k++) top = Math.max(top, c.slopeHzPerT(fromT + ((toT - fromT) * k) / 64));
  return top;
}

/** Twice the F (or J) of a low-field label: the first sort key of the listed sublevels. */
function lowFieldRank(low: LowFieldLabel): number {
  return low.scheme === 'F' ? low.twoF : low.twoJ;
}

/** |F, m_F⟩ style text of a low-field label, for messages. */
export function labelText(low: LowFieldLabel): string {
  return `|${low.text}⟩`;
}
