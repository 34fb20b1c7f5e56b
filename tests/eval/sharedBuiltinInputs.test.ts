/**
 * Built-in line energies summed from shared pieces (the lithium D lines on one recalled ⁷Li D1 anchor, the ⁸⁷Sr
 * 689 nm line on the ⁸⁸Sr one) enter a setup as their pieces, each one input however many levels carry it. A
 * difference of two such energies then keeps only what is not shared: the read fine structure (40 kHz), the read
 * isotope shift (15 kHz), the 1 MHz bound on the Sr shift; not the anchor's 1 MHz twice (docs/uncertainty.md).
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { setupInputs } from '../../server/src/eval/uncertainty/inputs';
import { combine, covariance, standardUncertainty } from '../../server/src/physics/uncertainty';

function energies(text: string) {
  const a = analyze(text);
  const inputs = setupInputs(a.model!);
  const sens = (species: string, level: string) =>
    inputs.levelEnergy(a.model!.species.find((s) => s.name === species)!.levels.find((l) => l.name === level)!);
  return { sens, table: inputs.table, result: a.result! };
}

const LITHIUM = `species Li7
  level g: 2s 2S1/2
  level p1: 2p 2P°1/2
  level p3: 2p 2P°3/2
species Li6
  level g: 2s 2S1/2
  level p1: 2p 2P°1/2
  level p3: 2p 2P°3/2
`;

describe('the lithium D lines share one anchor input', () => {
  const { sens, table, result } = energies(LITHIUM);

  it('each line keeps its stored uncertainty: 1 MHz anchor with the read pieces in quadrature', () => {
    expect(standardUncertainty(sens('Li7', 'p1'), table)).toBeCloseTo(1e6, 3);
    expect(standardUncertainty(sens('Li7', 'p3'), table)).toBeCloseTo(Math.hypot(1e6, 40e3), 3);
    expect(standardUncertainty(sens('Li6', 'p1'), table)).toBeCloseTo(Math.hypot(1e6, 15e3), 3);
    expect(standardUncertainty(sens('Li6', 'p3'), table)).toBeCloseTo(Math.hypot(1e6, 15e3, 49e3), 3);
  });

  it('lists the anchor once, as builtin:Li7.D1, not once per line', () => {
    const ids = result.uncertainty_inputs!.map((i) => i.id);
    expect(ids.filter((id) => id === 'builtin:Li7.D1')).toHaveLength(1);
    expect(ids.some((id) => id.endsWith('.energy'))).toBe(false);
    const anchor = result.uncertainty_inputs!.find((i) => i.id === 'builtin:Li7.D1')!;
    expect(anchor.value).toBe(446800129853e3);
    expect(anchor.u).toBe(1e6);
  });

  it('the ⁷Li fine structure E(2P3/2) − E(2P1/2) carries the review\'s 40 kHz, not √2 MHz', () => {
    // 2P fine structure 10 053.154 ± 0.040 MHz (⁷Li): critical review (2009), abstract, yorku.ca/wlaser.
    const diff = combine([[1, sens('Li7', 'p3')], [-1, sens('Li7', 'p1')]]);
    expect(standardUncertainty(diff, table)).toBeCloseTo(40e3, 3);
  });

  it('the D1 isotope shift ⁷Li − ⁶Li carries the measured 15 kHz, and the D2 one 15, 40 and 49 kHz in quadrature', () => {
    // D1 isotope shift 10 533.800(15) MHz: doctoral dissertation, National Tsing Hua University (2018), abstract.
    expect(standardUncertainty(combine([[1, sens('Li7', 'p1')], [-1, sens('Li6', 'p1')]]), table)).toBeCloseTo(15e3, 3);
    expect(standardUncertainty(combine([[1, sens('Li7', 'p3')], [-1, sens('Li6', 'p3')]]), table)).toBeCloseTo(Math.hypot(15e3, 40e3, 49e3), 3);
  });

  it('two lines that share the anchor are correlated: cov(D1, D2) = (1 MHz)²', () => {
    expect(covariance(sens('Li7', 'p1'), sens('Li7', 'p3'), table)).toBeCloseTo(1e12, -3);
    expect(covariance(sens('Li7', 'p1'), sens('Li6', 'p3'), table)).toBeCloseTo(1e12, -3);
  });

  it('a line centre prints the same uncertainty as before the split', () => {
    const lines = analyze(`${LITHIUM.split('species Li6')[0]}line D2: g -> p3\n`).result!.lines;
    expect(lines[0]!.line_centre_Hz).toBe(446810183007e3);
    expect(lines[0]!.line_centre_Hz_unc).toBeCloseTo(Math.hypot(1e6, 40e3), 3);
  });
});

describe('the strontium 689 nm lines share the ⁸⁸Sr measurement', () => {
  const { sens, table } = energies(`species Sr88\n  level g: 5s2 1S0\n  level p: 5s 5p 3P°1\nspecies Sr87\n  level g: 5s2 1S0\n  level p: 5s 5p 3P°1\n`);

  it('⁸⁸Sr 3P1 carries the measured 10 kHz; ⁸⁷Sr 3P1 that and the 1 MHz shift bound', () => {
    // ⁸⁸Sr 1S0–3P1 434 829 121 311(10) kHz: Phys. Rev. Lett. 91, 243002 (2003), abstract.
    expect(standardUncertainty(sens('Sr88', 'p'), table)).toBeCloseTo(10e3, 6);
    expect(standardUncertainty(sens('Sr87', 'p'), table)).toBeCloseTo(Math.hypot(1e6, 10e3), 3);
  });

  it('their isotope shift keeps only the 1 MHz bound', () => {
    expect(standardUncertainty(combine([[1, sens('Sr88', 'p')], [-1, sens('Sr87', 'p')]]), table)).toBeCloseTo(1e6, 3);
  });
});
