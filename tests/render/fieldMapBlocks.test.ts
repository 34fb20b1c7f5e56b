/**
 * Blocks in the field map's side view (setups invented for the test): a magnetised block shows
 * its magnetisation's direction (an arrow in the drawing plane, ⊙/⊗ across it); a block magnetised
 * 0 has none, says so in its label, and does not choose the line as if it pointed along +z.
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { fieldMapFor } from '../../server/src/views/fieldMapDiagram';
import { all, byClass, parseSvg, textOf, type Node } from './svgTree';

function mapOf(text: string): Node {
  const a = fieldMapFor(analyze(text).model!, { view: 'fieldmap', theme: 'export' }, { kind: 'export' });
  if (!a.ok) throw new Error(a.message);
  expect(a.svg).not.toMatch(/NaN|Infinity|undefined/);
  return parseSvg(a.svg);
}
const block = (name: string, m: string, centre = '0, 0, 0 mm'): string => `slab ${name}\n  size = 20 mm, 10 mm, 5 mm\n  centre = ${centre}\n  magnetisation = ${m}\n`;
const sourceNamed = (svg: Node, name: string): Node => all(svg, (n) => n.attrs['data-kind'] === 'source' && n.attrs['data-label'] === name)[0]!;
const marks = (n: Node): Node[] => byClass(n, 'sl-magnetisation');
const label = (n: Node): string => textOf(byClass(n, 'sl-source-name')[0]!);

describe('blocks in the side view', () => {
  it('a block magnetised 0 has no direction drawn and its label says it is not magnetised', () => {
    const svg = mapOf(block('dead', '0 T along x'));
    const dead = sourceNamed(svg, 'dead');
    expect(marks(dead)).toHaveLength(0);
    expect(label(dead)).toBe('dead (not magnetised)');
    expect(textOf(dead.children[0]!)).toBe('slab dead, not magnetised');
    // Nothing in the figure speaks of a magnetisation arrow.
    expect(textOf(byClass(svg, 'sl-side-caption')[0]!)).not.toMatch(/magnetisation/);
  });

  it('a magnetised block beside it leads: the line runs along its magnetisation (y), and its arrow points along the line', () => {
    const svg = mapOf(block('dead', '0 T along x', '0, 30, 0 mm') + block('live', '1.2 T along y'));
    expect(all(svg, (n) => n.name === 'svg')[0]!.attrs['data-x-name']).toBe('y');
    const live = marks(sourceNamed(svg, 'live'));
    expect(live).toHaveLength(1);
    expect(live[0]!.attrs['data-direction']).toBe('in-plane');
    // The arrow runs left to right (+y, along the line): its first point lies left of its tip.
    const nums = live[0]!.attrs.d!.match(/-?\d+(\.\d+)?/g)!.map(Number);
    expect(nums[2]! - nums[0]!).toBeGreaterThan(6);
    expect(Math.abs(nums[3]! - nums[1]!)).toBeLessThan(0.01);
    expect(marks(sourceNamed(svg, 'dead'))).toHaveLength(0);
    expect(label(sourceNamed(svg, 'live'))).toBe('live');
    expect(textOf(byClass(svg, 'sl-side-caption')[0]!)).toMatch(/arrow: magnetisation$/);
  });

  it('a block magnetised across the drawing plane shows ⊙ or ⊗, by its sense', () => {
    // Line along y; the side view's across axis is x, so z points at or away from the reader.
    const up = mapOf(block('a', '1 T along y') + block('b', '1 T along z', '0, 40, 0 mm'));
    const down = mapOf(block('a', '1 T along y') + block('b', '1 T along -z', '0, 40, 0 mm'));
    const dirOf = (svg: Node): string => marks(sourceNamed(svg, 'b'))[0]!.attrs['data-direction']!;
    expect(new Set([dirOf(up), dirOf(down)])).toEqual(new Set(['towards', 'away']));
  });
});
