/**
 * README's CLI section and the help texts say the same: the help is generated from the command
 * specs (cli/commands.ts), so this compares README's command table and its example command lines
 * with those specs — a new option without a README mention, or a README option the CLI lacks, fails.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { CommandSpec } from '../../server/src/cli/args';
import { ALL_COMMANDS } from '../../server/src/cli/commands';

const README = readFileSync('README.md', 'utf8');
const CI_DOC = readFileSync('docs/ci.md', 'utf8');
const SPECS: readonly CommandSpec[] = ALL_COMMANDS.map((c) => c.spec);

/** README's command table: command name → its synopsis cell, `|` escapes undone. */
function tableRows(): Map<string, string> {
  const rows = new Map<string, string>();
  for (const line of README.split('\n')) {
    const m = /^\| `(\w+) (.*?)` \| /.exec(line.replace(/`, `\w+ /g, ' '));
    if (m) rows.set(m[1]!, m[2]!.replace(/\\\|/g, '|'));
  }
  return rows;
}

/** Option name → the choice values written after it anywhere in `text` (`a|b`, or one lower-case word; an upper-case placeholder adds none). */
function writtenOptions(text: string): Map<string, Set<string>> {
  const found = new Map<string, Set<string>>();
  for (const m of text.matchAll(/--([a-z][\w-]*|…-threshold)(?:[ =]([^\s\]`]+))?/g)) {
    const values = found.get(m[1]!) ?? new Set<string>();
    const value = m[2];
    if (value && value.includes('|')) for (const v of value.split('|')) values.add(v);
    else if (value && /^[a-z]+$/.test(value)) values.add(value);
    found.set(m[1]!, values);
  }
  return found;
}

/** The README name of an option: the thresholds of diff are written once, as `--…-threshold`. */
const readmeName = (option: string): string => (option.endsWith('-threshold') ? '…-threshold' : option);

describe("README's CLI section matches every command's --help", () => {
  const rows = tableRows();

  it('the table has one row per command', () => {
    expect([...rows.keys()].sort()).toEqual(SPECS.map((s) => s.name).sort());
  });

  it.each(SPECS.map((s) => [s.name, s]))('%s: every option of the help is in its row (or, for --root, the sentence for every command), and no other', (name, spec) => {
    const written = writtenOptions(rows.get(name)!);
    const options = Object.keys(spec.options);
    const undocumented = options.filter((o) => o !== 'root' && !written.has(readmeName(o)));
    expect(undocumented).toEqual([]);
    expect([...written.keys()].filter((o) => !options.map(readmeName).includes(o))).toEqual([]);
    if (options.includes('root')) expect(README).toContain('or `--root DIR`, which every command that reads a setup takes');
  });

  it.each(SPECS.map((s) => [s.name, s]))('%s: the choices the row lists are the choices the help lists', (name, spec) => {
    const written = writtenOptions(rows.get(name)!);
    for (const [option, o] of Object.entries(spec.options)) {
      if (!o.choices) continue;
      expect([...(written.get(option) ?? [])].sort(), `--${option}`).toEqual([...o.choices].sort());
    }
  });

  it('every command takes --root, as the README says', () => {
    expect(SPECS.filter((s) => !('root' in s.options)).map((s) => s.name)).toEqual([]);
  });

  it("diff's thresholds, written once in the README, are each named in docs/ci.md", () => {
    const diff = SPECS.find((s) => s.name === 'diff')!;
    const thresholds = Object.keys(diff.options).filter((o) => o.endsWith('-threshold'));
    expect(thresholds.length).toBeGreaterThan(0);
    expect(thresholds.filter((t) => !CI_DOC.includes(`| \`--${t}\` |`))).toEqual([]);
  });

  it("every example command line in the README uses only that command's options", () => {
    const block = /## Using the CLI[\s\S]*?```sh\n([\s\S]*?)```/.exec(README)![1]!;
    const lines = block.split('\n').filter((l) => l.startsWith('npx sublevel '));
    expect(lines.length).toBeGreaterThan(10);
    for (const line of lines) {
      const name = line.split(/\s+/)[2]!;
      const spec = SPECS.find((s) => s.name === name);
      expect(spec, line).toBeDefined();
      const used = [...writtenOptions(line.replace(/#.*$/, '')).keys()];
      expect(used.filter((o) => !(o in spec!.options)), line).toEqual([]);
    }
  });

  it('the reader catches a mismatch: an option and its choices are read from a row', () => {
    const w = writtenOptions('check <files> [--format text|json] [--quiet] [--fail-on LEVEL] [--format jsonl]');
    expect([...w.keys()]).toEqual(['format', 'quiet', 'fail-on']);
    expect([...w.get('format')!]).toEqual(['text', 'json', 'jsonl']);
    expect(w.get('fail-on')!.size).toBe(0);
  });
});
