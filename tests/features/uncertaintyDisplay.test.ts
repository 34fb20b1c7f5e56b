/** Uncertainties written in the file reach the hover and the inlay hints as value(unc). */
import { describe, expect, it } from 'vitest';
import { hover } from '../../server/src/features/hover';
import { inlayHints } from '../../server/src/features/inlayHints';
import { analysisOf, atCursor, hoverText, plain } from './helpers';

const LEVEL = 'species Li7\n  level ground: 2s 2S1/2  A = 401.7520433(5) MHz  g_J = 2.002301(2)\n';

describe('uncertainty in the editor', () => {
  it('inlay hints: g_J and the splitting 2A with u = 2 u(A) (GUM, linear)', () => {
    const hints = inlayHints(analysisOf(LEVEL), { start: { line: 0, character: 0 }, end: { line: 10, character: 0 } }).map((h) => String(h.label));
    expect(hints).toContain('g_J 2.0023010(20)');
    expect(hints).toContain('ΔE_hfs 803.5040866(10) MHz');
  });
  it('hover on the level: the constants, shifts and intervals with their uncertainties', () => {
    const { text, position } = atCursor(LEVEL.replace('level ground', 'level gro|und'));
    const h = plain(hoverText(hover(analysisOf(text), position)));
    // F = 1 shift is −5/4 A: u = 5/4 · 0.5 Hz = 0.63 Hz.
    expect(h).toContain('A = 401.75204330(50) MHz');
    expect(h).toContain('-502.19005413(63) MHz');
    expect(h).toContain('F = 1 ↔ 2: 803.5040866(10) MHz');
  });
  it('hover on a resonance: the field found with its uncertainty from u(f)', () => {
    const setup = `${LEVEL}resonance r|f\n  level = ground\n  lower = 1 -1\n  upper = 1 0\n  frequency = 7.00(5) MHz\n  range = 0 G, 20 G\n`;
    const { text, position } = atCursor(setup);
    const h = plain(hoverText(hover(analysisOf(text), position)));
    expect(h).toMatch(/resonant at \d+\.\d+\(\d+\) G/);
  });
  it('hover on a beam: peak positions with their uncertainty (gradient written uncertain)', () => {
    const setup = `${LEVEL}magnet sel\n  field = 0.45 T\n  gradient = 180(2) T/m\n  length = 8 cm\nbeam ma|in\n  species = Li7\n  level = ground\n  source = oven 720 K\n  slits = 80 um, 50 um apart 40 cm\n  magnet = sel\n  drift = 35 cm\n  detector = 25 um\n`;
    const { text, position } = atCursor(setup);
    const h = plain(hoverText(hover(analysisOf(text), position)));
    // ⟨z⟩ ∝ G: a 1.1 % gradient moves the ±0.88 mm peaks by about 10 µm.
    expect(h).toMatch(/-8\d\d\.\d\(\d\d\) µm/);
    expect(h).toMatch(/[^-]8\d\d\.\d\(\d\d\) µm/);
  });
  it('no uncertainty written: no parentheses', () => {
    const hints = inlayHints(analysisOf('species Demo\n  mass = 40 u\n  level p: 3p 2P°3/2\nfield b = 1 G\n'), { start: { line: 0, character: 0 }, end: { line: 10, character: 0 } }).map((h) => String(h.label));
    expect(hints.join(' ')).not.toMatch(/\(\d+\)/);
  });
});
