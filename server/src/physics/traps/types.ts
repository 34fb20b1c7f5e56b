/**
 * Shapes of the trap analysis. SI throughout: positions m, fields T, energies J, frequencies Hz,
 * temperatures K. A problem is a value ({code, severity, message}) with a code from issueCodes.ts.
 */
import type { EngineIssue, LevelSpec, LowFieldLabel } from '../engine';
import type { FieldFunction, Vec3 } from '../fields/types';

/**
 * The region the atoms must stay in: a sphere. Its surface is the trap's edge (in a setup file,
 * by default the sphere inside the smallest coil; docs/traps.md).
 */
export interface TrapRegion {
  centre: Vec3;
  radiusM: number;
}

export interface TrapInput {
  field: FieldFunction;
  level: LevelSpec;
  massKg: number;
  /** Acceleration of gravity, m/s² (a vector; [0, 0, 0] for none). */
  gravity: Vec3;
  region: TrapRegion;
  /** Cloud temperature, K (the Majorana estimate of a zero-field trap and the cloud size). */
  temperatureK?: number;
  /** The RF knife's energy above each sublevel's minimum, J. */
  cutJ?: number;
}

/** A linear (zero-field) minimum: the |B| gradients along the field's principal axes, strongest first. */
export interface LinearShape {
  kind: 'linear';
  gradientsTPerM: [number, number, number];
  axes: [Vec3, Vec3, Vec3];
  /** 1/e size of the cloud along each axis at the temperature, k_B T / (μ · gradient), m. */
  cloudSizesM?: [number, number, number];
}

/** A harmonic minimum: frequencies (Hz, lowest first) and their axes from the Hessian of U. */
export interface HarmonicShape {
  kind: 'harmonic';
  frequenciesHz: [number, number, number];
  axes: [Vec3, Vec3, Vec3];
}

export interface RfCut {
  /** The field where the energy above the minimum equals the cut, T. */
  fieldT: number;
  /** The exact Δm = ±1 frequency there (to `partner`), Hz. */
  frequencyHz: number;
  /** The linear rule's frequency: splitting and field both from the low-field slopes, Hz. */
  linearHz: number;
  partner: LowFieldLabel;
}

export interface MajoranaEstimate {
  /** Loss rate, 1/s. */
  rateHz: number;
  /** The gradient used (the strongest |B| gradient at the zero), T/m. */
  gradientTPerM: number;
  source: string;
}

export interface SublevelTrap {
  low: LowFieldLabel;
  twoM: number;
  /** dE/dB > 0 at the field of the minimum (or at the field centre when there is none). */
  lowFieldSeeking: boolean;
  /** The engine's moment −dE/dB at that field, J/T (negative for a low-field seeker). */
  momentJT: number;
  /** m g / (dE/dB): the |B| gradient along gravity that holds the sublevel up, T/m (absent for a high-field seeker or without gravity). */
  levitationTPerM?: number;
  /** Where dE/dB turns negative above the field at the minimum, T; null when it does not within the range swept. */
  turningFieldT: number | null;
  /** Held: a minimum inside the region with a positive depth. */
  trapped: boolean;
  minimum?: { position: Vec3; fieldT: number; energyJ: number };
  /** Distance the minimum hangs below the field's own minimum, m. */
  sagM?: number;
  /** Lowest escape energy above the minimum, J, and which boundary sets it. */
  depthJ?: number;
  depthLimit?: 'edge' | 'turning';
  shape?: LinearShape | HarmonicShape;
  /** Larmor frequency at the minimum (splitting to the RF partner), Hz. */
  larmorHz?: number;
  rfCut?: RfCut;
  majorana?: MajoranaEstimate;
}

/** A trap problem worded here: it has no number with a unit in it. */
export interface WordedTrapIssue extends EngineIssue {
  /** The sublevel the issue is about, when it is about one. */
  sublevel?: string;
  /** A point on a conductor: what meets it (the centre, or a point of the region) and the part's place in the field's list. */
  conductor?: { meets: 'centre' | 'region'; partIndex?: number };
}

/**
 * The figures of a trap problem whose text has quantities in it: the evaluation words it in the
 * trap's own units (eval/trapIssueText.ts), the one place that does, so a field reads in the unit
 * family the trap's report uses and a written length in the unit it was written in.
 */
export type TrapFigures =
  /** The |B| gradient along gravity the sublevel needs and the largest the trap has, T/m. */
  | { code: 'trap-gravity-too-strong'; needTPerM: number; hasTPerM: number }
  /** The field where the sublevel's energy turns over and sets its depth, T. */
  | { code: 'trap-turning-point'; turningFieldT: number }
  /** The Larmor frequency at the minimum and the highest trap frequency, Hz, and the margin wanted between them. */
  | { code: 'trap-bias-too-small'; larmorHz: number; topHz: number; margin: number }
  /** The region's radius and the distance from its centre to the nearest conductor, m. */
  | { code: 'trap-region-reaches-source'; radiusM: number; nearestM: number };

export type FigureTrapIssue = TrapFigures & { severity: EngineIssue['severity']; sublevel?: string };

export type TrapIssue = WordedTrapIssue | FigureTrapIssue;

/**
 * A finding about one sublevel that the evaluation words once per trap, naming every sublevel it
 * meets (eval/trapSublevelFindings.ts): the core carries no text for it, only the code, the
 * sublevel and its figure, so no label has to match.
 */
export interface SublevelFinding {
  severity: EngineIssue['severity'];
  code: 'trap-zero-field' | 'trap-majorana-slow' | 'trap-cut-outside';
  sublevel: string;
  /** trap-zero-field, trap-majorana-slow: the Majorana loss rate (1/s) at the cloud temperature, when one was given. */
  majoranaRateHz?: number;
  /** trap-cut-outside: the sublevel's depth (J) beside the cut above it. */
  depthJ?: number;
}

export interface TrapSummary {
  /** Where |B| is smallest in the region, and |B| there. */
  fieldCentre: Vec3;
  fieldAtCentreT: number;
  /** |B| range sampled over the region. */
  fieldRangeT: [number, number];
  /** The largest |B| gradient along gravity below the field centre, T/m (0 without gravity). */
  gravityGradientTPerM: number;
  sublevels: SublevelTrap[];
  issues: TrapIssue[];
  /** Per-sublevel findings in the order they were met (zero field, slow Majorana loss, a cut outside). */
  sublevelFindings: SublevelFinding[];
}
