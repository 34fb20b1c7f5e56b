/**
 * Built-in data with uncertainties reach derived numbers. Each value below is the standard
 * uncertainty the cited compilation lists as recalled ("from memory": not read while the table
 * was written), and the citation a user sees says so.
 *  - Sodium D line data compilation: A(3²S1/2) = 885.813 064 4(5) MHz, A(3²P1/2) = 94.44(13) MHz,
 *    A(3²P3/2) = 18.534(15) MHz, B(3²P3/2) = 2.724(30) MHz, g_J(3²S1/2) = 2.002 296 00(80),
 *    g_J(3²P1/2) = 0.665 81(12), g_I = −0.000 804 610 80(80) (from memory).
 *  - Potassium properties compilation: A(4²S1/2) 230.859 860 1(3), −285.730 8(24), 127.006 935 2(6) MHz
 *    for 39K, 40K, 41K; A(4²P1/2) 27.775(42), −34.523(25), 15.245(42) MHz; A(4²P3/2) 6.093(25),
 *    −7.585(10), 3.363(25) MHz; B(4²P3/2) 2.786(71), −3.445(90), 3.351(71) MHz; g_J(4²S1/2) =
 *    2.002 294 21(24) (from memory).
 *  - 6Li properties compilation: A(2²S1/2) = 152.136 840 7(20) MHz, A(2²P1/2) = 17.386(31) MHz,
 *    A(2²P3/2) = −1.155(8) MHz, B(2²P3/2) = −0.10(14) MHz; alkali hyperfine review:
 *    A(7Li 2²S1/2) = 401.752 043 3(5) MHz, g_J(Li 2²S1/2) = 2.002 301 0(7) (from memory).
 *  - Rubidium 87 / Cesium D line data compilations: g_J(5²S1/2) = 2.002 331 13(20),
 *    g_J(5²P3/2) = 1.3362(13), g_I(87Rb) = −0.000 995 141 4(10); g_J(6²S1/2) = 2.002 540 32(20),
 *    g_J(6²P1/2) = 0.665 90(9), g_I(133Cs) = −0.000 398 853 95(52) (from memory).
 *  - D-line frequencies of the same compilations: 87Rb D2 384.230 484 468 5(62) THz, D1
 *    377.107 463 380(11) THz; 133Cs D2 351.725 718 50(11) THz; 39K D1 389.286 058 716(62) THz (from memory).
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';

function levels(text: string) {
  const r = analyze(text).result!;
  return { r, byName: Object.fromEntries(r.levels.map((l) => [l.level, l])) };
}

describe('built-in hyperfine constants carry their uncertainties into intervals and shifts', () => {
  const cases: [string, string, [string, number, number | null][]][] = [
    // species, levels, [level, u(A) Hz, u(B) Hz]
    ['Na23', '  level g: 3s 2S1/2\n  level p1: 3p 2P°1/2\n  level p: 3p 2P°3/2\n', [['g', 0.5, null], ['p1', 130e3, null], ['p', 15e3, 30e3]]],
    ['K39', '  level g: 4s 2S1/2\n  level p1: 4p 2P°1/2\n  level p: 4p 2P°3/2\n', [['g', 0.3, null], ['p1', 42e3, null], ['p', 25e3, 71e3]]],
    ['K40', '  level g: 4s 2S1/2\n  level p1: 4p 2P°1/2\n  level p: 4p 2P°3/2\n', [['g', 2400, null], ['p1', 25e3, null], ['p', 10e3, 90e3]]],
    ['K41', '  level g: 4s 2S1/2\n  level p1: 4p 2P°1/2\n  level p: 4p 2P°3/2\n', [['g', 0.6, null], ['p1', 42e3, null], ['p', 25e3, 71e3]]],
    ['Li6', '  level g: 2s 2S1/2\n  level p1: 2p 2P°1/2\n  level p: 2p 2P°3/2\n', [['g', 2, null], ['p1', 31e3, null], ['p', 8e3, 140e3]]],
    ['Li7', '  level g: 2s 2S1/2\n  level p: 2p 2P°3/2\n', [['g', 0.5, null], ['p', 14e3, 29e3]]],
  ];
  for (const [species, text, expected] of cases) {
    it(`${species}: A, B and every F interval carry u`, () => {
      const { byName } = levels(`species ${species}\n${text}`);
      for (const [name, uA, uB] of expected) {
        const h = byName[name]!.hyperfine!;
        expect(h.A_Hz.uncertainty, `${species} ${name} A`).toBeCloseTo(uA, 6);
        if (uB !== null) expect(h.B_Hz!.uncertainty, `${species} ${name} B`).toBeCloseTo(uB, 6);
        expect(h.intervals.length).toBeGreaterThan(0);
        for (const iv of h.intervals) expect(iv.interval_Hz_unc, `${species} ${name} interval`).toBeGreaterThan(0);
      }
      // The ground splitting (I + 1/2)·A is linear in A: u = (I + 1/2)·u(A) exactly (GUM, linear case).
      const g = byName.g!.hyperfine!;
      const iPlusHalf = Math.abs(g.intervals[0]!.interval_Hz / g.A_Hz.value);
      expect(g.intervals[0]!.interval_Hz_unc).toBeCloseTo(iPlusHalf * g.A_Hz.uncertainty!, 9);
    });
  }

  it('the Na ground splitting prints with the published 1 771 626 128.8(1.0) Hz', () => {
    const { byName } = levels('species Na23\n  level g: 3s 2S1/2\n');
    const iv = byName.g!.hyperfine!.intervals[0]!;
    expect(iv.interval_Hz).toBeCloseTo(1771626128.8, 1);
    expect(iv.interval_Hz_unc).toBeCloseTo(1.0, 9);
  });

  it('the citation says where the uncertainty came from', () => {
    const { byName } = levels('species K39\n  level g: 4s 2S1/2\n');
    expect(byName.g!.hyperfine!.A_Hz.source).toMatch(/^Tiecke.*; uncertainty from memory$/);
  });
});

describe('built-in g_J and g_I carry their uncertainties into sublevel energies', () => {
  const cases: [string, string, number, number][] = [
    // species, level, u(g_J), u(g_I)
    ['Na23', '3s 2S1/2', 8e-7, 8e-10],
    ['K39', '4s 2S1/2', 2.4e-7, 1.2e-13],
    ['Li6', '2s 2S1/2', 7e-7, 3e-10],
    ['Rb85', '5s 2S1/2', 2e-7, 6e-10],
    ['Rb87', '5s 2S1/2', 2e-7, 1e-9],
    ['Cs133', '6s 2S1/2', 2e-7, 5.2e-13],
  ];
  for (const [species, designation, uGJ, uGI] of cases) {
    it(`${species}: g_J and g_I are uncertain inputs and a stretched state's energy at 10 mT has u = μ_B B/h · sqrt((J u_gJ)² + (I u_gI)²)`, () => {
      const { r, byName } = levels(`species ${species}\n  level g: ${designation}\nfield f = 10 mT\n`);
      const inputs = Object.fromEntries(r.uncertainty_inputs!.map((i) => [i.id, i.u]));
      expect(inputs[`level:${species}.g.g_J`]).toBeCloseTo(uGJ, 15);
      expect(inputs[`species:${species}.g_I`]).toBeCloseTo(uGI, 18);
      const l = byName.g!;
      expect(l.g_J.used_unc).toBeCloseTo(uGJ, 15);
      // The stretched state |m_J = J, m_I = I> is an exact eigenstate: E = A·I·J + μ_B B (g_J J + g_I I)/h,
      // linear in g_J, g_I and A; its uncertainty follows by the GUM law in closed form.
      const top = l.at_fields![0]!.exact.reduce((a, b) => (b.m > a.m ? b : a));
      const muBB = 13.996244936e9 * 0.01; // μ_B/h (CODATA 2022, from memory) × 10 mT
      const I = l.I!;
      const uA = l.hyperfine!.A_Hz.uncertainty ?? 0;
      const expected = Math.hypot(muBB * 0.5 * uGJ, muBB * I * uGI, 0.5 * I * uA);
      expect(top.energy_Hz_unc! / expected).toBeCloseTo(1, 6);
    });
  }

  it('Rb87 5p3/2 and Cs 6p1/2 g_J are uncertain inputs', () => {
    const rb = levels('species Rb87\n  level p: 5p 2P°3/2\n').r;
    expect(rb.uncertainty_inputs!.find((i) => i.id === 'level:Rb87.p.g_J')!.u).toBeCloseTo(0.0013, 12);
    const cs = levels('species Cs133\n  level p: 6p 2P°1/2\n').r;
    expect(cs.uncertainty_inputs!.find((i) => i.id === 'level:Cs133.p.g_J')!.u).toBeCloseTo(9e-5, 12);
  });
});

describe('built-in D-line frequencies carry their uncertainties into line centres and absolute frequencies', () => {
  const cases: [string, string, string, number][] = [
    ['Rb87', '5s 2S1/2', '5p 2P°3/2', 6.2e3],
    ['Rb87', '5s 2S1/2', '5p 2P°1/2', 11e3],
    ['Cs133', '6s 2S1/2', '6p 2P°3/2', 110e3],
    ['K39', '4s 2S1/2', '4p 2P°1/2', 62e3],
  ];
  for (const [species, lower, upper, u] of cases) {
    it(`${species} ${upper}: u(centre) = u(E_upper) (the ground level is the zero of the scale), and every absolute frequency at least that`, () => {
      const r = analyze(`species ${species}\n  level g: ${lower}\n  level p: ${upper}\nfield f = 1 G\nline L: g -> p\n`).result!;
      const line = r.lines[0]!;
      expect(line.line_centre_Hz_unc).toBeCloseTo(u, 3);
      for (const c of line.at_fields[0]!.components) {
        expect(c.absolute_Hz_unc! / Math.hypot(u, c.offset_Hz_unc ?? 0)).toBeCloseTo(1, 9);
      }
    });
  }
});
