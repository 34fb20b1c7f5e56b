/** The `slower` block in the model: sources, start and axis; bad names and directions at their place. */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';

const BASE = `species Na23
  level ground: 3s 2S1/2
  level p32:    3p 2P°3/2

line D2: ground -> p32

solenoid tube
  radius = 3 cm
  length = 20 cm
  turns = 200
  current = 10 A
  centre = 0.1, 0, 0 m
  axis = x

slower s
  line = D2
  capture = 300 m/s
  final = 20 m/s
`;

function covered(text: string, code: string): string {
  const a = analyze(text);
  const p = a.problems.find((x) => x.code === code);
  if (!p) throw new Error(`no ${code} among ${a.problems.map((x) => x.code).join(', ')}`);
  return text.split('\n')[p.range.start.line]!.slice(p.range.start.character, p.range.end.character);
}

describe('slower sources, start and axis', () => {
  it('reads them into the model', () => {
    const m = analyze(`${BASE}  sources = tube\n  start = 0, 0, 0 cm\n  axis = x\n`).model!;
    const s = m.slowers[0]!;
    expect(s.sources!.map((x) => x.name)).toEqual(['tube']);
    expect(s.start!.value).toEqual([0, 0, 0]);
    expect(s.axis!.value).toEqual([1, 0, 0]);
  });

  it('checks the coils along the axis it is given: along x the solenoid is seen, along z only its edge', () => {
    const along = analyze(`${BASE}  sources = tube\n  axis = x\n`).result!.slowers![0]!;
    const across = analyze(`${BASE}  sources = tube\n  start = 0.1, 0, -0.2 m\n`).result!.slowers![0]!;
    // μ0 N I / L · (cos terms) ≈ 1.26e-6 · 2000 / 0.2 · 0.96 ≈ 120 G in the middle of the tube.
    const mid = along.samples!.reduce((a, b) => (Math.abs(b.z_m - 0.1) < Math.abs(a.z_m - 0.1) ? b : a));
    expect(mid.B_coils_T! * 1e4).toBeGreaterThan(110);
    expect(mid.B_coils_T! * 1e4).toBeLessThan(126);
    expect(Math.max(...across.samples!.map((x) => Math.abs(x.B_coils_T!)))).toBeLessThan(1e-4);
  });

  it('an unknown source name, a bad direction and a malformed start are reported at their text', () => {
    expect(covered(`${BASE}  sources = tub\n`, 'name-unknown')).toBe('tub');
    expect(covered(`${BASE}  axis = up\n`, 'direction-unknown')).toBe('up');
    expect(covered(`${BASE}  start = 0, 0 cm\n`, 'vector-malformed')).toMatch(/0, 0 cm/);
  });
});
