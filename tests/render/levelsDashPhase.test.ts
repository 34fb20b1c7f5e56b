/**
 * Dashed curves that merge must keep their dashes in step on the shared stretch: with the gaps
 * out of step, three high-field seekers drawn over each other read as one solid (low-field
 * seeker) line. The data are invented: three falling states that join one line by 0.4 T, one of
 * them rising at first (so it is drawn as two slope runs).
 */
import { describe, expect, it } from 'vitest';
import { renderLevels, type LevelsViewData } from '../../server/src/render';
import { dashPeriod, endAnchoredDashOffsets } from '../../server/src/render/dashPhase';
import { all, parseSvg, pathPoints, type Node } from './svgTree';

const fieldsT = Array.from({ length: 101 }, (_, k) => k / 100);
const shared = (b: number): number => -50e9 * b;
const curves: LevelsViewData['curves'] = [
  { id: 'a', lowLabel: 'a', highLabel: 'a', energyHz: fieldsT.map(shared) },
  { id: 'b', lowLabel: 'b', highLabel: 'b', energyHz: fieldsT.map((b) => shared(b) + 20e9 * Math.max(0, 1 - b / 0.3) ** 2) },
  { id: 'c', lowLabel: 'c', highLabel: 'c', energyHz: fieldsT.map((b) => shared(b) + (b < 0.4 ? 100e9 * b * (1 - b / 0.4) ** 2 : 0)) },
];
const data: LevelsViewData = { title: 'Invented merging states', fieldUnit: 'T', fieldsT, curves };

/** Dash phase (SVG user units into the period) where each curve's falling run passes the vertex at x. */
function phasesAt(svg: Node, x: number): number[] {
  return all(svg, (n) => n.attrs['data-kind'] === 'curve').map((g) => {
    const run = all(g, (n) => n.attrs.class === 'sl-seg sl-falling').at(-1)!;
    const period = dashPeriod(run.attrs['stroke-dasharray']);
    const pts = pathPoints(run.attrs.d);
    let s = 0;
    for (let k = 1; k < pts.length && pts[k - 1].x < x - 0.005; k++) s += Math.hypot(pts[k].x - pts[k - 1].x, pts[k].y - pts[k - 1].y);
    return (s + Number(run.attrs['stroke-dashoffset'] ?? 0)) % period;
  });
}

describe('dash phase of merging curves', () => {
  const svg = parseSvg(renderLevels(data, { kind: 'export' }));

  it('draws the three states dashed, the third in two runs', () => {
    const groups = all(svg, (n) => n.attrs['data-kind'] === 'curve');
    expect(groups.map((g) => g.attrs['data-trends'])).toEqual(['falling', 'falling', 'rising falling']);
  });

  it('keeps the dashes of the shared stretch in step (within 0.1 of a 10-unit period)', () => {
    const seg = all(svg, (n) => n.attrs.class === 'sl-seg sl-falling')[0];
    const xs = pathPoints(seg.attrs.d).map((p) => p.x);
    // Vertices at 0.5 T and 0.9 T (samples 50 and 90 of this run, which starts at 0 T).
    for (const x of [xs[50], xs[90]]) {
      const ph = phasesAt(svg, x);
      const spread = Math.max(...ph.map((p) => Math.min(Math.abs(p - ph[0]), 10 - Math.abs(p - ph[0]))));
      expect(spread).toBeLessThan(0.1);
    }
  });
});

describe('endAnchoredDashOffsets', () => {
  it('counts the pattern from the end: a 25-unit run of period 10 starts 5 into it', () => {
    expect(endAnchoredDashOffsets([{ points: [[0, 0], [15, 20]], dash: '7 3' }])).toEqual([5]);
  });
  it('carries the phase across runs and skips solid ones', () => {
    // Lengths 4 (solid), 3, 5 (total 12): the second run starts 8 before the end → offset 2; the last starts 5 before, one whole period of 2 3 → 0.
    const runs = [
      { points: [[0, 0], [4, 0]] as [number, number][] },
      { points: [[4, 0], [7, 0]] as [number, number][], dash: '7 3' },
      { points: [[7, 0], [10, 0], [10, 2]] as [number, number][], dash: '2 3' },
    ];
    expect(endAnchoredDashOffsets(runs)).toEqual([undefined, 2, 0]);
  });
  it('repeats an odd dash list as SVG does', () => {
    expect(dashPeriod('2 3 1')).toBe(12);
  });
});
