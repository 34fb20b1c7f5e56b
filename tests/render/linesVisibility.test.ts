/**
 * Components no spectrometer sees are not drawn as lines: the D2 line of Rb87 at 50 nT (an
 * invented setup) has ΔF = 2 and F = 2 → F′ = 2, m_F 0 → 0 components of relative strength
 * ~1e-11 (forbidden at zero field; their strength comes from the field's tiny mixing). The
 * figure draws the components at least VISIBLE_FLOOR of the strongest and says how many it
 * left out; the report keeps them all.
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { renderLines } from '../../server/src/render';
import { VISIBLE_FLOOR } from '../../server/src/render/lines';
import { linesView } from '../../server/src/views/linesView';
import { all, byClass, parseSvg, textOf } from './svgTree';

const SETUP = `species Rb87
  level ground: 5s 2S1/2
  level p32:    5p 2P°3/2
field tiny = 50 nT
line D2: ground -> p32
`;

describe('the lines figure at 50 nT', () => {
  const line = analyze(SETUP).result!.lines[0]!;
  const comps = line.at_fields[0]!.components;
  const strongest = Math.max(...comps.map((c) => c.strength));
  const faint = comps.filter((c) => c.strength < VISIBLE_FLOOR * strongest);
  const svg = renderLines(linesView(line)!, { kind: 'export' });
  const root = parseSvg(svg);

  it('the report lists faint components (the case this guards)', () => {
    expect(faint.length).toBe(12);
    for (const c of faint) expect(c.strength / strongest).toBeLessThan(1e-9);
  });

  it('draws only the visible ones, and no panel for the ΔF = 2 groups', () => {
    const drawn = all(root, (n) => n.attrs['data-kind'] === 'component');
    expect(drawn).toHaveLength(comps.length - faint.length);
    for (const g of drawn) expect(Number(g.attrs['data-strength'])).toBeGreaterThanOrEqual(VISIBLE_FLOOR * strongest);
    // F = 2 → F′ = 1, 2, 3 and F = 1 → F′ = 0, 1, 2: six groups; the two ΔF = 2 groups are left out.
    expect(root.attrs['data-panels']).toBe('6');
  });

  it('says how many it left out, and how faint they are', () => {
    const note = byClass(root, 'sl-faint-note')[0]!;
    expect(textOf(note)).toBe('not drawn: 12 components weaker than 0.0001 × the strongest (down to 1.1e-12 ×), listed in the report');
    expect(textOf(root.children.find((c) => c.name === 'desc')!)).toContain('not drawn: 12 components');
    expect(svg).not.toMatch(/NaN|Infinity/);
  });
});
