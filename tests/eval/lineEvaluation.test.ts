import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { BOHR_MAGNETON_HZ_PER_T } from '../../server/src/physics/constants';
import { cli } from '../cli/runCli';

const sodiumLike = `settings
  g_s = 2
species NaX          # nuclear spin 0, so the textbook anomalous Zeeman pattern
  mass = 23 u
  level g: 3s 2S1/2
  level p1: 3p 2P°1/2
  level p3: 3p 2P°3/2
field f = 0.1 T
line D1: g -> p1
line D2: g -> p3
`;

/** Distinct offsets of one polarisation in units of μ_B B/h, rounded to 1e-9. */
function offsets(line: string, pol: string): number[] {
  const r = analyze(sodiumLike).result!;
  const comps = r.lines.find((l) => l.name === line)!.at_fields[0]!.components.filter((c) => c.polarization === pol);
  return [...new Set(comps.map((c) => Math.round((c.offset_Hz / (BOHR_MAGNETON_HZ_PER_T * 0.1)) * 1e9) / 1e9))].sort((a, b) => a - b);
}

describe('line components through the setup file', () => {
  it('sodium-like D1 and D2: the textbook anomalous Zeeman pattern (standard textbook, in units of μ_B B/h)', () => {
    expect(offsets('D1', 'pi')).toEqual([-2 / 3, 2 / 3].map((x) => Math.round(x * 1e9) / 1e9));
    expect([...offsets('D1', 'sigma+'), ...offsets('D1', 'sigma-')].sort()).toEqual([-4 / 3, 4 / 3].map((x) => Math.round(x * 1e9) / 1e9).sort());
    expect(offsets('D2', 'pi')).toEqual([-1 / 3, 1 / 3].map((x) => Math.round(x * 1e9) / 1e9));
    expect(offsets('D2', 'sigma+')).toEqual([1, 5 / 3].map((x) => Math.round(x * 1e9) / 1e9));
    expect(offsets('D2', 'sigma-')).toEqual([-5 / 3, -1].map((x) => Math.round(x * 1e9) / 1e9));
  });

  it('effective Landé factors: D1 4/3, D2 7/6 with g_s = 2 (textbook)', () => {
    const r = analyze(sodiumLike).result!;
    expect(r.lines.find((l) => l.name === 'D1')!.g_eff).toBeCloseTo(4 / 3, 12);
    expect(r.lines.find((l) => l.name === 'D2')!.g_eff).toBeCloseTo(7 / 6, 12);
  });

  it('87Rb D2 line centre from the built-in level energies: 384.230 484 468 5 THz (alkali D-line data compilation)', () => {
    const r = analyze('species Rb87\n  level g: 5s 2S1/2\n  level p: 5p 2P°3/2\nline D2: g -> p\n').result!;
    expect(r.lines[0]!.line_centre_Hz! / 1e12).toBeCloseTo(384.2304844685, 9);
    // zero field when the file has no field: hyperfine-resolved components only
    expect(r.lines[0]!.at_fields[0]!.field_T).toBe(0);
  });

  it('reports selection-rule violations at the line', () => {
    const codes = analyze('species X\n  mass = 40 u\n  level a: 4s 2S1/2\n  level b: 5s 2S1/2\n  level c: 4P°5/2\nline L1: a -> b\nline L2: a -> c\n').problems.map((p) => `${p.range.start.line}:${p.code}`);
    expect(codes).toContain('5:line-parity-unchanged');
    expect(codes).toContain('6:line-delta-j');
    expect(codes).toContain('6:line-intercombination');
  });

  it('sublevel render --view lines gives SVG with one stick per component; --format csv the numbers', () => {
    const svg = cli('render', 'examples/rubidium-bias.sublevel', '--view', 'lines').out;
    expect(svg).toMatch(/^<svg/);
    const csv = cli('render', 'examples/rubidium-bias.sublevel', '--view', 'lines', '--format', 'csv').out.trim().split('\n');
    expect(csv[0]).toBe('# sublevel lines: file=examples/rubidium-bias.sublevel; line=D2; field=field trap 0.000323 T');
    expect(csv[1]).toBe('offset_Hz,strength,polarization,transition');
    expect(csv).toHaveLength(2 + 68);
    const offsets = csv.slice(2).map((r) => Number(r.split(',')[0]));
    expect(offsets).toEqual([...offsets].sort((a, b) => a - b));
    // --field picks the field the components are computed at: the two CSVs differ and say so.
    const probe = cli('render', 'examples/rubidium-bias.sublevel', '--view', 'lines', '--field', 'probe', '--format', 'csv').out.split('\n');
    expect(probe[0]).toBe('# sublevel lines: file=examples/rubidium-bias.sublevel; line=D2; field=field probe 0.012 T');
    expect(probe.slice(2)).not.toEqual(csv.slice(2));
    const svgProbe = cli('render', 'examples/rubidium-bias.sublevel', '--view', 'lines', '--field', 'probe').out;
    expect(svgProbe).not.toBe(svg);
    expect(svgProbe).toContain('at field probe, 120 G');
  });
});
