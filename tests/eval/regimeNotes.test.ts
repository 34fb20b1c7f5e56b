/**
 * Regime notes: one per level whatever the number of fields, naming every field past the linear
 * regime, with the thresholds to 3 significant digits in the unit family the file used.
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';

// Invented bench: Rb87 ground and D2 upper level, four bias fields and a magnet.
const SETUP = `species Rb87
  level ground: 5s 2S1/2
  level upper: 5p 2P°3/2
field trap = 3 G
field probe = 120 G
field probe2 = 120 G
field tiny = 1 mG
magnet m
  field = 0.6 T
  gradient = 10 T/m
  length = 10 cm
`;

const notes = (text: string) => analyze(text).result!.diagnostics.filter((d) => d.code.startsWith('zeeman-'));

describe('regime notes', () => {
  it('say one note per level, listing its fields, in the order they appear', () => {
    const ns = notes(SETUP);
    expect(ns.map((n) => `${n.line}:${n.column} ${n.code}`)).toEqual(['2:9 zeeman-not-linear', '3:9 zeeman-strong-field']);
    const [ground, upper] = ns.map((n) => n.message);
    expect(ground).toBe(
      'level Rb87.ground is in the intermediate regime at field probe (120 G), field probe2 (120 G) and magnet m (0.6 T) (the linear formula holds to 1 % only below 48.7 G); energies come from exact diagonalisation.',
    );
    // Each threshold in the unit family of the fields it is about: the magnet was written in T, the bias fields in G.
    expect(upper).toBe(
      'level Rb87.upper is in the strong-field (decoupled) regime at magnet m (0.6 T) (above 237 mT): labels |F, m_F> no longer describe the states; read the |m_J, m_I> labels; and in the intermediate regime at field trap (3 G), field probe (120 G) and field probe2 (120 G) (the linear formula holds to 1 % only below 462 mG); energies come from exact diagonalisation.',
    );
    expect(ground).not.toMatch(/tiny/);
    expect(upper).not.toMatch(/tiny/);
  });

  it('write thresholds to at most 3 significant digits', () => {
    for (const n of notes(SETUP)) {
      for (const m of n.message.matchAll(/(?:above|below) ([\d.]+) /g)) expect(m[1]!.replace('.', '').replace(/^0+/, '').length, n.message).toBeLessThanOrEqual(3);
    }
  });

  it('state the engine’s linear limit, rounded (not a different number)', () => {
    const a = analyze(SETUP).result!;
    const upper = a.levels.find((l) => l.level === 'upper')!;
    const limitT = upper.at_fields[0]!.regime!.linear_limit_T!;
    const shown = Number(/only below ([\d.]+) mG/.exec(notes(SETUP)[1]!.message)![1]) * 1e-7;
    expect(Math.abs(shown - limitT) / limitT).toBeLessThan(0.005);
  });

  it('a file with many fields gets no more notes than levels', () => {
    const more = SETUP + Array.from({ length: 8 }, (_, i) => `field f${i} = ${50 + 10 * i} G\n`).join('');
    expect(notes(more)).toHaveLength(2);
  });
});
