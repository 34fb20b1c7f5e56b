/**
 * A term symbol typed with a blank inside (`2P 3/2`, `2P°3 /2`): the designation's last two
 * words read as one term. Without this the first half reads as a subshell (`2P` as `2p`) and the
 * user gets three errors and a fix to lower-case the term's letter.
 */
import { parseLevelDesignation } from '../physics/configuration';

export interface SplitTerm {
  /** The designation with the blank taken out. */
  text: string;
  /** Offsets in the designation of the two halves' start and end, and the term written whole. */
  start: number;
  end: number;
  term: string;
  /** Where the second half starts in `text`, and how far it moved left. */
  joinAt: number;
  blank: number;
}

/** Only when the designation without the blank reads as a term (perhaps with a wrong J) and has fewer errors than as written. */
export function splitTermOf(designation: string, errorsAsWritten: number): SplitTerm | undefined {
  if (errorsAsWritten === 0) return undefined;
  const words = [...designation.matchAll(/\S+/g)];
  if (words.length < 2) return undefined;
  const prev = words[words.length - 2]!;
  const last = words[words.length - 1]!;
  // The second half is J (`3/2`, `/2`, `2`), or the first half is the bare multiplicity (`2 P3/2`).
  if (!/^(?:\d+\/?\d*|\/\d+)$/.test(last[0]) && !/^\d+$/.test(prev[0])) return undefined;
  const start = prev.index!;
  const end = last.index! + last[0].length;
  const term = prev[0] + last[0];
  const text = designation.slice(0, start) + term + designation.slice(end);
  const joined = parseLevelDesignation(text);
  const errors = joined.issues.filter((i) => i.severity === 'error');
  // A J the term cannot have (`2P° 5/2`) still reads as a term: that J is the one error left.
  const readsAsTerm = !!joined.term || (errors.length > 0 && errors.every((i) => i.code.startsWith('term-j-')));
  if (!readsAsTerm || errors.length >= errorsAsWritten) return undefined;
  return { text, start, end, term, joinAt: start + prev[0].length, blank: last.index! - start - prev[0].length };
}

/** An offset in the joined text as an offset in the designation as written (`isEnd`: an exclusive end). */
export function writtenOffset(split: SplitTerm | undefined, at: number, isEnd: boolean): number {
  if (!split) return at;
  return at > split.joinAt || (!isEnd && at === split.joinAt) ? at + split.blank : at;
}
