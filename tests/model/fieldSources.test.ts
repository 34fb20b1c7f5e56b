/**
 * Field-source blocks in the model: coil (single and pair), solenoid, wire (with return), slab;
 * the vector and direction readers; `sources = a, b` lists; and the plain-words diagnostics at
 * the right ranges (zero sizes, turns, currents, directions, sense without spacing, overlaps).
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { parseSetup } from '../../server/src/format/parser';
import { VACUUM_PERMEABILITY } from '../../server/src/physics/constants';
import type { SlabSpec, SolenoidSpec } from '../../server/src/physics/fields/types';
import { buildModel } from '../../server/src/model/buildModel';
import { NameIndex } from '../../server/src/model/nameIndex';
import { ProblemList } from '../../server/src/model/problems';
import { readSourceList } from '../../server/src/model/sourceListReader';
import type { FieldSourceModel, NameUse } from '../../server/src/model/types';
import { readDirection, readVector } from '../../server/src/model/vectorReader';

function model(text: string) {
  return buildModel(parseSetup(text));
}
/** Problems of parse + model as "line:col code" (1-based). */
function problems(text: string): string[] {
  const doc = parseSetup(text);
  const m = buildModel(doc);
  return [...doc.problems, ...m.problems].map((p) => `${p.range.start.line + 1}:${p.range.start.character + 1} ${p.code}`);
}
function setting(line: string) {
  const doc = parseSetup(`wire w\n  ${line}\n`);
  return doc.blocks[0]!.settings[0]!;
}

describe('vector and direction readers', () => {
  it('one unit at the end applies to all three; a unit on each number is read as written', () => {
    const p = new ProblemList();
    expect(readVector(setting('through = 0, 2, 3 cm'), 'length', p)?.value).toEqual([0, 0.02, 0.03]);
    expect(readVector(setting('through = 1 mm, -2 cm, 0.5 m'), 'length', p)?.value).toEqual([0.001, -0.02, 0.5]);
    expect(readVector(setting('through = 0, 2, 3 cm'), 'length', p)?.unit).toBe('cm');
    expect(p.items).toEqual([]);
  });

  it('says what is wrong with a malformed vector, at the value', () => {
    for (const [line, code, col] of [
      ['through = 0, 2 cm', 'vector-malformed', 13],
      ['through = 0, 2, 3', 'vector-malformed', 19],
      ['through = 0, up, 3 cm', 'vector-malformed', 16],
      ['through = 0, 2, 3 K', 'unit-wrong-dimension', 21],
    ] as const) {
      const p = new ProblemList();
      expect(readVector(setting(line), 'length', p), line).toBeUndefined();
      expect(p.items.map((x) => `${x.range.start.character + 1} ${x.code}`), line).toEqual([`${col} ${code}`]);
    }
  });

  it('directions: words, signed words, three numbers normalised; zero and unknown words are problems', () => {
    const p = new ProblemList();
    expect(readDirection(setting('direction = -z'), p)?.value).toEqual([0, 0, -1]);
    expect(readDirection(setting('direction = y'), p)?.value).toEqual([0, 1, 0]);
    const v = readDirection(setting('direction = 0, 3, 4'), p)!.value;
    expect(v[1]).toBeCloseTo(0.6, 15);
    expect(v[2]).toBeCloseTo(0.8, 15);
    expect(p.items).toEqual([]);
    const q = new ProblemList();
    expect(readDirection(setting('direction = 0, 0, 0'), q)).toBeUndefined();
    expect(readDirection(setting('direction = up'), q)).toBeUndefined();
    expect(q.items.map((x) => x.code)).toEqual(['direction-zero', 'direction-unknown']);
    expect(q.items[1]!.message).toContain("got 'up'");
    // An uncertainty on a direction component is read but cannot reach a result: a note, at that number.
    const u = new ProblemList();
    expect(readDirection(setting('direction = 0, 0.05(1), 1'), u)?.value[2]).toBeCloseTo(1 / Math.hypot(0.05, 1), 15);
    expect(u.items.map((x) => [x.code, x.severity])).toEqual([['direction-uncertainty-unused', 'info']]);
    expect(u.items[0]!.message).toContain('not used');
  });
});

describe('source blocks', () => {
  it('a coil pair with opposite sense is two loops at centre ± spacing/2 along the axis, currents opposite', () => {
    const m = model('coil quad\n  radius = 3.5 cm\n  turns = 120\n  current = 15 A\n  centre = 0, 0, 1 cm\n  axis = x\n  spacing = 7 cm\n  sense = opposite\n  conductor = 1.2 mm\n');
    expect(m.problems).toEqual([]);
    const s = m.sources[0]!;
    expect(s.kind).toBe('coil');
    expect(s.conductorM?.value).toBeCloseTo(1.2e-3, 15);
    expect(s.parts).toEqual([
      { kind: 'loop', centre: [-0.035, 0, 0.01], axis: [1, 0, 0], radiusM: 0.035, ampereTurns: 1800 },
      { kind: 'loop', centre: [0.035, 0, 0.01], axis: [1, 0, 0], radiusM: 0.035, ampereTurns: -1800 },
    ]);
  });

  it('a single loop defaults to the origin and the z axis; a solenoid is one current sheet', () => {
    const m = model('coil bias\n  radius = 10 cm\n  turns = 5\n  current = 2 A\n\nsolenoid tube\n  radius = 2 cm\n  length = 30 cm\n  turns = 600\n  current = 1.5 A\n  axis = 0, 1, 1\n');
    expect(m.problems).toEqual([]);
    expect(m.sources[0]!.parts).toEqual([{ kind: 'loop', centre: [0, 0, 0], axis: [0, 0, 1], radiusM: 0.1, ampereTurns: 10 }]);
    expect(m.sources[1]!.parts).toMatchObject([{ kind: 'solenoid', centre: [0, 0, 0], radiusM: 0.02, lengthM: 0.3, ampereTurns: 900 }]);
    const axis = (m.sources[1]!.parts[0] as SolenoidSpec).axis;
    expect(axis[0]).toBe(0);
    expect(Math.abs(axis[1]! - Math.SQRT1_2)).toBeLessThan(2e-16);
  });

  it('a wire with a return is two parallel wires with opposite currents; a finite one keeps its length', () => {
    const m = model('wire rail\n  current = 40 A\n  through = 0, 2, 0 mm\n  direction = x\n  length = 20 cm\n  return = 0, -2, 0 mm\n');
    expect(m.problems).toEqual([]);
    expect(m.sources[0]!.parts).toEqual([
      { kind: 'wire', direction: [1, 0, 0], lengthM: 0.2, point: [0, 0.002, 0], currentA: 40 },
      { kind: 'wire', direction: [1, 0, 0], lengthM: 0.2, point: [0, -0.002, 0], currentA: -40 },
    ]);
  });

  it('a slab takes μ0·M in T, or M in A/m, along a direction', () => {
    const m = model('slab pole\n  size = 10, 20, 5 mm\n  magnetisation = 1.2 T along -y\n\nslab other\n  size = 1, 1, 1 cm\n  centre = 0, 0, 5 cm\n  magnetisation = 1e6 A/m along 0, 0, 1\n');
    expect(m.problems).toEqual([]);
    expect(m.sources[0]!.parts).toEqual([{ kind: 'slab', centre: [0, 0, 0], sizeM: [0.01, 0.02, 0.005], magnetisationT: [0, -1.2, 0] }]);
    const j = (m.sources[1]!.parts[0] as SlabSpec).magnetisationT;
    expect(j[2]).toBeCloseTo(VACUUM_PERMEABILITY * 1e6, 15);
  });

  it('readSourceList resolves each name (recording the use), reports unknown names and repeats', () => {
    const m = model('coil a\n  radius = 1 cm\n  turns = 1\n  current = 1 A\n');
    const names: NameUse[] = [];
    const index = new NameIndex<FieldSourceModel>('source', names);
    const p = new ProblemList();
    for (const s of m.sources) index.declare(s, p);
    // Any comma list reads the same; `fit … data` stands in until the magnet, trap and slower keys land.
    const doc = parseSetup('fit m\n  data    = a, b, a\n');
    const list = readSourceList(doc.blocks[0]!.settings[0]!, index, p);
    expect(list?.map((s) => s.name)).toEqual(['a']);
    expect(p.items.map((x) => `${x.range.start.character + 1} ${x.code}`)).toEqual(['16 name-unknown', '19 source-listed-twice']);
    expect(names.filter((n) => !n.isDeclaration).map((n) => [n.name, n.target?.name])).toEqual([
      ['a', 'a'],
      ['b', undefined],
      ['a', 'a'],
    ]);
  });
});

describe('source diagnostics (code at line:column)', () => {
  const table: [string, string, string[]][] = [
    ['zero radius', 'coil c\n  radius = 0 cm\n  turns = 1\n  current = 1 A\n', ['2:12 value-out-of-range']],
    ['negative solenoid length', 'solenoid s\n  radius = 1 cm\n  length = -3 cm\n  turns = 10\n  current = 1 A\n', ['3:12 value-out-of-range']],
    ['zero turns', 'coil c\n  radius = 1 cm\n  turns = 0\n  current = 1 A\n', ['3:11 value-out-of-range']],
    ['fractional turns', 'coil c\n  radius = 1 cm\n  turns = 12.5\n  current = 1 A\n', ['3:11 source-turns-not-whole']],
    ['zero current', 'coil c\n  radius = 1 cm\n  turns = 3\n  current = 0 A\n', ['4:13 source-current-zero']],
    ['absurd current', 'wire w\n  current = 50 kA\n  through = 0, 0, 0 m\n  direction = z\n', ['2:13 source-current-absurd']],
    ['current in the wrong unit', 'coil c\n  radius = 1 cm\n  turns = 3\n  current = 2 V\n', ['4:15 unit-wrong-dimension']],
    ['missing keys', 'coil c\n  radius = 1 cm\n', ['1:6 source-incomplete']],
    ['unknown direction word', 'coil c\n  radius = 1 cm\n  turns = 3\n  current = 1 A\n  axis = up\n', ['5:10 direction-unknown']],
    ['zero direction', 'wire w\n  current = 1 A\n  through = 0, 0, 0 m\n  direction = 0, 0, 0\n', ['4:15 direction-zero']],
    ['sense without spacing', 'coil c\n  radius = 1 cm\n  turns = 3\n  current = 1 A\n  sense = opposite\n', ['5:3 source-sense-without-spacing']],
    ['zero slab edge', 'slab s\n  size = 1, 0, 1 cm\n  magnetisation = 1 T along z\n', ['2:10 value-out-of-range']],
    ['magnetisation beyond any magnet', 'slab s\n  size = 1, 1, 1 cm\n  magnetisation = 12 T along z\n', ['3:19 source-magnetisation-high']],
    ['magnetisation without direction', 'slab s\n  size = 1, 1, 1 cm\n  magnetisation = 1 T\n', ['3:19 vector-malformed']],
    ['return on the wire itself', 'wire w\n  current = 1 A\n  through = 0, 0, 0 m\n  direction = x\n  return = 5, 0, 0 cm\n', ['5:12 source-return-on-wire']],
    ['two equal loops at one place', 'coil a\n  radius = 2 cm\n  turns = 1\n  current = 1 A\ncoil b\n  radius = 20 mm\n  turns = 4\n  current = 1 A\n  axis = -z\n', ['5:6 source-overlap']],
    ['a wire through a loop\u2019s wire', 'coil a\n  radius = 2 cm\n  turns = 1\n  current = 1 A\nwire w\n  current = 1 A\n  through = 2, 0, 5 cm\n  direction = z\n', ['5:6 source-overlap']],
    ['two wires on one line', 'wire a\n  current = 1 A\n  through = 0, 0, 0 m\n  direction = x\nwire b\n  current = 2 A\n  through = 3, 0, 0 m\n  direction = -x\n', ['5:6 source-overlap']],
    ['a name used twice', 'coil a\n  radius = 2 cm\n  turns = 1\n  current = 1 A\nwire a\n  current = 1 A\n  through = 0, 0, 0 m\n  direction = x\n', ['5:6 name-duplicate']],
  ];
  for (const [name, text, expected] of table) {
    it(name, () => expect(problems(text)).toEqual(expected));
  }

  it('a loop beside a wire, and a wire in the loop plane outside it, are not overlaps', () => {
    expect(problems('coil a\n  radius = 2 cm\n  turns = 1\n  current = 1 A\nwire w\n  current = 1 A\n  through = 3, 0, 0 cm\n  direction = z\nwire v\n  current = 1 A\n  through = 0, 5, 0 cm\n  direction = x\n')).toEqual([]);
  });

  it('the overlap names the other source as related information', () => {
    const a = analyze('coil a\n  radius = 2 cm\n  turns = 1\n  current = 1 A\ncoil b\n  radius = 2 cm\n  turns = 1\n  current = 1 A\n');
    const p = a.problems.find((x) => x.code === 'source-overlap')!;
    expect(p.message).toBe("coil 'b' has a loop on top of one of coil 'a' (same centre, radius and axis); the field on it is infinite, so one of them is probably misplaced.");
    expect(p.related?.[0]?.range.start.line).toBe(0);
  });
});
