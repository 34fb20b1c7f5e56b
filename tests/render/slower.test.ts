/** The slower view: ideal field and speeds along the slower, rules at B = 0 and where atoms are dropped. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { renderSlower } from '../../server/src/render';
import { diagramFor } from '../../server/src/views/diagram';
import { slowerView } from '../../server/src/views/slowerView';
import { estimateTextWidth } from '../../server/src/render/frame';
import { all, byClass, parseSvg, type Node } from './svgTree';

const TEXT = readFileSync(new URL('../../examples/sodium-slower.sublevel', import.meta.url), 'utf8');

describe('slower view', () => {
  it('draws the ideal field, the resonant speed and the flight, with the zero crossing marked', () => {
    const a = analyze(TEXT);
    const d = diagramFor(a, { view: 'slower', theme: 'export', source: 'sodium-slower.sublevel' });
    expect(d.ok).toBe(true);
    if (!d.ok) return;
    expect(d.title).toBe('Slower main on D2: spin-flip field profile');
    expect(d.svg).toContain('data-view="slower"');
    for (const kind of ['ideal', 'coils', 'resonant', 'flight', 'zero-crossing']) expect(d.svg).toContain(`data-kind="${kind}"`);
    expect(d.svg).not.toContain('data-kind="drop"');
    expect(d.svg).not.toMatch(/NaN|Infinity/);
    const z0 = a.result!.slowers![0]!.zero_crossing_m!;
    expect(d.svg).toContain(`data-z-m="${Number(z0.toPrecision(12))}"`);
    expect(d.csv.split('\n')[1]).toBe('z_m,B_ideal_T,B_coils_T,resonant_speed_m_per_s,needed_deceleration_m_per_s2,flight_speed_m_per_s');
  });

  it('marks where coils drop the atoms and draws their field', () => {
    const s = analyze(TEXT).result!.slowers![0]!;
    const v = slowerView({ ...s, samples: s.samples!.map((x) => ({ ...x, B_coils_T: 0.9 * x.B_ideal_T })), coils: { sources: ['c'], worst_over_design: 2, capture_m_per_s: 900, drop_at_m: 0.3 } })!;
    const svg = renderSlower(v, { kind: 'panel' });
    expect(svg).toContain('data-kind="coils"');
    expect(svg).toMatch(/data-kind="drop" data-z-m="0.3"/);
  });

  it('a steep exit: curves stay inside their plots, rule labels stay on the figure and apart', () => {
    // Invented worst case: coils whose field falls far below the ideal one over the last 10 %, so
    // the speed resonant with the laser goes below 0 there, and atoms dropped just before the exit.
    const s = analyze(TEXT).result!.slowers![0]!;
    const L = s.samples!.at(-1)!.z_m;
    const samples = s.samples!.map((x) => ({ ...x, B_coils_T: x.z_m > 0.9 * L ? x.B_ideal_T - 0.2 * (x.z_m / L - 0.9) : x.B_ideal_T }));
    const steep = slowerView({ ...s, samples: samples.map((x) => (x.z_m > 0.95 * L ? { ...x, resonant_speed_m_per_s: -300 } : x)), coils: { sources: ['c'], worst_over_design: 3, capture_m_per_s: 900, drop_at_m: 0.99 * L } })!;
    const doc = parseSvg(renderSlower(steep, { kind: 'export' }));
    const width = Number(doc.attrs.width ?? doc.attrs.viewBox?.split(' ')[2]);
    const clips = new Map(all(doc, (n) => n.name === 'clipPath').map((c) => [c.attrs.id!, c.children[0]!]));
    const curves = byClass(doc, 'sl-curve');
    expect(curves.map((c) => c.attrs['data-kind'])).toEqual(['ideal', 'coils', 'ideal-resonant', 'resonant', 'flight']);
    // Every curve is clipped, the speeds to the lower plot (below the field's plot).
    const box = (c: Node) => clips.get(/^url\(#(.+)\)$/.exec(c.attrs['clip-path'] ?? '')?.[1] ?? '')!;
    for (const c of curves) expect(box(c), c.attrs['data-kind']).toBeDefined();
    expect(Number(box(curves[2]!).attrs.y)).toBeGreaterThan(Number(box(curves[0]!).attrs.y) + Number(box(curves[0]!).attrs.height));
    // The drop label runs left of its rule near the exit, inside the figure; the two labels do not overlap.
    const labels = [...byClass(doc, 'sl-zero-crossing'), ...byClass(doc, 'sl-drop')].map((g) => all(g, (n) => n.name === 'text')[0]!);
    const spans = labels.map((t) => {
      const x = Number(t.attrs.x);
      const w = estimateTextWidth(t.text);
      return { from: t.attrs['text-anchor'] === 'end' ? x - w : x, to: t.attrs['text-anchor'] === 'end' ? x : x + w, y: Number(t.attrs.y) };
    });
    for (const sp of spans) {
      expect(sp.from).toBeGreaterThanOrEqual(0);
      expect(sp.to).toBeLessThanOrEqual(width);
    }
    const [a, b] = spans;
    expect(a!.y !== b!.y || a!.to <= b!.from || b!.to <= a!.from).toBe(true);
    expect(labels[1]!.attrs['text-anchor']).toBe('end');
  });

  it("names each resonance after its field: the designed one (v0 √(1 − z/L0)) and the coils' actual one", () => {
    const s = analyze(TEXT).result!.slowers![0]!;
    const doc = parseSvg(renderSlower(slowerView(s)!, { kind: 'export' }));
    const titleOf = (kind: string) => all(byClass(doc, 'sl-curve').find((c) => c.attrs['data-kind'] === kind)!, (n) => n.name === 'title')[0]!.text;
    expect(titleOf('ideal-resonant')).toBe('speed resonant with the laser in the ideal (designed) field');
    expect(titleOf('resonant')).toBe("speed resonant with the laser in the coils' actual field");
    expect(titleOf('flight')).toBe("simulated atom in the coils' field");
    const legend = all(doc, (n) => n.name === 'text').map((t) => t.text);
    expect(legend).toEqual(expect.arrayContaining(['resonant speed, ideal field', "resonant speed, coils' field", "coils' field"]));
    expect(legend).not.toContain('resonant speed');
    expect(all(doc, (n) => n.name === 'desc')[0]!.text).toContain("resonant speed in the coils' field from");
    // The designed resonance starts at the capture speed and ends at the final speed as written (950 and 30 m/s in the example).
    const ideal = s.samples!.map((x) => x.ideal_resonant_speed_m_per_s!);
    expect(ideal[0]).toBe(950);
    expect(ideal.at(-1)).toBe(30);
    // Without coils there is one resonance, named after the ideal field, and no second curve.
    const bare = { ...s, coils: undefined, samples: s.samples!.map(({ B_coils_T: _c, ideal_resonant_speed_m_per_s: _i, ...x }) => x) };
    const bareDoc = parseSvg(renderSlower(slowerView(bare)!, { kind: 'export' }));
    expect(byClass(bareDoc, 'sl-curve').map((c) => c.attrs['data-kind'])).toEqual(['ideal', 'resonant', 'flight']);
    expect(all(bareDoc, (n) => n.name === 'text').map((t) => t.text)).toContain('resonant speed, ideal field');
  });

  it('says plainly when there is no slower', () => {
    const d = diagramFor(analyze('species Na23\n  level g: 3s 2S1/2\n'), { view: 'slower', theme: 'export' });
    expect(d).toEqual({ ok: false, message: expect.stringContaining('No slower to draw') });
  });
});
