/**
 * Hyperfine constants and the spin–orbit constant a file writes are shown back in the unit it wrote
 * (docs/format.md, "How results are written"): `B = -0.221 MHz` read `B = -221 kHz` before. The
 * setup is invented (a ⁷Li 2p level with constants typed in the file).
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { textReport } from '../../server/src/cli/textReport';
import { hyperfineSection } from '../../server/src/features/hover/hyperfineSection';
import { fineStructureSection } from '../../server/src/features/hover/fineStructureSection';

const SETUP = 'species Li7\n  level upper:  2p 2P°3/2  A = -3.055(5) MHz  B = -0.221 MHz\n  level p_term: 2p 2P°  zeta = 6700000 kHz\nfield bias = 5 G\n';

describe('constants echo the unit the file wrote', () => {
  const r = analyze(SETUP).result!;
  const report = textReport('x.sublevel', r).join('\n');

  it('the report: A with its uncertainty, B and ζ each in its own unit', () => {
    expect(report).toContain('    A = -3.0550(50) MHz [this file]');
    expect(report).toContain('    B = -0.221 MHz [this file]');
    expect(report).toContain('fine structure ζ = 6700000 kHz [this file]');
  });

  it('the JSON carries the written unit beside the SI value', () => {
    const hf = r.levels[0]!.hyperfine!;
    expect(hf.B_Hz).toEqual({ value: -221000, source: 'this file', written_unit: 'MHz' });
    expect(hf.A_Hz.written_unit).toBe('MHz');
    expect(r.terms[0]!.zeta_Hz).toEqual({ value: 6.7e9, source: 'this file', written_unit: 'kHz' });
  });

  it('the hover says the same', () => {
    expect(hyperfineSection(r.levels[0]!)).toContain('B = -0.221 MHz');
    // ζ as the report reads it (the hover read `ζ = 6.7 GHz`).
    expect(fineStructureSection(r.terms[0]!)).toContain('ζ = 6700000 kHz (this file)');
  });

  it('built-in constants keep their prefixed form', () => {
    const rb = textReport('x.sublevel', analyze('species Rb87\n  level p32: 5p 2P°3/2\n').result!).join('\n');
    expect(rb).toContain('    B = 12.4965(37) MHz [');
  });
});
