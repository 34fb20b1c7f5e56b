import { describe, expect, it } from 'vitest';
import { COPPER_RESISTIVITY_20C, copperResistivity, loopWireLength, windingPower } from '../../server/src/physics/fields/coilPower';
import { sourceCautions } from '../../server/src/eval/fieldSourceCautions';
import { magnitudeGradient } from '../../server/src/physics/fields';

describe('copper windings', () => {
  it('uses the annealed-copper resistivity 1/58 Ω·mm²/m = 1.7241e-8 Ω·m (IEC 60028, from memory)', () => {
    expect(COPPER_RESISTIVITY_20C).toBeCloseTo(1.7241e-8, 12);
  });

  it('warms by 0.393 %/K: at 80 °C ρ = 1.7241e-8 × 1.2358 (hand-computed)', () => {
    expect(copperResistivity(80)).toBeCloseTo(2.13069e-8, 12);
  });

  // Published wire tables (from memory): AWG 18 (1.0237 mm) 20.95 Ω/km, AWG 10 (2.588 mm) 3.277 Ω/km at 20 °C.
  it.each([
    [1.0237e-3, 20.95],
    [2.588e-3, 3.277],
  ])('a kilometre of %s m wire has the tabulated resistance (%s Ω)', (d, ohmPerKm) => {
    const w = windingPower({ wireLengthM: 1000, diameterM: d, currentA: 1 })!;
    expect(w.resistanceOhm).toBeCloseTo(ohmPerKm, 2);
  });

  it('a 120-turn coil of 3.5 cm radius, 1.2 mm wire, 15 A (hand-computed: L = 26.389 m, R = 0.4023 Ω, 90.52 W, 6.034 V, 13.26 A/mm²)', () => {
    const length = loopWireLength(120, 0.035);
    expect(length).toBeCloseTo(26.389378, 5);
    const w = windingPower({ wireLengthM: length, diameterM: 1.2e-3, currentA: -15 })!;
    expect(w.resistanceOhm).toBeCloseTo(0.4022989, 6);
    expect(w.powerW).toBeCloseTo(90.517241, 4);
    expect(w.voltageV).toBeCloseTo(6.0344828, 6);
    expect(w.currentDensityAPerM2 / 1e6).toBeCloseTo(13.262912, 5);
    expect(w.cooling).toBe('water');
  });

  it('gives no numbers for a wire of no size or no length (the model reports those)', () => {
    expect(windingPower({ wireLengthM: 1, diameterM: 0, currentA: 1 })).toBeUndefined();
    expect(windingPower({ wireLengthM: 0, diameterM: 1e-3, currentA: 1 })).toBeUndefined();
    expect(windingPower({ wireLengthM: Infinity, diameterM: 1e-3, currentA: 1 })).toBeUndefined();
  });
});

describe('cautions of field sources', () => {
  const winding = (j: number) => windingPower({ wireLengthM: 10, diameterM: 1e-3, currentA: (j * Math.PI * 1e-6) / 4 })!;
  it.each([
    [2e6, 'air', /check the temperature under load/],
    [10e6, 'water', /plan water cooling/],
    [40e6, 'beyond', /pulsed only/],
  ])('a winding at %s A/m² is %s-cooled and says so', (j, cooling, words) => {
    const w = winding(j);
    expect(w.cooling).toBe(cooling);
    const c = sourceCautions({ kind: 'coil', winding: { ...w, conductorM: 1e-3 } });
    expect(c).toHaveLength(1);
    expect(c[0]).toMatch(/^Coil heating \(/);
    expect(c[0]).toContain(`${Number((j / 1e6).toPrecision(4))} A/mm²`);
    expect(c[0]).toMatch(words);
    expect(c[0]).toContain('safety officer');
  });
  it('a magnetised block pinches and erases; a weak coil without conductor has no caution', () => {
    expect(sourceCautions({ kind: 'slab', magnetisationT: 1.2 })[0]).toMatch(/^Permanent magnet \(μ0·M = 1.2 T\): .*pinch/);
    expect(sourceCautions({ kind: 'coil', fieldT: 1e-4 })).toEqual([]);
    expect(sourceCautions({ kind: 'solenoid', fieldT: 8.4e-4 })[0]).toBe("Field above the 5 G implant limit (8.4 G at the centre): keep pacemakers and other implants away while it is on; follow your lab's rules and ask its safety officer.");
    expect(sourceCautions({ kind: 'solenoid', fieldT: 0.2 })[0]).toContain('(200 mT at the centre): keep pacemakers and other implants, steel tools, watches and cards away');
  });
});

describe('|B| and its gradient', () => {
  // An Ioffe-type field near its axis: B = (G x, −G y, B0); |B| = √(B0² + G² r²), ∂|B|/∂x = G² x / |B| (analytic).
  const G = 2.5;
  const B0 = 1e-4;
  const sample = (x: number, y: number) => ({
    B: [G * x, -G * y, B0] as const,
    gradient: [[G, 0, 0], [0, -G, 0], [0, 0, 0]] as const,
  });
  it('matches the analytic gradient of |B| of an Ioffe-type field', () => {
    const s = sample(1e-3, -2e-3);
    const b = Math.sqrt(B0 * B0 + G * G * 5e-6);
    const g = magnitudeGradient(s)!;
    expect(g[0]).toBeCloseTo((G * G * 1e-3) / b, 10);
    expect(g[1]).toBeCloseTo((G * G * -2e-3) / b, 10);
    expect(g[2]).toBe(0);
  });
  it('has no gradient of |B| at a field zero or on a conductor', () => {
    expect(magnitudeGradient({ B: [0, 0, 0], gradient: [[1, 0, 0], [0, 1, 0], [0, 0, -2]] })).toBeUndefined();
    expect(magnitudeGradient({ B: [NaN, 0, 0], gradient: [[1, 0, 0], [0, 1, 0], [0, 0, -2]] })).toBeUndefined();
  });
});
