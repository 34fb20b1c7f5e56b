// Absolute line frequencies carry the uncertainties of the two level energies (docs/uncertainty.md):
// centre = E_upper − E_lower and absolute = centre + offset are linear in the energies, so the GUM
// law is exact here; the derivative is also checked by central differences of the whole evaluation.
import { describe, expect, it } from 'vitest';
import { textReport } from '../../server/src/cli/textReport';
import { analyze } from '../../server/src/eval/analyze';

/**
 * Invented use of ⁸⁷Rb D2-like numbers: g_I and level constants written exactly (the built-in ones carry
 * uncertainties of their own), the upper energy and the field written with uncertainties.
 * 384.230 484 468 5(62) THz is the D2 frequency of the rubidium-87 D line data compilation (from memory).
 */
function setup(upperEnergy: string, lowerEnergy = '0 Hz', field = '1.00(5) mT'): string {
  return `species Rb87
  g_I = -0.0009951414
  level g: 5s 2S1/2  energy = ${lowerEnergy}  A = 3417.341305452145 MHz  g_J = 2.00233113
  level p: 5p 2P°3/2  energy = ${upperEnergy}  A = 84.7185 MHz  B = 12.4965 MHz  g_J = 1.3362
field f = ${field}
line D2: g -> p
`;
}

describe('absolute line frequencies', () => {
  it('the centre carries u = sqrt(u(E_u)² + u(E_l)²) and is listed with both energies as inputs', () => {
    const r = analyze(setup('384.2304844685(62) THz', '0.0(30) kHz')).result!;
    const line = r.lines[0]!;
    expect(line.line_centre_Hz).toBeCloseTo(384230484468500, 0);
    expect(line.line_centre_Hz_unc).toBeCloseTo(Math.hypot(6200, 3000), 6);
    expect(r.uncertainty_inputs!.map((i) => i.id)).toEqual(expect.arrayContaining(['level:Rb87.p.energy', 'level:Rb87.g.energy']));
  });

  it('each component: u(absolute)² = u(offset)² + u(centre)² (offsets from the field, centre from the energies: independent)', () => {
    const line = analyze(setup('384.2304844685(62) THz')).result!.lines[0]!;
    const comps = line.at_fields[0]!.components;
    expect(comps.length).toBeGreaterThan(10);
    for (const c of comps) {
      expect(c.absolute_Hz).toBeDefined();
      expect(c.absolute_Hz_unc! / Math.hypot(c.offset_Hz_unc ?? 0, 6200)).toBeCloseTo(1, 12);
    }
  });

  it('d(absolute)/d(E_upper) = 1 by central differences of the evaluation', () => {
    const at = (e: string) => analyze(setup(e, '0 Hz', '1.00 mT')).result!.lines[0]!.at_fields[0]!.components;
    const mid = at('384.2304844685(62) THz');
    const up = at('384.2304854685 THz');
    const down = at('384.2304834685 THz');
    mid.forEach((c, k) => {
      expect((up[k]!.absolute_Hz! - down[k]!.absolute_Hz!) / 2e6).toBeCloseTo(1, 6);
      // Only the energy is uncertain here: the offsets print none, the absolute frequency exactly u(E).
      expect(c.offset_Hz_unc).toBeUndefined();
      expect(c.absolute_Hz_unc).toBeCloseTo(6200, 6);
    });
  });

  it('no uncertainty when the energies are exact (nothing printed as noise)', () => {
    const line = analyze(setup('384.2304844685 THz', '0 Hz', '1.00 mT')).result!.lines[0]!;
    expect(line.line_centre_Hz_unc).toBeUndefined();
    for (const c of line.at_fields[0]!.components) expect(c.absolute_Hz_unc).toBeUndefined();
  });

  it('the text report prints the centre with its uncertainty (two digits, GUM 7.2.6)', () => {
    const r = analyze(setup('384.2304844685(62) THz')).result!;
    expect(textReport('x.sublevel', r).join('\n')).toContain('line centre 384.2304844685(62) THz');
  });
});
