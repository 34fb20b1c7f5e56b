/**
 * Species from other files through `use`, with an in-memory reader: resolution (by URI and by
 * path), a missing file, a used file with errors, circles, the depth limit, duplicates, and the
 * evaluation of used levels.
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { formatRange } from '../../server/src/format/positions';
import { memorySources } from '../../server/src/model/sources';

const lines = (...l: string[]): string => l.join('\n');

const ALKALIS = lines('# shared', 'species K39', '  level ground: 4s 2S1/2', '  level p12:    4p 2P°1/2', '');
const ROOT = 'file:///ws/main.sublevel';

/** Analyses `text` as file:///ws/main.sublevel beside the given files (paths relative to file:///ws/). */
function run(text: string, files: Record<string, string>) {
  const all = Object.fromEntries(Object.entries(files).map(([k, v]) => [`file:///ws/${k}`, v]));
  return analyze(text, memorySources(ROOT, all));
}

/** Problems other than regime notes, as `code range` (0-based). */
function problems(a: ReturnType<typeof run>): string[] {
  return a.problems.filter((p) => !p.code.startsWith('zeeman-')).map((p) => `${p.code} ${formatRange(p.range)}`);
}

describe('species from a used file', () => {
  const text = lines('use "atoms/alkalis.sublevel"', 'field bias = 1 G', 'line D1: ground -> p12', '');

  it('are available by name, with where they come from', () => {
    const a = run(text, { 'atoms/alkalis.sublevel': ALKALIS });
    expect(problems(a)).toEqual([]);
    const k = a.model!.species.find((s) => s.name === 'K39')!;
    expect(k.origin).toEqual({ uri: 'file:///ws/atoms/alkalis.sublevel', path: 'atoms/alkalis.sublevel', useRange: a.doc.uses[0]!.path!.range });
    // The ranges stay those of the used file: `species K39` is on its line 2.
    expect(formatRange(k.nameRange)).toBe('1:8-1:11');
    expect(a.model!.lines[0]!.lower?.name).toBe('ground');
    expect(a.model!.uses[0]).toMatchObject({ location: 'file:///ws/atoms/alkalis.sublevel', loaded: true });
    expect(a.model!.uses[0]!.species.map((s) => s.name)).toEqual(['K39']);
  });

  it('resolve references to the other file (for go-to-definition)', () => {
    const a = run(text, { 'atoms/alkalis.sublevel': ALKALIS });
    const ref = a.model!.names.find((n) => n.name === 'p12' && !n.isDeclaration)!;
    expect(ref.target).toEqual({ kind: 'level', name: 'p12', range: { start: { line: 3, character: 8 }, end: { line: 3, character: 11 } }, uri: 'file:///ws/atoms/alkalis.sublevel' });
    // No declaration of the used file's names is recorded in this file.
    expect(a.model!.names.filter((n) => n.isDeclaration)).toEqual([
      expect.objectContaining({ kind: 'field', name: 'bias' }),
      expect.objectContaining({ kind: 'line', name: 'D1' }),
    ]);
  });

  it('are evaluated like the file’s own, and the result says where they are defined', () => {
    const a = run(text, { 'atoms/alkalis.sublevel': ALKALIS });
    expect(a.result!.species).toEqual([expect.objectContaining({ name: 'K39', defined_in: 'atoms/alkalis.sublevel', levels: ['ground', 'p12'] })]);
    const ground = a.result!.levels.find((l) => l.species === 'K39' && l.level === 'ground')!;
    // 39K ground-state hyperfine splitting 461.719 720 2 MHz (Tiecke's potassium data compilation, as in the built-in table).
    expect(ground.hyperfine!.intervals[0]!.interval_Hz).toBeCloseTo(461.7197202e6, 0);
    // Regime notes about a used level stay on this file's lines (the field here).
    for (const p of a.problems) expect(p.range.start.line).toBeLessThanOrEqual(2);
  });

  it('ignore everything in the used file but its species (and its settings)', () => {
    const shared = lines('settings', '  g_s = 2', 'species Na23', '  level g: 3s 2S1/2', 'field there = 5 G', 'magnet m', '  field = 1 T');
    const a = run(lines('use "s.sublevel"', 'field here = 1 G'), { 's.sublevel': shared });
    expect(a.model!.fields.map((f) => f.name)).toEqual(['here']);
    expect(a.model!.magnets).toEqual([]);
    expect(a.model!.settings.gS).toBe('exact');
  });

  it('resolve with plain paths as well as URIs', () => {
    const a = analyze(lines('use "atoms/alkalis.sublevel"', 'line D1: ground -> p12'), memorySources('/ws/main.sublevel', { '/ws/atoms/alkalis.sublevel': ALKALIS }));
    expect(problems(a)).toEqual([]);
    expect(a.model!.species[0]!.origin?.uri).toBe('/ws/atoms/alkalis.sublevel');
  });

  it('follow a nested use; the species says which file declares it', () => {
    const a = run(lines('use "b.sublevel"', 'line D1: ground -> p12'), {
      'b.sublevel': lines('use "deep/c.sublevel"', 'species Na23'),
      'deep/c.sublevel': ALKALIS,
    });
    expect(problems(a)).toEqual([]);
    expect(a.model!.species.map((s) => [s.name, s.origin?.path, s.origin?.uri])).toEqual([
      ['Na23', 'b.sublevel', 'file:///ws/b.sublevel'],
      ['K39', 'deep/c.sublevel', 'file:///ws/deep/c.sublevel'],
    ]);
  });

  it('keep the sources read, for the language server and the evaluation worker', () => {
    const a = run(text, { 'atoms/alkalis.sublevel': ALKALIS });
    expect(a.sources).toEqual({ uri: ROOT, files: { 'file:///ws/atoms/alkalis.sublevel': ALKALIS }, folders: {} });
  });
});

describe('what goes wrong with use', () => {
  it('a missing file: an error at the path, with the setup files beside it as suggestions', () => {
    const a = run(lines('use "atoms/alkali.sublevel"', 'line D1: ground -> p12'), { 'atoms/alkalis.sublevel': ALKALIS, 'atoms/notes.txt': 'x' });
    const p = a.problems.find((x) => x.code === 'use-file-missing')!;
    expect(p.message).toBe("cannot read atoms/alkali.sublevel: no such file — did you mean 'atoms/alkalis.sublevel'?");
    expect(formatRange(p.range)).toBe('0:5-0:26');
    expect(p.data?.suggestions).toEqual(['atoms/alkalis.sublevel']);
    // The names it would have brought are then unknown.
    expect(problems(a)).toContain('name-unknown 1:9-1:15');
  });

  it('a text that is not read from a file cannot use another', () => {
    const a = analyze('use "x.sublevel"\n');
    expect(a.problems.map((p) => [p.code, p.message])).toEqual([['use-file-missing', 'cannot read x.sublevel: this text is not read from a file, so it cannot use other files.']]);
  });

  it('a used file with errors: one warning at the use line, pointing into that file', () => {
    const broken = lines('species K39', '  level ground: 4s 2S1/2', '  level p12: 4p 2P°5/2', '  level p32: 4p 2P°3/2  A = 6 T');
    const a = run(lines('use "atoms.sublevel"', 'line D2: ground -> p32'), { 'atoms.sublevel': broken });
    const warnings = a.problems.filter((p) => p.code === 'use-has-errors');
    expect(warnings).toHaveLength(1);
    const w = warnings[0]!;
    expect(w.severity).toBe('warning');
    expect(formatRange(w.range)).toBe('0:0-0:20');
    expect(w.message).toMatch(/^atoms\.sublevel has 2 errors; first: line 3: J = 5\/2 is impossible for 2P/);
    expect(w.related).toEqual([{ message: expect.stringMatching(/^J = 5\/2/), range: { start: { line: 2, character: 19 }, end: { line: 2, character: 22 } }, uri: 'file:///ws/atoms.sublevel' }]);
    // The used file's own problems are not repeated here.
    expect(problems(a)).toEqual(['use-has-errors 0:0-0:20']);
  });

  it('errors two files down are not silent at the top', () => {
    const a = run('use "b.sublevel"', { 'b.sublevel': 'use "c.sublevel"', 'c.sublevel': 'species Foo' });
    expect(a.problems).toHaveLength(1);
    expect(a.problems[0]!.message).toMatch(/^b\.sublevel uses a file with errors: line 1: c\.sublevel has 1 error; first: line 1: 'Foo' is not a built-in species/);
  });

  it.each([
    ['a file that uses itself', { 'main.sublevel': 'use "main.sublevel"' }, 'use "main.sublevel"', ['use-cycle 0:5-0:18']],
    ['two files that use each other', { 'b.sublevel': 'use "main.sublevel"\nspecies Na23' }, 'use "b.sublevel"', ['use-cycle 0:5-0:15']],
    // main is not on the circle b → c → b: it hears of it as an error of b.
    ['a circle further down', { 'b.sublevel': 'use "c.sublevel"', 'c.sublevel': 'use "b.sublevel"' }, 'use "b.sublevel"\nspecies K39', ['use-has-errors 0:0-0:16']],
  ])('a circle is an error and ends: %s', (_name, files, text, expected) => {
    expect(problems(run(text, files as Record<string, string>))).toEqual(expected);
  });

  it('names the circle', () => {
    const a = run('use "b.sublevel"', { 'b.sublevel': 'use "main.sublevel"' });
    const p = a.problems.find((x) => x.code === 'use-cycle')!;
    expect(p.message).toBe('b.sublevel uses this file in turn: files cannot use each other in a circle.');
    expect(p.related![0]).toMatchObject({ uri: 'file:///ws/b.sublevel', message: 'main.sublevel leads back to this file (main.sublevel → b.sublevel → main.sublevel): files cannot use each other in a circle.' });
  });

  it('names a circle even when the analysed text has no location of its own', () => {
    const { uri: _none, ...reader } = memorySources('', { '/ws/c.sublevel': 'use "c.sublevel"' });
    // Without a location of its own, the text may read only below the roots it is given.
    expect(analyze('use "/ws/c.sublevel"', reader).problems.map((p) => p.code)).toEqual(['use-outside-root']);
    const a = analyze('use "/ws/c.sublevel"', { ...reader, roots: ['/ws'] });
    expect(a.problems.map((p) => p.code)).toEqual(['use-has-errors']);
    expect(a.problems[0]!.message).toContain('leads back to this file (c.sublevel → c.sublevel)');
  });

  it('follows at most 8 files deep', () => {
    const files: Record<string, string> = {};
    for (let i = 1; i <= 12; i++) files[`f${i}.sublevel`] = `use "f${i + 1}.sublevel"\nspecies S${i}\n  mass = ${i} u`;
    const a = run('use "f1.sublevel"', files);
    const names = a.model!.species.map((s) => s.name);
    expect(names).toContain('S8');
    expect(names).not.toContain('S9');
    expect(a.problems.map((p) => p.code)).toEqual(['use-has-errors']);
    expect(a.problems[0]!.message).toContain('`use` is followed at most 8 files deep');
  });

  it('a species declared here and in a used file: name-duplicate here, pointing at the other', () => {
    const a = run(lines('use "atoms/alkalis.sublevel"', 'species K39', '  level g: 4s 2S1/2'), { 'atoms/alkalis.sublevel': ALKALIS });
    const p = a.problems.find((x) => x.code === 'name-duplicate')!;
    expect(formatRange(p.range)).toBe('1:8-1:11');
    expect(p.message).toBe("species 'K39' is also declared in atoms/alkalis.sublevel (used on line 1); the one here is used.");
    expect(p.related).toEqual([{ message: "'K39' is declared in atoms/alkalis.sublevel", range: expect.objectContaining({ start: { line: 1, character: 8 } }), uri: 'file:///ws/atoms/alkalis.sublevel' }]);
    expect(a.model!.species.map((s) => [s.name, s.origin === undefined])).toEqual([['K39', true]]);
  });

  it('two used files that declare the same name: an error at the second use', () => {
    const a = run(lines('use "a.sublevel"', 'use "b.sublevel"'), { 'a.sublevel': 'species Na23', 'b.sublevel': 'species Na23' });
    expect(problems(a)).toEqual(['name-duplicate 1:5-1:15']);
    expect(a.problems[0]!.related!.map((r) => r.uri)).toEqual(['file:///ws/b.sublevel', 'file:///ws/a.sublevel']);
  });

  it('one file reached twice is no duplicate', () => {
    const a = run(lines('use "a.sublevel"', 'use "b.sublevel"', 'line D1: ground -> p12'), {
      'a.sublevel': 'use "shared.sublevel"',
      'b.sublevel': 'use "shared.sublevel"',
      'shared.sublevel': ALKALIS,
    });
    expect(problems(a)).toEqual([]);
    expect(a.model!.species.map((s) => s.name)).toEqual(['K39']);
  });
});

describe('what use may read', () => {
  const SECRET = 'root:x:0:0:very-secret-token';
  /** A reader that holds files outside the workspace too, so that only the confinement keeps them out. */
  const everywhere = (extra: Record<string, string> = {}) => ({
    'file:///ws/ok.sublevel': ALKALIS,
    'file:///etc/passwd': SECRET,
    'file:///etc/x.sublevel': SECRET,
    'file:///ws/notes.txt': SECRET,
    ...extra,
  });

  const cases: { name: string; use: string; code: string; roots?: string[] }[] = [
    { name: 'an absolute path outside the workspace', use: '/etc/passwd', code: 'use-not-setup-file' },
    { name: 'a URI outside the workspace', use: 'file:///etc/passwd', code: 'use-not-setup-file' },
    { name: 'a setup file outside the workspace', use: '/etc/x.sublevel', code: 'use-outside-root' },
    { name: 'a climb out of the workspace', use: '../../../etc/x.sublevel', code: 'use-outside-root' },
    { name: 'an escaped climb in a URI', use: 'file:///ws/..%2F..%2Fetc/x.sublevel', code: 'use-outside-root' },
    { name: 'a file of another kind inside the workspace', use: 'notes.txt', code: 'use-not-setup-file' },
    { name: 'a process file', use: '/proc/self/environ', code: 'use-not-setup-file' },
    { name: 'a setup file in a folder that is not a root', use: '/ws/ok.sublevel', code: 'use-outside-root', roots: ['file:///other/'] },
  ];
  for (const c of cases) {
    it(`refuses ${c.name}, naming the path and quoting nothing of the file`, () => {
      const reader = { ...memorySources(ROOT, everywhere()), ...(c.roots ? { roots: c.roots } : {}) };
      const read: string[] = [];
      const a = analyze(`use "${c.use}"`, { ...reader, readFile: (l) => (read.push(l), reader.readFile!(l)) });
      expect(a.problems.map((p) => p.code)).toEqual([c.code]);
      expect(a.problems[0]!.severity).toBe('error');
      expect(a.problems[0]!.message).toContain(c.use);
      expect(JSON.stringify(a)).not.toContain('secret');
      expect(read).toEqual([]); // refused before it is opened
    });
  }

  it('reads a setup file below the root, in a subfolder too', () => {
    expect(problems(run('use "ok.sublevel"', { 'ok.sublevel': ALKALIS }))).toEqual([]);
    expect(problems(run('use "a/b.sublevel"', { 'a/b.sublevel': ALKALIS }))).toEqual([]);
  });

  it('keeps the analysed file’s roots for the files it uses (a used file cannot climb further out)', () => {
    const a = run('use "sub/a.sublevel"', { 'sub/a.sublevel': 'use "../../etc/x.sublevel"' });
    expect(a.problems.map((p) => p.code)).toEqual(['use-has-errors']);
    expect(a.problems[0]!.message).toContain('is outside');
  });

  it('refuses a link that leads outside the root', () => {
    const reader = memorySources(ROOT, everywhere({ 'file:///ws/link.sublevel': SECRET }));
    const realLocation = (l: string): string | undefined => (l === 'file:///ws/link.sublevel' ? 'file:///etc/x.sublevel' : l);
    const a = analyze('use "link.sublevel"', { ...reader, realLocation });
    expect(a.problems.map((p) => `${p.code} ${p.message}`)).toEqual([
      'use-outside-root link.sublevel is not read: it is a link that leads outside file:///ws/; `use` reads only files inside it.',
    ]);
    // A link inside the root that stays inside is fine.
    const inside = analyze('use "link.sublevel"', { ...memorySources(ROOT, { 'file:///ws/link.sublevel': ALKALIS }), realLocation: (l) => l.replace('link', 'real') });
    expect(inside.problems.filter((p) => p.severity === 'error')).toEqual([]);
  });

  it('does not read a used file over the cap, and says how large it is', () => {
    const big = `species K39\n${'# filler\n'.repeat(120_000)}`;
    const a = run('use "big.sublevel"', { 'big.sublevel': big });
    expect(a.problems.map((p) => `${p.code} ${p.message}`)).toEqual([
      `use-file-too-large big.sublevel is not read: it has ${big.length} characters, more than the 500000 a used file may have.`,
    ]);
    const many = run('use "many.sublevel"', { 'many.sublevel': `species K39\n${'  level x: 4s 2S1/2\n'.repeat(20_000)}` });
    expect(many.problems.map((p) => `${p.code} ${p.message}`)).toEqual([
      'use-file-too-large many.sublevel is not used: it has more than 20000 statements, the most a setup file may have.',
    ]);
    const onDisk = analyze('use "huge.sublevel"', { ...memorySources(ROOT, {}), readFile: () => ({ tooLarge: true, bytes: 15_000_000 }) });
    expect(onDisk.problems[0]!.message).toBe('huge.sublevel is not read: it has 15000000 bytes, more than the 500000 a used file may have.');
  });
});
