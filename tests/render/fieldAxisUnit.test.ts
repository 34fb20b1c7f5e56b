/**
 * The one rule for a figure's field axis (render/fieldAxisUnit.ts): the family the file wrote while
 * the tick labels stay short; a gauss axis past 0.1 T reads in T (1 T = 10⁴ G, SI definition of the
 * gauss). With no unit written the axis follows the reports' field text (eval/quantityText.ts fieldText):
 * G from 1 G up to 0.1 T, T from there; µT/nT below 1 G. The marker's echo of the user's value keeps the written unit.
 */
import { describe, expect, it } from 'vitest';
import { fieldAxisUnit } from '../../server/src/render/fieldAxisUnit';
import { diagramFor } from '../../server/src/views/diagram';
import { analyze } from '../../server/src/eval/analyze';
import { renderSlower } from '../../server/src/render';
import { slowerView } from '../../server/src/views/slowerView';
import { readFileSync } from 'node:fs';

describe('field axis unit', () => {
  it.each([
    [20, 'G', 'T'],
    [0.5, 'G', 'T'],
    [0.1, 'G', 'T'],
    [0.05, 'G', 'G'],
    [0.001, 'kG', 'G'],
    [0.02, 'mT', 'mT'],
    [20, 'mT', 'T'],
    [2e-6, 'uT', 'µT'],
    [0.005, undefined, 'G'],
    [0.0558, undefined, 'G'],
    [0.3, undefined, 'T'],
    [3, undefined, 'T'],
    [5e-5, undefined, 'µT'],
    [0, undefined, 'T'],
    [0, 'G', 'T'],
    [Number.NaN, undefined, 'T'],
    [Number.POSITIVE_INFINITY, 'mT', 'T'],
  ] as const)('axis to %s T, written %s → %s', (top, written, unit) => {
    expect(fieldAxisUnit(top, written)).toBe(unit);
  });

  it('a whole-term level swept to 20 T with its field written in G: the axis reads T, the marker keeps 2000 G', () => {
    const text = 'species Li7\n  level p: 2p 2P°  E_J = 1/2 446.800129853 THz, 3/2 446.810183007 THz\n    A_J = 1/2 45.9365 MHz, 3/2 -3.055 MHz\nfield big = 2000 G\n';
    const d = diagramFor(analyze(text), { view: 'levels', theme: 'export', toT: 20 });
    expect(d.ok).toBe(true);
    if (!d.ok) return;
    expect(d.svg).toContain('data-x-unit="T"');
    expect(d.svg).toContain('>B (T)<');
    expect(d.svg).not.toContain('50,000');
    expect(d.svg).toContain('2000 G');
  });

  it('a slower whose field passes 0.1 T reads its B axis in T; the example (558 G, no unit written) reads G as its reports do', () => {
    const s = analyze(readFileSync(new URL('../../examples/sodium-slower.sublevel', import.meta.url), 'utf8')).result!.slowers![0]!;
    expect(renderSlower(slowerView(s)!, { kind: 'export' })).toContain('>B (G)<');
    // A bias written in gauss keeps the slower's axis in gauss.
    expect(renderSlower({ ...slowerView(s)!, fieldWrittenUnit: 'G' }, { kind: 'export' })).toContain('>B (G)<');
    const strong = { ...s, samples: s.samples!.map((x) => ({ ...x, B_ideal_T: 4 * x.B_ideal_T, B_coils_T: 4 * x.B_coils_T! })) };
    expect(renderSlower({ ...slowerView(strong)!, fieldWrittenUnit: 'G' }, { kind: 'export' })).toContain('>B (T)<');
    expect(renderSlower(slowerView(strong)!, { kind: 'export' })).toContain('>B (T)<');
  });
});
