/**
 * A term symbol typed with blanks inside (`2P 3/2`, `2P°3 /2`, `2P 5 /2`): the designation's last
 * words read as one term. Without this the first half reads as a subshell (`2P` as `2p`) and the
 * user gets three errors and a fix to lower-case the term's letter.
 */
import { parseLevelDesignation } from '../physics/configuration';

export interface SplitTerm {
  /** The designation with the blanks taken out. */
  text: string;
  /** Offsets in the designation of the first half's start and the last half's end, and the term written whole. */
  start: number;
  end: number;
  term: string;
  /** Each blank taken out: where the half after it starts in `text`, and how wide the blank was. */
  joins: { at: number; blank: number }[];
}

/** A piece of J: `3/2`, `3`, `/2`, `3/`, `/`. */
const J_PIECE = /^(?:\d+\/?\d*|\/\d*)$/;
/** At most this many words are joined (`2P 5 / 2`), so a long configuration is never swallowed. */
const MOST_WORDS = 4;

/** Only when the designation without the blanks reads as a term (perhaps with a wrong J) and has fewer errors than as written; the fewest words that do. */
export function splitTermOf(designation: string, errorsAsWritten: number): SplitTerm | undefined {
  if (errorsAsWritten === 0) return undefined;
  const words = [...designation.matchAll(/\S+/g)];
  for (let count = 2; count <= Math.min(MOST_WORDS, words.length); count++) {
    const group = words.slice(words.length - count);
    // The halves after the first are pieces of J (`3/2`, `5`, `/2`), or the first is the bare multiplicity (`2 P3/2`, `2 S 1/2`).
    const piecesOfJ = group.slice(1).every((w) => J_PIECE.test(w[0]));
    const bareMultiplicity = /^\d+$/.test(group[0]![0]) && group.slice(2).every((w) => J_PIECE.test(w[0]));
    if (!piecesOfJ && !bareMultiplicity) continue;
    const split = joined(designation, group, errorsAsWritten);
    if (split) return split;
  }
  return undefined;
}

function joined(designation: string, group: RegExpMatchArray[], errorsAsWritten: number): SplitTerm | undefined {
  const start = group[0]!.index!;
  const last = group[group.length - 1]!;
  const end = last.index! + last[0].length;
  const term = group.map((w) => w[0]).join('');
  const text = designation.slice(0, start) + term + designation.slice(end);
  const parsed = parseLevelDesignation(text);
  const errors = parsed.issues.filter((i) => i.severity === 'error');
  // A J the term cannot have (`2P° 5/2`) still reads as a term: that J is the one error left.
  const readsAsTerm = !!parsed.term || (errors.length > 0 && errors.every((i) => i.code.startsWith('term-j-')));
  if (!readsAsTerm || errors.length >= errorsAsWritten) return undefined;
  const joins: SplitTerm['joins'] = [];
  let at = start;
  for (let i = 1; i < group.length; i++) {
    at += group[i - 1]![0].length;
    joins.push({ at, blank: group[i]!.index! - (group[i - 1]!.index! + group[i - 1]![0].length) });
  }
  return { text, start, end, term, joins };
}

/** An offset in the joined text as an offset in the designation as written (`isEnd`: an exclusive end). */
export function writtenOffset(split: SplitTerm | undefined, at: number, isEnd: boolean): number {
  if (!split) return at;
  let moved = 0;
  for (const j of split.joins) if (at > j.at || (!isEnd && at === j.at)) moved += j.blank;
  return at + moved;
}
