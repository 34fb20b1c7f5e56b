/**
 * The diagram palette, checked by computation rather than by eye:
 * - WCAG 2.1 relative luminance and contrast ratio (W3C definition); graphics need 3:1 (SC 1.4.11)
 *   against a light and a dark editor background alike.
 * - Colour-vision deficiency simulated with the severity-1.0 matrices of Machado, Oliveira &
 *   Fernandes (2009), doi:10.1109/TVCG.2009.113, applied in linear sRGB; colours that must be
 *   told apart keep a CIE76 distance (CIELAB, D65 white) under normal vision and all three
 *   dichromacies. The thresholds are common practice (ΔE76 ≈ 2.3 is a just-noticeable difference).
 */
import { describe, expect, it } from 'vitest';
import { HUES, paletteFor } from '../../server/src/render/palette';

type Vec = [number, number, number];
const MACHADO: Record<string, number[][]> = {
  protan: [[0.152286, 1.052583, -0.204868], [0.114503, 0.786281, 0.099216], [-0.003882, -0.048116, 1.051998]],
  deutan: [[0.367322, 0.860646, -0.227968], [0.280085, 0.672501, 0.047413], [-0.01182, 0.04294, 0.968881]],
  tritan: [[1.255528, -0.076749, -0.178779], [-0.078411, 0.930809, 0.147602], [0.004733, 0.691367, 0.3039]],
};
// sRGB (D65) to XYZ, IEC 61966-2-1.
const TO_XYZ = [[0.4124, 0.3576, 0.1805], [0.2126, 0.7152, 0.0722], [0.0193, 0.1192, 0.9505]];

const mul = (m: number[][], v: Vec): Vec => [0, 1, 2].map((i) => m[i][0] * v[0] + m[i][1] * v[1] + m[i][2] * v[2]) as Vec;
const linear = (hex: string): Vec =>
  [1, 3, 5].map((i) => {
    const c = parseInt(hex.slice(i, i + 2), 16) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  }) as Vec;
const luminance = (hex: string): number => mul(TO_XYZ, linear(hex))[1];
const contrast = (a: string, b: string): number => {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
};
const WHITE = mul(TO_XYZ, [1, 1, 1]);
const lab = (lin: Vec): Vec => {
  const f = mul(TO_XYZ, lin).map((t, i) => {
    const r = t / WHITE[i];
    return r > (6 / 29) ** 3 ? Math.cbrt(r) : r / (3 * (6 / 29) ** 2) + 4 / 29;
  });
  return [116 * f[1] - 16, 500 * (f[0] - f[1]), 200 * (f[1] - f[2])];
};
const clip = (v: Vec): Vec => v.map((x) => Math.min(1, Math.max(0, x))) as Vec;
const views = (hex: string): Vec[] => [lab(linear(hex)), ...Object.values(MACHADO).map((m) => lab(clip(mul(m, linear(hex)))))];
/** The smallest CIE76 distance between two colours over normal vision and the three simulated dichromacies. */
const worstDistance = (a: string, b: string): number => {
  const va = views(a);
  const vb = views(b);
  return Math.min(...va.map((x, i) => Math.hypot(x[0] - vb[i][0], x[1] - vb[i][1], x[2] - vb[i][2])));
};
const minPair = (cs: readonly string[]): number => {
  let m = Infinity;
  for (let i = 0; i < cs.length; i++) for (let j = i + 1; j < cs.length; j++) m = Math.min(m, worstDistance(cs[i], cs[j]));
  return m;
};

const LIGHT_BACKGROUNDS = ['#fbfbf8', '#ffffff'];
const DARK_BACKGROUNDS = ['#1e1f22', '#1f1f1f', '#000000'];
const pal = paletteFor({ kind: 'export' });

describe('palette', () => {
  it('reproduces the W3C contrast examples (black on white 21:1, white on white 1:1)', () => {
    expect(contrast('#000000', '#ffffff')).toBeCloseTo(21, 6);
    expect(contrast('#777777', '#777777')).toBe(1);
    // #767676 on white is the well-known darkest grey that passes 4.5:1 (from memory): 4.54.
    expect(contrast('#767676', '#ffffff')).toBeCloseTo(4.54, 2);
  });

  it('simulates a dichromat seeing red and green alike (sanity check of the matrices)', () => {
    expect(worstDistance('#ff0000', '#00ff00')).toBeLessThan(0.5 * Math.hypot(...lab(linear('#ff0000')).map((x, i) => x - lab(linear('#00ff00'))[i])));
  });

  it('keeps every series, trend and polarisation colour at 3:1 or more on light and dark backgrounds', () => {
    const used = [...pal.series, pal.rising, pal.falling, pal.flat, pal.marker, pal.good, pal.bad, ...Object.values(pal.polarization)];
    for (const c of new Set(used)) {
      for (const bg of [...LIGHT_BACKGROUNDS, ...DARK_BACKGROUNDS]) expect(contrast(c, bg), `${c} on ${bg}`).toBeGreaterThanOrEqual(3);
    }
    // The panel uses the same hues as exported files.
    expect(paletteFor({ kind: 'panel' }).series).toEqual(pal.series);
  });

  it('keeps colours that must be told apart distinct for colour-blind readers', () => {
    expect(minPair([pal.rising, pal.falling, pal.flat])).toBeGreaterThan(20);
    expect(minPair(Object.values(pal.polarization))).toBeGreaterThan(20);
    expect(minPair([pal.good, pal.bad])).toBeGreaterThan(10);
    expect(minPair(pal.series)).toBeGreaterThan(15);
  });

  it('takes no colour from the earlier palette or published schemes it replaced', () => {
    const all = Object.values(HUES).map((h) => h.toLowerCase());
    for (const old of ['#2166ac', '#d7832a', '#b03a8c', '#c0461d', '#23917a', '#7b4fa6', '#8c7d12']) expect(all).not.toContain(old);
  });
});
