/**
 * The level diagram at its worst cases: a whole term far from zero (446.8 THz) drawn over a few
 * GHz, whose absolute tick labels ran into the axis title, and 32 sublevels whose zero-field ends
 * coincide in four points, whose 32 names fanned out into a wall of leaders.
 */
import { describe, expect, it } from 'vitest';
import { renderLevels, type LevelsViewData } from '../../server/src/render';
import { estimateTextWidth } from '../../server/src/render/frame';
import { mergedName, placeLabels } from '../../server/src/render/labelLayout';
import { levelsFixture } from './fixtures';
import { all, axisMap, byClass, parseSvg, pathPoints, textOf } from './svgTree';

const exportTheme = { kind: 'export' } as const;

/** An invented level with F = 2 … 5 (32 sublevels) split linearly by the field: E = E_F + g_F m μ_B B (shapes only). */
function crowded(offsetHz = 0): LevelsViewData {
  const fieldsT = Array.from({ length: 41 }, (_, k) => (k / 40) * 0.01);
  const curves: LevelsViewData['curves'] = [];
  for (const [F, eF, gF] of [[5, 250e6, 0.4], [4, 0, 0.27], [3, -190e6, 0], [2, -350e6, -0.67]] as const) {
    for (let m = -F; m <= F; m++) {
      const energyHz = fieldsT.map((b) => offsetHz + eF + gF * m * 1.4e10 * b);
      curves.push({ id: `F${F}m${m}`, lowLabel: `F=${F}, m_F=${m > 0 ? '+' : ''}${m}`, highLabel: `F=${F}, m_F=${m > 0 ? '+' : ''}${m} high`, energyHz });
    }
  }
  return { title: 'Invented F = 2…5 level', fieldUnit: 'G', fieldsT, curves };
}

describe('level diagram far from zero', () => {
  const shifted = levelsFixture();
  const OFFSET = 446.8e12;
  shifted.curves = shifted.curves.map((c) => ({ ...c, energyHz: Array.from(c.energyHz, (e) => e + OFFSET) }));
  const svg = parseSvg(renderLevels(shifted, exportTheme));
  const axis = byClass(svg, 'sl-axis-y')[0]!;
  const ticks = all(axis, (n) => n.name === 'text' && n.attrs['data-tick'] !== undefined);
  const title = byClass(axis, 'sl-axis-title')[0]!;

  it('counts from a round offset written in the title, with short tick labels', () => {
    expect(textOf(title)).toBe('E/h − 446.8 THz (GHz)');
    for (const t of ticks) expect(Array.from(t.attrs['data-tick']!).length).toBeLessThanOrEqual(4);
  });

  it('keeps the tick labels clear of the rotated title (measured widths)', () => {
    const titleRight = Number(title.attrs.x) + 11 / 2 + 2;
    for (const t of ticks) expect(Number(t.attrs.x) - estimateTextWidth(t.attrs['data-tick']!)).toBeGreaterThan(titleRight);
  });

  it('places the curves where the offset ticks say: E − 446.8 THz in GHz', () => {
    const yOf = axisMap(svg, 'sl-axis-y');
    const first = all(svg, (n) => n.attrs['data-kind'] === 'curve')[0]!;
    const start = pathPoints(byClass(first, 'sl-seg')[0]!.attrs.d)[0]!;
    expect(Math.abs(start.y - yOf((shifted.curves[0]!.energyHz[0]! - OFFSET) / 1e9))).toBeLessThan(0.05);
  });

  it('leaves an axis near zero as it was (no offset)', () => {
    const plain = parseSvg(renderLevels(levelsFixture(), exportTheme));
    expect(textOf(byClass(byClass(plain, 'sl-axis-y')[0]!, 'sl-axis-title')[0]!)).toBe('E/h (GHz)');
  });
});

describe('level diagram with 32 sublevels', () => {
  const d = crowded();
  const svg = parseSvg(renderLevels(d, exportTheme));
  const labels = (side: 'low' | 'high') => byClass(byClass(svg, `sl-end-${side}`)[0]!, 'sl-end-label');

  it('names the coinciding zero-field ends once per F level, with the m_F range', () => {
    expect(labels('low').map((l) => l.attrs['data-label'])).toEqual(['F=5, m_F=-5…+5', 'F=4, m_F=-4…+4', 'F=3, m_F=-3…+3', 'F=2, m_F=-2…+2']);
  });

  it('still joins every curve to exactly one name on each side', () => {
    for (const side of ['low', 'high'] as const) {
      const members = labels(side).flatMap((l) => l.attrs['data-members']!.split(' '));
      expect([...members].sort()).toEqual(d.curves.map((c) => c.id).sort());
    }
  });

  it('keeps ends that the figure tells apart named one by one, at least one line apart', () => {
    const high = labels('high');
    const ys = high.map((l) => Number(all(l, (n) => n.name === 'text')[0]!.attrs.y));
    // F = 3 has g_F = 0 here, so its 7 ends stay within a pixel and share one name; the 25 others are apart.
    expect(high.length).toBe(26);
    for (let i = 1; i < ys.length; i++) expect(ys[i]! - ys[i - 1]!).toBeGreaterThanOrEqual(13 - 0.01);
  });
});

describe('mergedName', () => {
  it.each([
    [['F=2, m_F=+1', 'F=2, m_F=-2', 'F=2, m_F=0'], 'F=2, m_F=-2…+1'],
    [['J=3/2, F=3, m_F=+3/2', 'J=3/2, F=3, m_F=-1/2'], 'J=3/2, F=3, m_F=-1/2…+3/2'],
    [['J=3/2, F=3, m_F=+1', 'J=3/2, F=2, m_F=0'], 'J=3/2, F=2,3: 2 states'],
    // States of several F whose zero-field ends coincide name the F values they merge.
    [['F=4, m_F=+1', 'F=3, m_F=0', 'F=4, m_F=-4', 'F=3, m_F=+3'], 'F=3,4: 4 states'],
    [['F=1, m_F=0', 'F=3, m_F=0', 'F=2, m_F=0', 'F=4, m_F=0'], 'F=1…4: 4 states'],
    [['F=1/2, m_F=+1/2', 'F=5/2, m_F=-1/2'], 'F=1/2,5/2: 2 states'],
    [['m_J=+1/2', 'F=1, m_F=0'], '2 states'],
  ])('%j → %s', (labels, want) => {
    expect(mergedName(labels)).toBe(want);
  });
  it('says how many states when the range would not fit', () => {
    expect(mergedName(['m_L=+1, m_S=+1/2, m_I=-3/2', 'm_L=+1, m_S=+1/2, m_I=+3/2'], 28)).toBe('m_L=+1, m_S=+1/2: 2 states');
  });
  it('a lane of up to 16 names keeps one name per state even where ends coincide', () => {
    const anchors = Array.from({ length: 16 }, (_, i) => ({ index: i, y: 50, label: `s${i}` }));
    expect(placeLabels(anchors, 0, 400, 13)).toHaveLength(16);
    expect(placeLabels([...anchors, { index: 16, y: 50, label: 's16' }], 0, 400, 13)).toHaveLength(1);
  });
});
