// Peak positions carry their uncertainty (docs/uncertainty.md): first-order propagation through
// the exact slopes of physics/beam/peakSlopes.ts, checked against central differences of the whole
// evaluation (the GUM law with a numerically differentiated model, JCGM 100 §5.1.3).
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import type { BeamResult } from '../../server/src/eval/resultTypes';

/**
 * Invented apparatus: ⁷Li in a selector magnet, one input written with an uncertainty at a time
 * (the level's constants are written exactly: the built-in ones carry uncertainties of their own).
 */
function setup(gradient: string, drift = '35.0 cm', field = '0.450 T'): string {
  return `species Li7
  level ground: 2s 2S1/2  A = 401.7520433 MHz  g_J = 2.0023010

magnet selector
  field    = ${field}
  gradient = ${gradient}
  length   = 8.00 cm

beam main
  species  = Li7
  level    = ground
  source   = oven 720 K
  slits    = 80 um, 50 um apart 40 cm
  magnet   = selector
  drift    = ${drift}
  detector = 25 um
`;
}
const beam = (text: string): BeamResult => analyze(text).result!.beams[0]!;

describe('peak position uncertainty', () => {
  it('follows the gradient: u(x) = |dx/dG| u(G), dx/dG by central differences of the evaluation', () => {
    const b = beam(setup('180(2) T/m'));
    const up = beam(setup('183.6 T/m'));
    const down = beam(setup('176.4 T/m'));
    expect(b.peaks.length).toBeGreaterThan(1);
    for (const [j, p] of b.peaks.entries()) {
      if (p.position_m === 0) continue;
      const fd = Math.abs(up.peaks[j]!.position_m - down.peaks[j]!.position_m) / 7.2;
      expect(p.position_m_unc, p.members.join('+')).toBeDefined();
      // The refined positions are good to ~1e-5 relative: over a 4 % span that is ~5e-4 of the slope.
      expect(Math.abs(p.position_m_unc! / (fd * 2) - 1), p.members.join('+')).toBeLessThan(2e-3);
    }
    for (const [i, s] of b.sublevels.entries()) {
      if (s.peak_m === null || s.peak_m === 0) continue;
      const fd = Math.abs(up.sublevels[i]!.peak_m! - down.sublevels[i]!.peak_m!) / 7.2;
      expect(Math.abs(s.peak_m_unc! / (fd * 2) - 1), s.label).toBeLessThan(2e-3);
    }
  });

  it('follows the drift through both the lever arm and the slit image', () => {
    const b = beam(setup('180 T/m', '35.0(4) cm'));
    const up = beam(setup('180 T/m', '35.8 cm'));
    const down = beam(setup('180 T/m', '34.2 cm'));
    for (const [j, p] of b.peaks.entries()) {
      if (p.position_m === 0) continue;
      const fd = Math.abs(up.peaks[j]!.position_m - down.peaks[j]!.position_m) / 0.016;
      expect(Math.abs(p.position_m_unc! / (fd * 0.004) - 1), p.members.join('+')).toBeLessThan(2e-3);
    }
  });

  it('a point detector: no slope, so no uncertainty, and the warning uncertainty-undefined on the beam says so', () => {
    const a = analyze(setup('180(2) T/m').replace('detector = 25 um', 'detector = 0 um'));
    const b = a.result!.beams[0]!;
    expect(b.peaks.some((p) => p.position_m !== 0)).toBe(true);
    for (const p of b.peaks) expect(p.position_m_unc).toBeUndefined();
    const w = a.problems.find((p) => p.code === 'uncertainty-undefined');
    expect(w?.severity).toBe('warning');
    expect(w?.message).toContain("beam 'main'");
    expect(w?.range.start).toEqual({ line: 8, character: 5 });
  });

  it('a point detector with only published built-in uncertainties reaching the peaks: a note, not a warning', () => {
    // Li7 from the built-in table (A and g_J carry the compilation's uncertainties); the file writes none.
    const text = 'species Li7\n  level ground: 2s 2S1/2\nmagnet m\n  field = 0.4 T\n  gradient = 100 T/m\n  length = 5 cm\n'
      + 'beam b\n  species = Li7\n  level = ground\n  source = oven 700 K\n  slits = 50 um, 50 um apart 30 cm\n  magnet = m\n  drift = 30 cm\n';
    const w = analyze(text).problems.find((p) => p.code === 'uncertainty-undefined');
    expect(w?.severity).toBe('info');
    // The same beam with a gradient the file gives an uncertainty: the user's own uncertainty is lost, a warning.
    const v = analyze(text.replace('100 T/m', '100(2) T/m')).problems.find((p) => p.code === 'uncertainty-undefined');
    expect(v?.severity).toBe('warning');
  });

  it('is absent when nothing uncertain reaches the beam, and an undeflected peak at 0 gets none printed as noise', () => {
    const b = beam(setup('180 T/m'));
    for (const p of b.peaks) expect(p.position_m_unc).toBeUndefined();
    for (const s of b.sublevels) expect(s.peak_m_unc).toBeUndefined();
    expect(analyze(setup('180 T/m').replace('detector = 25 um', 'detector = 0 um')).problems.map((p) => p.code)).not.toContain('uncertainty-undefined');
  });
});
