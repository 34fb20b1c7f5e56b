/**
 * Electric-dipole selection rules as issue values. Rules: textbook (parity change,
 * ΔJ = 0, ±1 not 0 ↔ 0 strictly; ΔS = 0, ΔL = 0, ±1 not 0 ↔ 0 in LS coupling).
 * Level assignments of the real lines below are from memory (standard spectroscopy).
 */
import { describe, expect, it } from 'vitest';
import { selectionRules } from '../../server/src/physics/transitions';
import type { LineTerm } from '../../server/src/physics/transitions';

const codes = (lower: LineTerm, upper: LineTerm): string[] => selectionRules(lower, upper).map((i) => `${i.severity}:${i.code}`);

describe('selection rules on real lines', () => {
  it('Na D2, 3s 2S1/2 – 3p 2P°3/2: allowed, no findings', () => {
    expect(codes({ twoS: 1, L: 0, twoJ: 1, configuration: '3s' }, { twoS: 1, L: 1, twoJ: 3, configuration: '3p' })).toEqual([]);
  });

  it('Sr 689 nm, 5s2 1S0 – 5s5p 3P°1: an intercombination line (warning only)', () => {
    expect(codes({ twoS: 0, L: 0, twoJ: 0, configuration: '[Kr] 5s2' }, { twoS: 2, L: 1, twoJ: 2, configuration: '[Kr] 5s 5p' })).toEqual([
      'warning:line-intercombination',
    ]);
  });

  it('Sr clock line 1S0 – 3P°0: J = 0 ↔ 0 (error) and intercombination (warning)', () => {
    expect(codes({ twoS: 0, L: 0, twoJ: 0, parity: 'even' }, { twoS: 2, L: 1, twoJ: 0, parity: 'odd' })).toEqual([
      'error:line-j-zero-zero',
      'warning:line-intercombination',
    ]);
  });

  it('Fe I 525.02 nm, 3d6 4s2 a5D0 – 3d6 4s 4p z7D°1: intercombination; 630.25 nm, 3d7 4s a5P1 – z5D°0: allowed', () => {
    expect(codes({ twoS: 4, L: 2, twoJ: 0, configuration: '3d6 4s2' }, { twoS: 6, L: 2, twoJ: 2, configuration: '3d6 4s 4p' })).toEqual([
      'warning:line-intercombination',
    ]);
    expect(codes({ twoS: 4, L: 1, twoJ: 2, configuration: '3d7 4s' }, { twoS: 4, L: 2, twoJ: 0, configuration: '3d6 4s 4p' })).toEqual([]);
  });
});

describe('each rule on its own', () => {
  it('parity unchanged is an error (3s → 3d, both even)', () => {
    expect(codes({ twoS: 1, L: 0, twoJ: 1, configuration: '3s' }, { twoS: 1, L: 2, twoJ: 3, configuration: '3d' })).toEqual([
      'error:line-parity-unchanged',
      'warning:line-delta-l',
    ]);
  });

  it('ΔJ = 2 is an error', () => {
    expect(codes({ twoS: 2, L: 1, twoJ: 0, parity: 'odd' }, { twoS: 2, L: 2, twoJ: 4, parity: 'even' })).toEqual(['error:line-delta-j']);
  });

  it('ΔL = 2 with allowed J and parity is an LS-coupling warning', () => {
    expect(codes({ twoS: 2, L: 1, twoJ: 4, parity: 'odd' }, { twoS: 2, L: 3, twoJ: 6, parity: 'even' })).toEqual(['warning:line-delta-l']);
  });

  it('L = 0 ↔ 0 with a parity change is an LS-coupling warning', () => {
    expect(codes({ twoS: 1, L: 0, twoJ: 1, parity: 'even' }, { twoS: 1, L: 0, twoJ: 1, parity: 'odd' })).toEqual([
      'warning:line-l-zero-zero',
    ]);
  });

  it('unknown parity is reported (info) and that rule skipped', () => {
    expect(codes({ twoS: 1, L: 0, twoJ: 1 }, { twoS: 1, L: 1, twoJ: 1, parity: 'odd' })).toEqual(['info:line-parity-unknown']);
  });

  it('a configuration that disagrees with the stated parity wins, with a warning', () => {
    expect(codes({ twoS: 1, L: 0, twoJ: 1, parity: 'odd', configuration: '3s' }, { twoS: 1, L: 1, twoJ: 1, parity: 'odd' })).toEqual([
      'warning:line-parity-conflict',
    ]);
  });

  it('an unreadable configuration is a warning; bad numbers are an error; nothing throws', () => {
    expect(codes({ twoS: 1, L: 0, twoJ: 1, configuration: '3x#' }, { twoS: 1, L: 1, twoJ: 1, parity: 'odd' })).toEqual([
      'warning:line-configuration-unreadable',
      'info:line-parity-unknown',
    ]);
    expect(codes({ twoS: 1, L: 0, twoJ: 3 }, { twoS: 1, L: 1, twoJ: 1 })).toEqual(['error:line-term-invalid']);
    expect(codes({ twoS: 1.5, L: 0, twoJ: 1 }, { twoS: 1, L: 1, twoJ: 1 })).toEqual(['error:line-term-invalid']);
    expect(codes(null as unknown as LineTerm, { twoS: 1, L: 1, twoJ: 1 })).toEqual(['error:line-term-invalid']);
  });
});
