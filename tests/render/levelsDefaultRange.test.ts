/**
 * The level diagram's default field range. A file working in the weak field (its largest field
 * below a tenth of the change of regime) gets twice that field, so its sublevels sit mid-figure
 * with their fans visible; other files get the sweep past the change of regime. The change of
 * regime of the Rb87 ground level is ΔE_hfs / ((g_J − g_I) μ_B) ≈ 6.8347 GHz / (2.0033 × 13.996 GHz/T)
 * ≈ 0.2438 T (built-in data; μ_B/h from CODATA 2022).
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { diagramFor } from '../../server/src/views/diagram';
import { parseSvg } from './svgTree';

function fieldDomain(text: string): [number, number] {
  const d = diagramFor(analyze(text), { view: 'levels', theme: 'export' });
  if (!d.ok) throw new Error(d.message);
  const svg = parseSvg(d.svg);
  return svg.attrs['data-x-domain']!.split(',').map(Number) as [number, number];
}

const rb = (fields: string) => `species Rb87\n  level ground: 5s 2S1/2\n${fields}`;

describe('default field range of the level diagram', () => {
  it('a 20 µT magnetometer field: 0 to 40 µT', () => {
    const [lo, hi] = fieldDomain(rb('field earth = 20 uT\n'));
    expect(lo).toBe(0);
    expect(hi).toBeCloseTo(40e-6, 15); // T
  });

  it('the largest named field decides: 3.23 G and 120 G give 0 to 240 G', () => {
    const [lo, hi] = fieldDomain(rb('field trap = 3.23 G\nfield probe = 120 G\n'));
    expect(lo).toBe(0);
    expect(hi).toBeCloseTo(0.024, 12); // T
  });

  it('a field past a tenth of the change of regime: the sweep runs to 3 × 0.2438 T', () => {
    const [lo, hi] = fieldDomain(rb('field strong = 30 mT\n'));
    expect(lo).toBe(0);
    expect(hi).toBeCloseTo(0.7313, 3); // T
  });
});
