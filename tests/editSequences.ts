/**
 * Shared fast-check arbitrary: a seed text (an example, or a generated big setup) and a sequence
 * of edits a typing user makes, biased towards what makes or breaks a block header, joins or
 * splits lines, and every line-break style.
 */
import fc from 'fast-check';
import { readdirSync, readFileSync } from 'fs';
import { generateSetup } from '../bench/generatedSetup';

export const EDIT_SEEDS = [
  ...readdirSync('examples')
    .filter((f) => f.endsWith('.sublevel'))
    .map((f) => readFileSync(`examples/${f}`, 'utf8')),
  generateSetup(400),
];

const PIECES = [
  'species Demo', 'species', 'magnet m', 'beam b', 'field f = 3 G', 'line L: g -> p', 'settings', 'use "a.sublevel"', 'use',
  'level x: 5s 2S1/2', 'level', 'field: 0.4 T', 'field =', 'A = 3 MHz', 'mass = 7 u', 'I = 3/2', ':', '=', '#', '# c', 'spices', 'lvel',
  '\n', '\r\n', '\r', '\n\n', '  ', 'x', '3', '->', '\u0007', '\u202e',
];

export interface TextEdit {
  at: number;
  remove: number;
  insert: string;
}

export const textEdit: fc.Arbitrary<TextEdit> = fc.record({
  at: fc.nat(),
  remove: fc.oneof(fc.constant(0), fc.nat(3), fc.nat(80)),
  insert: fc.oneof(fc.constantFrom(...PIECES), fc.constant(''), fc.string({ maxLength: 4 })),
});

export const editSequence = fc.tuple(fc.constantFrom(...EDIT_SEEDS), fc.array(textEdit, { minLength: 1, maxLength: 12 }));

export function applyTextEdit(text: string, e: TextEdit): string {
  const at = e.at % (text.length + 1);
  return text.slice(0, at) + e.insert + text.slice(at + e.remove);
}
