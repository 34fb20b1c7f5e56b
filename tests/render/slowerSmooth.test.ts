/**
 * The ideal slower profile B(z) = B_bias ± ΔB √(1 − z/L0) steepens toward its end; drawn through
 * uniform samples its end shows a kink, and so does a coil design's fall at the exit. The
 * evaluation's samples are dense where a field bends (physics/slower/zGrid.ts), and the figure
 * draws every curve through them (the sodium example, a spin-flip design with coils).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { renderSlower } from '../../server/src/render';
import { slowerView } from '../../server/src/views/slowerView';
import { all, parseSvg, pathPoints } from './svgTree';

const TEXT = readFileSync(new URL('../../examples/sodium-slower.sublevel', import.meta.url), 'utf8');

const curveOf = (svg: string, kind: string): string => all(all(parseSvg(svg), (n) => n.attrs['data-kind'] === kind)[0]!, (n) => n.name === 'path')[0]!.attrs.d!;

describe('the slower figure draws the √ profile smoothly to its steep end', () => {
  const s = analyze(TEXT).result!.slowers![0]!;
  const v = slowerView(s)!;
  const sign = s.design === 'increasing' ? -1 : 1;
  const root = (z: number): number => Math.sqrt(Math.max(0, 1 - z / s.stop_length_m!));
  const b = (z: number): number => s.bias_T! + sign * s.delta_B_T! * root(z);
  /** The largest gap between f at an interval's midpoint and the chord through the samples, over `scale`. */
  const stray = (zs: number[], ys: number[], f: (z: number) => number, scale: number): number => {
    let worst = 0;
    for (let k = 0; k + 1 < zs.length; k++) worst = Math.max(worst, Math.abs(f((zs[k]! + zs[k + 1]!) / 2) - (ys[k]! + ys[k + 1]!) / 2));
    return worst / scale;
  };

  it('no chord of the ideal curve strays more than 1e-3 of ΔB (0.2 px) from B(z); the 101 uniform samples strayed over 5e-3 (about 1 px)', () => {
    const uniform = Array.from({ length: 101 }, (_, i) => (s.length_m! * i) / 100);
    expect(v.zM.length).toBeGreaterThan(101);
    for (const z of uniform) expect(v.zM).toContain(z);
    expect(stray(uniform, uniform.map(b), b, s.delta_B_T!)).toBeGreaterThan(5e-3);
    expect(stray(v.zM, v.idealT, b, s.delta_B_T!)).toBeLessThanOrEqual(1e-3);
    // The figure draws every sample, the coils' curve included.
    const svg = renderSlower(v, { kind: 'export' });
    expect(pathPoints(curveOf(svg, 'ideal')).length).toBe(v.zM.length);
    expect(pathPoints(curveOf(svg, 'coils')).length).toBe(v.zM.length);
  });

  it('without coils, the resonant speed v0 √(1 − z/L0) is as smooth (to 1e-3 of v0)', () => {
    const noCoils = TEXT.split('\n').filter((l) => !/^\s*sources\s*=/.test(l)).join('\n');
    const bare = slowerView(analyze(noCoils).result!.slowers![0]!)!;
    expect(bare.coilsT).toBeUndefined();
    const v0 = s.capture_m_per_s!;
    expect(stray(bare.zM, bare.resonantMPerS, (z) => v0 * root(z), v0)).toBeLessThanOrEqual(1e-3);
    expect(pathPoints(curveOf(renderSlower(bare, { kind: 'export' }), 'resonant')).length).toBe(bare.zM.length);
  });
});
