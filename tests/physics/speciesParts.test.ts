/**
 * Built-in values summed from shared pieces (`Sourced.parts`): the value is the signed sum of its pieces (to the
 * rounding of the published last digit), the stored uncertainty is theirs in quadrature, and a piece with one key
 * has one value and one uncertainty wherever it recurs, so it can be one uncertain input.
 */
import { describe, expect, it } from 'vitest';
import { BUILTIN_SPECIES, type Sourced, type UncertainPart } from '../../server/src/physics/species';

const withParts: [string, Sourced<number>][] = [];
for (const s of BUILTIN_SPECIES) {
  for (const l of s.levels) {
    for (const [what, v] of Object.entries(l)) {
      if (v && typeof v === 'object' && 'parts' in v && (v as Sourced<number>).parts) withParts.push([`${s.id} ${l.key} ${what}`, v as Sourced<number>]);
    }
  }
}

describe('built-in values with shared pieces', () => {
  it('are the six line energies built on a shared measurement (four lithium D lines, both Sr 689 nm lines)', () => {
    expect(withParts.map(([name]) => name).sort()).toEqual(
      ['Li6 P1/2 energyHz', 'Li6 P3/2 energyHz', 'Li7 P1/2 energyHz', 'Li7 P3/2 energyHz', 'Sr87 3P1 energyHz', 'Sr88 3P1 energyHz'],
    );
  });

  for (const [name, v] of withParts) {
    it(`${name}: value = Σ sign·piece (within the 1 Hz of rounding) and u = their quadrature sum`, () => {
      const parts = v.parts!;
      const sum = parts.reduce((acc, p) => acc + p.sign * p.value, 0);
      expect(Math.abs(v.value - sum)).toBeLessThanOrEqual(1);
      expect(v.uncertainty).toBeCloseTo(Math.hypot(...parts.map((p) => p.u)), 6);
    });
  }

  it('a key names one piece: the same value, uncertainty, sign and label everywhere', () => {
    const byKey = new Map<string, UncertainPart>();
    for (const [, v] of withParts) {
      for (const p of v.parts!) {
        const seen = byKey.get(p.key);
        if (seen) expect(p).toEqual(seen);
        else byKey.set(p.key, p);
      }
    }
    // The lithium anchor: ⁷Li D1 446 800 129.853 MHz (from memory) with the stated 1 MHz, shared by all four lines.
    expect(byKey.get('Li7.D1')).toMatchObject({ value: 446800129853e3, u: 1e6, sign: 1 });
    expect(withParts.filter(([n, v]) => n.startsWith('Li') && v.parts!.some((p) => p.key === 'Li7.D1'))).toHaveLength(4);
  });
});
