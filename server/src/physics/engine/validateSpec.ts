/**
 * Checks a level spec before anything is built: integer angular momenta,
 * finite constants, size caps. Constants that cannot act (B with I or J < 1,
 * C with I or J < 3/2, g_I without a nucleus) are dropped with a warning.
 */
import { issue } from './issues';
import { MAX_BASIS_STATES, MAX_BLOCK_SIZE } from './limits';
import type { EngineIssue, LevelSpec } from './types';
import { octupoleActs, quadrupoleActs } from './zeroFieldLevels';
import { validateTerm, type CleanTerm } from './validateTerm';

export interface CleanHyperfine {
  kind: 'hyperfine';
  twoJ: number;
  twoI: number;
  gJ: number;
  gI: number;
  A: number;
  B: number;
  C: number;
}

export interface CleanFine {
  kind: 'fine';
  twoS: number;
  L: number;
  zeta: number;
  gL: number;
  gS: number;
  /** 0 when no nucleus was given. */
  twoI: number;
  gI: number;
  hasNucleus: boolean;
}

export type CleanSpec = CleanHyperfine | CleanFine | CleanTerm;

export interface ValidatedSpec {
  spec: CleanSpec | null;
  issues: EngineIssue[];
}

function isCount(v: unknown): v is number {
  return typeof v === 'number' && Number.isInteger(v) && v >= 0;
}

function isReal(v: unknown): v is number {
  return typeof v === 'number' && Number.isFinite(v);
}

function optionalReal(v: unknown): boolean {
  return v === undefined || isReal(v);
}

function checkSize(dimension: number, largestBlock: number, issues: EngineIssue[]): boolean {
  if (dimension > MAX_BASIS_STATES) {
    issues.push(
      issue('error', 'basis-too-large', `The level has ${dimension} sublevels; the engine handles at most ${MAX_BASIS_STATES}.`),
    );
    return false;
  }
  if (largestBlock > MAX_BLOCK_SIZE) {
    issues.push(
      issue('error', 'block-too-large', `One m block would have ${largestBlock} states; the engine handles at most ${MAX_BLOCK_SIZE}.`),
    );
    return false;
  }
  return true;
}

function validateHyperfine(s: Record<string, unknown>, issues: EngineIssue[]): CleanHyperfine | null {
  const { twoJ, twoI, gJ, gI, A } = s;
  if (!isCount(twoJ) || !isCount(twoI)) {
    issues.push(issue('error', 'bad-momentum', 'twoJ and twoI must be whole numbers ≥ 0 (twice J and twice I).'));
    return null;
  }
  if (!isReal(gJ) || !isReal(gI) || !isReal(A) || !optionalReal(s.B) || !optionalReal(s.C)) {
    issues.push(issue('error', 'bad-constant', 'g_J, g_I, A (and B, C when given) must be finite numbers.'));
    return null;
  }
  // Compare sizes in floating point first so huge inputs cannot overflow or allocate.
  if (!checkSize((twoJ + 1) * (twoI + 1), Math.min(twoJ, twoI) + 1, issues)) return null;
  let B = (s.B as number | undefined) ?? 0;
  let C = (s.C as number | undefined) ?? 0;
  if (B !== 0 && !quadrupoleActs(twoJ, twoI)) {
    issues.push(
      issue('warning', 'quadrupole-ignored', 'The quadrupole constant B needs I ≥ 1 and J ≥ 1; it has no effect here and was ignored.'),
    );
    B = 0;
  }
  if (C !== 0 && !octupoleActs(twoJ, twoI)) {
    issues.push(
      issue('warning', 'octupole-ignored', 'The octupole constant C needs I ≥ 3/2 and J ≥ 3/2; it has no effect here and was ignored.'),
    );
    C = 0;
  }
  if (twoI === 0 && (A !== 0 || gI !== 0)) {
    issues.push(issue('info', 'no-nucleus', 'With I = 0 there is no hyperfine structure; A and g_I have no effect.'));
  }
  if (twoJ === 0 && A !== 0) {
    issues.push(issue('info', 'no-electronic-momentum', 'With J = 0 the hyperfine constants have no effect.'));
  }
  return { kind: 'hyperfine', twoJ, twoI, gJ, gI, A, B, C };
}

function validateFine(s: Record<string, unknown>, issues: EngineIssue[]): CleanFine | null {
  const { twoS, L, zeta, gL, gS } = s;
  if (!isCount(twoS) || !isCount(L)) {
    issues.push(issue('error', 'bad-momentum', 'twoS (twice S) and L must be whole numbers ≥ 0.'));
    return null;
  }
  if (!isReal(zeta) || !isReal(gL) || !isReal(gS)) {
    issues.push(issue('error', 'bad-constant', 'ζ, g_L and g_S must be finite numbers.'));
    return null;
  }
  const hasNucleus = s.twoI !== undefined && s.twoI !== 0;
  if (s.twoI !== undefined && !isCount(s.twoI)) {
    issues.push(issue('error', 'bad-momentum', 'twoI (twice I) must be a whole number ≥ 0.'));
    return null;
  }
  if (!optionalReal(s.gI)) {
    issues.push(issue('error', 'bad-constant', 'g_I must be a finite number.'));
    return null;
  }
  const twoI = hasNucleus ? (s.twoI as number) : 0;
  let gI = (s.gI as number | undefined) ?? 0;
  if (!hasNucleus && gI !== 0) {
    issues.push(issue('warning', 'nuclear-g-ignored', 'g_I was given without a nuclear spin; it was ignored.'));
    gI = 0;
  }
  if (!checkSize((2 * L + 1) * (twoS + 1) * (twoI + 1), Math.min(2 * L, twoS) + 1, issues)) return null;
  return { kind: 'fine', twoS, L, zeta, gL, gS, twoI, gI, hasNucleus };
}

export function validateSpec(spec: LevelSpec): ValidatedSpec {
  const issues: EngineIssue[] = [];
  if (spec === null || typeof spec !== 'object') {
    issues.push(issue('error', 'bad-spec', 'No level description was given.'));
    return { spec: null, issues };
  }
  const raw = spec as unknown as Record<string, unknown>;
  let clean: CleanSpec | null = null;
  if (raw.kind === 'hyperfine') clean = validateHyperfine(raw, issues);
  else if (raw.kind === 'fine') clean = validateFine(raw, issues);
  else if (raw.kind === 'term') clean = validateTerm(spec as LevelSpec & { kind: 'term' }, issues);
  else issues.push(issue('error', 'bad-spec', "The level kind must be 'hyperfine', 'fine' or 'term'."));
  return { spec: clean, issues };
}

/** A field value must be a finite number of tesla. */
export function checkField(fieldT: unknown, name: string, issues: EngineIssue[]): fieldT is number {
  if (!isReal(fieldT)) {
    issues.push(issue('error', 'bad-field', `The ${name} must be a finite number of tesla.`));
    return false;
  }
  return true;
}
