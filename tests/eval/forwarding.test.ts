/**
 * Every finding the physics layer raises reaches the diagnostics, whatever its severity:
 * the physics entry points are wrapped to add a planted finding, which must come out once.
 */
import { describe, expect, it, vi } from 'vitest';

const planted = (code: string) => ({ severity: 'info' as const, code, message: `planted ${code}` });

vi.mock('../../server/src/physics/transitions', async (importOriginal) => {
  const t = await importOriginal<typeof import('../../server/src/physics/transitions')>();
  const wrap = <A extends unknown[], R extends { issues: unknown[] }>(f: (...a: A) => R, code: string) => (...a: A): R => {
    const r = f(...a);
    return { ...r, issues: [...r.issues, planted(code)] };
  };
  return {
    ...t,
    selectionRules: (...a: Parameters<typeof t.selectionRules>) => [...t.selectionRules(...a), planted('planted-rules')],
    electricDipoleLine: wrap(t.electricDipoleLine, 'planted-line'),
    // The evaluation checks a line here and builds its components (electricDipoleLine) only when they are read.
    electricDipoleLineChecks: wrap(t.electricDipoleLineChecks, 'planted-line'),
    magneticTransitions: wrap(t.magneticTransitions, 'planted-transitions'),
    resonanceFields: wrap(t.resonanceFields, 'planted-resonance'),
    fieldInsensitivePoints: wrap(t.fieldInsensitivePoints, 'planted-insensitive'),
  };
});

vi.mock('../../server/src/physics/beam', async (importOriginal) => {
  const b = await importOriginal<typeof import('../../server/src/physics/beam')>();
  return {
    ...b,
    detectorPattern: (...a: Parameters<typeof b.detectorPattern>) => {
      const r = b.detectorPattern(...a);
      return { ...r, issues: [...r.issues, planted('planted-beam')] };
    },
  };
});

vi.mock('../../server/src/eval/exactAtField', async (importOriginal) => {
  const e = await importOriginal<typeof import('../../server/src/eval/exactAtField')>();
  return {
    ...e,
    exactAtField: (...a: Parameters<typeof e.exactAtField>) => ({
      ...e.exactAtField(...a),
      exact: [],
      errors: [{ code: 'basis-too-large', message: 'planted size cap' }],
      notices: [{ code: 'planted-level', severity: 'warning', message: 'planted notice' }],
    }),
  };
});

const { analyze } = await import('../../server/src/eval/analyze');

const TEXT = [
  'species Rb87',
  '  level g: 5s 2S1/2',
  '  level p: 5p 2P°3/2',
  'field f1 = 1 G',
  'field f2 = 2 G',
  'magnet m',
  '  field = 0.1 T',
  '  gradient = 100 T/m',
  '  length = 5 cm',
  'beam b',
  '  level = g',
  '  source = oven 400 K',
  '  slits = 20 um, 20 um apart 30 cm',
  '  magnet = m',
  '  drift = 20 cm',
  '  detector = 20 um',
  'line L: g -> p',
  'resonance r',
  '  level = g',
  '  lower = 1 0',
  '  upper = 2 0',
  '  frequency = 6.8 GHz',
  '  range = 0 G, 10 G',
  '',
].join('\n');

describe('findings of the physics layer', () => {
  it('reach the diagnostics, each once however many fields repeat it', () => {
    const codes = analyze(TEXT).result!.diagnostics.map((d) => d.code);
    for (const c of ['planted-rules', 'planted-line', 'planted-transitions', 'planted-resonance', 'planted-insensitive', 'planted-beam']) {
      expect(codes.filter((x) => x === c), c).toHaveLength(1);
    }
    // A size cap does not depend on the field: one note per level, not one per field.
    expect(codes.filter((x) => x === 'level-too-large')).toHaveLength(2);
    // The level engine's own warnings and notes too, under their own codes, once per level.
    expect(codes.filter((x) => x === 'planted-level')).toHaveLength(2);
  });
});
