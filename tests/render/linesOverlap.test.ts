/**
 * Line components at a worst case: in the Paschen–Back regime the components of one (m_J → m_J′)
 * pair lie a hyperfine spacing apart on an axis hundreds of GHz wide, so their sticks stand on each
 * other. The figure then says how many components it drew at how many places, so its count agrees
 * with the report's (invented components: 4 groups of 8, 1 GHz apart within a group, 300 GHz between groups).
 */
import { describe, expect, it } from 'vitest';
import { renderLines, type LinesViewData } from '../../server/src/render';
import { all, byClass, parseSvg, textOf } from './svgTree';

const groupOf = (centreHz: number, pol: 'pi' | 'sigma+' | 'sigma-') =>
  Array.from({ length: 8 }, (_, k) => ({ offsetHz: centreHz + (k - 3.5) * 1e9, strength: 1, polarization: pol, label: `g${centreHz} ${k}` }));

const crowded: LinesViewData = {
  title: 'crowded sticks',
  components: [...groupOf(-450e9, 'sigma-'), ...groupOf(-150e9, 'pi'), ...groupOf(150e9, 'pi'), ...groupOf(450e9, 'sigma+')],
};

describe('sticks closer than their width', () => {
  it('are counted in a note: 32 components at the places they share, and the description says the same', () => {
    const svg = parseSvg(renderLines(crowded, { kind: 'export' }));
    const note = byClass(svg, 'sl-overlap-note')[0]!;
    const places = Number(note.attrs['data-places']);
    // Each group of 8 spans 7 GHz, a few px on a ~1000 GHz axis of ~690 units: at least one place a group, far fewer than 8.
    expect(places).toBeGreaterThanOrEqual(4);
    expect(places).toBeLessThan(16);
    expect(textOf(note)).toBe(`32 components drawn at ${places} places: sticks closer than their width overlap (each is listed in the report)`);
    const desc = textOf(all(svg, (n) => n.name === 'desc')[0]!);
    expect(desc).toContain(`32 components drawn at ${places} places`);
  });

  it('well-separated sticks get no note', () => {
    const apart: LinesViewData = { title: 'apart', components: [-2e9, 0, 2e9].map((f, k) => ({ offsetHz: f, strength: 1, polarization: 'pi', label: `c${k}` })) };
    expect(byClass(parseSvg(renderLines(apart, { kind: 'export' })), 'sl-overlap-note')).toHaveLength(0);
  });
});
