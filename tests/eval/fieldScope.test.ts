/**
 * Which working fields a level is evaluated at (docs/format.md, "Which fields a level is evaluated
 * at"): a field's `species` list, the beams through a magnet, everything else at every field.
 * The physics at one field does not depend on which other fields are evaluated, so a pair left
 * out and computed on demand must equal the same pair in an evaluation that keeps every field.
 */
import { readFileSync } from 'node:fs';
import Ajv2020 from 'ajv/dist/2020';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { textReport } from '../../server/src/cli/textReport';
import { lineAtField } from '../../server/src/eval/lineAtField';
import { gJLookup } from '../../server/src/eval/gJLookup';
import { workingFields } from '../../server/src/eval/evaluate';
import { completion } from '../../server/src/features/completion';
import { hover } from '../../server/src/features/hover';
import { diskSources } from '../../server/src/service/workspaceFiles';
import { atCursor, hoverText, plain } from '../features/helpers';

const SPECIES = `species Rb87
  level ground: 5s 2S1/2
  level p32:    5p 2P°3/2

species K39
  level kg: 4s 2S1/2
  level kp: 4p 2P°3/2
`;

const APPARATUS = `
field guide = 10 G

magnet sel
  field    = 0.4 T
  gradient = 100 T/m
  length   = 5 cm

beam b
  level    = kg
  source   = oven 400 K
  slits    = 80 um, 50 um apart 40 cm
  magnet   = sel
  drift    = 30 cm

line D2: ground -> p32
line K2: kg -> kp

resonance rf
  level = ground
  range = 0 G, 5 G
`;

const SCOPED = `${SPECIES}
field bias = 3 G
  species = Rb87
${APPARATUS}`;

/** A copy without the `*_unc` keys. */
function withoutUncertainty<T>(x: T): T {
  return JSON.parse(JSON.stringify(x, (k, v) => (k.endsWith('_unc') ? undefined : v)));
}

type Named = { source: { kind: string; name: string } };
const names = (at: readonly Named[]): string[] => at.map((f) => `${f.source.kind} ${f.source.name}`);

describe('a level is evaluated at the working fields that concern its species', () => {
  const a = analyze(SCOPED);
  const r = a.result!;
  const level = (name: string) => r.levels.find((l) => l.level === name)!;

  it('a field with a species list concerns those species; one without, every species; a magnet, the species its beams carry', () => {
    expect(a.problems.filter((p) => p.severity === 'error')).toEqual([]);
    expect(names(level('ground').at_fields)).toEqual(['field bias', 'field guide']);
    expect(names(level('p32').at_fields)).toEqual(['field bias', 'field guide']);
    // Every level of the beam's species is at the magnet, not only the level that flies.
    expect(names(level('kg').at_fields)).toEqual(['field guide', 'magnet sel']);
    expect(names(level('kp').at_fields)).toEqual(['field guide', 'magnet sel']);
  });

  it('lines and resonances follow their species', () => {
    expect(names(r.lines.find((l) => l.name === 'D2')!.at_fields)).toEqual(['field bias', 'field guide']);
    expect(names(r.lines.find((l) => l.name === 'K2')!.at_fields)).toEqual(['field guide', 'magnet sel']);
    expect(names(r.resonances[0]!.at_fields)).toEqual(['field bias', 'field guide']);
  });

  it('the JSON names the fields of a species evaluated at some only, and the list of a field', () => {
    expect(r.species.map((s) => s.evaluated_at)).toEqual([
      [{ kind: 'field', name: 'bias' }, { kind: 'field', name: 'guide' }],
      [{ kind: 'field', name: 'guide' }, { kind: 'magnet', name: 'sel' }],
    ]);
    expect(r.magnets.map((m) => [m.name, m.beams])).toEqual([['sel', [{ name: 'b', species: 'K39' }]]]);
    const validate = new Ajv2020({ allErrors: true, strict: true }).compile(JSON.parse(readFileSync('docs/schema/evaluation.schema.json', 'utf8')));
    validate(JSON.parse(JSON.stringify(r)));
    expect(validate.errors ?? []).toEqual([]);
    expect(r.fields.map((f) => [f.name, f.field_unit, f.species])).toEqual([
      ['bias', 'G', ['Rb87']],
      ['guide', 'G', undefined],
    ]);
  });

  it('the report says which fields and why, under the species', () => {
    const text = textReport('x.sublevel', r);
    expect(text).toContain("  evaluated at 2 of the file's 3 working fields: field bias (its species list), field guide (every species); not at magnet sel (beam b of K39)");
    expect(text).toContain("  evaluated at 2 of the file's 3 working fields: field guide (every species), magnet sel (beam b); not at field bias (species = Rb87)");
  });

  it('a beam that names one species and a level of another: an error, the beam is not flown, and the text, the hover and the magnet\'s JSON all give the species it names', () => {
    const src = SCOPED.replace('  species = Rb87\n', '').replace('  level    = kg\n', '  species  = Rb87\n  level    = K39.kg\n');
    const b = analyze(src);
    expect(b.problems.filter((p) => p.code === 'beam-level-of-other-species').length).toBe(1);
    expect(b.result!.beams[0]!.computed).toBe(false);
    const rb = b.result!.species.find((s) => s.name === 'Rb87')!;
    expect(names(b.result!.levels.find((l) => l.level === 'ground')!.at_fields)).toEqual(['field bias', 'field guide', 'magnet sel']);
    expect(rb.evaluated_at).toBeUndefined();
    expect(b.result!.beams[0]!.species).toBe('Rb87');
    expect(b.result!.magnets[0]!.beams).toEqual([{ name: 'b', species: 'Rb87' }]);
    const k = b.result!.species.find((s) => s.name === 'K39')!;
    const line = "  evaluated at 2 of the file's 3 working fields: field bias (every species), field guide (every species); not at magnet sel (beam b of Rb87)";
    expect(k.evaluated_at).toEqual([{ kind: 'field', name: 'bias' }, { kind: 'field', name: 'guide' }]);
    expect(textReport('x.sublevel', b.result!)).toContain(line);
    const { analysis, position } = atCursor(src.replace('species K39', 'species K3|9'));
    expect(plain(hoverText(hover(analysis, position)))).toContain(line.trim());
  });

  it('a magnet no beam names is at every species; the others say which beams keep them out', () => {
    const src = `${SPECIES}magnet spare\n  field = 0.1 T\n  gradient = 1 T/m\n  length = 1 cm\n${APPARATUS}`;
    const r2 = analyze(src).result!;
    const rb = r2.species.find((s) => s.name === 'Rb87')!;
    expect(rb.evaluated_at).toEqual([{ kind: 'field', name: 'guide' }, { kind: 'magnet', name: 'spare' }]);
    expect(r2.magnets.map((m) => m.beams)).toEqual([undefined, [{ name: 'b', species: 'K39' }]]);
    expect(textReport('x.sublevel', r2)).toContain("  evaluated at 2 of the file's 3 working fields: field guide (every species), magnet spare (no beam: every species); not at magnet sel (beam b of K39)");
  });

  it('each pair equals the same pair of an evaluation at every field (the field alone sets it)', () => {
    const every = analyze(SCOPED.replace('  species = Rb87\n', '').replace('beam b', 'beam b2\n  level    = ground\n  source   = oven 400 K\n  slits    = 80 um, 50 um apart 40 cm\n  magnet   = sel\n  drift    = 30 cm\n\nbeam b')).result!;
    expect(every.species.every((s) => s.evaluated_at === undefined)).toBe(true);
    const ground = every.levels.find((l) => l.level === 'ground')!;
    expect(names(ground.at_fields)).toEqual(['field bias', 'field guide', 'magnet sel']);
    expect(level('ground').at_fields[0]).toEqual(ground.at_fields[0]);
    expect(level('kg').at_fields[1]).toEqual(every.levels.find((l) => l.level === 'kg')!.at_fields[2]);
  });

  it('a line at a field left out is computed on demand, equal to the evaluation that keeps it', () => {
    const sel = workingFields(a.model!).find((f) => f.source.name === 'sel')!;
    const onDemand = lineAtField(a.model!, 'D2', sel, gJLookup(r.levels))!;
    expect(names(onDemand.at_fields)).toEqual(['magnet sel']);
    const every = analyze(SCOPED.replace('  species = Rb87\n', '').replace('  magnet   = sel\n', '  magnet   = other\n') + 'magnet other\n  field = 0.2 T\n  gradient = 10 T/m\n  length = 1 cm\n').result!;
    const kept = every.lines.find((l) => l.name === 'D2')!.at_fields.find((f) => f.source.name === 'sel')!;
    // The same components; uncertainties are attached by the whole evaluation only (the panel and the spectrum CSV show none).
    expect(onDemand.at_fields[0]).toEqual(withoutUncertainty(kept));
    expect(onDemand.at_fields[0]!.components.length).toBe(68); // 8 × 16 sublevels, Δm = 0, ±1 (as at the other fields)
  });
});

describe('files whose fields concern every species are evaluated as before', () => {
  it('every example: each level at every working field, no evaluated_at', () => {
    for (const name of ['lithium-beam', 'rubidium-bias', 'rubidium-spectrum', 'shared-species-demo', 'lithium-whole-term', 'mistakes', 'two-wire-magnet', 'handmade-species']) {
      const path = `examples/${name}.sublevel`;
      const a = analyze(readFileSync(path, 'utf8'), diskSources(path));
      const all = names(workingFields(a.model!));
      expect(a.result!.species.filter((s) => s.evaluated_at !== undefined), name).toEqual([]);
      for (const l of [...a.result!.levels, ...a.result!.terms]) expect(names(l.at_fields), `${name} ${l.level}`).toEqual(all);
    }
  });

  it('lithium-beam: the whole term is at the magnet too (its species flies through it)', () => {
    const a = analyze(readFileSync('examples/lithium-beam.sublevel', 'utf8'));
    expect(names(a.result!.terms[0]!.at_fields)).toEqual(['field bias', 'magnet selector']);
  });

  it('a magnet that no beam names concerns every species', () => {
    const r = analyze(`${SPECIES}magnet m\n  field = 0.1 T\n  gradient = 1 T/m\n  length = 1 cm\n`).result!;
    expect(r.levels.map((l) => names(l.at_fields))).toEqual([['magnet m'], ['magnet m'], ['magnet m'], ['magnet m']]);
  });
});

describe('the species list of a field', () => {
  it('an unknown name is an error with a suggestion; the field then acts on the known ones only', () => {
    const a = analyze(`${SPECIES}field bias = 3 G\n  species = Rb78\nline K2: kg -> kp\n`);
    const p = a.problems.filter((x) => x.code === 'name-unknown');
    expect(p.map((x) => x.message)).toEqual(["no species named 'Rb78' — did you mean 'Rb87'?"]);
    expect(a.result!.levels.map((l) => l.at_fields.length)).toEqual([0, 0, 0, 0]);
    // A line whose species has no working field is computed at zero field, as in a file without fields.
    expect(names(a.result!.lines[0]!.at_fields)).toEqual(['field zero']);
    expect(textReport('x.sublevel', a.result!)).toContain("  evaluated at none of the file's 1 working fields; not at field bias (its species list names no known species)");
  });

  it('an empty list is an error and the field acts on every species', () => {
    const a = analyze(`${SPECIES}field bias = 3 G\n  species =\n`);
    expect(a.problems.filter((x) => x.severity === 'error').map((x) => x.code)).toContain('value-missing');
    expect(a.result!.levels.every((l) => l.at_fields.length === 1)).toBe(true);
  });

  it('names species of a used file', () => {
    const shared = readFileSync('examples/shared/alkali-levels.sublevel', 'utf8');
    const a = analyze('use "alkali.sublevel"\nfield bias = 3 G\n  species = Na23\n', { uri: '/ws/main.sublevel', readFile: (l) => (l === '/ws/alkali.sublevel' ? shared : undefined) });
    expect(a.problems.filter((x) => x.severity === 'error')).toEqual([]);
    const bySpecies = new Map(a.result!.levels.map((l) => [l.species, l.at_fields.length]));
    expect(bySpecies.get('Na23')).toBe(1);
    expect(bySpecies.get('K39')).toBe(0);
  });

  it('is a reference: rename and find references see it', () => {
    const a = analyze(SCOPED);
    const uses = a.model!.names.filter((u) => u.kind === 'species' && u.name === 'Rb87' && !u.isDeclaration);
    expect(uses.map((u) => u.range.start.line)).toEqual([SCOPED.split('\n').findIndex((l) => l === '  species = Rb87')]);
  });

  it('the field hover says which species it acts on and shows only their levels', () => {
    const { analysis, position } = atCursor(SCOPED.replace('field bias', 'field bi|as'));
    const text = plain(hoverText(hover(analysis, position)));
    expect(text).toContain('acts on Rb87 (its species list)');
    expect(text).toContain('Rb87 ground');
    expect(text).not.toContain('K39 kg');
  });

  it('the species hover gives the fields it is evaluated at', () => {
    const { analysis, position } = atCursor(SCOPED.replace('species K39', 'species K|39'));
    expect(plain(hoverText(hover(analysis, position)))).toContain("evaluated at 2 of the file's 3 working fields: field guide (every species), magnet sel (beam b); not at field bias (species = Rb87)");
  });

  it('completion offers the species not yet listed', () => {
    const { analysis, position } = atCursor(`${SPECIES}field bias = 3 G\n  species = Rb87, |\n`);
    expect(completion(analysis, position).map((i) => i.label)).toEqual(['K39']);
  });
});
