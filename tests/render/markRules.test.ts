/**
 * Two named fields a hair apart (the file's 3.23 G and the field-insensitive point 3.229 G of the
 * invented Rb87 clock pair below) stack their labels in two rows above the plot. The upper label's
 * dashed rule must not run through the lower label's words, in the resonance and the levels figure.
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { estimateTextWidth } from '../../server/src/render/frame';
import { diagramFor } from '../../server/src/views/diagram';
import { all, parseSvg, pathPoints, textOf, type Node } from './svgTree';

const CLOCK = 'species Rb87\n  level ground: 5s 2S1/2\nfield trap = 3.23 G\nfield near = 3.3 G\n\nresonance clock\n  level = ground\n  lower = 1 -1\n  upper = 2 +1\n  range = 0 G, 10 G\n';

/** Vertical stretches [from, to] a rule path draws (M x,y V y' pieces). */
function stretches(d: string): { x: number; from: number; to: number }[] {
  const out: { x: number; from: number; to: number }[] = [];
  for (const m of d.matchAll(/M([\d.]+),([\d.]+)V([\d.]+)/g)) out.push({ x: Number(m[1]), from: Number(m[2]), to: Number(m[3]) });
  return out;
}

function crossings(svg: Node): string[] {
  const marks = all(svg, (n) => n.attrs['data-kind'] === 'marker');
  const labels = marks.map((g) => {
    const t = all(g, (n) => n.name === 'text')[0]!;
    const half = estimateTextWidth(textOf(t)) / 2;
    return { text: textOf(t), x: Number(t.attrs.x), y: Number(t.attrs.y), half };
  });
  const out: string[] = [];
  marks.forEach((g, i) => {
    const rule = all(g, (n) => n.attrs.class === 'sl-marker-rule')[0]!;
    for (const s of stretches(rule.attrs.d!)) {
      labels.forEach((l, j) => {
        if (j === i) return;
        const inX = Math.abs(s.x - l.x) <= l.half;
        const inY = s.from < l.y + 3 && s.to > l.y - 9;
        if (inX && inY) out.push(`${labels[i]!.text} runs through ${l.text}`);
      });
    }
  });
  return out;
}

describe('rules of stacked field labels', () => {
  it('the resonance figure: two labels stacked, no rule through the other label', () => {
    const d = diagramFor(analyze(CLOCK), { view: 'resonance', theme: 'export' });
    if (!d.ok) throw new Error(d.message);
    const svg = parseSvg(d.svg);
    const ys = all(svg, (n) => n.attrs['data-kind'] === 'marker').map((g) => Number(all(g, (n) => n.name === 'text')[0]!.attrs.y));
    expect(new Set(ys).size).toBeGreaterThan(1); // they do stack
    expect(crossings(svg)).toEqual([]);
    // Each rule still reaches the bottom of the lower plot.
    const bottoms = all(svg, (n) => n.attrs.class === 'sl-marker-rule').map((r) => Math.max(...pathPoints(r.attrs.d!).map((p) => p.y)));
    expect(new Set(bottoms).size).toBe(1);
  });

  it('the levels figure: trap 3.23 G and near 3.3 G stacked, no rule through the other label', () => {
    const d = diagramFor(analyze(CLOCK), { view: 'levels', theme: 'export', toT: 1e-3 });
    if (!d.ok) throw new Error(d.message);
    const svg = parseSvg(d.svg);
    expect(all(svg, (n) => n.attrs['data-kind'] === 'marker')).toHaveLength(2);
    expect(crossings(svg)).toEqual([]);
  });
});
