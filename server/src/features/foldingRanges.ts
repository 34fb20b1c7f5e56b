/** Folding: every block over more than one line, multi-line levels, and runs of two or more comment lines. */
import { type FoldingRange, FoldingRangeKind } from 'vscode-languageserver-types';
import type { Analysis } from '../eval/analyze';

export function foldingRanges(analysis: Analysis): FoldingRange[] {
  const out: FoldingRange[] = [];
  for (const b of analysis.doc.blocks) {
    if (b.range.end.line > b.range.start.line) out.push({ startLine: b.range.start.line, endLine: b.range.end.line });
    for (const l of b.levels) {
      if (l.range.end.line > l.range.start.line) out.push({ startLine: l.range.start.line, endLine: l.range.end.line });
    }
  }
  let runStart = -1;
  let runEnd = -1;
  const flush = (): void => {
    if (runStart >= 0 && runEnd > runStart) out.push({ startLine: runStart, endLine: runEnd, kind: FoldingRangeKind.Comment });
  };
  for (const c of analysis.doc.comments) {
    if (!c.ownLine) continue;
    const line = c.range.start.line;
    if (line === runEnd + 1 && runStart >= 0) runEnd = line;
    else {
      flush();
      runStart = line;
      runEnd = line;
    }
  }
  flush();
  return out.sort((a, b) => a.startLine - b.startLine || b.endLine - a.endLine);
}
