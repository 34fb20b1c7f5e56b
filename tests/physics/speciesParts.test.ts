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
    it(`${name}: value = Σ sign·piece (within the 1 Hz of rounding)`, () => {
      const parts = v.parts!;
      const sum = parts.reduce((acc, p) => acc + p.sign * p.value, 0);
      expect(Math.abs(v.value - sum)).toBeLessThanOrEqual(1);
    });
  }

  // The published figures, not the stored pieces: the ⁷Li D1 anchor's stated 1 MHz; the ⁷Li − ⁶Li D1 isotope
  // shift 10 533.800(15) MHz (dissertation, 2018, abstract); the ⁷Li 2P fine structure 10 053.154(40) MHz
  // (critical review, 2009, abstract); the ⁶Li one 10 052.954(49) MHz (docs/species-data.md); ⁸⁸Sr 1S0–3P1
  // 434 829 121 311(10) kHz (Phys. Rev. Lett. 91, 243002, abstract); the 1 MHz bound on the ⁸⁸Sr − ⁸⁷Sr shift
  // of the 689 nm line (docs/species-data.md). Each stored uncertainty is these in quadrature.
  const published: Record<string, number> = {
    'Li7 P1/2 energyHz': 1e6,
    'Li7 P3/2 energyHz': Math.hypot(1e6, 40e3),
    'Li6 P1/2 energyHz': Math.hypot(1e6, 15e3),
    'Li6 P3/2 energyHz': Math.hypot(1e6, 15e3, 49e3),
    'Sr88 3P1 energyHz': 10e3,
    'Sr87 3P1 energyHz': Math.hypot(10e3, 1e6),
  };
  it('each stored uncertainty is the published figures in quadrature (1 MHz, 15/40/49 kHz, 10 kHz)', () => {
    expect(Object.fromEntries(withParts.map(([name, v]) => [name, Math.round(v.uncertainty!)]))).toEqual(
      Object.fromEntries(Object.entries(published).map(([name, u]) => [name, Math.round(u)])),
    );
  });

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
