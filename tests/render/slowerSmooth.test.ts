/**
 * The ideal slower profile B(z) = B_bias ± ΔB √(1 − z/L0) has an infinite slope at z = L0; drawn
 * through uniform samples its end shows a kink. The figure samples it densely where it bends:
 * no chord of the drawn curve strays more than 1e-3 of ΔB from B(z), and it is the same function as the evaluation's own samples (the sodium example, a spin-flip design).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { renderSlower } from '../../server/src/render';
import { valueAt } from '../../server/src/render/sampled';
import { slowerView } from '../../server/src/views/slowerView';
import { all, parseSvg, pathPoints } from './svgTree';

const TEXT = readFileSync(new URL('../../examples/sodium-slower.sublevel', import.meta.url), 'utf8');

const curveOf = (svg: string, kind: string): string => all(all(parseSvg(svg), (n) => n.attrs['data-kind'] === kind)[0]!, (n) => n.name === 'path')[0]!.attrs.d!;

describe('the slower figure draws the √ profile smoothly to its steep end', () => {
  const s = analyze(TEXT).result!.slowers![0]!;
  const v = slowerView(s)!;

  it('the dense curve is the evaluation’s own ideal field (at every evaluated sample, within the chords’ 1e-3 of ΔB)', () => {
    expect(v.idealFine!.zM.length).toBeGreaterThan(v.zM.length / 4);
    for (let k = 0; k < v.zM.length; k++) {
      const fine = valueAt(v.idealFine!.zM, v.idealFine!.values, v.zM[k]!);
      expect(Math.abs(fine - v.idealT[k]!)).toBeLessThan(1e-3 * s.delta_B_T!);
    }
    // It ends on the exit field exactly.
    expect(v.idealFine!.values.at(-1)! / v.idealT.at(-1)! - 1).toBeCloseTo(0, 9);
  });

  it('no chord of the drawn curve strays more than 1e-3 of ΔB (0.2 px) from B(z); uniform samples strayed over 5e-3 (about 1.5 px)', () => {
    const sign = s.design === 'increasing' ? -1 : 1;
    const b = (z: number): number => s.bias_T! + sign * s.delta_B_T! * Math.sqrt(Math.max(0, 1 - z / s.stop_length_m!));
    const stray = (zs: number[], bs: number[]): number => {
      let worst = 0;
      for (let k = 0; k + 1 < zs.length; k++) worst = Math.max(worst, Math.abs(b((zs[k]! + zs[k + 1]!) / 2) - (bs[k]! + bs[k + 1]!) / 2));
      return worst / s.delta_B_T!;
    };
    expect(stray(v.idealFine!.zM, v.idealFine!.values)).toBeLessThanOrEqual(1e-3);
    expect(stray(v.zM, v.idealT)).toBeGreaterThan(5e-3);
    // And the figure draws the dense curve, not the uniform samples.
    expect(pathPoints(curveOf(renderSlower(v, { kind: 'export' }), 'ideal')).length).toBe(v.idealFine!.zM.length);
  });

  it('without coils, the resonant speed v0 √(1 − z/L0) is drawn densely too, and equals the evaluation’s', () => {
    // The same slower with no coils named: its atoms are resonant with the ideal field.
    const noCoils = TEXT.split('\n').filter((l) => !/^\s*sources\s*=/.test(l)).join('\n');
    const bare = slowerView(analyze(noCoils).result!.slowers![0]!)!;
    expect(bare.coilsT).toBeUndefined();
    expect(bare.resonantFine).toBeDefined();
    for (let k = 0; k < bare.zM.length; k += 10) {
      // Within the chords' tolerance (1e-3 of v0) plus as much again.
      expect(Math.abs(valueAt(bare.resonantFine!.zM, bare.resonantFine!.values, bare.zM[k]!) - bare.resonantMPerS[k]!)).toBeLessThan(2e-3 * s.capture_m_per_s!);
    }
    expect(pathPoints(curveOf(renderSlower(bare, { kind: 'export' }), 'resonant')).length).toBe(bare.resonantFine!.zM.length);
  });
});
