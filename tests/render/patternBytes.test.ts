/**
 * The pattern's SVG, byte for byte, as it was before its peak entries were built once instead of
 * twice (a refactor that must change nothing): SHA-256 of the text for the five-peak fixture in
 * both themes, and for a variant with a peak of no named states, near-zero positions and a
 * resolvability verdict of "not resolved". A change meant to alter the figure updates these
 * hashes in the same commit (last: the peak table moved 8 units down, clear of the axis title).
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
    ['five peaks, export', () => renderPattern(patternFixture(), { kind: 'export' }), 'f70a48aa83e6406ee99dcda5deb7703ebbe252ebbf279c246d564fe12fdd7c20'],
    ['five peaks, panel', () => renderPattern(patternFixture(), { kind: 'panel' }), '9f08e15ef9ca2177e01d9683360d908883a606f70d5abcdd73798838ef32b77a'],
    ['a peak with no states, one at 0, not resolved', () => renderPattern(variant(), { kind: 'export' }), '6c60af10098f39fd781a67aae3a4eac30d35d761171b788c79d981f72c8418a3'],
  ])('%s', (_name, render, hash) => {
    expect(sha256(render())).toBe(hash);
  });
});
