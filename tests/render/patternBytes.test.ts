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
    ['five peaks, export', () => renderPattern(patternFixture(), { kind: 'export' }), 'ee1e839da2907b9d4be5582ee542fe7eedc79be56db272d3a2c2c916e093fefa'],
    ['five peaks, panel', () => renderPattern(patternFixture(), { kind: 'panel' }), 'deb04bc4794cd7f1d098b6691a3655b894e6a7c5f4e9a78b3ca2e0e48296b1b5'],
    ['a peak with no states, one at 0, not resolved', () => renderPattern(variant(), { kind: 'export' }), '5b2d0d2c8828e4ea44adc77d9d10d69bdba2d510fb63701f0f3097c7ad5fe3d4'],
  ])('%s', (_name, render, hash) => {
    expect(sha256(render())).toBe(hash);
  });
});
