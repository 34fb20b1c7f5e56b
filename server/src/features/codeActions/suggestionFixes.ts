/**
 * Fixes from a problem's `data.suggestions`: each suggestion replaces the problem's range
 * (allowed J values, allowed terms, did-you-mean names, keywords and units, built-in species).
 */
import type { CodeAction } from 'vscode-languageserver-types';
import { type FixContext, quickFix } from './types';

function title(code: string, s: string): string {
  switch (code) {
    case 'term-j-out-of-range':
    case 'term-j-parity-of-spin':
      return `Change J to ${s}`;
    case 'term-not-in-configuration':
      return `Change the term to ${s}`;
    case 'term-parity-mismatch':
      return s === '' ? 'Remove the odd-parity mark' : `Replace the parity mark with '${s}'`;
    case 'level-missing-term':
      return `Write '${s}'`;
    case 'name-unknown':
    case 'name-ambiguous':
    case 'syntax-unknown-statement':
    case 'syntax-unknown-key':
    case 'unit-unknown':
    case 'use-file-missing':
      return `Change to '${s}'`;
    case 'syntax-use-path':
      return `Write ${s}`;
    case 'unit-missing':
      return `Add a unit: ${s}`;
    case 'unit-wrong-dimension':
      return `Change the unit to ${s}`;
    case 'species-needs-mass':
      return `Use the built-in species ${s}`;
    case 'beam-source-malformed':
      return `Write source = ${s}`;
    case 'config-malformed':
      return `Write '${s}'`;
    default:
      return s === '' ? 'Remove it' : `Replace with '${s}'`;
  }
}

export function suggestionFixes(ctx: FixContext): CodeAction[] {
  const raw = ctx.problem.data?.suggestions;
  if (!Array.isArray(raw)) return [];
  const suggestions = raw.filter((s): s is string => typeof s === 'string').slice(0, 24);
  const range = ctx.problem.range;
  if (range.start.line !== range.end.line) return [];
  // The problem may name the one suggestion that is clearly meant (`Gs` → G); it goes first.
  const named = ctx.problem.data?.preferred;
  const preferred = typeof named === 'string' && suggestions.includes(named) ? named : suggestions.length === 1 ? suggestions[0] : undefined;
  const ordered = preferred === undefined ? suggestions : [preferred, ...suggestions.filter((s) => s !== preferred)];
  // Fixes of more than one kind (a trap cut: temperatures and frequencies) say which kind each is.
  const kinds = ctx.problem.data?.kinds as Record<string, unknown> | undefined;
  const kindOf = (s: string): string => (kinds && typeof kinds[s] === 'string' ? ` (${kinds[s]})` : '');
  return ordered.map((s) => quickFix(ctx, `${title(ctx.problem.code, s)}${kindOf(s)}`, [{ range, newText: s }], s === preferred));
}
