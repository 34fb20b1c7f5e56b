/**
 * A named field echoes the unit the file wrote on every figure that marks it: a magnetometer's
 * `1 nT` reads `1 nT` on a tesla axis, not `1e-9 T`; a `250 mT` field reads `250 mT`. Fields the
 * evaluation found (df/dB = 0) stay in the axis unit. Setups are invented for the test.
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { diagramFor } from '../../server/src/views/diagram';
import { all, parseSvg, textOf } from './svgTree';

const setup = `species Sr87
  level p2: 5s 5p 3P°2
field tiny = 1 nT
field mid  = 250 mT
field huge = 30 T
field lab  = 0.5 G
`;

function markTexts(svg: string): string[] {
  return all(parseSvg(svg), (n) => n.attrs['data-kind'] === 'marker').map((m) => textOf(all(m, (n) => n.name === 'text')[0]!));
}

function descOf(svg: string): string {
  return textOf(parseSvg(svg).children.find((c) => c.name === 'desc')!);
}

describe('named fields on figures keep the unit the file wrote', () => {
  it('levels view on a tesla axis', () => {
    const d = diagramFor(analyze(setup), { view: 'levels', theme: 'export', toT: 31, fieldUnit: 'T' });
    if (!d.ok) throw new Error(d.message);
    expect(markTexts(d.svg)).toEqual(['field tiny · 1 nT', 'field mid · 250 mT', 'field huge · 30 T', 'field lab · 0.5 G']);
    expect(descOf(d.svg)).toContain('chosen field 1 nT');
  });

  it('levels view: a field outside the range is named in its own unit too', () => {
    const d = diagramFor(analyze(setup), { view: 'levels', theme: 'export', toT: 1, fieldUnit: 'mT' });
    if (!d.ok) throw new Error(d.message);
    expect(descOf(d.svg)).toContain('outside the sweep: field huge 30 T');
    expect(markTexts(d.svg)).toContain('field mid · 250 mT');
  });

  it('resonance view: named fields echo, found fields use the axis unit', () => {
    const text = `species Rb87
  level ground: 5s 2S1/2
field trap = 323 µT
resonance clock
  level = ground
  lower = 1 -1
  upper = 2 +1
  range = 0 G, 10 G
`;
    const d = diagramFor(analyze(text), { view: 'resonance', theme: 'export' });
    if (!d.ok) throw new Error(d.message);
    const marks = all(parseSvg(d.svg), (n) => n.name === 'text').map((n) => textOf(n));
    expect(marks).toContain('field trap · 323 µT');
    expect(marks.some((t) => /^df\/dB = 0 · 3\.2\d* G$/.test(t))).toBe(true);
  });
});

describe('the resonance field axis follows the unit of the range', () => {
  it.each([
    ['0 mT, 5 mT', 'mT'],
    ['0 G, 50 G', 'G'],
    // A range written in tesla reads in the tesla family, with the prefix that suits it.
    ['0 T, 0.005 T', 'mT'],
    ['0 uT, 50 uT', 'µT'],
    ['0 nT, 500 nT', 'nT'],
    ['0 mT, 0.05 mT', 'µT'],
    // The written prefix stays while the range's top reads 0.1–1000 in it.
    ['0 mT, 0.5 mT', 'mT'],
    ['0 uT, 800 uT', 'µT'],
  ])('range = %s draws B in %s', (range, unit) => {
    const text = `species Rb87\n  level ground: 5s 2S1/2\nresonance clock\n  level = ground\n  lower = 1 -1\n  upper = 2 +1\n  range = ${range}\n`;
    const d = diagramFor(analyze(text), { view: 'resonance', theme: 'export' });
    if (!d.ok) throw new Error(d.message);
    expect(parseSvg(d.svg).attrs['data-x-unit']).toBe(unit);
  });
});

describe('a magnetometer’s fields (1 nT to 100 µT) read in µT or nT', () => {
  const bias = (field: string, toT: number): string => {
    const d = diagramFor(analyze(`species Rb87\n  level ground: 5s 2S1/2\nfield bias = ${field}\n`), { view: 'levels', theme: 'export', toT });
    if (!d.ok) throw new Error(d.message);
    return d.svg;
  };
  it.each([
    ['20 uT', 5e-5, 'µT'],
    ['300 nT', 5e-7, 'nT'],
    ['0.02 mT', 5e-5, 'µT'],
    ['0.2 G', 5e-5, 'G'],
  ])('field bias = %s on a levels axis to %s T reads in %s', (field, toT, unit) => {
    const svg = bias(field, toT);
    expect(parseSvg(svg).attrs['data-x-unit']).toBe(unit);
    expect(svg).not.toMatch(/NaN|Infinity/);
  });
  it('with no field written, a range under 1 G reads in µT, under 1 µT in nT', () => {
    const d = (toT: number): string | undefined => {
      const r = diagramFor(analyze('species Rb87\n  level ground: 5s 2S1/2\n'), { view: 'levels', theme: 'export', toT });
      return r.ok ? parseSvg(r.svg).attrs['data-x-unit'] : undefined;
    };
    expect([d(5e-5), d(5e-7), d(5e-3)]).toEqual(['µT', 'nT', 'G']);
  });
});

describe('the resonance frequency axis', () => {
  const rf = (lower: string, upper: string): string[] => {
    // K40 ground (invented range): a Δm = 1 pair inside F = 9/2 starts at 0 Hz; a ΔF pair near 1.3 GHz.
    const text = `species K40\n  level ground: 4s 2S1/2\nresonance r\n  level = ground\n  lower = ${lower}\n  upper = ${upper}\n  range = 0 mT, 60 mT\n`;
    const d = diagramFor(analyze(text), { view: 'resonance', theme: 'export' });
    if (!d.ok) throw new Error(d.message);
    return all(parseSvg(d.svg), (n) => n.attrs.class === 'sl-axis-title').map((n) => textOf(n));
  };
  it('is plain f when the transition starts at zero frequency (no "f − 0 Hz")', () => {
    expect(rf('9/2 -9/2', '9/2 -7/2')).toContain('f (MHz)');
  });
  it('counts from a round reference when the frequency is far from zero', () => {
    expect(rf('9/2 1/2', '7/2 1/2').some((t) => /^f − 1\.\d+ GHz \((GHz|MHz)\)$/.test(t))).toBe(true);
  });
});

describe('levels view: the right lane names what the states are at the end of the range', () => {
  const rightLabels = (toT: number): string[] => {
    const d = diagramFor(analyze(setup), { view: 'levels', theme: 'export', toT });
    if (!d.ok) throw new Error(d.message);
    return all(parseSvg(d.svg), (n) => n.attrs['data-kind'] === 'end-label' && n.attrs['data-side'] === 'high').map((n) => n.attrs['data-label']!);
  };
  it('a range ending at 1 µT (weak field, x ≈ 5e-6) names F and m_F on the right too', () => {
    // Each F has its own band of the broken energy axis there, so each of the 50 states has its own name
    // (on one GHz axis the ends of each F coincided and were named once per F).
    const labels = rightLabels(1e-6);
    expect(labels).toHaveLength(50);
    expect(labels.every((l) => /^F=\d+\/2, m_F=[+-]\d+\/2$/.test(l))).toBe(true);
    // ⁸⁷Sr 3P2 has A < 0 (docs/species-data.md): F = 5/2 lies highest, and its g_F = g_J (F(F+1) + J(J+1) − I(I+1)) /
    // (2F(F+1)) = 1.5 × (8.75 + 6 − 24.75)/17.5 = −0.857 < 0 puts m_F = −5/2 on top.
    expect(labels.slice(0, 2)).toEqual(['F=5/2, m_F=-5/2', 'F=5/2, m_F=-3/2']);
  });
  it('a range ending at 30 T (decoupled) names m_J and m_I', () => {
    const labels = rightLabels(30);
    expect(labels.length).toBeGreaterThan(0);
    expect(labels.every((l) => l.startsWith('m_J='))).toBe(true);
  });
});
