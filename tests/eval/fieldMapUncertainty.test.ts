/**
 * Uncertainties of a beam through a magnet built from sources (eval/uncertainty/fieldMapPass.ts):
 * against central differences of the whole evaluation (each uncertain input moved in the file and
 * evaluated again), and against the uniform-gradient pass in a nearly uniform gradient.
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { ATOMIC_MASS_UNIT } from '../../server/src/physics/constants';
import { coilPairBeam, twoWireBeam } from '../fixtures/fieldMapBeams';

/** Na23 through two 12 cm conductors, every input a {placeholder}. */
const WIRES = twoWireBeam({ current: '{current}', through: '{through}', at: '{at}', length: '{length}', T: '{T}', drift: '{drift}' });

/** Writes value(u) with u in units of the value's last digit (the file's notation). */
function written(value: number, u: number, decimals: number): string {
  return `${value.toFixed(decimals)}(${Math.round(u * 10 ** decimals)})`;
}

describe('a field-map beam: peak uncertainties against differences of the whole evaluation', () => {
  const inputs: Record<string, { value: number; u: number; decimals: number }> = {
    current: { value: 2400, u: 24, decimals: 0 },
    through: { value: 2, u: 0.005, decimals: 3 },
    at: { value: 1.5, u: 0.02, decimals: 2 },
    T: { value: 600, u: 5, decimals: 0 },
    drift: { value: 40, u: 0.1, decimals: 1 },
    length: { value: 8, u: 0.05, decimals: 2 },
  };
  const text = (moved?: { key: string; by: number }, only?: string) =>
    WIRES.replace(/\{(\w+)\}/g, (_, key: string) => {
      const i = inputs[key]!;
      if (moved?.key === key) return String(i.value + moved.by);
      return !moved && (only === undefined || only === key) ? written(i.value, i.u, i.decimals) : i.value.toFixed(i.decimals);
    });
  const peaks = (t: string) => analyze(t).result!.beams[0]!.peaks.map((p) => p.position_m);

  it('every input at once: the reported u is the root sum of squares of u · ∂x/∂p (differences at ±u/10), within 1e-3', () => {
    const r = analyze(text()).result!;
    const beam = r.beams[0]!;
    expect(beam.deflection_model).toBe('field-map');
    const ids = r.uncertainty_inputs!.map((i) => i.id);
    for (const id of ['source:rails.current', 'source:rails.through.y', 'magnet:selector.at.z', 'magnet:selector.length', 'beam:main.temperature', 'beam:main.drift']) expect(ids).toContain(id);
    const sumSq = beam.peaks.map(() => 0);
    for (const [key, i] of Object.entries(inputs)) {
      const h = i.u / 10;
      const up = peaks(text({ key, by: h }));
      const down = peaks(text({ key, by: -h }));
      up.forEach((x, j) => (sumSq[j]! += (((x - down[j]!) / (2 * h)) * i.u) ** 2));
    }
    beam.peaks.forEach((p, j) => {
      expect(p.position_m).not.toBe(0);
      expect(Math.abs(p.position_m_unc! / Math.sqrt(sumSq[j]!) - 1)).toBeLessThan(1e-3);
    });
    // the magnet's field and gradient at the beam line carry the sources' uncertainties too
    expect(r.magnets[0]!.field_T_unc).toBeGreaterThan(0);
    expect(r.magnets[0]!.gradient_T_per_m_unc).toBeGreaterThan(0);
    expect(JSON.stringify(r)).not.toMatch(/NaN|Infinity/);
  });

  it('one input alone (the beam line height): u · |∂x/∂p| within 1e-3', () => {
    const beam = analyze(text(undefined, 'at')).result!.beams[0]!;
    const h = inputs.at!.u / 10;
    const up = peaks(text({ key: 'at', by: h }));
    const down = peaks(text({ key: 'at', by: -h }));
    beam.peaks.forEach((p, j) => {
      const fd = Math.abs(((up[j]! - down[j]!) / (2 * h)) * inputs.at!.u);
      // the built-in constants' (published) uncertainties add ~1e-10 m, far below 1e-3 of this
      expect(Math.abs(p.position_m_unc! / fd - 1)).toBeLessThan(1e-3);
    });
  });
});

/**
 * A spin-1/2 without a nucleus (constant moment ±g_J μ_B/2) through a Helmholtz pair for 0.3 T
 * and an anti-Helmholtz pair for ~10 T/m on the same axis, the beam line through their centre
 * across the axis over 1 cm: ∂|B|/∂z = G B0/|B| changes by < 0.4 % along it (invented numbers).
 */
function nearlyUniform(magnet: string, beamExtra: { T: string; slit: string; detector: string }): string {
  return coilPairBeam({ magnet, gradCurrent: '{gradCurrent}', ...beamExtra });
}

describe('a field-map beam against the uniform-gradient pass in a nearly uniform gradient', () => {
  const sourcesMagnet = 'magnet m\n  sources = bias, grad\n  length  = 1 cm\n';
  const apparatus = { T: '600(6)', slit: '10.0(5)', detector: '10.0(5)' };

  /** The uniform magnet with the field at the line and the gradient that gives the same coefficients as the flights. */
  function equivalentUniform(mapped: ReturnType<typeof analyze>, relativeU = 0): string {
    const r = mapped.result!;
    const s = r.beams[0]!.sublevels[0]!;
    const lever = 0.5 * 0.01 * 0.01 + 0.01 * 1.0;
    const g = (s.field_map!.coefficient_m3_per_s2 * 39 * ATOMIC_MASS_UNIT) / (s.moment_J_per_T * lever);
    const gradient = relativeU > 0 ? written(g, Math.abs(g) * relativeU, 9) : g.toFixed(9);
    return `magnet m\n  field = ${r.magnets[0]!.field_T} T\n  gradient = ${gradient} T/m\n  length = 1 cm\n`;
  }

  it('the oven temperature, slits and detector: the two passes agree to 1e-6 (measured 1.4e-8: the same peak slopes, k nearly 1/v²)', () => {
    const text = nearlyUniform(sourcesMagnet, apparatus).replace('{gradCurrent}', '185.4');
    const mapped = analyze(text);
    const b = mapped.result!.beams[0]!;
    expect(b.deflection_model).toBe('field-map');
    expect(b.field_map!.gradient_variation).toBeLessThan(0.004);
    const uniform = analyze(nearlyUniform(equivalentUniform(mapped), apparatus).replace('{gradCurrent}', '185.4')).result!.beams[0]!;
    expect(uniform.deflection_model).not.toBe('field-map');
    expect(uniform.peaks.length).toBe(b.peaks.length);
    b.peaks.forEach((p, j) => {
      expect(Math.abs(uniform.peaks[j]!.position_m / p.position_m - 1)).toBeLessThan(1e-6);
      expect(Math.abs(uniform.peaks[j]!.position_m_unc! / p.position_m_unc! - 1)).toBeLessThan(1e-6);
    });
  });

  it('the gradient coil current (1 %) against the gradient with the same relative uncertainty: within the 0.4 % the gradient varies (measured 0.13 %)', () => {
    const none = { T: '600', slit: '10', detector: '10' };
    const mapped = analyze(nearlyUniform(sourcesMagnet, none).replace('{gradCurrent}', '185.4(19)'));
    const b = mapped.result!.beams[0]!;
    const uniform = analyze(nearlyUniform(equivalentUniform(mapped, 1.9 / 185.4), none).replace('{gradCurrent}', '185.4')).result!.beams[0]!;
    b.peaks.forEach((p, j) => expect(Math.abs(uniform.peaks[j]!.position_m_unc! / p.position_m_unc! - 1)).toBeLessThan(3e-3));
  });
});

describe('coils and a magnetised block: every kind of source input', () => {
  /** The nearly uniform pair of coils above with a block below the beam line (invented numbers). */
  const template = coilPairBeam({
    bias: { radius: '{radius}', turns: '{turns}', current: '{current}', spacing: '{spacing}' },
    gradCurrent: '185.4',
    gradCentre: '{gradZ}',
    magnet: 'slab block\n  size          = 2, 2, {sizeZ} cm\n  magnetisation = {magnetisation} T along z\n  centre        = 0, 0, -3 cm\nmagnet m\n  sources = bias, grad, block\n  length  = 1 cm',
    T: '600',
    slit: '10',
    detector: '10',
  });
  const inputs: Record<string, { value: number; u: number; decimals: number }> = {
    radius: { value: 10, u: 0.02, decimals: 2 },
    turns: { value: 100, u: 1, decimals: 0 },
    current: { value: 300, u: 3, decimals: 0 },
    spacing: { value: 10, u: 0.03, decimals: 2 },
    gradZ: { value: 0, u: 0.2, decimals: 1 },
    sizeZ: { value: 1, u: 0.01, decimals: 2 },
    magnetisation: { value: 1.2, u: 0.01, decimals: 2 },
  };
  const text = (only: string[], moved?: { key: string; by: number }) =>
    template.replace(/\{(\w+)\}/g, (_, key: string) => {
      const i = inputs[key]!;
      if (moved?.key === key) return String(i.value + moved.by);
      return only.includes(key) ? written(i.value, i.u, i.decimals) : i.value.toFixed(i.decimals);
    });
  const peaks = (t: string) => analyze(t).result!.beams[0]!.peaks.map((p) => p.position_m);

  it('radius, spacing, a coil centre, a block size and magnetisation: the reported u against differences of the whole evaluation, within 1e-3', () => {
    const keys = ['radius', 'spacing', 'gradZ', 'sizeZ', 'magnetisation'];
    const r = analyze(text(keys)).result!;
    const ids = r.uncertainty_inputs!.map((i) => i.id);
    for (const id of ['source:bias.radius', 'source:bias.spacing', 'source:grad.centre.z', 'source:block.size.z', 'source:block.magnetisation']) expect(ids).toContain(id);
    const sumSq = r.beams[0]!.peaks.map(() => 0);
    for (const key of keys) {
      const h = inputs[key]!.u / 10;
      const up = peaks(text([], { key, by: h }));
      const down = peaks(text([], { key, by: -h }));
      up.forEach((x, j) => (sumSq[j]! += (((x - down[j]!) / (2 * h)) * inputs[key]!.u) ** 2));
    }
    r.beams[0]!.peaks.forEach((p, j) => expect(Math.abs(p.position_m_unc! / Math.sqrt(sumSq[j]!) - 1)).toBeLessThan(1e-3));
  });

  it('1 % on the turns moves the peaks as 1 % on the current does (both scale the ampere-turns)', () => {
    const byTurns = analyze(text(['turns'])).result!.beams[0]!.peaks;
    const byCurrent = analyze(text(['current'])).result!.beams[0]!.peaks;
    byTurns.forEach((p, j) => {
      expect(p.position_m_unc).toBeGreaterThan(0);
      expect(Math.abs(p.position_m_unc! / byCurrent[j]!.position_m_unc! - 1)).toBeLessThan(1e-6);
    });
  });

  it('a source without current whose current is uncertain: the current is set rather than scaled, and the peaks move as the whole evaluation does (within 1e-3)', () => {
    const idle = (current: string) =>
      text([]).replace('slab block', `coil idle\n  radius  = 5 cm\n  turns   = 10\n  current = ${current} A\n  centre  = 0, 0, 3 cm\nslab block`).replace('sources = bias, grad, block', 'sources = bias, grad, block, idle');
    const a = analyze(idle('0.0(5)'));
    expect(a.problems.filter((x) => x.code === 'uncertainty-undefined')).toEqual([]);
    const h = 0.05;
    const up = peaks(idle(String(h)));
    const down = peaks(idle(String(-h)));
    a.result!.beams[0]!.peaks.forEach((p, j) => {
      const fd = Math.abs(((up[j]! - down[j]!) / (2 * h)) * 0.5);
      expect(fd).toBeGreaterThan(0);
      expect(Math.abs(p.position_m_unc! / fd - 1)).toBeLessThan(1e-3);
    });
  });
});
