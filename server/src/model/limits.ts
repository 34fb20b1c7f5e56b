/**
 * The caps that keep a hostile or runaway input from stalling the editor or exhausting the
 * CLI's memory. A realistic setup file is a few kilobytes and a few dozen statements, so each
 * cap is far above real use. docs/reliability.md lists them; change both together.
 */

/** A document longer than this many characters (UTF-16 code units, about bytes for ASCII text) is not analysed. */
export const MAX_DOCUMENT_CHARS = 1_000_000;

/** A document with more statements (lines that are neither blank nor only a comment) than this is not analysed. */
export const MAX_STATEMENTS = 20_000;

/**
 * A file named by `use` that is larger than this many bytes on disk (or characters when open in
 * the editor) is not read; one that has more than MAX_STATEMENTS statements is not used either.
 */
export const MAX_USED_FILE_BYTES = 500_000;

/** How many files deep `use` statements are followed (the analysed file is depth 0). */
export const MAX_USE_DEPTH = 8;

/** An evaluation (the physics, in the language server's worker thread) that runs longer than this is stopped. */
export const EVALUATION_TIME_LIMIT_MS = 30_000;

/** Lines that hold a statement: neither blank nor only a comment. Stops counting past `limit`, so a huge text costs little. */
export function countStatements(text: string, limit: number): number {
  let count = 0;
  let lineHasCode = false;
  let inComment = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 10 || c === 13) {
      if (lineHasCode && ++count > limit) return count;
      lineHasCode = false;
      inComment = false;
    } else if (!lineHasCode && !inComment) {
      if (c === 35 /* # */) inComment = true;
      else if (c !== 32 && c !== 9) lineHasCode = true;
    }
  }
  return lineHasCode ? count + 1 : count;
}

/** Samples of a line's synthesized spectrum (`points`): default, least and most (docs/spectra.md). */
export const SPECTRUM_POINTS_DEFAULT = 2001;
export const SPECTRUM_POINTS_MIN = 11;
export const SPECTRUM_POINTS_MAX = 100_001;
