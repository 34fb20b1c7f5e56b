/**
 * The pattern's SVG, byte for byte, as it was before its peak entries were built once instead of
 * twice (a refactor that must change nothing): SHA-256 of the text for the five-peak fixture in
 * both themes, and for a variant with a peak of no named states, near-zero positions and a
 * resolvability verdict of "not resolved". A change meant to alter the figure updates these
 * hashes in the same commit.
 */
import { createHash } from 'crypto';
import { describe, expect, it } from 'vitest';
import { renderPattern, type PatternViewData } from '../../server/src/render';
import { patternFixture } from './fixtures';

const sha256 = (svg: string): string => createHash('sha256').update(svg).digest('hex');

function variant(): PatternViewData {
  const d = patternFixture();
  return {
    ...d,
    peaks: d.peaks.map((p, i) => ({ ...p, ...(i === 0 ? { members: [] } : {}), ...(i === 2 ? { positionM: 1e-13 } : {}), ...(i === 3 ? { members: ['m_F=1', 'm_F=0 of the upper level'] } : {}) })),
    verdict: { resolved: false, text: 'peaks 2 and 3 overlap' },
  };
}

describe('renderPattern bytes', () => {
  it.each([
    ['five peaks, export', () => renderPattern(patternFixture(), { kind: 'export' }), '92a19bc816ecc61bc6fda11741428c0d545ade4f64de329a8b0e41275b2288f3'],
    ['five peaks, panel', () => renderPattern(patternFixture(), { kind: 'panel' }), '19e6611edb72d7ac314da0c52d38c5c50b377b8a74305f4d0726e62fde3742aa'],
    ['a peak with no states, one at 0, not resolved', () => renderPattern(variant(), { kind: 'export' }), '447c684b26838751f76b8a7b22b2c84a579dfa55a598988f1f99c6c82bae481f'],
  ])('%s', (_name, render, hash) => {
    expect(sha256(render())).toBe(hash);
  });
});
