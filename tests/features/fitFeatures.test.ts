/** Fitted values next to the data: inline hints after the fit and after each point, and the hovers of data and fit blocks. */
import { readFileSync } from 'fs';
import { describe, expect, it } from 'vitest';
import { hover } from '../../server/src/features/hover';
import { inlayHints } from '../../server/src/features/inlayHints';
import { analysisOf, hoverText, plain } from './helpers';

const TEXT = readFileSync('examples/fit-rubidium.sublevel', 'utf8');
const ALL = { start: { line: 0, character: 0 }, end: { line: 200, character: 0 } };

describe('fits in the editor', () => {
  const analysis = analysisOf(TEXT);
  const hints = inlayHints(analysis, ALL).map((h) => `${h.position.line} ${String(h.label)}`);

  it('the calibration lists both fields after the one-line fit (u(B) = 5 Hz / 928.8 Hz/G = 5.4 mG)', () => {
    expect(hints).toContain('14 field 2.1523(54) G or 4.3056(54) G');
  });

  it('the fitted g_J and A after the fit header and the data headers, residuals after each point', () => {
    expect(hints).toContain('36 g_J 2.00233089(18), A 3417.341382(68) MHz');
    expect(hints).toContain('18 constants: g_J 2.00233089(18), A 3417.341382(68) MHz');
    // Point on line 23 (0-based 22): measured 6834.696976 MHz, model 6834.697142 MHz (as SciPy's fit, tests/reference).
    expect(hints).toContain('22 r -165.6 Hz (-0.55 σ)');
  });

  it('hovering a fit or its data shows values, χ² and correlations', () => {
    const at = (line: number) => plain(hoverText(hover(analysis, { line, character: 1 })));
    expect(at(36)).toContain('χ² 8.118 for 6 degrees of freedom');
    expect(at(36)).toContain('g_J–A -0.596');
    expect(at(18)).toContain('3417.341382(68) MHz');
    expect(at(14)).toContain('4.3056(54) G');
  });
});
