/** A small collector so that model builders can report problems in one line each; every message leaves it ending as a sentence. */
import type { Problem, ProblemSeverity, Range } from '../format/ast';
import { endSentence } from '../format/sentenceEnd';
import { MODEL_RULES } from './modelCodes';

export class ProblemList {
  readonly items: Problem[] = [];

  /** Report with the rule's default severity. */
  add(code: keyof typeof MODEL_RULES, message: string, range: Range, extra?: Partial<Problem>): void {
    this.addWith(code, MODEL_RULES[code].severity, message, range, extra);
  }

  addWith(code: string, severity: ProblemSeverity, message: string, range: Range, extra?: Partial<Problem>): void {
    this.items.push({ code, severity, message: endSentence(message), range, ...extra });
  }

  push(p: Problem): void {
    this.items.push({ ...p, message: endSentence(p.message) });
  }
}
