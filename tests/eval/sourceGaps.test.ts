/**
 * Nothing silent in the sources' uncertainties (eval/uncertainty/sourceInputs.ts, sourceGaps.ts):
 * a current of 0 is set rather than scaled (so its uncertainty reaches the magnet's field, checked
 * against the on-axis field of a loop, B = μ0 N I R²/(2 (R² + z²)^(3/2)), textbook Biot–Savart),
 * and so is a block's magnetisation of 0, along the direction written (checked against a block's
 * on-axis field);
 * an input whose nudge puts a conductor on the beam line gets `uncertainty-undefined` at the
 * number the file wrote, in `check`, `eval` text and JSON. (Every input can be moved: turns are at
 * least 1 and a magnetisation is always written with its direction.)
 */
import { mkdtempSync, writeFileSync } from 'fs';
import { tmpdir } from 'os';
import path from 'path';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { partsAtCurrent } from '../../server/src/eval/uncertainty/sourceInputs';
import { VACUUM_PERMEABILITY } from '../../server/src/physics/constants';
import { cli } from '../cli/runCli';

/** A one-loop coil that sets the field at the origin and a second source under test (invented numbers). */
const setup = (other: string, otherName: string) => `coil bias
  radius  = 10 cm
  turns   = 100
  current = 300 A
${other}
magnet m
  sources = bias, ${otherName}
  length  = 8 cm
`;

const lineOf = (text: string, line: number) => text.split('\n')[line];

describe('a source input that cannot be scaled or moved', () => {
  it('a current of 0(5) A: set instead of scaled, so the magnet field carries 0.5 A × the loop’s on-axis field per ampere (to 1e-9)', () => {
    const text = setup('coil idle\n  radius  = 5 cm\n  turns   = 10\n  current = 0.0(5) A\n  centre  = 0, 0, -3 cm', 'idle');
    const a = analyze(text);
    expect(a.problems.filter((p) => p.code === 'uncertainty-undefined')).toEqual([]);
    const R = 0.05, z = 0.03;
    const perAmpere = (VACUUM_PERMEABILITY * 10 * R * R) / (2 * (R * R + z * z) ** 1.5);
    // the bias field is along +z at the origin, so |B| grows with the idle coil's B_z
    expect(Math.abs(a.result!.magnets[0]!.field_T_unc! / (0.5 * perAmpere) - 1)).toBeLessThan(1e-9);
  });

  it('partsAtCurrent gives back the builders’ parts at the written current (a reversed pair, a solenoid, a wire with its return)', () => {
    const text = `coil pair
  radius  = 4 cm
  turns   = 20
  current = -3 A
  spacing = 8 cm
  sense   = opposite
solenoid long
  radius  = 1 cm
  length  = 20 cm
  turns   = 400
  current = 2 A
wire rails
  current   = 7 A
  through   = 0, 2, 0 mm
  direction = x
  return    = 0, -2, 0 mm
`;
    for (const s of analyze(text).model!.sources) {
      expect(s.parts.length).toBeGreaterThan(0);
      expect(partsAtCurrent(s, s.currentA!.value)).toEqual(s.parts);
    }
  });

  it('a block magnetised 0.0(1) T along z: set along z instead of scaled, so the magnet field carries 0.1 T × the block’s on-axis field per tesla (to 1e-9)', () => {
    // A 2 × 2 × 1 cm block 2.5 cm below the beam line's centre, on its axis. On the axis of a block
    // with half-sides a, b and thickness L magnetised along it, at distance d from the near face:
    // B = (μ0M/π) [atan(ab / (d √(a² + b² + d²))) − atan(ab / ((d + L) √(a² + b² + (d + L)²)))]
    // (the surface-charge integral of two uniformly charged rectangles, textbook magnetostatics; from memory).
    const a = 0.01, b = 0.01, L = 0.01, d = 0.025;
    const face = (x: number) => Math.atan((a * b) / (x * Math.sqrt(a * a + b * b + x * x)));
    const perTesla = (face(d) - face(d + L)) / Math.PI;
    for (const along of ['z', '-z', '0, 0, 2']) {
      const text = setup(`slab block\n  size          = 2, 2, 1 cm\n  magnetisation = 0.0(1) T along ${along}\n  centre        = 0, 0, -3 cm`, 'block');
      const an = analyze(text);
      expect(an.problems.filter((p) => p.code === 'uncertainty-undefined')).toEqual([]);
      // the bias field is along +z at the origin, so |B| moves with the block's B_z, whichever way it is set
      expect(Math.abs(an.result!.magnets[0]!.field_T_unc! / (0.1 * perTesla) - 1)).toBeLessThan(1e-9);
    }
    // The direction is the one written, not a default: set across the axis, the block's field at the centre is across |B| too, so it does not reach it at first order.
    const across = analyze(setup('slab block\n  size          = 2, 2, 1 cm\n  magnetisation = 0.0(1) T along x\n  centre        = 0, 0, -3 cm', 'block'));
    expect(across.problems.filter((p) => p.code === 'uncertainty-undefined')).toEqual([]);
    expect(across.result!.magnets[0]!.field_T_unc ?? 0).toBeLessThan(1e-6 * 0.1 * perTesla);
  });

  it('a wire whose nudge puts it on the beam line’s centre: a warning at its `through`, in check, eval text and eval JSON', () => {
    // The wire crosses 10 µm under the centre; its place is uncertain by 10 µm, the step taken (within 1e-4…1e-2 of 8 cm).
    const text = setup('wire w\n  current   = 5 A\n  through   = 0, 0, -0.010(10) mm\n  direction = y', 'w');
    const a = analyze(text);
    const p = a.problems.filter((x) => x.code === 'uncertainty-undefined');
    expect(p.length).toBe(1);
    expect(lineOf(text, p[0]!.range.start.line)).toBe('  through   = 0, 0, -0.010(10) mm');
    expect(p[0]!.message).toMatch(/^line of wire w z: moving it by its uncertainty puts a conductor on the beam line's centre/);
    expect(JSON.stringify(a.result)).not.toMatch(/NaN|Infinity/);
    // The same warning in check, eval text and eval JSON.
    const file = path.join(mkdtempSync(path.join(tmpdir(), 'sublevel-gap-')), 'gap.sublevel');
    writeFileSync(file, text);
    expect(cli('check', file).out).toContain('uncertainty-undefined');
    expect(cli('eval', file).out).toContain('line of wire w z: moving it by its uncertainty');
    expect(JSON.stringify(JSON.parse(cli('eval', file, '--format', 'json').out))).toContain('line of wire w z: moving it by its uncertainty');
  });
});
