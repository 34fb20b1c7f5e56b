/**
 * A field map of many sources in a row (a slower's sections; setups invented for the test): the
 * heading fits the figure and the side view's names do not run into each other.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { estimateTextWidth } from '../../server/src/render/frame';
import { fieldMapTitle } from '../../server/src/render/fieldMap';
import { fieldMapFor } from '../../server/src/views/fieldMapDiagram';
import { all, byClass, parseSvg, textOf } from './svgTree';

function mapOf(text: string): ReturnType<typeof parseSvg> {
  const a = fieldMapFor(analyze(text).model!, { view: 'fieldmap', theme: 'export' }, { kind: 'export' });
  if (!a.ok) throw new Error(a.message);
  return parseSvg(a.svg);
}

/** `n` solenoids 5.32 cm long end to end along z, as a slower's sections. */
function sections(n: number): string {
  return Array.from({ length: n }, (_, i) => `solenoid zs${String(i + 1).padStart(2, '0')}\n  radius = 4 cm\n  length = 5.32 cm\n  turns = 100\n  current = 20 A\n  centre = 0, 0, ${(i * 5.32).toFixed(2)} cm\n`).join('\n');
}

describe('a field map of many sources', () => {
  it('keeps the full list in the heading while it fits, and else counts each kind with its first and last names', () => {
    const few = [{ kind: 'coil', name: 'quad' }, { kind: 'coil', name: 'bias' }, { kind: 'wire', name: 'rail' }, { kind: 'slab', name: 'pole' }];
    expect(fieldMapTitle(few)).toBe('field map: coil quad, coil bias, wire rail, slab pole');
    const many = Array.from({ length: 20 }, (_, i) => ({ kind: 'solenoid', name: `zs${String(i + 1).padStart(2, '0')}` }));
    expect(fieldMapTitle(many)).toBe('field map: 20 solenoids zs01 … zs20');
    expect(fieldMapTitle([...many, { kind: 'wire', name: 'rail' }, { kind: 'coil', name: 'a' }, { kind: 'coil', name: 'b' }])).toBe(
      'field map: 20 solenoids zs01 … zs20; wire rail; 2 coils a, b',
    );
  });

  it('the heading drawn for 20 sections fits the 760-wide figure, and the sodium example says what it draws', () => {
    const svg = mapOf(sections(20));
    const heading = textOf(byClass(svg, 'sl-heading')[0]!);
    expect(heading).toBe('field map: 20 solenoids zs01 … zs20');
    expect(16 + estimateTextWidth(heading, 15)).toBeLessThan(760);
    const example = mapOf(readFileSync('examples/sodium-slower.sublevel', 'utf8'));
    expect(textOf(byClass(example, 'sl-heading')[0]!)).toBe('field map: 20 solenoids zs01 … zs20');
  });

  it('names in the side view never overlap: of 20 touching sections every other one is named, each source keeps its tooltip', () => {
    const svg = mapOf(sections(20));
    const names = byClass(svg, 'sl-source-name');
    const spans = names.map((n) => {
      const half = estimateTextWidth(textOf(n), 10) / 2;
      return { x0: Number(n.attrs.x) - half, x1: Number(n.attrs.x) + half, y: Number(n.attrs.y) };
    });
    for (let i = 0; i < spans.length; i++) {
      for (let j = i + 1; j < spans.length; j++) {
        const a = spans[i]!;
        const b = spans[j]!;
        expect(Math.abs(a.y - b.y) >= 11 || a.x1 < b.x0 || b.x1 < a.x0, `${textOf(names[i]!)} and ${textOf(names[j]!)}`).toBe(true);
      }
    }
    expect(names.map(textOf)).toEqual(['zs01', 'zs03', 'zs05', 'zs07', 'zs09', 'zs11', 'zs13', 'zs15', 'zs17', 'zs19']);
    expect(all(svg, (n) => n.attrs['data-kind'] === 'source')).toHaveLength(20);
  });

  it('sources far apart keep every name', () => {
    const svg = mapOf('coil a\n  radius = 2 cm\n  turns = 10\n  current = 1 A\n  centre = 0, 0, -5 cm\n\ncoil b\n  radius = 2 cm\n  turns = 10\n  current = 1 A\n  centre = 0, 0, 5 cm\n');
    expect(byClass(svg, 'sl-source-name').map(textOf)).toEqual(['a', 'b']);
  });
});
