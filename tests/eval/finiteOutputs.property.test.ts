/**
 * Nothing misleading: on random valid setups no text, JSON or hover/inlay output of the
 * analysis holds NaN or Infinity, and the evaluation result itself holds only finite numbers.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { finiteJsonText } from '../../server/src/eval/machineText';
import { textReport } from '../../server/src/cli/textReport';
import { NEWER_BLOCKS } from '../features/newerBlockMistakes';
import { mutatedText } from '../mutatedExamples';

const RUNS = Number(process.env.FUZZ_RUNS ?? 40);
/**
 * Grows with the case count: a fixed 600 s stopped FUZZ_RUNS=20000 (and 2000 on the loaded machine,
 * about 0.3 s a case) before it had drawn its cases, so the long runs never finished.
 */
const TIME_LIMIT = Math.max(600_000, RUNS * 1000);

const SPECIES = [
  { name: 'Li7', s: '2s 2S1/2', p: '2p 2P°3/2' },
  { name: 'Na23', s: '3s 2S1/2', p: '3p 2P°1/2' },
  { name: 'Rb87', s: '5s 2S1/2', p: '5p 2P°3/2' },
  { name: 'K40', s: '4s 2S1/2', p: '4p 2P°3/2' },
  { name: 'H', s: '1s 2S1/2', p: '2p 2P°1/2' },
];
const FIELD_UNITS: [string, number][] = [['T', 1], ['mT', 1e3], ['G', 1e4], ['uT', 1e6], ['kG', 10]];

const number = (min: number, max: number): fc.Arbitrary<number> => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const written = (x: number): string => String(Number(x.toPrecision(4)));

const setup = fc
  .record({
    species: fc.constantFrom(...SPECIES),
    field: fc.oneof(fc.constant(0), number(1e-7, 2)),
    fieldUnit: fc.constantFrom(...FIELD_UNITS),
    magnetField: fc.oneof(fc.constant(0), number(1e-6, 3)),
    magnetUnit: fc.constantFrom(...FIELD_UNITS),
    gradient: fc.oneof(fc.constant(0), number(-500, 500)),
    length: number(0.005, 0.5),
    source: fc.constantFrom('oven 450 K', 'oven 900 K', 'jet 1200 m/s spread 8 %', 'speed 700 m/s'),
    slits: fc.tuple(number(5, 200), number(5, 200), number(5, 80)),
    drift: number(1, 200),
    detector: number(0, 100),
    populations: fc.oneof(fc.constant(''), fc.constant('  populations = 1 1\n'), fc.constant('  populations = 2 +2 1, 1 -1 0\n')),
    rangeTo: number(1e-3, 50),
    frequency: fc.oneof(fc.constant(''), number(1e3, 1e10).map((f) => `  frequency = ${written(f)} Hz\n`)),
  })
  .map((r) => {
    const [fu, fscale] = r.fieldUnit;
    const [mu, mscale] = r.magnetUnit;
    return `species ${r.species.name}
  level g: ${r.species.s}
  level e: ${r.species.p}
field f = ${written(r.field * fscale)} ${fu}
magnet m
  field = ${written(r.magnetField * mscale)} ${mu}
  gradient = ${written(r.gradient)} T/m
  length = ${written(r.length)} m
beam b
  level = g
  source = ${r.source}
  slits = ${written(r.slits[0])} um, ${written(r.slits[1])} um apart ${written(r.slits[2])} cm
  magnet = m
  drift = ${written(r.drift)} cm
  detector = ${written(r.detector)} um
${r.populations}resonance r
  level = g
  range = 0 G, ${written(r.rangeTo)} G
${r.frequency}line L: g -> e
`;
  });

/** Paths of the non-finite numbers in a value. */
function nonFinite(v: unknown, path = '$'): string[] {
  if (typeof v === 'number') return Number.isFinite(v) ? [] : [path];
  if (Array.isArray(v)) return v.flatMap((x, i) => nonFinite(x, `${path}[${i}]`));
  if (v && typeof v === 'object') return Object.entries(v).flatMap(([k, x]) => nonFinite(x, `${path}.${k}`));
  return [];
}

describe('no NaN or Infinity in any output', () => {
  it('on random valid setups', () => {
    fc.assert(
      fc.property(setup, (text) => {
        const a = analyze(text);
        expect(a.problems.filter((p) => p.code === 'internal-error'), text).toEqual([]);
        expect(a.result, text).toBeDefined();
        const r = a.result!;
        expect(nonFinite(r), text).toEqual([]);
        const report = textReport('x.sublevel', r).join('\n');
        expect(report, text).not.toMatch(/NaN|Infinity/);
        expect(finiteJsonText(r)).not.toMatch(/NaN|Infinity/);
        for (const d of r.diagnostics) expect(d.message, text).not.toMatch(/NaN|Infinity/);
      }),
      { numRuns: RUNS },
    );
  }, TIME_LIMIT);

  it('on the newer blocks\' mistakes (sources, traps, slowers, data, fits, line shapes) with random edits', () => {
    fc.assert(
      fc.property(mutatedText(NEWER_BLOCKS.map((c) => c.text), 4), (text) => {
        const a = analyze(text);
        expect(a.problems.filter((p) => p.code === 'internal-error'), text).toEqual([]);
        const r = a.result!;
        expect(nonFinite(r), text).toEqual([]);
        expect(textReport('x.sublevel', r).join('\n'), text).not.toMatch(/NaN|Infinity/);
        expect(finiteJsonText(r)).not.toMatch(/NaN|Infinity/);
      }),
      { numRuns: RUNS },
    );
  }, TIME_LIMIT);
});
