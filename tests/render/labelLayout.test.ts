/** The end-label placer: exact where nothing collides, minimal spacing kept where labels crowd. */
import { describe, expect, it } from 'vitest';
import { groupLabel, placeLabels, truncateLabel } from '../../server/src/render/labelLayout';

describe('placeLabels', () => {
  it('leaves well-separated labels exactly at their anchors', () => {
    const placed = placeLabels([{ index: 0, y: 50, label: 'a' }, { index: 1, y: 20, label: 'b' }], 0, 100, 10);
    expect(placed.map((p) => [p.text, p.y])).toEqual([['b', 20], ['a', 50]]);
  });

  it('spreads a crowded pair symmetrically about its mean (least squares)', () => {
    const placed = placeLabels([{ index: 0, y: 50, label: 'a' }, { index: 1, y: 52, label: 'b' }], 0, 100, 10);
    expect(placed.map((p) => p.y)).toEqual([46, 56]);
  });

  it('keeps labels inside the lane', () => {
    const anchors = [0, 1, 2].map((i) => ({ index: i, y: 99 + i * 0.01 * 0 + i * 2, label: `s${i}` }));
    const placed = placeLabels(anchors, 0, 100, 10);
    expect(placed[placed.length - 1].y).toBeLessThanOrEqual(100);
    for (let i = 1; i < placed.length; i++) expect(placed[i].y - placed[i - 1].y).toBeGreaterThanOrEqual(10 - 1e-9);
  });

  it('merges closest neighbours when the lane cannot hold every label', () => {
    const anchors = Array.from({ length: 12 }, (_, i) => ({ index: i, y: i * 8, label: `F=1, m=${i}` }));
    const placed = placeLabels(anchors, 0, 40, 10); // room for 5
    expect(placed).toHaveLength(5);
    expect(placed.flatMap((p) => p.members.map((m) => m.index)).sort((a, b) => a - b)).toEqual(anchors.map((a) => a.index));
  });

  it('gives coincident ends one label', () => {
    const placed = placeLabels([{ index: 0, y: 30, label: 'x' }, { index: 1, y: 30.4, label: 'y' }], 0, 100, 10);
    expect(placed).toHaveLength(1);
    expect(placed[0].text).toBe('x +1');
  });

  it('ignores anchors that are not finite', () => {
    expect(placeLabels([{ index: 0, y: NaN, label: 'n' }], 0, 10, 5)).toEqual([]);
  });
});

describe('groupLabel / truncateLabel', () => {
  it('names a group by the shared part before a separator', () => {
    expect(groupLabel(['F=2, m_F=-2', 'F=2, m_F=-1', 'F=2, m_F=0'])).toBe('F=2 · 3 states');
    expect(groupLabel(['m_J=1/2; m_I=3/2', 'm_J=1/2; m_I=1/2'])).toBe('m_J=1/2 · 2 states');
    expect(groupLabel(['ab', 'ac'])).toBe('ab +1');
    expect(groupLabel(['only'])).toBe('only');
  });

  it('truncates by characters, not UTF-16 units', () => {
    expect(truncateLabel('m′=−½ state', 5)).toBe('m′=−…');
    expect(truncateLabel('short', 10)).toBe('short');
  });
});
