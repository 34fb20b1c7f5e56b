/**
 * What the file wrote reaches the JSON document, the text report and the diagnostics as the number
 * it wrote, without conversion noise, and trap findings with quantities read in the trap's own
 * units. Demo scenario with invented numbers. Exact conversions: 1 G = 1e-4 T (CGS definition),
 * the SI prefixes, and a cut in J read straight into joules (no trip through Hz and back by h).
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { textReport } from '../../server/src/cli/textReport';

const SETUP = `species Li7
  level g2: 2s 2S1/2

field bias = 3 G

magnet sel
  field    = 0.3 mT
  gradient = 3 G/cm
  length   = 2.2 cm

coil quad
  radius  = 4 cm
  turns   = 100
  current = 20 A
  spacing = 8 cm
  sense   = opposite

trap t1
  sources     = quad
  level       = g2
  gravity     = -z
  temperature = 7 uK
  cut         = 3e-30 J
`;

describe('written quantities without conversion noise, in every output', () => {
  const r = analyze(SETUP);
  const json = JSON.parse(JSON.stringify(r.result));

  it('JSON holds the written numbers in SI: 3 G is 3e-4 T, 2.2 cm is 0.022 m, a 3e-30 J cut is 3e-30 J', () => {
    expect(json.fields.find((f: { name: string }) => f.name === 'bias').field_T).toBe(3e-4); // was 3.0000000000000003e-4
    const magnet = json.magnets.find((m: { name: string }) => m.name === 'sel');
    expect(magnet.length_m).toBe(0.022); // was 0.022000000000000002
    expect(json.traps[0].cut_J).toBe(3e-30); // was 3.0000000000000003e-30
    expect(json.traps[0].cut_unit).toBe('J');
    expect(json.traps[0].temperature_K).toBe(7e-6);
  });

  it('the text report echoes the cut as written', () => {
    expect(textReport('x.sublevel', r.result!).join('\n')).toContain('temperature 7 µK; cut 3e-30 J');
  });

  it('no number in the JSON document is a written value with noise in its last digits', () => {
    const noisy = JSON.stringify(json).match(/"(?:field_T|length_m|cut_J|temperature_K|gradient_T_per_m)":-?\d+\.\d*(?:0{8,}|9{8,})\d(?:e-?\d+)?/g);
    expect(noisy).toBeNull();
  });
});

describe('trap findings with quantities read in the trap’s units, the same in JSON, text and the editor', () => {
  // The turning field of Li7 |1,−1⟩ (≈ 143.6 G, from the engine's Breit–Rabi curve) sets its depth when the region is the default one.
  const base = SETUP.replace('  cut         = 3e-30 J\n', '');
  const turning = (text: string): string[] => analyze(text).problems.filter((p) => p.code === 'trap-turning-point').map((p) => p.message);

  it('gauss family (fields written in G): the turning field reads in G', () => {
    expect(turning(base)).toEqual(["trap 't1': The depth for |F=1, m_F=-1⟩ is set by the turning point of its energy at 143.56 G, where it becomes high-field seeking."]);
  });

  it('tesla family (fields written in mT): the turning field reads in mT to the trap report’s 5 digits (the core always wrote G)', () => {
    const text = base.replace('field bias = 3 G', 'field bias = 0.3 mT');
    expect(turning(text)).toEqual(["trap 't1': The depth for |F=1, m_F=-1⟩ is set by the turning point of its energy at 14.356 mT, where it becomes high-field seeking."]);
    const report = textReport('x.sublevel', analyze(text).result!).join('\n');
    expect(report).toContain('turns high-field seeking at 14.356 mT');
  });

  it('a region that reaches a coil reads its lengths in the unit the region was written in, as the report line does (the core wrote cm)', () => {
    const a = analyze(`${base}  region      = 60 mm\n`);
    const found = a.problems.filter((p) => p.code === 'trap-region-reaches-source');
    // The nearest winding of loops of radius 4 cm at ±4 cm: √(4² + 4²) cm = 56.57 mm from the centre.
    expect(found.map((p) => p.message)).toEqual([
      "trap 't1': The trap region (radius 60 mm) reaches a conductor 56.57 mm from its centre: atoms would meet the hardware before the edge, and the field near a thin conductor grows without bound. Make the region smaller.",
    ]);
    // The JSON diagnostics carry the same sentence as the problem the editor and `check` show.
    expect(a.result!.diagnostics.filter((d) => d.code === 'trap-region-reaches-source').map((d) => d.message)).toEqual(found.map((p) => p.message));
    // The report's region line reads in the same unit (it read `region 6 cm about (0, 0, 0) cm`).
    expect(textReport('x.sublevel', a.result!).join('\n')).toContain('region 60 mm about (0, 0, 0) mm');
  });
});
