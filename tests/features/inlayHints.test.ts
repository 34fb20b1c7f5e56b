import { describe, expect, it } from 'vitest';
import { inlayHints } from '../../server/src/features/inlayHints';
import { analysisOf } from './helpers';

const TEXT = [
  'species Rb87',
  '  level ground: 5s 2S1/2',
  '  level p: 5p 2P°3/2  A = 84.7185 MHz',
  'field bias = 1 G',
  'magnet m',
  '  field = 0.5 T',
  '  gradient = 100 T/m',
  '  length = 5 cm',
  'line D2: ground -> p',
  '',
].join('\n');

const ALL = { start: { line: 0, character: 0 }, end: { line: 100, character: 0 } };

function labels(range = ALL): string[] {
  return inlayHints(analysisOf(TEXT), range).map((h) => `${h.position.line}:${h.position.character} ${String(h.label)}`);
}

describe('inlay hints', () => {
  it('puts the numbers after the statements that produce them', () => {
    expect(labels()).toEqual([
      // Steck, Rubidium 87 D Line Data: g_J(5S1/2) = 2.002 331 13; ground splitting 6.834 682 610 904 GHz = 2A
      // (A = 3.417 341 305 452 145(45) GHz in the built-in table, so the splitting prints with u = 2 u(A) = 90 µHz,
      // the compilation's 6.834 682 610 904 290(90) GHz).
      // The built-in g_J values carry the compilation's uncertainties (from memory): 2.002 331 13(20), 1.3362(13).
      '1:24 g_J 2.00233113(20), ΔE_hfs 6.83468261090429(9) GHz',
      // Landé with CODATA g_s for 2P3/2 is 1.3341; the built-in measured g_J (Steck) is 1.3362.
      '2:20 g_J 1.3362(13)',
      // Steck: 5P3/2 intervals 72.2180, 156.9470 and 266.6500 MHz (from A = 84.7185 MHz and B = 12.4965 MHz).
      // A is written without an uncertainty here; the built-in B = 12.4965(37) MHz enters each interval with weight 1.
      '2:37 ΔE_hfs 72.2220(37) MHz, 156.9405(37) MHz, 266.6520(37) MHz',
      // μ_B/h = 13.996 244 171 GHz/T (CODATA 2022): 1 G → 1.3996 MHz, 0.5 T → 6.9981 GHz.
      '3:16 μ_B·B/h 1.3996 MHz',
      '5:15 μ_B·B/h 6.9981 GHz',
      // μ_B · 100 T/m = 9.274e-22 N.
      '6:20 μ_B·b 9.274e-22 N',
      // Steck: D2 at 384.230 484 468 5 THz, vacuum wavelength 780.241 209 686 nm. g_eff from the textbook formula
      // ½(g_u + g_l) + ¼(g_u − g_l)[J_u(J_u+1) − J_l(J_l+1)] with Steck's g_J(5S1/2) = 2.00233113, g_J(5P3/2) = 1.3362: 1.16967.
      '8:20 384.2305 THz, λ_vac 780.2412 nm, g_eff 1.17',
    ]);
  });

  it('computes only the requested range', () => {
    expect(labels({ start: { line: 3, character: 0 }, end: { line: 5, character: 100 } })).toEqual(['3:16 μ_B·B/h 1.3996 MHz', '5:15 μ_B·B/h 6.9981 GHz']);
    expect(labels({ start: { line: 9, character: 0 }, end: { line: 9, character: 0 } })).toEqual([]);
  });

  it('writes half-integer F as fractions in the tooltip, as the hovers do', () => {
    // J = 1/2, I = 1: F = 1/2 and 3/2, split by A(I + 1/2) = 1.5 A (textbook hyperfine interval rule).
    const text = 'species Demo\n  mass = 40 u\n  I = 1\n  g_I = 0.0001\n  level g: 2S1/2  A = 100 MHz\n';
    const hint = inlayHints(analysisOf(text), ALL).find((h) => String(h.label).startsWith('ΔE_hfs'))!;
    expect(hint.tooltip).toBe('F = 1/2 ↔ 3/2: 150 MHz');
  });

  it('a line whose energy is uncertain at the digits shown gives its frequency and wavelength with their uncertainty', () => {
    // Invented scenario: an upper level at 500.000(1) THz. λ = c/ν = 599.5849 nm; u(λ) = λ u(ν)/ν = 1.2 pm = 0.0012 nm,
    // above half the 7th digit (0.00005 nm), so the hint shows it; the built-in D2 above (6.2 kHz) does not.
    // The frequency the same way: u(ν) = 1 GHz is above half its 7th digit (50 MHz): 500.0000(10) THz.
    const text = 'species Demo\n  mass = 40 u\n  level g: 2S1/2  energy = 0 THz\n  level e: 2P°3/2  energy = 500.000(1) THz\nline L: g -> e\n';
    const hint = inlayHints(analysisOf(text), ALL).find((h) => String(h.label).includes('λ_vac'))!;
    // g_eff = ½(g_u + g_l) + ¼(g_u − g_l)·3 with Landé g(2P3/2) = 1.3341 and g(2S1/2) = 2.0023: 1.167 (textbook formula).
    expect(String(hint.label)).toBe('500.0000(10) THz, λ_vac 599.5849(12) nm, g_eff 1.167');
  });

  it('a line uncertain below the digits shown: neither its frequency nor its wavelength shows it', () => {
    // Invented scenario: 500 THz ± 20 MHz. Half the 7th digit is 50 MHz for ν and 0.00005 nm for λ (u(λ) = 0.000024 nm).
    const text = 'species Demo\n  mass = 40 u\n  level g: 2S1/2  energy = 0 THz\n  level e: 2P°3/2  energy = 500.00000(2) THz\nline L: g -> e\n';
    const hint = inlayHints(analysisOf(text), ALL).find((h) => String(h.label).includes('λ_vac'))!;
    expect(String(hint.label)).toBe('500 THz, λ_vac 599.5849 nm, g_eff 1.167');
  });

  it('a line whose uncertainty reaches the wavelength\'s last digit but not the frequency\'s: both show it', () => {
    // Invented scenario: 500 THz ± 45 MHz. Half the 7th digit: 50 MHz for ν (hidden alone), 0.00005 nm for λ,
    // where u(λ) = 599.5849 nm × 45 MHz / 500 THz = 0.000054 nm (shown alone): the hint shows it on both.
    const text = 'species Demo\n  mass = 40 u\n  level g: 2S1/2  energy = 0 THz\n  level e: 2P°3/2  energy = 500.000000(45) THz\nline L: g -> e\n';
    const hint = inlayHints(analysisOf(text), ALL).find((h) => String(h.label).includes('λ_vac'))!;
    expect(String(hint.label)).toBe('500.000000(45) THz, λ_vac 599.584916(54) nm, g_eff 1.167');
  });

  it('gives no hints for an invalid level', () => {
    expect(inlayHints(analysisOf('species Na23\n  level x: 3p 2P°5/2\n'), ALL)).toEqual([]);
  });
});

describe('inlay hints of hardware blocks', () => {
  it('after a trap header: how many sublevels it holds and their depths (docs/traps.md)', () => {
    // An anti-Helmholtz pair R = 5 cm at ±5 cm, 120 turns, 30 A: 95.97 G/cm on the axis (closed form
    // 3 μ0 N I R² d/(R² + d²)^{5/2}). Depths checked with SciPy: elliptic-integral loop fields, Breit–Rabi
    // energies, rays over the region of 6.364 cm: |1,−1⟩ 4.7835 mK, |2,+1⟩ 5.4083 mK, |2,+2⟩ 10.846 mK.
    const text = 'species Rb87\n  level ground: 5s 2S1/2\ncoil qp\n  radius = 5 cm\n  turns = 120\n  current = 30 A\n  spacing = 10 cm\n  sense = opposite\ntrap qt\n  sources = qp\n  level = ground\n';
    const hints = inlayHints(analysisOf(text), ALL).filter((h) => h.position.line === 8).map((h) => String(h.label));
    expect(hints).toEqual(['holds 3 sublevels, depth 4.784 mK … 10.85 mK']);
  });

  it('after a trap that holds nothing: says so', () => {
    const text = 'species Rb87\n  level ground: 5s 2S1/2\ncoil qp\n  radius = 5 cm\n  turns = 20\n  current = 5 A\n  spacing = 10 cm\n  sense = opposite\ntrap qt\n  sources = qp\n  level = ground\n';
    const hints = inlayHints(analysisOf(text), ALL).filter((h) => h.position.line === 8).map((h) => String(h.label));
    expect(hints).toEqual(['holds no sublevel']);
  });

  it('after a slower header: its length, field span and laser detuning (docs/slower.md)', () => {
    // Li7 D2: a_max = ħkΓ/2m = 1.5638e6 m/s² (λ = 670.9616 nm, τ = 27.102 ns), η = 0.5:
    // L = (800² − 60²)/(2 η a_max) = 40.70 cm; ΔB = v0/(λ μ'/h) = 850.74 G with μ'/h = 1.40151 MHz/G;
    // B_bias = −ΔB vf/v0 = −63.81 G, so 786.93 G at the entrance; δ = (μ'/h) B_bias = −89.42 MHz.
    const text = 'species Li7\n  level ground: 2s 2S1/2\n  level p32: 2p 2P°3/2\nline D2: ground -> p32\nslower li\n  line = D2\n  capture = 800 m/s\n  final = 60 m/s\n  safety = 0.5\n  saturation = 3\n';
    const hints = inlayHints(analysisOf(text), ALL).filter((h) => h.position.line === 4).map((h) => String(h.label));
    expect(hints).toEqual(['40.7 cm, 786.93 G → 0 G, laser -89.424 MHz']);
  });
});
