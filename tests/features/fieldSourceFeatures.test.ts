/**
 * Field sources in the editor: the hover on a source block and the inlay hint after it, from the
 * evaluation's `fieldSources` entry (the numbers themselves are checked in tests/eval and tests/cli).
 */
import { readFileSync } from 'fs';
import { describe, expect, it } from 'vitest';
import { hover } from '../../server/src/features/hover';
import { inlayHints } from '../../server/src/features/inlayHints';
import { analysisOf, atCursor, hoverText, plain } from './helpers';

const EXAMPLE = readFileSync('examples/coils-and-wires.sublevel', 'utf8');
const ALL = { start: { line: 0, character: 0 }, end: { line: 1000, character: 0 } };

function hoverAt(marked: string): string {
  const { analysis, position } = atCursor(marked);
  return plain(hoverText(hover(analysis, position)));
}

describe('hover on a field source', () => {
  it('an opposed pair: what it is, zero field and the gradient at the centre, the winding, the cautions in one line', () => {
    const h = hoverAt(EXAMPLE.replace('coil quad', 'coil qu|ad'));
    expect(h).toContain('coil quad: a pair wound in opposite senses (anti-Helmholtz type), spacing 7 cm = 2 R');
    expect(h).toContain('at the centre (0, 0, 0) m: |B| = 0 G, B = (0, 0, 0) G');
    expect(h).toMatch(/axial gradient ∂B_z\/∂z = -979\.2\d* mT\/m = -97\.92\d* G\/cm/);
    expect(h).toContain('winding: 52.78 m of 1.2 mm copper, 0.8046 Ω at 20 °C; 13.26 A/mm², 181 W, 12.07 V (needs water cooling)');
    expect(h).toContain("⚠ Coil heating (181 W at 13.26 A/mm², 12.07 V): follow your lab's safety rules");
  });

  it('the block word shows the same section after the word\'s own description', () => {
    const h = hoverAt(EXAMPLE.replace('slab pole', 'sl|ab pole'));
    expect(h).toContain('a uniformly magnetised rectangular block');
    expect(h).toContain('slab pole: 10 × 20 × 5 mm, μ0·M = 1.2 T');
    expect(h).toContain('inside the block, at its centre (0, 0, -8) cm');
    expect(h).toContain('⚠ Permanent magnet (μ0·M = 1.2 T)');
  });

  it('a magnetisation reads as written, in the report line and the caution alike (both read `μ0·M = 1.234 T`)', () => {
    const mT = EXAMPLE.replace('slab pole', 'sl|ab pole').replace(/magnetisation = [^\n]*/, 'magnetisation = 1234.5 mT along z');
    const h = hoverAt(mT);
    expect(h).toContain('slab pole: 10 × 20 × 5 mm, μ0·M = 1234.5 mT');
    expect(h).toContain('⚠ Permanent magnet (μ0·M = 1234.5 mT)');
    // M in A/m stays M in A/m: 9.5e5 A/m is μ0·M ≈ 1.194 T (μ0 = 1.25663706127e-6 N/A², CODATA 2022).
    const am = hoverAt(EXAMPLE.replace('slab pole', 'sl|ab pole').replace(/magnetisation = [^\n]*/, 'magnetisation = 9.5e5 A/m along z'));
    expect(am).toContain('slab pole: 10 × 20 × 5 mm, M = 950000 A/m');
    expect(am).toContain('⚠ Permanent magnet (M = 950000 A/m)');
  });

  it('a source with problems says it was not computed', () => {
    const h = hoverAt('coil br|oken\n  radius = 0 cm\n  turns = 10\n  current = 1 A\n');
    expect(h).toContain('coil broken');
    expect(h).toContain('not computed: the block has problems to fix (see diagnostics)');
  });
});

describe('inlay hints after field sources', () => {
  it('the gradient of an opposed pair, the field of the others, the power of a winding', () => {
    const hints = inlayHints(analysisOf(EXAMPLE), ALL).map((h) => `${h.position.line + 1} ${String(h.label)}`);
    expect(hints).toEqual([
      '4 ∂B/∂axis -97.92 G/cm, 181 W, 13.3 A/mm²',
      '12 |B| 8.378 G at centre, 1.32 W, 2.55 A/mm²',
      '19 |B| 79.98 G midway',
      '26 |B| 1.117 T inside',
    ]);
  });
});
