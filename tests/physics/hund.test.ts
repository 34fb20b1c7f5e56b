import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { parseConfiguration } from '../../server/src/physics/configuration';
import { hundGroundLevel, hundSubshell } from '../../server/src/physics/hund';
import { termsOfConfiguration, termsOfEquivalentElectrons } from '../../server/src/physics/lsTerms';
import { formatTermSymbol } from '../../server/src/physics/termSymbol';

/** Ground level of a configuration, written like '3P0' (parity mark left off). */
function ground(config: string): string | null {
  const { configuration } = parseConfiguration(config);
  if (!configuration) throw new Error(`bad test configuration ${config}`);
  const h = hundGroundLevel(configuration);
  return h ? formatTermSymbol({ ...h, parityMark: null }, 'ascii') : null;
}

// Ground-state configurations and ground levels of the neutral atoms from NIST Standard
// Reference Database 111, "Ground Levels and Ionization Energies for the Neutral Atoms"
// (W.C. Martin, A. Musgrove, S. Kotochigova, J.E. Sansonetti). H–Cr were read from a copy of that
// table found with the search tool; the heavier entries are from memory of the same table.
// Parity marks are left off here (parity is checked in configuration.test.ts).
const NIST_GROUND: [string, string, string][] = [
  ['H', '1s', '2S1/2'],
  ['He', '1s2', '1S0'],
  ['Li', '1s2 2s', '2S1/2'],
  ['Be', '1s2 2s2', '1S0'],
  ['B', '1s2 2s2 2p', '2P1/2'],
  ['C', '1s2 2s2 2p2', '3P0'],
  ['N', '1s2 2s2 2p3', '4S3/2'],
  ['O', '1s2 2s2 2p4', '3P2'],
  ['F', '1s2 2s2 2p5', '2P3/2'],
  ['Ne', '1s2 2s2 2p6', '1S0'],
  ['Na', '[Ne] 3s', '2S1/2'],
  ['Al', '[Ne] 3s2 3p', '2P1/2'],
  ['Si', '[Ne] 3s2 3p2', '3P0'],
  ['P', '[Ne] 3s2 3p3', '4S3/2'],
  ['S', '[Ne] 3s2 3p4', '3P2'],
  ['Cl', '[Ne] 3s2 3p5', '2P3/2'],
  ['Sc', '[Ar] 3d 4s2', '2D3/2'],
  ['Ti', '[Ar] 3d2 4s2', '3F2'],
  ['V', '[Ar] 3d3 4s2', '4F3/2'],
  ['Cr', '[Ar] 3d5 4s', '7S3'],
  ['Mn', '[Ar] 3d5 4s2', '6S5/2'],
  ['Fe', '[Ar] 3d6 4s2', '5D4'],
  ['Co', '[Ar] 3d7 4s2', '4F9/2'],
  ['Ni', '[Ar] 3d8 4s2', '3F4'],
  ['Cu', '[Ar] 3d10 4s', '2S1/2'],
  ['Nb', '[Kr] 4d4 5s', '6D1/2'],
  ['Ru', '[Kr] 4d7 5s', '5F5'],
  ['Rh', '[Kr] 4d8 5s', '4F9/2'],
  ['Pd', '[Kr] 4d10', '1S0'],
  ['La', '[Xe] 5d 6s2', '2D3/2'],
  ['Pr', '[Xe] 4f3 6s2', '4I9/2'],
  ['Nd', '[Xe] 4f4 6s2', '5I4'],
  ['Sm', '[Xe] 4f6 6s2', '7F0'],
  ['Eu', '[Xe] 4f7 6s2', '8S7/2'],
  ['Gd', '[Xe] 4f7 5d 6s2', '9D2'],
  ['Tb', '[Xe] 4f9 6s2', '6H15/2'],
  ['Dy', '[Xe] 4f10 6s2', '5I8'],
  ['Ho', '[Xe] 4f11 6s2', '4I15/2'],
  ['Er', '[Xe] 4f12 6s2', '3H6'],
  ['Tm', '[Xe] 4f13 6s2', '2F7/2'],
  ['Yb', '[Xe] 4f14 6s2', '1S0'],
  ['Pt', '[Xe] 4f14 5d9 6s', '3D3'],
  ['Th', '[Rn] 6d2 7s2', '3F2'],
  ['Cm', '[Rn] 5f7 6d 7s2', '9D2'],
];

describe("Hund's rules vs NIST ground levels of the neutral atoms", () => {
  for (const [el, config, level] of NIST_GROUND) {
    it(`${el}: ${config} → ${level}`, () => {
      expect(ground(config)).toBe(level);
    });
  }

  it('Gd: the exception is in the configuration, not in the rules', () => {
    // Filling order alone would give 4f8 6s2, whose Hund level is 7F6 (the ground level of Tb+,
    // a different species). The observed Gd configuration keeps the half-filled 4f7 and puts one
    // electron in 5d; for THAT configuration our multi-subshell rule gives S = 7/2 + 1/2 = 4,
    // L = 0 + 2 = 2 and, with 5d less than half full, J = |L − S| = 2: 9D2, matching NIST 9D°2.
    expect(ground('[Xe] 4f8 6s2')).toBe('7F6');
    expect(ground('[Xe] 4f7 5d 6s2')).toBe('9D2');
  });

  it('Ce is a known failure of the rules: they give 3H4, NIST lists 1G°4', () => {
    // 4f 5d 6s2: Hund picks the highest spin (triplet) and highest L (H); the observed ground
    // level is the singlet 1G°4 (strong mixing between the two open shells). Documented limit.
    expect(ground('[Xe] 4f 5d 6s2')).toBe('3H4');
  });
});

describe("Hund's rules: consistency properties", () => {
  it('single subshell: the Hund term is the highest-S, then highest-L term of l^n', () => {
    for (let l = 0; l <= 4; l++) {
      for (let n = 0; n <= 4 * l + 2; n++) {
        const h = hundSubshell(l, n)!;
        const terms = termsOfEquivalentElectrons(l, n);
        const maxS = Math.max(...terms.map((t) => t.twoS));
        const maxL = Math.max(...terms.filter((t) => t.twoS === maxS).map((t) => t.L));
        expect([h.twoS, h.L], `l=${l} n=${n}`).toEqual([maxS, maxL]);
      }
    }
  });
  it('several open subshells: also the highest-S, highest-L term of the coupled configuration', () => {
    const letters = 'spdf';
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 3 }), fc.nat(14), fc.integer({ min: 0, max: 2 }), fc.nat(10), (l1, k1, l2, k2) => {
        const n1 = 1 + (k1 % (4 * l1 + 2));
        const n2 = 1 + (k2 % (4 * l2 + 2));
        const text = `4${letters[l1]}${n1} 5${letters[l2]}${n2}`;
        const c = parseConfiguration(text).configuration!;
        const h = hundGroundLevel(c)!;
        const terms = termsOfConfiguration(c);
        const maxS = Math.max(...terms.map((t) => t.twoS));
        const maxL = Math.max(...terms.filter((t) => t.twoS === maxS).map((t) => t.L));
        return h.twoS === maxS && h.L === maxL;
      }),
      { numRuns: 200 },
    );
  });
  it('J is |L−S| below half filling and L+S above (single shell)', () => {
    expect(hundSubshell(2, 2)).toEqual({ twoS: 2, L: 3, twoJ: 4 }); // d2 3F2
    expect(hundSubshell(2, 8)).toEqual({ twoS: 2, L: 3, twoJ: 8 }); // d8 3F4
    expect(hundSubshell(3, 7)).toEqual({ twoS: 7, L: 0, twoJ: 7 }); // f7 8S7/2
    expect(hundSubshell(1, 7)).toBeNull();
  });
});
