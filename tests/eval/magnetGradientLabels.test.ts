/**
 * A magnet built from sources has two gradients: its own ∂|B|/∂z at the centre of the beam line
 * and a beam's ∂|B|/∂z averaged along the magnet's length. Text, hover and the JSON schema say
 * which is which. Centre value: two long opposite currents ±I at y = ±a, on their mid-plane
 * ∂|B|/∂z = −2 μ0 I a z/π(a² + z²)² = −147.46 T/m for I = 2400 A, a = 2 mm, z = 1.5 mm
 * (superposition of two infinite wires, textbook; the example's 12 cm wires are close to it).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { textReport } from '../../server/src/cli/textReport';
import { hover } from '../../server/src/features/hover';
import { analysisOf, hoverText, plain } from '../features/helpers';

const TEXT = readFileSync(new URL('../../examples/two-wire-magnet.sublevel', import.meta.url), 'utf8');
const MAGNET_LINE = TEXT.split('\n').findIndex((l) => l.startsWith('magnet selector'));

describe('a sources-built magnet labels its centre gradient and the beam-averaged one', () => {
  const r = analyze(TEXT).result!;
  const report = textReport('x', r).join('\n');

  it('the text report: the magnets table says where its values are taken, the beam says what it averages over', () => {
    expect(report).toContain('selector: field and gradient at the centre of the beam line, (0, 0, 1.5) mm; averaged along the 8 cm of beam line, ∂|B|/∂z is -147.5 T/m (beam main)');
    expect(report).toMatch(/∂\|B\|\/∂z averaged along the 8 cm of beam line through magnet selector is -147\.5 T\/m \(at its centre -147\.4\d T\/m\)/);
    expect(report).not.toContain('mean ∂|B|/∂z');
  });

  it('the hover: both gradients, each named', () => {
    const h = plain(hoverText(hover(analysisOf(TEXT), { line: MAGNET_LINE, character: 8 })));
    expect(h).toMatch(/gradient ∂\|B\|\/∂z at the centre of the beam line = -147\.4\d+ T\/m/);
    expect(h).toContain('gradient ∂|B|/∂z averaged along the 8 cm of beam line: -147.5 T/m (beam main)');
  });

  it('the JSON keys are documented as the centre value and the average', () => {
    const schema = JSON.parse(readFileSync(new URL('../../docs/schema/evaluation.schema.json', import.meta.url), 'utf8'));
    const text = JSON.stringify(schema);
    expect(text).toContain('the value at the centre of its beam line (at_m) only');
    expect(text).toContain("averaged along the magnet's length (length_m) of the beam line");
    expect(r.magnets[0]!.gradient_T_per_m!).toBeCloseTo(-147.46, 0);
  });
});
