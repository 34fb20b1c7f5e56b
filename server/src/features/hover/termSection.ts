/**
 * A level's term: g_J (as used, the Landé value and the exact fraction with g_s = 2), J and the
 * J values the term allows, the number of sublevels, and the parity. When the term is invalid
 * (no result), what can still be read from the text: the allowed J for its S and L.
 */
import { configurationText } from '../../eval/designationText';
import type { LevelResult } from '../../eval/resultTypes';
import { halfText } from '../../eval/halves';
import { trimNumber, withUncertainty } from '../../eval/quantityText';
import type { LevelModel } from '../../model/types';
import { withoutStop } from '../../format/sentenceEnd';
import { parseLevelDesignation } from '../../physics/configuration';
import { allowedJ, formatTermLabel, formatTermSymbol } from '../../physics/termSymbol';
import { md, mdTitle } from '../shared/markdown';

function parityText(parity: 'even' | 'odd' | null): string {
  if (parity === null) return 'parity not stated (no configuration and no ° mark)';
  return `${parity} parity`;
}

export function termSection(level: LevelModel, r: LevelResult | undefined): string {
  if (!r) return level.valid ? unevaluatedTermSection(level) : invalidTermSection(level);
  const head = [`${mdTitle(md(r.designation.unicode))}`];
  if (r.designation.configuration) head.push(`— ${md(r.designation.configuration)}`);
  head.push(`— ${parityText(r.designation.parity)}`);
  const g = r.g_J;
  const lines = [head.join(' ')];
  const landeNote = `Landé ${trimNumber(g.lande, 7)} (g_s = ${g.g_s === 2 ? '2' : trimNumber(g.g_s, 12)}${g.g_L !== 1 ? `, g_L = ${trimNumber(g.g_L, 10)}` : ''})`;
  if (g.measured) {
    lines.push(`g_J = ${withUncertainty(g.used, g.used_unc, (v) => trimNumber(v, 8))} — measured (${md(g.used_source)}); ${landeNote}; exactly ${g.lande_fraction} with g_s = 2`);
  } else {
    lines.push(`g_J = ${trimNumber(g.used, 7)} — ${landeNote}; exactly ${g.lande_fraction} with g_s = 2`);
  }
  lines.push(`J = ${r.J_text}; ${md(formatTermLabel(2 * r.S, r.L))} allows J = ${r.allowed_J.join(', ')}`);
  const twoJ = Math.round(2 * r.J);
  const twoI = Math.round(2 * r.I);
  const jCount = twoJ + 1;
  lines.push(
    twoI === 0
      ? `${jCount} sublevel${jCount === 1 ? '' : 's'} (2J+1)`
      : `${r.sublevel_count} sublevels: (2J+1)(2I+1) = ${jCount} × ${twoI + 1} with I = ${halfText(twoI)}`,
  );
  return lines.join('  \n');
}

/** A valid term whose evaluation is not available (still running, or failed): what the model knows. */
function unevaluatedTermSection(level: LevelModel): string {
  const term = level.term!;
  if (term.twoJ === null) {
    return [
      mdTitle(`${md(formatTermSymbol(term, 'unicode'))} term`),
      `${md(formatTermLabel(term.twoS, term.L))} (S = ${halfText(term.twoS)}, L = ${term.L}) has J = ${allowedJ(term.twoS, term.L).map(halfText).join(', ')}`,
      'its J levels appear once the evaluation has run',
    ].join('  \n');
  }
  const twoJ = term.twoJ ?? 0;
  const twoI = level.species.twoI.value;
  const parity = level.configuration?.parity ?? term.parityMark;
  const head = [mdTitle(md(formatTermSymbol(term, 'unicode')))];
  if (level.configuration) head.push(`— ${md(configurationText(level.configuration) ?? '')}`);
  head.push(`— ${parityText(parity)}`);
  return [
    head.join(' '),
    `J = ${halfText(twoJ)}; ${md(formatTermLabel(term.twoS, term.L))} allows J = ${allowedJ(term.twoS, term.L).map(halfText).join(', ')}`,
    `${(twoJ + 1) * (twoI + 1)} sublevel${(twoJ + 1) * (twoI + 1) === 1 ? '' : 's'}`,
    'g-factors and energies appear once the evaluation has run',
  ].join('  \n');
}

/** S and L read from a term that failed validation, e.g. `2P5/2` → S = 1/2, L = 1. */
function termLetters(text: string): { twoS: number; L: number } | undefined {
  const last = text.trim().split(/\s+/).pop() ?? '';
  const m = /^\^?(\d{1,2})([SPDFGHIKLMNOQRTUVWXYZ])/.exec(last);
  if (!m) return undefined;
  const twoS = Number(m[1]) - 1;
  const L = 'SPDFGHIKLMNOQRTUVWXYZ'.indexOf(m[2]!);
  return twoS >= 0 && L >= 0 ? { twoS, L } : undefined;
}

/** Which part of a designation is wrong, with the first error's words ('the configuration: 6s holds …'). */
function wrongPart(text: string): string {
  const first = parseLevelDesignation(text).issues.find((i) => i.severity === 'error');
  if (!first) return 'this level is not valid';
  const part = first.code.startsWith('config-')
    ? 'the configuration is not valid'
    : first.code === 'term-not-in-configuration' || first.code === 'term-parity-mismatch'
      ? 'the term does not fit the configuration'
      : first.code === 'level-missing-term' || first.code === 'level-empty'
        ? 'the term is missing'
        : 'the term is not valid';
  return `${part}: ${md(withoutStop(first.message))}`;
}

function invalidTermSection(level: LevelModel): string {
  const term = level.term;
  const lines = [mdTitle(md(level.designationText || '(no term)'))];
  const sl = term ? { twoS: term.twoS, L: term.L } : termLetters(level.designationText);
  if (term && term.twoJ === null) lines.push(`${md(formatTermSymbol(term, 'unicode'))} has no J yet`);
  else lines.push(`${wrongPart(level.designationText)}, so nothing is computed for this level yet`);
  if (sl) {
    const js = allowedJ(sl.twoS, sl.L).map(halfText);
    lines.push(`${md(formatTermLabel(sl.twoS, sl.L))} (S = ${halfText(sl.twoS)}, L = ${sl.L}) allows J = ${js.join(', ')}`);
  }
  return lines.join('  \n');
}
