/**
 * `sublevel field` on examples/coils-and-wires.sublevel: values against direct Biot–Savart
 * quadrature (tests/reference/field_command.json, from scripts/reference/field_command.py with
 * SciPy), the three output formats, and the usage errors.
 */
import { readFileSync } from 'fs';
import { describe, expect, it } from 'vitest';
import { cli } from './runCli';
import { onConductorNote } from '../../server/src/cli/fieldCommand';

const FILE = 'examples/coils-and-wires.sublevel';
const reference = JSON.parse(readFileSync('tests/reference/field_command.json', 'utf8')) as {
  cases: { sources: string[]; point_m: number[]; B_T: number[]; gradient_T_per_m: number[][] }[];
};

function json(...args: string[]) {
  const r = cli('field', FILE, ...args, '--format', 'json');
  expect(r.err).toBe('');
  expect(r.code).toBe(0);
  return JSON.parse(r.out);
}

describe('sublevel field: values', () => {
  it.each(reference.cases.map((c) => [c.sources.join('+'), c.point_m.join(','), c] as const))('%s at (%s) m agrees with Biot–Savart quadrature to 1e-9', (_s, _p, c) => {
    const doc = json('--source', c.sources.join(','), '--at', `${c.point_m.join(',')} m`);
    const p = doc.points[0];
    const bScale = Math.hypot(...c.B_T);
    const gScale = Math.max(...c.gradient_T_per_m.flat().map(Math.abs));
    p.B_T.forEach((b: number, i: number) => expect(Math.abs(b - c.B_T[i]!)).toBeLessThanOrEqual(1e-9 * bScale));
    p.gradient_T_per_m.flat().forEach((g: number, k: number) => expect(Math.abs(g - c.gradient_T_per_m.flat()[k]!)).toBeLessThanOrEqual(1e-9 * gScale));
    expect(p.B_abs_T).toBeCloseTo(bScale, 15);
  });

  it('cleans exact cancellations: the quadrupole centre is 0, not 1e-20', () => {
    const p = json('--source', 'quad', '--at', '0,0,0').points[0];
    expect(p.B_T).toEqual([0, 0, 0]);
    expect(p.B_abs_T).toBe(0);
    // |B| has a cone at a field zero: no gradient of |B| there.
    expect(p.B_abs_gradient_T_per_m).toBeNull();
  });

  it('has no value on a wire and says so in every format', () => {
    // The rail's wire runs along x through y = 2 mm: the bare sum would leave it out there, which would mislead.
    const j = cli('field', FILE, '--source', 'rail', '--at', '1cm,2mm,0', '--format', 'json');
    expect(j.code).toBe(0);
    const p = JSON.parse(j.out).points[0];
    expect(p).toMatchObject({ B_T: null, B_abs_T: null, gradient_T_per_m: null, B_abs_gradient_T_per_m: null });
    expect(p.note).toMatch(/^The point lies on a wire/);
    expect(cli('field', FILE, '--source', 'rail', '--at', '1cm,2mm,0').out).toMatch(/\n {2}no value: the point lies on a wire/);
    const r = cli('field', FILE, '--source', 'rail', '--at', '1cm,2mm,0', '--format', 'csv');
    expect(r.out.split('\n')[2]).toBe('0.01,0.002,0' + ','.repeat(16));
    expect(r.err.trim()).toBe('note: 1 point lies on a wire and has no field value.');
  });

  it('has no value on the wire of a loop, alone or in a pair (the sum says which part it left out)', () => {
    // bias: one loop of radius 6 cm at z = 9 cm; quad: two loops of radius 3.5 cm at z = ±3.5 cm.
    expect(cli('field', FILE, '--source', 'bias', '--at', '0,6,9 cm').out).toMatch(/\n {2}no value: the point lies on the wire of a loop, where a thin loop has no field; that loop is left out there\.$/);
    const p = JSON.parse(cli('field', FILE, '--source', 'quad', '--at', '-3.5,0,3.5 cm', '--format', 'json').out).points[0];
    expect(p).toMatchObject({ B_T: null, note: 'The point lies on the wire of a loop, where a thin loop has no field; that loop is left out there.' });
    // A grid through the pair's wires: those cells are empty, the others have values.
    const grid = cli('field', FILE, '--source', 'quad', '--grid', 'x=-3.5:3.5cm,z=-3.5:3.5cm', '--points', '3', '--format', 'json');
    const values = JSON.parse(grid.out).points.map((q: { B_T: number[] | null }) => q.B_T !== null);
    expect(values).toEqual([false, true, false, true, true, true, false, true, false]);
    expect(grid.err.trim()).toBe('note: 4 points lie on the wire of a loop and have no field value.');
  });
});

describe('sublevel field: the note on points without a value', () => {
  it('is one plain sentence, naming the conductor once (or the first of several kinds)', () => {
    expect(onConductorNote(['a wire', 'a wire'])).toBe('note: 2 points lie on a wire and have no field value.');
    expect(onConductorNote(['the wire of a loop', 'a wire'])).toBe('note: 2 points lie on conductors and have no field value, the first on the wire of a loop.');
  });
});

describe('sublevel field: formats', () => {
  it('prints one point with B, |B|, the gradient tensor and ∇|B| in the unit asked for', () => {
    const r = cli('field', FILE, '--source', 'quad', '--at', '0,0,1cm', '--unit', 'G');
    expect(r.code).toBe(0);
    const lines = r.out.split('\n');
    // The point echoes in the unit written on the command line.
    expect(lines[0]).toBe('field of quad at (0, 0, 1) cm:');
    expect(cli('field', FILE, '--source', 'quad', '--at', '0,0,10mm').out.split('\n')[0]).toBe('field of quad at (0, 0, 10) mm:');
    // The model reverses the loop on the +z side of an opposed pair: B_z < 0 above the centre.
    expect(lines[1]).toMatch(/^ {2}B {3}= \(0, 0, -99\.33\d*\) G$/);
    expect(lines[2]).toMatch(/^ {2}\|B\| = 99\.33\d* G$/);
    expect(lines[3]).toBe('  gradient ∂B_i/∂x_j (G/cm):');
    expect(r.out).toMatch(/B_z +0 +0 +-101\.64\d*/);
    expect(r.out).toMatch(/∇\|B\| = \(0, 0, 101\.64\d*\) G\/cm/);
  });

  it('prints a magnetometer’s units: uT (or µT) and nT, gradients per metre', () => {
    // The same point as above in T, µT and nT: the numbers scale by 1e6 and 1e9 (SI prefixes).
    const inT = cli('field', FILE, '--source', 'quad', '--at', '0,0,1cm', '--unit', 'T').out.split('\n');
    const bzT = Number(/\(0, 0, (-[\d.e-]+)\) T$/.exec(inT[1]!)![1]);
    for (const [choice, shown, factor] of [['uT', 'µT', 1e6], ['µT', 'µT', 1e6], ['nT', 'nT', 1e9]] as const) {
      const r = cli('field', FILE, '--source', 'quad', '--at', '0,0,1cm', '--unit', choice);
      expect(r.code).toBe(0);
      const lines = r.out.split('\n');
      const bz = Number(new RegExp(`\\(0, 0, (-[\\d.e+-]+)\\) ${shown}$`).exec(lines[1]!)![1]);
      expect(bz / (bzT * factor)).toBeCloseTo(1, 5);
      expect(lines[3]).toBe(`  gradient ∂B_i/∂x_j (${shown}/m):`);
    }
    expect(cli('field', FILE, '--source', 'quad', '--at', '0,0,1cm', '--unit', 'kG').code).toBe(2);
  });

  it('tabulates a line in text, and writes CSV with SI column names', () => {
    const text = cli('field', FILE, '--source', 'quad', '--along', '0,0,-1cm:0,0,1cm', '--points', '3').out.split('\n');
    expect(text[0]).toBe('field of quad along (0, 0, -1) cm → (0, 0, 1) cm, 3 points:');
    expect(text[1]).toMatch(/^x \(cm\) +y \(cm\) +z \(cm\) /);
    // Every field and gradient column names its unit, as the position columns do.
    expect(text[1]!.split(/ {2,}/).slice(3)).toEqual(['B_x (G)', 'B_y (G)', 'B_z (G)', '|B| (G)', '∂|B|/∂x (G/cm)', '∂|B|/∂y (G/cm)', '∂|B|/∂z (G/cm)']);
    // Units that differ between the ends: one unit by size for the whole table.
    expect(cli('field', FILE, '--source', 'quad', '--along', '0,0,-1cm:0,0,10mm', '--points', '3').out.split('\n')[0]).toBe('field of quad along (0, 0, -1) cm → (0, 0, 1) cm, 3 points:');
    expect(text).toHaveLength(1 + 2 + 3);
    const csv = cli('field', FILE, '--along', '0,0,-1cm:0,0,1cm', '--points', '3', '--format', 'csv').out.split('\n');
    expect(csv[0]).toBe(`# sublevel field: file=${FILE}; sources=quad + bias + rail + pole`);
    expect(csv[1]).toBe(
      'x_m,y_m,z_m,Bx_T,By_T,Bz_T,B_abs_T,dBx_dx_T_per_m,dBx_dy_T_per_m,dBx_dz_T_per_m,dBy_dx_T_per_m,dBy_dy_T_per_m,dBy_dz_T_per_m,dBz_dx_T_per_m,dBz_dy_T_per_m,dBz_dz_T_per_m,dB_abs_dx_T_per_m,dB_abs_dy_T_per_m,dB_abs_dz_T_per_m',
    );
    expect(csv).toHaveLength(5);
    expect(csv[4]!.split(',').slice(0, 3)).toEqual(['0', '0', '0.01']);
  });

  it('samples a grid, first axis fastest', () => {
    const doc = json('--source', 'rail', '--grid', 'y=-1:1mm,z=-1:1mm', '--points', '3x2');
    expect(doc.sampling).toEqual({ kind: 'grid', axes: ['y', 'z'], points: [3, 2] });
    expect(doc.points.map((p: { position_m: number[] }) => p.position_m)).toEqual([
      [0, -0.001, -0.001], [0, 0, -0.001], [0, 0.001, -0.001],
      [0, -0.001, 0.001], [0, 0, 0.001], [0, 0.001, 0.001],
    ]);
  });
});

describe('sublevel field: mistakes', () => {
  it.each([
    [['--at', '0,0,1'], /'1' needs a length unit/],
    [['--source', 'qaud', '--at', '0,0,0'], /no source named 'qaud' — did you mean 'quad'\?/],
    [['--along', '0,0,0:0,0,1cm', '--grid', 'x=0:1cm,y=0:1cm'], /one of --along or --grid/],
    [['--at', '0,0,0', '--unit', 'G', '--format', 'csv'], /--unit sets the unit of the text output; --format csv is always in SI units/],
    [[], /say where/],
  ])('%j is a usage error (exit 2)', (args, message) => {
    const r = cli('field', FILE, ...args);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(message);
  });

  it('a file without sources: exit 1 with words', () => {
    const r = cli('field', 'examples/rubidium-bias.sublevel', '--at', '0,0,0');
    expect(r.code).toBe(1);
    expect(r.err).toContain('the file has no field source');
  });

  it('is listed in the help', () => {
    expect(cli('--help').out).toMatch(/\n {2}field +the summed field/);
    expect(cli('field', '--help').out).toContain('--grid RANGES');
  });
});

describe('sublevel field: large grids', () => {
  it('prints a 150 × 150 grid as text (the unit choice looks at every value without overflowing the stack)', async () => {
    const { fieldText } = await import('../../server/src/cli/fieldCommand');
    const { fieldPointPlan } = await import('../../server/src/cli/fieldPoints');
    const plan = fieldPointPlan({ grid: 'x=-1:1cm,y=-1:1cm', points: '150x150' });
    const rows = plan.points.map((point) => ({ point, sample: { B: [1e-3, 0, 0] as const, gradient: [[0.1, 0, 0], [0, -0.1, 0], [0, 0, 0]] as const } }));
    const lines = fieldText(['g'], plan, rows, undefined);
    expect(lines).toHaveLength(1 + 2 + 150 * 150);
    expect(lines[0]).toBe('field of g on a 150 × 150 grid:');
    expect(lines[2]!.startsWith('------')).toBe(true);
  });
});
