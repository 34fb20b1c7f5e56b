/** The end-label placer: exact where nothing collides, minimal spacing kept where labels crowd. */
import { describe, expect, it } from 'vitest';
import { placeLabels, truncateLabel } from '../../server/src/render/labelLayout';

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

  it('gives every state its own label, coincident ends fanned out in the order of their tie key', () => {
    const placed = placeLabels(
      [
        { index: 0, y: 30, tie: 40, label: 'x' },
        { index: 1, y: 30.2, tie: 20, label: 'y' },
        { index: 2, y: 30, tie: 30, label: 'z' },
      ],
      0,
      100,
      10,
    );
    expect(placed.map((p) => p.text)).toEqual(['y', 'z', 'x']);
    expect(placed[1].y - placed[0].y).toBeCloseTo(10, 9);
    expect(placed[2].y - placed[1].y).toBeCloseTo(10, 9);
  });

  it('ignores anchors that are not finite', () => {
    expect(placeLabels([{ index: 0, y: NaN, label: 'n' }], 0, 10, 5)).toEqual([]);
  });
});

describe('truncateLabel', () => {
  it('truncates by characters, not UTF-16 units', () => {
    expect(truncateLabel('m′=−½ state', 5)).toBe('m′=−…');
    expect(truncateLabel('short', 10)).toBe('short');
  });
});
