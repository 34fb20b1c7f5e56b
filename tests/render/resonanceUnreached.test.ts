/**
 * A resonance whose frequency is met nowhere in its range (an invented Rb87 setup): the report
 * warns `resonance-unreachable`, and the figure must say the same instead of drawing a plain curve.
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { diagramFor } from '../../server/src/views/diagram';
import { all, byClass, parseSvg, textOf } from './svgTree';

const setup = (frequency: string): string =>
  `species Rb87\n  level ground: 5s 2S1/2\n\nresonance far\n  level     = ground\n  lower     = 1 -1\n  upper     = 2 -1\n  frequency = ${frequency}\n  range     = 0 G, 1 G\n`;

function figure(frequency: string): ReturnType<typeof parseSvg> {
  const d = diagramFor(analyze(setup(frequency)), { view: 'resonance', theme: 'export' });
  if (!d.ok) throw new Error(d.message);
  return parseSvg(d.svg);
}

describe('a resonance outside the swept range', () => {
  it('6.9 GHz between 0 G and 1 G: the report warns, the figure notes it above the plot and in its description', () => {
    expect(analyze(setup('6.9 GHz')).problems.map((x) => x.code)).toContain('resonance-unreachable');
    const svg = figure('6.9 GHz');
    const note = byClass(svg, 'sl-unreached')[0]!;
    expect(textOf(note)).toBe('not resonant with 6.9 GHz anywhere from 0 G to 1 G');
    expect(textOf(all(svg, (n) => n.name === 'desc')[0]!)).toContain('not resonant with 6.9 GHz anywhere from 0 G to 1 G');
    // The note has a row of its own above the frequency plot's top.
    const plotTop = Math.min(...all(svg, (n) => n.attrs.class === 'sl-axis-line').map((n) => Number(n.attrs.d!.match(/^M[\d.]+,([\d.]+)/)?.[1] ?? Infinity)));
    expect(Number(note.attrs.y)).toBeLessThan(plotTop - 12);
  });

  it('a frequency met inside the range draws its point and no such note', () => {
    const svg = figure('6.8342 GHz');
    expect(byClass(svg, 'sl-unreached')).toHaveLength(0);
    expect(all(svg, (n) => n.attrs['data-kind'] === 'resonance')).toHaveLength(1);
  });
});
