/** The list helper every message shares (its own module, not the term-symbol parser's). */
import { describe, expect, it } from 'vitest';
import { listWords } from '../../server/src/physics/listWords';

describe('listWords', () => {
  it('says none, one, two and more items as a sentence does', () => {
    expect(listWords([])).toBe('');
    expect(listWords(['a'])).toBe('a');
    expect(listWords(['a', 'b'])).toBe('a or b');
    expect(listWords(['text', 'json', 'csv'])).toBe('text, json or csv');
  });
  it('joins with "and" when asked (the sublevels a trap finding names)', () => {
    expect(listWords(['a', 'b'], 'and')).toBe('a and b');
    expect(listWords(['x', 'y', 'z'], 'and')).toBe('x, y and z');
  });
});
