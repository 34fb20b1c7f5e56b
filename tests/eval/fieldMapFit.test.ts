/**
 * Profile fits of a beam through a magnet built from sources (eval/fitEvaluation.ts): the model
 * flies the atoms, and `source_scale` (every source's strength times one factor) replaces the
 * gradient. Synthetic profiles come from the whole beam evaluation (evaluateBeam: the flights at
 * three speeds and the detector pattern), with seeded Poisson-like noise.
 */
import Ajv2020 from 'ajv/dist/2020';
import { mkdtempSync, readFileSync, writeFileSync } from 'fs';
import { tmpdir } from 'os';
import path from 'path';
import { describe, expect, it } from 'vitest';
import { cli } from '../cli/runCli';
import { analyze } from '../../server/src/eval/analyze';
import { evaluateBeam } from '../../server/src/eval/beamEvaluation';
import { gJLookup } from '../../server/src/eval/gJLookup';
import { magnetAndBeam, speciesX } from '../fixtures/ovenBeam';
import { coilPairBeam, twoWireBeam } from '../fixtures/fieldMapBeams';

const wires = (current: number): string => twoWireBeam({ current: String(current) });

/** Counts amplitude · P(x − offset) + background at `positions`, P the evaluated pattern (linear between its bins), with seeded noise of σ = √counts. */
function syntheticCounts(text: string, positions: number[], amplitude: number, offset: number, background: number, seed: number): number[] {
  const a = analyze(text);
  const p = evaluateBeam(a.model!.beams[0]!, gJLookup(a.result!.levels), false).pattern!;
  const xs = p.positionsM;
  const at = (x: number): number => {
    if (x <= xs[0]! || x >= xs[xs.length - 1]!) return 0;
    let lo = 0, hi = xs.length - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (xs[mid]! <= x) lo = mid;
      else hi = mid;
    }
    const t = (x - xs[lo]!) / (xs[lo + 1]! - xs[lo]!);
    return p.total[lo]! * (1 - t) + p.total[lo + 1]! * t;
  };
  let s = seed;
  const rand = () => ((s = (s * 16807) % 2147483647) / 2147483647);
  return positions.map((x) => {
    const c = amplitude * at(x - offset) + background;
    return Math.max(0, Math.round(c + Math.sqrt(Math.max(c, 1)) * Math.sqrt(-2 * Math.log(rand())) * Math.cos(2 * Math.PI * rand())));
  });
}

const positions = Array.from({ length: 241 }, (_, i) => -2.4e-3 + (4.8e-3 * i) / 240);
const profileBlock = (counts: number[], fit: string) =>
  `data scan\n  kind = profile\n  beam = main\n${positions.map((x, i) => `  point = ${(x * 1e6).toFixed(2)} um ${counts[i]}`).join('\n')}\nfit shape\n  data = scan\n${fit}`;

describe('a profile fit through the flights', () => {
  it('recovers a known current scale (1.03) from a profile of the beam with 3 % more current, within its uncertainty', () => {
    const counts = syntheticCounts(wires(2472), positions, 4, 12e-6, 20, 5);
    const r = analyze(wires(2400) + profileBlock(counts, '  free = source_scale, offset, background\n'));
    const f = r.result!.fits![0]!;
    expect(r.problems.filter((p) => p.code.startsWith('fit-')).map((p) => p.message)).toEqual([]);
    expect(f.status).toBe('converged');
    const byName = Object.fromEntries(f.parameters.map((p) => [p.name, p]));
    const scale = byName.source_scale!;
    expect(scale.start).toBe(1);
    expect(scale.uncertainty!).toBeGreaterThan(0);
    expect(scale.uncertainty!).toBeLessThan(0.01);
    expect(Math.abs(scale.value - 1.03)).toBeLessThan(2 * scale.uncertainty!);
    expect(Math.abs(byName.offset!.value - 12e-6)).toBeLessThan(3 * byName.offset!.uncertainty!);
    expect(f.reduced_chi2!).toBeGreaterThan(0.7);
    expect(f.reduced_chi2!).toBeLessThan(1.4);
  });

  it('refuses the gradient and field of a magnet built from sources, and source_scale for a magnet given by numbers, in plain words', () => {
    const counts = syntheticCounts(wires(2400), positions, 4, 0, 20, 3);
    const grad = analyze(wires(2400) + profileBlock(counts, '  free = gradient, offset\n'));
    const p = grad.problems.find((x) => x.code === 'fit-not-possible')!;
    expect(p.severity).toBe('error');
    expect(p.message).toContain('free source_scale');
    const uniform = `${speciesX('39 u', '2S1/2')}${magnetAndBeam()}data s\n  kind = profile\n  beam = b\n  point = 10 um 3\n  point = 20 um 4\n  point = 30 um 5\nfit f\n  data = s\n  free = source_scale\n`;
    const q = analyze(uniform).problems.find((x) => x.code === 'fit-not-possible')!;
    expect(q.message).toContain('free gradient instead');
  });

  it('agrees with the uniform-gradient fit where the field is nearly uniform: source_scale × G = the fitted gradient', () => {
    // A spin-1/2 without a nucleus through a Helmholtz pair (0.3 T) and an anti-Helmholtz pair (~10 T/m) on one axis (invented numbers).
    const setup = (magnet: string): string => coilPairBeam({ magnet, beam: 'main', gradCurrent: '185.4', T: '600', slit: '10', detector: '10' });
    const mapped = setup('magnet m\n  sources = bias, grad\n  length  = 1 cm\n');
    const m = analyze(mapped).result!.magnets[0]!;
    const near = Array.from({ length: 161 }, (_, i) => -80e-6 + (160e-6 * i) / 160);
    const counts = syntheticCounts(mapped.replace('current = 185.4 A', 'current = 190.96 A'), near, 0.2, 0, 5, 9);
    const block = (fit: string) => `data scan\n  kind = profile\n  beam = main\n${near.map((x, i) => `  point = ${(x * 1e6).toFixed(3)} um ${counts[i]}`).join('\n')}\nfit shape\n  data = scan\n${fit}`;
    const byFlights = analyze(mapped + block('  free = source_scale, background\n')).result!.fits![0]!;
    const uniformText = setup(`magnet m\n  field = ${m.field_T} T\n  gradient = ${m.gradient_T_per_m} T/m\n  length = 1 cm\n`);
    const byGradient = analyze(uniformText + block('  free = gradient, background\n')).result!.fits![0]!;
    const s = byFlights.parameters.find((p) => p.name === 'source_scale')!;
    const g = byGradient.parameters.find((p) => p.name === 'gradient')!;
    // the gradient coil's current 3 % up moves |B|'s gradient 3 % (the bias coil has none at the centre): s ≈ 1.03 × (its share)
    expect(Math.abs((s.value * m.gradient_T_per_m!) / g.value - 1)).toBeLessThan(3e-3);
    expect(Math.abs(s.uncertainty! / s.value / Math.abs(g.uncertainty! / g.value) - 1)).toBeLessThan(1e-2);
  });
});

describe('the JSON document of a field-map beam with uncertainties and a source_scale fit', () => {
  it('validates against the published JSON Schema, and the text report shows value(unc)', () => {
    const counts = syntheticCounts(wires(2472), positions, 4, 12e-6, 20, 5);
    const text = twoWireBeam({ current: '2400(24)', T: '600(5)' }) + profileBlock(counts, '  free = source_scale, offset, background\n');
    const file = path.join(mkdtempSync(path.join(tmpdir(), 'fieldfit-')), 'setup.sublevel');
    writeFileSync(file, text);
    const doc = JSON.parse(cli('eval', file, '--format', 'json').out);
    const validate = new Ajv2020({ allErrors: true, strict: true }).compile(JSON.parse(readFileSync('docs/schema/evaluation.schema.json', 'utf8')));
    validate(doc);
    expect(validate.errors ?? []).toEqual([]);
    expect(doc.beams[0].peaks[0].position_m_unc).toBeGreaterThan(0);
    expect(doc.fits[0].parameters[0].name).toBe('source_scale');
    const report = cli('fit', file).out;
    expect(report).toMatch(/source_scale[^\n]*1\.0\d+\(\d+\)/);
    expect(report).not.toMatch(/NaN|Infinity/);
  });
});
