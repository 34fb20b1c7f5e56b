/**
 * One field unit per trap: a reader of a trap's lines (text report, hover) meets either gauss with
 * G/cm or tesla with T/m, chosen by the largest field of the trap, never 0.05 T beside 1200 G.
 * Conversions: 1 T = 10⁴ G, 1 G/cm = 0.01 T/m (SI definition of the gauss).
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { trapReport } from '../../server/src/cli/trapReport';
import { trapSection } from '../../server/src/features/hover/trapSection';
import { trapFieldUnit } from '../../server/src/eval/trapText';

const TRAP = (current: string, field = '') => `species Rb87
  level ground: 5s 2S1/2
${field}coil quad
  radius  = 4 cm
  turns   = 100
  current = ${current}
  spacing = 8 cm
  sense   = opposite
trap q
  sources     = quad
  level       = ground
  temperature = 300 uK
  cut         = 3 mK
`;

function trapOf(current: string, field = '') {
  const t = analyze(TRAP(current, field)).result!.traps![0]!;
  expect(t.computed).toBe(true);
  return t;
}

const FIELD = /(-?[\d.]+(?:e-?\d+)?) (G|T|mT|mG|µT)(?![\w/])/g;
const GRADIENT = /[\d.]+ (G\/cm|T\/m|mT\/m)/g;

function unitsIn(text: string): { fields: Set<string>; gradients: Set<string> } {
  return { fields: new Set([...text.matchAll(FIELD)].map((m) => m[2]!)), gradients: new Set([...text.matchAll(GRADIENT)].map((m) => m[1]!)) };
}

describe('a trap reads its fields and gradients in one unit', () => {
  it('a strong pair (|B| up to 0.17 T in the region): the tesla family (T with a prefix, T/m) throughout, the RF-cut field too', () => {
    const t = trapOf('40 A');
    expect(t.field_max_T!).toBeGreaterThan(0.1);
    expect(trapFieldUnit(t)).toBe('T');
    for (const text of [trapReport(t).join('\n'), trapSection(t)]) {
      const u = unitsIn(text);
      expect([...u.fields].every((f) => ['T', 'mT', 'µT'].includes(f))).toBe(true);
      expect([...u.gradients].every((g) => ['T/m', 'mT/m'].includes(g))).toBe(true);
      expect(text).not.toMatch(/\d e-?\d| \de-?\d|\de-\d+ T/);
    }
    // |2,+2⟩ levitation m g/(g_F m_F μ_B) = 15.27 G/cm (docs/traps.md) = 152.7 mT/m; its 3 mK cut field 44.676 G = 4.4676 mT.
    const report = trapReport(t).join('\n');
    expect(report).toContain('152.7 mT/m');
    expect(report).toContain('at 4.4676 mT (linear rule');
    expect(report).not.toContain('44.676 G');
    expect(report).not.toContain('0.0044676 T');
  });

  it('a file that writes fields in mT: a weak trap reads in the tesla family too, like its coil (docs/fields.md)', () => {
    const t = trapOf('20 A', 'field bias = 2 mT\n');
    expect(t.field_max_T!).toBeLessThan(0.1);
    expect(t.field_unit).toBe('mT');
    expect(trapFieldUnit(t)).toBe('T');
    const report = trapReport(t).join('\n');
    // ⁸⁷Rb |1,−1⟩ turns at 1220.9 G = 122.09 mT (Breit–Rabi; docs/traps.md); 1 G = 0.1 mT (SI definition of the gauss).
    expect(report).toContain('turns high-field seeking at 122.09 mT');
    for (const text of [report, trapSection(t)]) {
      const u = unitsIn(text);
      expect(u.fields.has('G')).toBe(false);
      expect(u.gradients.has('G/cm')).toBe(false);
      expect(u.fields.size).toBeGreaterThan(0);
    }
  });

  it('a file that writes fields in G: gauss below 0.1 T, tesla past it (the shared switch inside the family)', () => {
    expect(trapFieldUnit(trapOf('20 A', 'field bias = 2 G\n'))).toBe('G');
    expect(trapFieldUnit(trapOf('40 A', 'field bias = 2 G\n'))).toBe('T');
  });

  it('a weaker pair (|B| below 0.1 T): gauss and G/cm throughout, even the zero at the minimum and a turning field of 0.122 T', () => {
    const t = trapOf('20 A');
    expect(t.field_max_T!).toBeLessThan(0.1);
    const report = trapReport(t).join('\n');
    // ⁸⁷Rb |1,−1⟩ turns at 1220.9 G (Breit–Rabi; docs/traps.md): in gauss here, not 0.12209 T.
    expect(report).toContain('turns high-field seeking at 1220.9 G');
    expect(report).toContain('field minimum 0 G at');
    for (const text of [report, trapSection(t)]) {
      const u = unitsIn(text);
      expect([...u.fields]).toEqual(['G']);
      expect([...u.gradients]).toEqual(['G/cm']);
    }
  });

  it('JSON stays SI', () => {
    const t = trapOf('40 A');
    expect(t.sublevels.find((s) => s.label === 'F=2, m_F=+2')!.levitation_T_per_m).toBeCloseTo(0.1527, 3);
  });
});
