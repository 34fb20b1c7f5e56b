import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { PLANCK_H, BOHR_MAGNETON } from '../../../server/src/physics/constants';
import { hasFigures, STANDARD_GRAVITY, summariseTrap, type SublevelTrap, type TrapInput, type WordedTrapIssue } from '../../../server/src/physics/traps';
import { ioffe, quadrupole, RB87_GROUND, RB87_MASS } from './analyticFields';

// tests/reference/traps.json is written by scripts/reference/traps_reference.py (Breit–Rabi + SciPy).
const ref = JSON.parse(readFileSync(join(__dirname, '..', '..', 'reference', 'traps.json'), 'utf8'));

const DOWN: [number, number, number] = [0, 0, -STANDARD_GRAVITY];
const G_CM = 0.01;

function input(over: Partial<TrapInput>): TrapInput {
  return { field: quadrupole(0.3), level: RB87_GROUND, massKg: RB87_MASS, gravity: DOWN, region: { centre: [0, 0, 0], radiusM: 0.02 }, ...over };
}

function state(list: SublevelTrap[], twoF: number, twoM: number): SublevelTrap {
  const s = list.find((x) => x.low.scheme === 'F' && x.low.twoF === twoF && x.low.twoMF === twoM);
  if (!s) throw new Error(`no state ${twoF}/${twoM}`);
  return s;
}

function rel(a: number, b: number): number {
  return Math.abs(a - b) / Math.abs(b);
}

describe('standard gravity', () => {
  it('is g_n of scipy.constants (CGPM 1901 conventional value)', () => {
    expect(STANDARD_GRAVITY).toBe(ref.standard_gravity);
  });
});

describe('levitation gradient', () => {
  // A 1 T/m quadrupole holds all three at its zero, where the moment is the low-field one.
  const s = summariseTrap(input({ field: quadrupole(1) }));
  it('⁸⁷Rb |2,+2⟩: m g / (dE/dB) against Breit–Rabi (reference script), ≈ 15.3 G/cm (common practice ~15 G/cm)', () => {
    const lev = state(s.sublevels, 4, 4).levitationTPerM!;
    expect(rel(lev, ref.levitation_T_per_m['4/4'])).toBeLessThan(1e-6);
    expect(lev / G_CM).toBeCloseTo(15.3, 1);
    // m g / μ_B with CODATA μ_B and g_n: the stretched moment is μ_B (g_J/2 + 3 g_I/2) ≈ 0.9997 μ_B.
    expect(rel(lev, (RB87_MASS * STANDARD_GRAVITY) / BOHR_MAGNETON)).toBeLessThan(1e-3);
  });
  it('|2,+1⟩ and |1,−1⟩ need about twice as much (g_F m_F = 1/2)', () => {
    expect(rel(state(s.sublevels, 4, 2).levitationTPerM!, ref.levitation_T_per_m['4/2'])).toBeLessThan(1e-6);
    expect(rel(state(s.sublevels, 2, -2).levitationTPerM!, ref.levitation_T_per_m['2/-2'])).toBeLessThan(1e-6);
  });
});

describe('the exact moment grows with field', () => {
  it('a 30 G/cm quadrupole holds |2,+1⟩ low down, where its moment has grown to m g / b′ (the linear rule says it needs 30.5 G/cm)', () => {
    const s = summariseTrap(input({ field: quadrupole(0.3) }));
    const t = state(s.sublevels, 4, 2);
    expect(t.trapped).toBe(true);
    expect(t.levitationTPerM!).toBeCloseTo(0.3, 9);
    expect(t.minimum!.position[2]).toBeLessThan(-0.005);
  });
});

describe('a quadrupole against gravity (b′ = 21 G/cm along z, gravity −z)', () => {
  const s = summariseTrap(input({ field: quadrupole(21 * G_CM), temperatureK: 100e-6 }));
  it('holds |2,+2⟩ at the zero, linear, with no harmonic frequency', () => {
    const t = state(s.sublevels, 4, 4);
    expect(t.trapped).toBe(true);
    expect(t.shape?.kind).toBe('linear');
    expect(t.sagM!).toBeLessThan(1e-9);
    if (t.shape?.kind !== 'linear') throw new Error('linear');
    // Principal |B| gradients of B = b′(x/2, y/2, −z): b′, b′/2, b′/2.
    expect(rel(t.shape.gradientsTPerM[0], 0.21)).toBeLessThan(1e-9);
    expect(rel(t.shape.gradientsTPerM[1], 0.105)).toBeLessThan(1e-9);
  });
  it('cannot hold |2,+1⟩ or |1,−1⟩: needs ≥ 30.5 G/cm (has 21 G/cm)', () => {
    expect(state(s.sublevels, 4, 2).trapped).toBe(false);
    expect(state(s.sublevels, 2, -2).trapped).toBe(false);
    const found = s.issues.filter((i) => i.code === 'trap-gravity-too-strong');
    // The core gives only the figures; the evaluation words them in the trap's unit (eval/trapIssueText.ts).
    const plus1 = found.find((i) => i.sublevel === '|F=2, m_F=+1⟩')!;
    if (!hasFigures(plus1) || plus1.code !== 'trap-gravity-too-strong') throw new Error('gravity');
    expect(Number((plus1.needTPerM * 100).toPrecision(3))).toBe(30.5);
    expect(rel(plus1.hasTPerM, 0.21)).toBeLessThan(1e-9);
    expect('message' in plus1).toBe(false);
    expect(found.length).toBe(2);
  });
  it('says the zero field loses atoms (Majorana) and estimates the rate: a note when slower than 1/(60 s)', () => {
    const t = state(s.sublevels, 4, 4);
    // 21 G/cm at 100 µK: Γ ≈ 1.85 ħ/m (μ_B b′/k_B T)² ≈ 0.0027 /s.
    expect(t.majorana!.rateHz).toBeCloseTo(0.0027, 4);
    // The findings carry the sublevel and its figure, no text: the evaluation words them (eval/trapSublevelFindings.ts).
    expect(s.sublevelFindings.find((f) => f.code === 'trap-majorana-slow' && f.sublevel === '|F=2, m_F=+2⟩')).toEqual({ severity: 'info', code: 'trap-majorana-slow', sublevel: '|F=2, m_F=+2⟩', majoranaRateHz: t.majorana!.rateHz });
    const cold = summariseTrap(input({ field: quadrupole(1), temperatureK: 20e-6 }));
    // The same formula at 1 T/m and 20 µK: (100/21)² × (100/20)² × 0.0027 /s ≈ 1.5 /s, above the note's 1/(60 s).
    const coldFinding = cold.sublevelFindings.find((f) => f.code === 'trap-zero-field' && f.sublevel === '|F=2, m_F=+2⟩');
    expect(coldFinding?.majoranaRateHz).toBeCloseTo(1.5, 1);
    const unknown = summariseTrap(input({ field: quadrupole(1) }));
    const unrated = unknown.sublevelFindings.filter((f) => f.code === 'trap-zero-field');
    expect(unrated.length).toBeGreaterThan(0);
    expect(unrated.every((f) => f.majoranaRateHz === undefined)).toBe(true);
    expect(unknown.issues.filter((i) => i.code === 'trap-zero-field')).toEqual([]);
  });
  it('holds nothing of the high-field seekers', () => {
    expect(state(s.sublevels, 4, -4).trapped).toBe(false);
    expect(state(s.sublevels, 4, -4).lowFieldSeeking).toBe(false);
    expect(state(s.sublevels, 2, 2).lowFieldSeeking).toBe(false);
  });
});

describe('Majorana estimate', () => {
  it('Γ = 1.85 ħ/m (μ b′/k_B T)² for |2,+2⟩ at 1 T/m and 100 µK (reference script)', () => {
    const s = summariseTrap(input({ field: quadrupole(1), temperatureK: 1e-4, gravity: [0, 0, 0] }));
    const t = state(s.sublevels, 4, 4);
    expect(rel(t.majorana!.rateHz, ref.majorana.rate_per_s)).toBeLessThan(1e-6);
  });
});

describe('the turning point of E(B)', () => {
  it('⁸⁷Rb |1,−1⟩ turns high-field seeking at the field of the Breit–Rabi maximum (reference script)', () => {
    const s = summariseTrap(input({ field: quadrupole(10), gravity: [0, 0, 0], region: { centre: [0, 0, 0], radiusM: 0.05 } }));
    expect(rel(state(s.sublevels, 2, -2).turningFieldT!, ref.turning_field_T_1_m1)).toBeLessThan(1e-7);
    expect(state(s.sublevels, 4, 4).turningFieldT).toBeNull();
  });
  it('limits the depth of |1,−1⟩ in a deep quadrupole, while |2,+2⟩ and |2,+1⟩ leave at the edge', () => {
    const dq = ref.deep_quadrupole;
    const s = summariseTrap(input({ field: quadrupole(dq.gradient_T_per_m), gravity: [0, 0, 0], region: { centre: [0, 0, 0], radiusM: dq.radius_m } }));
    const low = state(s.sublevels, 2, -2);
    expect(low.depthLimit).toBe('turning');
    expect(rel(low.depthJ!, dq.depth_J_1_m1)).toBeLessThan(1e-6);
    const top = state(s.sublevels, 4, 4);
    expect(top.depthLimit).toBe('edge');
    expect(rel(top.depthJ!, dq.depth_J_2_2)).toBeLessThan(1e-6);
    expect(rel(state(s.sublevels, 4, 2).depthJ!, dq.depth_J_2_1)).toBeLessThan(1e-6);
    // The turning field as a figure, no text: the evaluation words it in the trap's field unit.
    const turning = s.issues.find((i) => i.code === 'trap-turning-point' && i.sublevel === '|F=1, m_F=-1⟩');
    expect(turning).toEqual({ severity: 'info', code: 'trap-turning-point', sublevel: '|F=1, m_F=-1⟩', turningFieldT: low.turningFieldT });
  });
});

describe('an Ioffe–Pritchard trap', () => {
  // B0 = 1 G, b′ = 1000 G/cm, b″ = 100 G/cm²; no gravity.
  const [b0, b1, b2] = [1e-4, 10, 100];
  const s = summariseTrap(input({ field: ioffe(b0, b1, b2), gravity: [0, 0, 0], region: { centre: [0, 0, 0], radiusM: 0.005 } }));
  it('frequencies ω_ρ = √(μ/m (b′²/B0 − b″/2)), ω_z = √(μ b″/m) (Pethick & Smith, ch. 4)', () => {
    const t = state(s.sublevels, 4, 4);
    expect(t.shape?.kind).toBe('harmonic');
    if (t.shape?.kind !== 'harmonic') throw new Error('harmonic');
    const mu = -t.momentJT;
    const wz = Math.sqrt((mu * b2) / RB87_MASS) / (2 * Math.PI);
    const wr = Math.sqrt((mu / RB87_MASS) * ((b1 * b1) / b0 - b2 / 2)) / (2 * Math.PI);
    expect(rel(t.shape.frequenciesHz[0], wz)).toBeLessThan(1e-5);
    expect(rel(t.shape.frequenciesHz[1], wr)).toBeLessThan(1e-5);
    expect(rel(t.shape.frequenciesHz[2], wr)).toBeLessThan(1e-5);
  });
  it('gravity along −x sags the |2,+2⟩ minimum by g/ω_ρ²', () => {
    const g = summariseTrap(input({ field: ioffe(b0, b1, b2), gravity: [-STANDARD_GRAVITY, 0, 0], region: { centre: [0, 0, 0], radiusM: 0.005 } }));
    const t = state(g.sublevels, 4, 4);
    const free = state(s.sublevels, 4, 4);
    if (free.shape?.kind !== 'harmonic') throw new Error('harmonic');
    const w = 2 * Math.PI * free.shape.frequenciesHz[1];
    expect(rel(t.sagM!, STANDARD_GRAVITY / (w * w))).toBeLessThan(2e-3);
    expect(t.minimum!.position[0]).toBeLessThan(0);
  });
  it('the Larmor frequency at 1 G is far above the trap frequencies: no bias warning', () => {
    expect(s.issues.filter((i) => i.code === 'trap-bias-too-small')).toEqual([]);
    expect(state(s.sublevels, 4, 4).larmorHz! / 1e6).toBeCloseTo(0.7, 1);
  });
  it('a bias of 0.1 mG is too small (Larmor frequency below 100 × the trap frequency)', () => {
    const w = summariseTrap(input({ field: ioffe(1e-8, 1, 1), gravity: [0, 0, 0], region: { centre: [0, 0, 0], radiusM: 0.005 } }));
    const bias = w.issues.find((i) => i.code === 'trap-bias-too-small' && i.sublevel === '|F=2, m_F=+2⟩');
    // The two frequencies as figures: the Larmor one below 100 × the highest trap frequency.
    if (!bias || !hasFigures(bias) || bias.code !== 'trap-bias-too-small') throw new Error('bias');
    expect(bias.larmorHz).toBe(state(w.sublevels, 4, 4).larmorHz);
    expect(bias.larmorHz).toBeLessThan(bias.margin * bias.topHz);
    expect(bias.margin).toBe(100);
  });
});

describe('minimum with gravity against SciPy (Ioffe–Pritchard, gravity −x; reference script)', () => {
  const m = ref.ioffe_gravity_minimum;
  const s = summariseTrap(input({ field: ioffe(m.B0_T, m.b1_T_per_m, m.b2_T_per_m2), gravity: m.gravity, region: { centre: [0, 0, 0], radiusM: 0.005 } }));
  for (const [key, twoF, twoM] of [['2/-2', 2, -2], ['4/2', 4, 2]] as const) {
    it(`|${twoF / 2}, ${twoM / 2}⟩ to 1 nm`, () => {
      const t = state(s.sublevels, twoF, twoM);
      const want = m.minima[key].position_m as number[];
      for (let k = 0; k < 3; k++) expect(Math.abs(t.minimum!.position[k] - want[k])).toBeLessThan(1e-9);
      expect(rel(t.minimum!.fieldT, m.minima[key].field_T)).toBeLessThan(1e-6);
    });
  }
});

describe('the RF knife', () => {
  const rf = ref.rf_cut;
  const s = summariseTrap(input({ field: ioffe(rf.B0_T, 10, 100), gravity: [0, 0, 0], region: { centre: [0, 0, 0], radiusM: 0.005 }, cutJ: rf.cut_J }));
  const t = state(s.sublevels, 4, 4);
  it('cuts |2,+2⟩ at the field where it rose by the cut, at the exact |2,+2⟩ → |2,+1⟩ splitting (Breit–Rabi, reference script)', () => {
    expect(rel(t.rfCut!.fieldT, rf.field_T)).toBeLessThan(1e-8);
    expect(rel(t.rfCut!.frequencyHz, rf.frequency_Hz)).toBeLessThan(1e-8);
  });
  it('agrees with the linear rule ν = g_F μ_B B/h at low field, within the quadratic Zeeman shift', () => {
    expect(rel(t.rfCut!.linearHz, t.rfCut!.frequencyHz)).toBeLessThan(2e-3);
    expect(rel(t.rfCut!.linearHz, t.rfCut!.frequencyHz)).toBeGreaterThan(1e-5);
    // Zero bias: the linear rule gives ν = cut/(m_F h) (common practice for a quadrupole knife).
    const q = summariseTrap(input({ field: quadrupole(1), gravity: [0, 0, 0], cutJ: rf.cut_J }));
    expect(rel(state(q.sublevels, 4, 4).rfCut!.linearHz, rf.cut_J / PLANCK_H / 2)).toBeLessThan(1e-3);
  });
  it('a cut above the depth is flagged: a note per sublevel, a warning when it cuts no sublevel', () => {
    const q = summariseTrap(input({ field: quadrupole(1), gravity: [0, 0, 0], cutJ: 1e-20 }));
    const outside = q.sublevelFindings.filter((f) => f.code === 'trap-cut-outside');
    expect(outside).toHaveLength(3);
    expect(outside.every((f) => f.depthJ !== undefined && f.depthJ < 1e-20)).toBe(true);
    expect(q.issues.filter((i) => i.code === 'trap-cut-above-depth')).toHaveLength(1);
    // 1 T/m, 2 cm: |2,+2⟩ is about 6.7 mK deep (μ_B b′R/2 / k_B), |2,+1⟩ about half: a 5 mK cut reaches only |2,+2⟩.
    const one = summariseTrap(input({ field: quadrupole(1), gravity: [0, 0, 0], cutJ: 1.380649e-23 * 5e-3 }));
    expect(one.sublevelFindings.filter((f) => f.code === 'trap-cut-outside').map((f) => f.sublevel).sort()).toEqual(['|F=1, m_F=-1⟩', '|F=2, m_F=+1⟩']);
    expect(one.issues.filter((i) => i.code === 'trap-cut-above-depth')).toEqual([]);
  });
});

describe('bad input', () => {
  it('a trap that holds nothing says so', () => {
    const s = summariseTrap(input({ field: quadrupole(0.01) }));
    expect(s.sublevels.some((x) => x.trapped)).toBe(false);
    expect(s.issues.map((i) => i.code)).toContain('trap-holds-nothing');
  });
  it('a region of zero size, a mass of 0, a temperature of 0 are errors, never NaN', () => {
    expect(summariseTrap(input({ region: { centre: [0, 0, 0], radiusM: 0 } })).issues[0]!.code).toBe('trap-region-invalid');
    expect(summariseTrap(input({ massKg: 0 })).issues[0]!.code).toBe('trap-mass-invalid');
    expect(summariseTrap(input({ temperatureK: 0 })).issues[0]!.code).toBe('trap-temperature-invalid');
  });
  it('a wire through the centre: an error that names the wire, never NaN (the sum says what it left out)', async () => {
    const { sumField } = await import('../../../server/src/physics/fields');
    const wire = { kind: 'wire', point: [0, 0, 0], direction: [1, 0, 0], currentA: 5 } as const;
    const loop = (z: number, at: number) => ({ kind: 'loop', centre: [0, 0, z], axis: [0, 0, 1], radiusM: 0.04, ampereTurns: at }) as const;
    const s = summariseTrap(input({ field: sumField([loop(0.04, 2000), loop(-0.04, -2000), wire]) }));
    expect(s.issues.map((i) => i.code)).toEqual(['trap-on-conductor']);
    expect((s.issues[0] as WordedTrapIssue).message).toMatch(/^The trap's centre lies on a wire of its sources, where the field has no value/);
    expect(s.sublevels).toEqual([]);
    expect(JSON.stringify(s)).not.toMatch(/NaN|Infinity|null/);
    // A default region about a centre on the wire has radius 0: the wire is still what is reported.
    const zero = summariseTrap(input({ field: sumField([wire]), region: { centre: [0, 0, 0], radiusM: 0 } }));
    expect(zero.issues.map((i) => i.code)).toEqual(['trap-on-conductor']);
  });
  it('a loop’s wire on the region’s surface, where the survey samples: the region meets it', async () => {
    const { sumField } = await import('../../../server/src/physics/fields');
    const { sphereDirections } = await import('../../../server/src/physics/traps/vec3');
    const { SURFACE_SAMPLES } = await import('../../../server/src/physics/traps/fieldSurvey');
    // A loop about z whose wire passes through the first surface sample of a 2 cm region.
    const d = sphereDirections(SURFACE_SAMPLES)[0]!;
    const p = [0.02 * d[0], 0.02 * d[1], 0.02 * d[2]];
    const loop = { kind: 'loop', centre: [0, 0, p[2]!], axis: [0, 0, 1], radiusM: Math.hypot(p[0]!, p[1]!), ampereTurns: 100 } as const;
    const s = summariseTrap(input({ field: sumField([loop]) }));
    expect(s.issues.map((i) => i.code)).toEqual(['trap-on-conductor']);
    expect((s.issues[0] as WordedTrapIssue).message).toMatch(/^The trap region meets the wire of a loop of its sources/);
    expect(JSON.stringify(s)).not.toMatch(/NaN|Infinity|null/);
  });
});

describe('the default region (90 % of the way to the nearest conductor)', () => {
  it('is measured to a loop winding, a finite solenoid, a wire segment and a block (geometry by hand)', async () => {
    const { defaultRegionRadius, distanceToSource } = await import('../../../server/src/physics/traps/defaultRegion');
    // A loop of radius 3 cm at z = ±2 cm: from the origin √(3² + 2²) cm.
    const loop = { kind: 'loop', centre: [0, 0, 0.02], axis: [0, 0, 1], radiusM: 0.03, ampereTurns: 1 } as const;
    expect(distanceToSource([0, 0, 0], loop)).toBeCloseTo(Math.hypot(0.03, 0.02), 12);
    // Inside a solenoid (radius 2 cm, length 10 cm) on its axis: 2 cm; beyond its end by 3 cm: √(2² + 3²).
    const sol = { kind: 'solenoid', centre: [0, 0, 0], axis: [0, 0, 1], radiusM: 0.02, lengthM: 0.1, ampereTurns: 1 } as const;
    expect(distanceToSource([0, 0, 0.01], sol)).toBeCloseTo(0.02, 12);
    expect(distanceToSource([0, 0, 0.08], sol)).toBeCloseTo(Math.hypot(0.02, 0.03), 12);
    // A wire along x through (0, 2 mm, 0), 1 cm long: 2 mm from the origin; from (2 cm, 0, 0) to its end.
    const wire = { kind: 'wire', point: [0, 0.002, 0], direction: [1, 0, 0], currentA: 1, lengthM: 0.01 } as const;
    expect(distanceToSource([0, 0, 0], wire)).toBeCloseTo(0.002, 12);
    expect(distanceToSource([0.02, 0, 0], wire)).toBeCloseTo(Math.hypot(0.015, 0.002), 12);
    const slab = { kind: 'slab', centre: [0, 0, 0.01], sizeM: [0.01, 0.01, 0.004], magnetisationT: [0, 0, 1] } as const;
    expect(distanceToSource([0, 0, 0], slab)).toBeCloseTo(0.008, 12);
    expect(defaultRegionRadius([0, 0, 0], [loop, wire])).toBeCloseTo(0.9 * 0.002, 12);
    expect(defaultRegionRadius([0, 0, 0], [])).toBeUndefined();
    const { regionIssues } = await import('../../../server/src/physics/traps/defaultRegion');
    expect(regionIssues([0, 0, 0], 0.0019, [wire])).toEqual([]);
    // The radius and the distance as figures (the evaluation words them in the region's written unit).
    expect(regionIssues([0, 0, 0], 0.002, [wire])).toEqual([{ severity: 'warning', code: 'trap-region-reaches-source', radiusM: 0.002, nearestM: 0.002 }]);
  });
});

describe('a trap from real coils (field sources, elliptic integrals)', () => {
  it('an anti-Helmholtz pair: the linear gradients are the closed-form axial gradient and half of it', async () => {
    const { sumField } = await import('../../../server/src/physics/fields');
    // Loops of radius R at ±a, N I = ±2000 A: dB_z/dz = 3 μ0 N I a R²/(R² + a²)^{5/2} (the on-axis loop
    // field differentiated; Griffiths, Introduction to Electrodynamics, ch. 5). μ0 from CODATA 2022.
    const [R, a, NI, mu0] = [0.04, 0.04, 2000, 1.25663706127e-6];
    const loop = (z: number, at: number) => ({ kind: 'loop', centre: [0, 0, z], axis: [0, 0, 1], radiusM: R, ampereTurns: at }) as const;
    const field = sumField([loop(a, NI), loop(-a, -NI)]);
    const s = summariseTrap(input({ field, region: { centre: [0, 0, 0], radiusM: 0.03 }, temperatureK: 3e-4 }));
    const t = state(s.sublevels, 4, 4);
    if (t.shape?.kind !== 'linear') throw new Error('linear');
    const b1 = (3 * mu0 * NI * a * R * R) / (R * R + a * a) ** 2.5;
    expect(rel(t.shape.gradientsTPerM[0], b1)).toBeLessThan(1e-9);
    expect(rel(t.shape.gradientsTPerM[1], b1 / 2)).toBeLessThan(1e-9);
    expect(s.sublevels.filter((x) => x.trapped)).toHaveLength(3);
  });
});
