/** CSV companions of the diagrams: headers name SI units, values keep full precision, text is defused. */
import { describe, expect, it } from 'vitest';
import { levelsCsv, linesCsv, patternCsv } from '../../server/src/render';

describe('diagram CSV', () => {
  it('writes one row per field with energies and moments', () => {
    const csv = levelsCsv({
      title: 't',
      fieldUnit: 'T',
      fieldsT: [0, 0.1],
      curves: [{ id: 'a', lowLabel: 'F=1, m=0', highLabel: 'x', energyHz: [1.5e9, 1.2345678901234e9], momentJT: [0, 9.27e-24] }],
    });
    expect(csv).toBe('B (T),"E/h F=1, m=0 / x (Hz)","mu F=1, m=0 / x (J/T)"\n0,1500000000,0\n0.1,1234567890.1234,9.27e-24\n');
  });

  it('quotes and defuses user text', () => {
    const csv = linesCsv({
      title: 't',
      components: [{ offsetHz: -1, strength: 0.5, polarization: 'sigma-', label: '=HYPERLINK("x")' }],
    });
    expect(csv.split('\n')[1]).toBe('-1,0.5,sigma-,"\'=HYPERLINK(""x"")"');
  });

  it('leaves empty cells for missing values', () => {
    const csv = patternCsv({ title: 't', positionsM: [0, 1e-3], total: [1, NaN], parts: [{ id: 'p', label: 'p', values: [1] }], peaks: [], verdict: { resolved: true, text: '' } });
    expect(csv).toBe('position (m),total,p\n0,1,1\n0.001,,\n');
  });
});
