/**
 * The field map at its worst cases (setups invented for the test): a spike cut on both sides, µA
 * currents, a field that is zero everywhere, fields written in µT, two sources in one place, and a
 * side view whose across axis must read at the coils' radius. Every clipped side is named.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { fieldMapFor } from '../../server/src/views/fieldMapDiagram';
import { all, byClass, parseSvg, textOf } from './svgTree';

function mapOf(text: string): string {
  const a = fieldMapFor(analyze(text).model!, { view: 'fieldmap', theme: 'export' }, { kind: 'export' });
  if (!a.ok) throw new Error(a.message);
  expect(a.svg).not.toMatch(/NaN|Infinity|undefined/);
  return a.svg;
}

const noteOf = (svg: string): string | undefined => {
  const n = byClass(parseSvg(svg), 'sl-note')[0];
  return n && textOf(n);
};
const yTitle = (svg: string): string => textOf(all(parseSvg(svg), (n) => n.attrs.class === 'sl-axis-title' && n.parent?.attrs.class?.includes('sl-axis-y') === true)[0]!);

const pairOfWires = (current: string): string => `wire rails\n  current = ${current}\n  through = 0, 2, 0 mm\n  direction = x\n  length = 12 cm\n  return = 0, -2, 0 mm\n`;

describe('the field map names every side it cuts', () => {
  it('the two-wire example: B_z spikes below as |B| spikes above, both cut at 2.5 T and both named', () => {
    const svg = mapOf(readFileSync('examples/two-wire-magnet.sublevel', 'utf8'));
    expect(noteOf(svg)).toBe('axis cut at −2.5 T and 2.5 T: the field is far stronger next to (or inside) a source');
  });

  it('µA in the wires: the axis reads in nT, the cut in nT', () => {
    const svg = mapOf(pairOfWires('5 uA'));
    expect(yTitle(svg)).toBe('B (nT)');
    expect(noteOf(svg)).toMatch(/^axis cut at −6 nT and 6 nT:/);
  });

  it('a field that is zero all along says so instead of leaving a bare plot', () => {
    const svg = mapOf('coil a\n  radius = 5 cm\n  turns = 10\n  current = 1 A\ncoil b\n  radius = 5 cm\n  turns = 10\n  current = -1 A\n');
    expect(noteOf(svg)).toBe('|B| = 0 all along the line: the sources cancel here, or none carries a current or a magnetisation');
    // Two coils in one place share one name label.
    expect(byClass(parseSvg(svg), 'sl-source-name').map(textOf)).toEqual(['a, b']);
  });

  it('a file that writes its fields in µT reads the map in µT; one in mT, in the tesla family; one in G, in G', () => {
    const coil = 'coil helm\n  radius = 10 cm\n  turns = 2\n  current = 1 A\n  spacing = 10 cm\n';
    expect(yTitle(mapOf(`field bias = 20 uT\n${coil}`))).toBe('B (µT)');
    expect(yTitle(mapOf(`field bias = 0.02 mT\n${coil}`))).toBe('B (µT)');
    expect(yTitle(mapOf(`field bias = 0.2 G\n${coil}`))).toBe('B (G)');
  });

  it('the side view reads the coils’ radius (±40 mm) on its across axis', () => {
    const svg = mapOf('coil quad\n  radius = 4 cm\n  turns = 100\n  current = 20 A\n  spacing = 8 cm\n  sense = opposite\n');
    const side = byClass(parseSvg(svg), 'sl-side-view')[0]!;
    const ticks = all(side, (n) => n.attrs['data-tick'] !== undefined && n.parent?.attrs.class?.includes('sl-axis-y') === true).map((n) => n.attrs['data-tick']!);
    expect(ticks).toEqual(expect.arrayContaining(['−40', '40']));
  });
});
