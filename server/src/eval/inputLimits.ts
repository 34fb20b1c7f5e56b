/**
 * The document caps of model/limits.ts, checked before anything is parsed: a text over a cap
 * gets one problem that says which cap and by how much, and no other analysis, so that a huge
 * input costs a length check and a line count instead of minutes and all the memory.
 */
import type { Problem, SetupDocument } from '../format/ast';
import { countStatements, MAX_DOCUMENT_CHARS, MAX_STATEMENTS } from '../model/limits';
import { endSentence } from '../format/sentenceEnd';
import { EVAL_RULES } from './evalCodes';

function problem(code: 'document-too-large' | 'too-many-statements', message: string): Problem {
  const at = { line: 0, character: 0 };
  return { code, severity: EVAL_RULES[code].severity, message: endSentence(message), range: { start: at, end: at } };
}

/** The problem of a text over a document cap, or undefined when it is within them. */
export function overCap(text: string): Problem | undefined {
  if (text.length > MAX_DOCUMENT_CHARS) {
    return problem('document-too-large', `this file is not checked: it has ${text.length} characters, more than the ${MAX_DOCUMENT_CHARS} a setup file may have`);
  }
  const statements = countStatements(text, MAX_STATEMENTS);
  if (statements > MAX_STATEMENTS) {
    return problem('too-many-statements', `this file is not checked: it has more than ${MAX_STATEMENTS} statements, the most a setup file may have`);
  }
  return undefined;
}

/** The document of a text that was not parsed: no lines are indexed either (one line start). */
export function unparsedDocument(text: string): SetupDocument {
  return { text, lineStarts: [0], blocks: [], uses: [], comments: [], problems: [] };
}
