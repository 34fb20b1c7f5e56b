import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  LSTerm,
  microstateCount,
  subshellCapacity,
  termsOfConfiguration,
  termsOfEquivalentElectrons,
} from '../../server/src/physics/lsTerms';
import { parseConfiguration } from '../../server/src/physics/configuration';
import { orbitalLetter } from '../../server/src/physics/termSymbol';

/** '2D×2' style labels, in the module's order (by S, then L). */
function labels(terms: LSTerm[]): string[] {
  return terms.map((t) => `${t.twoS + 1}${orbitalLetter(t.L)}${t.count > 1 ? `×${t.count}` : ''}`);
}

function binomial(n: number, k: number): number {
  let r = 1;
  for (let i = 1; i <= k; i++) r = (r * (n - k + i)) / i;
  return Math.round(r);
}

describe('terms of equivalent electrons (standard textbook tables, from memory)', () => {
  it('p^n', () => {
    expect(labels(termsOfEquivalentElectrons(1, 1))).toEqual(['2P']);
    expect(labels(termsOfEquivalentElectrons(1, 2))).toEqual(['1S', '1D', '3P']);
    expect(labels(termsOfEquivalentElectrons(1, 3))).toEqual(['2P', '2D', '4S']);
    expect(labels(termsOfEquivalentElectrons(1, 6))).toEqual(['1S']);
  });
  it('d^n', () => {
    expect(labels(termsOfEquivalentElectrons(2, 2))).toEqual(['1S', '1D', '1G', '3P', '3F']);
    expect(labels(termsOfEquivalentElectrons(2, 3))).toEqual(['2P', '2D×2', '2F', '2G', '2H', '4P', '4F']);
    // d5: 2S 2P 2D×3 2F×2 2G×2 2H 2I 4P 4D 4F 4G 6S (16 terms)
    expect(labels(termsOfEquivalentElectrons(2, 5))).toEqual([
      '2S', '2P', '2D×3', '2F×2', '2G×2', '2H', '2I', '4P', '4D', '4F', '4G', '6S',
    ]);
  });
  it('f-shell spot checks', () => {
    expect(labels(termsOfEquivalentElectrons(3, 1))).toEqual(['2F']);
    expect(labels(termsOfEquivalentElectrons(3, 2))).toEqual(['1S', '1D', '1G', '1I', '3P', '3F', '3H']);
    // f3: 17 terms — 2P 2D×2 2F×2 2G×2 2H×2 2I 2K 2L, 4S 4D 4F 4G 4I
    expect(labels(termsOfEquivalentElectrons(3, 3))).toEqual([
      '2P', '2D×2', '2F×2', '2G×2', '2H×2', '2I', '2K', '2L', '4S', '4D', '4F', '4G', '4I',
    ]);
    const f7 = termsOfEquivalentElectrons(3, 7);
    // f7: 119 terms in all, one octet 8S, sextets 6P 6D 6F 6G 6H 6I
    expect(f7.reduce((s, t) => s + t.count, 0)).toBe(119);
    expect(labels(f7.filter((t) => t.twoS >= 5))).toEqual(['6P', '6D', '6F', '6G', '6H', '6I', '8S']);
  });
  it('impossible input gives []', () => {
    expect(termsOfEquivalentElectrons(1, 7)).toEqual([]);
    expect(termsOfEquivalentElectrons(-1, 1)).toEqual([]);
    expect(termsOfEquivalentElectrons(1.5, 1)).toEqual([]);
    expect(termsOfEquivalentElectrons(0, 0)).toEqual([{ twoS: 0, L: 0, count: 1 }]);
  });
});

describe('properties', () => {
  it('microstates add up to C(4l+2, n)', () => {
    for (let l = 0; l <= 4; l++) {
      for (let n = 0; n <= subshellCapacity(l); n++) {
        expect(microstateCount(termsOfEquivalentElectrons(l, n)), `l=${l} n=${n}`).toBe(binomial(subshellCapacity(l), n));
      }
    }
  });
  it('electron–hole symmetry: l^n and l^(4l+2−n) have the same terms', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 4 }), fc.nat(18), (l, k) => {
        const n = k % (subshellCapacity(l) + 1);
        const a = termsOfEquivalentElectrons(l, n);
        const b = termsOfEquivalentElectrons(l, subshellCapacity(l) - n);
        return JSON.stringify(a) === JSON.stringify(b);
      }),
      { numRuns: 100 },
    );
  });
  it('spin never exceeds min(n, 4l+2−n)/2 and l^1 is a single term', () => {
    for (let l = 0; l <= 4; l++) {
      expect(termsOfEquivalentElectrons(l, 1)).toEqual([{ twoS: 1, L: l, count: 1 }]);
      for (let n = 0; n <= subshellCapacity(l); n++) {
        const maxTwoS = Math.max(...termsOfEquivalentElectrons(l, n).map((t) => t.twoS));
        expect(maxTwoS).toBe(Math.min(n, subshellCapacity(l) - n, 2 * l + 1));
      }
    }
  });
});

describe('terms of configurations (textbook: non-equivalent electrons couple freely)', () => {
  const terms = (text: string) => labels(termsOfConfiguration(parseConfiguration(text).configuration!));
  it('np n\'p gives 1S 1P 1D 3S 3P 3D', () => {
    expect(terms('2p 3p')).toEqual(['1S', '1P', '1D', '3S', '3P', '3D']);
  });
  it('ns n\'s, 2s 2p, 3d 4s, closed shells', () => {
    expect(terms('1s 2s')).toEqual(['1S', '3S']);
    expect(terms('2s.2p')).toEqual(['1P', '3P']);
    expect(terms('3d 4s')).toEqual(['1D', '3D']);
    expect(terms('1s2 2s2 2p6')).toEqual(['1S']);
    expect(terms('[Ne]')).toEqual(['1S']);
    expect(terms('[Ne] 3s2 3p2')).toEqual(['1S', '1D', '3P']);
  });
  it('2p2 3p: couples the 2p2 terms with a p electron', () => {
    // Worked by hand (vector coupling): 1S×2P → 2P; 1D×2P → 2P 2D 2F; 3P×2P → 2S 2P 2D 4S 4P 4D.
    // Microstates: 15 × 6 = 90.
    const t = termsOfConfiguration(parseConfiguration('2p2 3p').configuration!);
    expect(microstateCount(t)).toBe(90);
    expect(labels(t)).toEqual(['2S', '2P×3', '2D×2', '2F', '4S', '4P', '4D']);
  });
});
