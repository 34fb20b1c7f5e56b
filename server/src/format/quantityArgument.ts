/**
 * Reads a quantity written outside a setup file (a CLI option such as `--to 0.1T`) with the same
 * grammar and units as the format, so `sublevel sweep --to 500 G` means what `field = 500 G` means.
 */
import type { Problem } from './ast';
import { scanLine } from './scanner';
import { readQuantity, type Dimension } from './units';
import { withoutStop } from './sentenceEnd';
import { allParts, readValueGroups } from './values';

export function readQuantityArgument(text: string, expected: Dimension, what: string): { si?: number; message?: string } {
  const oneLine = text.replace(/[\r\n]+/g, ' ');
  const problems: Problem[] = [];
  const scanned = scanLine(oneLine, 0, 0, oneLine.length);
  const groups = readValueGroups(scanned.tokens, { text: oneLine, line: 0, lineStart: 0 }, problems);
  const parts = allParts(groups);
  // A usage error on the command line is a phrase after `sublevel:`, without the finding's full stop.
  if (problems.length > 0) return { message: withoutStop(problems[0]!.message) };
  if (parts.length !== 1) return { message: `${what} needs one quantity such as ${exampleFor(expected)}, got '${text}'` };
  const reading = readQuantity(parts[0]!, expected, what);
  if (reading.problem) return { message: withoutStop(reading.problem.message) };
  return reading.si !== undefined ? { si: reading.si } : { message: `${what}: cannot read '${text}'` };
}

function exampleFor(d: Dimension): string {
  return d === 'flux-density' ? '0.1 T or 500 G' : 'a number with a unit';
}
