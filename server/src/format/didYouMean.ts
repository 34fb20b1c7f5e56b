/**
 * "Did you mean" suggestions: candidates close to a misspelt word by edit distance
 * (insertions, deletions, substitutions and swaps of two neighbours), ignoring case first
 * so that `Mhz` finds `MHz` and `a` finds `A`.
 */

/** Longest word we try to match; longer input gets no suggestions (it is not a typo). */
const MAX_WORD = 64;

/**
 * Optimal-string-alignment distance between a and b. Stops early and returns `limit + 1`
 * once the distance is known to exceed `limit`.
 */
export function editDistance(a: string, b: string, limit = Number.POSITIVE_INFINITY): number {
  if (Math.abs(a.length - b.length) > limit) return limit + 1;
  const n = b.length;
  let prevPrev = new Array<number>(n + 1).fill(0);
  let prev = Array.from({ length: n + 1 }, (_, j) => j);
  let cur = new Array<number>(n + 1).fill(0);
  for (let i = 1; i <= a.length; i++) {
    cur[0] = i;
    let rowMin = cur[0];
    for (let j = 1; j <= n; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let d = Math.min(prev[j]! + 1, cur[j - 1]! + 1, prev[j - 1]! + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) d = Math.min(d, prevPrev[j - 2]! + 1);
      cur[j] = d;
      if (d < rowMin) rowMin = d;
    }
    if (rowMin > limit) return limit + 1;
    [prevPrev, prev, cur] = [prev, cur, prevPrev];
  }
  return prev[n]!;
}

/** How many edits we allow for a word of this length (short words only differ by case). */
export function allowedEdits(length: number): number {
  if (length <= 2) return 0;
  if (length <= 4) return 1;
  if (length <= 8) return 2;
  return 3;
}

/**
 * Up to `max` candidates close to `word`, best first; ties keep the candidates' order, so
 * callers list the likelier candidates first. When some candidates differ from the word only
 * in case, only those are returned. The word itself is never suggested.
 */
export function suggestNames(word: string, candidates: readonly string[], max = 3): string[] {
  if (word.length === 0 || word.length > MAX_WORD) return [];
  const lower = word.toLowerCase();
  const limit = allowedEdits(word.length);
  const scored: { name: string; score: number; order: number }[] = [];
  const seen = new Set<string>();
  candidates.forEach((name, order) => {
    if (name === word || seen.has(name)) return;
    seen.add(name);
    const d = editDistance(lower, name.toLowerCase(), limit);
    // A candidate must keep at least one character of its own, else anything would match.
    if (d <= limit && d < name.length) scored.push({ name, score: d, order });
  });
  scored.sort((x, y) => x.score - y.score || x.order - y.order);
  // A match that differs only in case beats every real typo.
  const best = scored[0]?.score === 0 ? scored.filter((s) => s.score === 0) : scored;
  return best.slice(0, max).map((s) => s.name);
}

/** ` — did you mean 'x' or 'y'?` or '' when there are no suggestions. */
export function didYouMeanText(suggestions: readonly string[]): string {
  if (suggestions.length === 0) return '';
  return ` — did you mean ${suggestions.map((s) => `'${s}'`).join(' or ')}?`;
}
