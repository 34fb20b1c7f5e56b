/**
 * Electric-dipole selection rules for a line between two levels given as term data.
 * Strict rules (errors): parity must change; ΔJ = 0, ±1; not J = 0 ↔ 0.
 * LS-coupling rules (warnings, since spin–orbit mixing lets them break): ΔS = 0
 * (otherwise an intercombination line); ΔL = 0, ±1; not L = 0 ↔ 0.
 * Nothing throws; every finding is an issue with a stable code.
 */
import { parseConfiguration } from '../configuration';
import { formatHalfInteger, formatTermSymbol, type Parity } from '../termSymbol';
import { issue } from './issueValues';
import type { LineTerm, TransitionIssue } from './types';

function isCount(v: unknown): v is number {
  return typeof v === 'number' && Number.isInteger(v) && v >= 0;
}

/** Checks the numbers of one term; null when they are usable. */
function termProblem(t: LineTerm): string | null {
  if (t === null || typeof t !== 'object') return 'no term data was given';
  if (!isCount(t.twoS) || !isCount(t.L) || !isCount(t.twoJ)) return 'twoS, L and twoJ must be whole numbers ≥ 0';
  const twoL = 2 * t.L;
  if (t.twoJ < Math.abs(twoL - t.twoS) || t.twoJ > twoL + t.twoS || (t.twoJ + t.twoS) % 2 !== 0) {
    return `J = ${formatHalfInteger(t.twoJ)} is not possible for S = ${formatHalfInteger(t.twoS)}, L = ${t.L}`;
  }
  return null;
}

/** The level's parity: from its configuration when given (which wins), else the stated one. */
function parityOf(t: LineTerm, which: string, issues: TransitionIssue[]): Parity | null {
  let fromConfig: Parity | null = null;
  if (typeof t.configuration === 'string' && t.configuration.trim() !== '') {
    const parsed = parseConfiguration(t.configuration);
    if (parsed.configuration) fromConfig = parsed.configuration.parity;
    else {
      issues.push(
        issue('warning', 'line-configuration-unreadable', `The ${which} configuration '${t.configuration}' could not be read; its parity is not used.`),
      );
    }
  }
  const stated = t.parity === 'even' || t.parity === 'odd' ? t.parity : null;
  if (fromConfig && stated && fromConfig !== stated) {
    issues.push(
      issue(
        'warning',
        'line-parity-conflict',
        `The ${which} level is marked ${stated} but its configuration '${t.configuration}' is ${fromConfig}; the configuration's parity is used.`,
      ),
    );
  }
  return fromConfig ?? stated;
}

function termText(t: LineTerm, parity: Parity | null): string {
  return formatTermSymbol({ twoS: t.twoS, L: t.L, twoJ: t.twoJ, parityMark: parity }, 'unicode');
}

export function selectionRules(lower: LineTerm, upper: LineTerm): TransitionIssue[] {
  const issues: TransitionIssue[] = [];
  const badLower = termProblem(lower);
  const badUpper = termProblem(upper);
  if (badLower || badUpper) {
    if (badLower) issues.push(issue('error', 'line-term-invalid', `Lower level: ${badLower}.`));
    if (badUpper) issues.push(issue('error', 'line-term-invalid', `Upper level: ${badUpper}.`));
    return issues;
  }
  const pl = parityOf(lower, 'lower', issues);
  const pu = parityOf(upper, 'upper', issues);
  const name = `${termText(lower, pl)} – ${termText(upper, pu)}`;

  if (pl === null || pu === null) {
    issues.push(issue('info', 'line-parity-unknown', `The parity of ${pl === null ? 'the lower' : 'the upper'} level is not known, so the parity rule was not checked.`));
  } else if (pl === pu) {
    issues.push(issue('error', 'line-parity-unchanged', `${name}: both levels are ${pl}; an electric-dipole line must change parity.`));
  }
  const dJ = Math.abs(upper.twoJ - lower.twoJ) / 2;
  if (dJ > 1) {
    issues.push(issue('error', 'line-delta-j', `${name}: ΔJ = ${dJ}; an electric-dipole line needs ΔJ = 0 or ±1.`));
  } else if (lower.twoJ === 0 && upper.twoJ === 0) {
    issues.push(issue('error', 'line-j-zero-zero', `${name}: J = 0 ↔ 0 has no electric-dipole line.`));
  }
  if (lower.twoS !== upper.twoS) {
    issues.push(
      issue(
        'warning',
        'line-intercombination',
        `${name}: the spin changes (ΔS = ${formatHalfInteger(upper.twoS - lower.twoS)}), an intercombination line — allowed only through spin–orbit mixing, so expect it to be weak.`,
      ),
    );
  }
  const dL = Math.abs(upper.L - lower.L);
  if (dL > 1) {
    issues.push(issue('warning', 'line-delta-l', `${name}: ΔL = ${dL}; in LS coupling an electric-dipole line needs ΔL = 0 or ±1.`));
  } else if (lower.L === 0 && upper.L === 0) {
    issues.push(issue('warning', 'line-l-zero-zero', `${name}: L = 0 ↔ 0 is forbidden in LS coupling.`));
  }
  return issues;
}
