/**
 * docs/format.md names everything the parser and the model accept: every block word, every key of
 * every block (in that block's section), every level key, every word a value may hold, every unit
 * name and every choice the model tables list. The lists come from the code's own tables, so a key
 * added to the parser without a line in the reference fails here.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { BLOCK_KEYS, BLOCK_WORDS, LEVEL_KEYS, LEVEL_WORD, USE_WORD, VALUE_WORDS } from '../../server/src/format/schema';
import { LONG_NAMES, SPECIAL_NAMES, SYMBOLS } from '../../server/src/format/unitGrammar';
import { DATA_KINDS } from '../../server/src/model/dataBuilder';
import { FIT_PARAMETERS } from '../../server/src/model/fitTypes';
import { SLOWER_DESIGNS } from '../../server/src/model/slowerBuilder';
import { SOURCE_BLOCKS } from '../../server/src/model/sourceBuilder';
import { SPECTRUM_DIRECTIONS, SPECTRUM_LIGHTS } from '../../server/src/model/spectrumRequestBuilder';

const FORMAT = readFileSync('docs/format.md', 'utf8');
const SPECTRA = readFileSync('docs/spectra.md', 'utf8');

/** The `## ` sections of a page, keyed by their heading line. */
function sections(page: string): { heading: string; body: string }[] {
  return page.split(/\n(?=## )/).map((body) => ({ heading: body.split('\n', 1)[0]!, body }));
}

/** The section whose heading names `word` in backticks (`## \`magnet\``, `## Field sources: \`coil\`, …`). */
function sectionOf(word: string): string {
  const found = sections(FORMAT).filter((s) => s.heading.startsWith('## ') && s.heading.includes(`\`${word}\``));
  expect(found.map((s) => s.heading), `one section of docs/format.md for '${word}'`).toHaveLength(1);
  return found[0]!.body;
}

const escape = (s: string): string => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** `key` or `key = …` in backticks, or `key =` at the start of a line of a syntax block, or `key, …` in a list of keys there. */
function namesKey(text: string, key: string): boolean {
  const k = escape(key);
  return new RegExp(`\`${k}(\`| = )|^\\s*${k}\\s*=|^\\s*(\\w+, )*${k}(, \\w+)*\\s+#`, 'm').test(text);
}

/** `word` in backticks, alone or inside a longer code span (`oven 450 K`, `a | b`). */
function namesWord(text: string, word: string): boolean {
  const w = escape(word);
  return new RegExp(`\`[^\`\\n]*(?<![\\w+-])${w}(?![\\w+-])[^\`\\n]*\``).test(text) || new RegExp(`^\\s+\\S.*(?<![\\w+-])${w}(?![\\w+-])`, 'm').test(text);
}

describe('docs/format.md documents every key the parser accepts', () => {
  it('names every block word in the list of block words, and `level` and `use`', () => {
    const list = FORMAT.split('\n').join(' ').match(/A line that starts with a \*\*block word\*\*(.*?)opens a new block/)?.[1] ?? '';
    for (const word of BLOCK_WORDS) expect(list, word).toContain(`\`${word}\``);
    expect(FORMAT).toContain(`## \`${LEVEL_WORD}\``);
    expect(FORMAT).toContain(`## \`${USE_WORD}\``);
  });

  it.each(BLOCK_WORDS.map((kind) => [kind]))('every key of a `%s` block is named in its section', (kind) => {
    const section = sectionOf(kind);
    const missing = BLOCK_KEYS[kind].filter((key) => !namesKey(section, key));
    expect(missing).toEqual([]);
  });

  it('every key a level takes is in the `level` table', () => {
    const section = sectionOf(LEVEL_WORD);
    expect(LEVEL_KEYS.filter((key) => !section.includes(`| \`${key}\` |`))).toEqual([]);
  });

  it('every plain word a value may hold appears in a written form', () => {
    expect(VALUE_WORDS.filter((word) => !namesWord(FORMAT, word))).toEqual([]);
  });

  it('every unit name the grammar knows, its aliases included, is named in the units paragraph or table', () => {
    const values = sections(FORMAT).find((s) => s.heading === '## Values')!.body + sectionOf(LEVEL_WORD);
    const names = [...Object.keys(SPECIAL_NAMES), ...Object.keys(SYMBOLS), ...Object.keys(LONG_NAMES)];
    expect(names.filter((name) => !values.includes(`\`${name}\``) && !values.includes(`\`${name}^`))).toEqual([]);
  });

  it('every choice the model tables list is named: data kinds, fit parameters, slower designs, spectrum views and analysers', () => {
    const fit = sectionOf('fit');
    expect(DATA_KINDS.filter((k) => !namesWord(fit, k))).toEqual([]);
    expect(FIT_PARAMETERS.filter((p) => !fit.includes(`\`${p}\``))).toEqual([]);
    expect(SLOWER_DESIGNS.filter((d) => !namesWord(sectionOf('slower'), d))).toEqual([]);
    // The line section names the views; spectra.md, which it points to, lists every analyser.
    expect(SPECTRUM_DIRECTIONS.filter((d) => !namesWord(sectionOf('line'), d))).toEqual([]);
    expect(SPECTRUM_LIGHTS.filter((l) => !namesWord(SPECTRA, l))).toEqual([]);
    for (const source of SOURCE_BLOCKS) expect(sectionOf(source)).toContain(`${source} <name>`);
  });

  it('the checks can fail: a key missing from a section is found', () => {
    expect(namesKey('magnet <name>\n  field = 1 T', 'gradient')).toBe(false);
    expect(namesKey('magnet <name>\n  field = 1 T', 'field')).toBe(true);
    expect(namesWord('`oven 450 K`', 'jet')).toBe(false);
    expect(namesWord('`oven 450 K`', 'oven')).toBe(true);
  });
});
