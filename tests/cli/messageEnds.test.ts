/**
 * Findings read like sentences: every rule summary of the catalogue ends with a full stop, and so
 * do the evaluation's sentence-style notes met in the bundled examples (the whole-term hyperfine
 * assumption of the lithium example among them), and every problem the parser and the model raise
 * on the examples, the test fixtures and the setups the docs show, and every finding of the evaluation
 * there too (a question such as "did you mean 'magnet'?" ends a sentence too).
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { ruleCatalogue } from '../../server/src/cli/sarif/ruleCatalogue';
import { makeProblem } from '../../server/src/format/codes';
import { parseSetup } from '../../server/src/format/parser';
import { endSentence } from '../../server/src/format/sentenceEnd';
import { buildModel } from '../../server/src/model/buildModel';
import { ProblemList } from '../../server/src/model/problems';

const AT = { start: { line: 0, character: 0 }, end: { line: 0, character: 1 } };

function setupFiles(dir: string): string[] {
  return readdirSync(dir)
    .sort()
    .flatMap((name) => {
      const p = path.join(dir, name);
      if (statSync(p).isDirectory()) return setupFiles(p);
      return name.endsWith('.sublevel') ? [p] : [];
    });
}

/** The bodies of the docs' fences without a language: the setups the pages show (and some plain text, which raises problems too). */
function docSetups(): [string, string][] {
  const out: [string, string][] = [];
  for (const page of readdirSync('docs').filter((n) => n.endsWith('.md'))) {
    let body: string[] | undefined;
    let plain = false;
    for (const line of readFileSync(path.join('docs', page), 'utf8').split('\n')) {
      if (!line.startsWith('```')) body?.push(line);
      else if (body === undefined) [body, plain] = [[], line.trim() === '```'];
      else {
        if (plain) out.push([`docs/${page}#${out.length}`, `${body.join('\n')}\n`]);
        body = undefined;
      }
    }
  }
  return out;
}

describe('message endings', () => {
  it('ends every rule summary with a full stop', () => {
    expect(ruleCatalogue().filter((r) => !r.summary.endsWith('.')).map((r) => r.id)).toEqual([]);
  });

  it('ends the whole-term hyperfine note with a full stop, like the other notes of the lithium example', () => {
    const problems = analyze(readFileSync('examples/lithium-whole-term.sublevel', 'utf8')).problems;
    const note = problems.find((p) => p.code === 'hyperfine-between-levels-assumed');
    expect(note?.message).toMatch(/would replace it\.$/);
  });

  it('ends every problem the parser and the model raise on the examples, fixtures and docs with a full stop', () => {
    const texts: [string, string][] = [...[...setupFiles('examples'), ...setupFiles('tests/fixtures')].map((f): [string, string] => [f, readFileSync(f, 'utf8')]), ...docSetups()];
    const codes = new Set<string>();
    const open: string[] = [];
    for (const [where, text] of texts) {
      const doc = parseSetup(text);
      for (const p of [...doc.problems, ...buildModel(doc).problems]) {
        codes.add(p.code);
        if (!/[.?]$/.test(p.message)) open.push(`${where}: ${p.code}: ${p.message}`);
      }
    }
    expect(open).toEqual([]);
    // The corpus meets the mistakes example's problems and many more: 34 codes when this was written.
    expect(codes.size).toBeGreaterThanOrEqual(30);
  });

  it('ends every finding of the evaluation on the examples, fixtures and docs with a full stop', () => {
    const texts: [string, string][] = [...[...setupFiles('examples'), ...setupFiles('tests/fixtures')].map((f): [string, string] => [f, readFileSync(f, 'utf8')]), ...docSetups()];
    const codes = new Set<string>();
    const open: string[] = [];
    for (const [where, text] of texts) {
      for (const p of analyze(text).problems) {
        codes.add(p.code);
        if (!/[.?]$/.test(p.message)) open.push(`${where}: ${p.code}: ${p.message}`);
      }
    }
    expect(open).toEqual([]);
    // The evaluation's own codes the review found without a stop are met in this corpus.
    for (const code of ['fit-several-roots', 'diamagnetic-not-included']) expect(codes).toContain(code);
    // 50 codes of every stage when this was written.
    expect(codes.size).toBeGreaterThanOrEqual(45);
  });

  it('ends the fit\'s several-roots note with its full stop after the last word', () => {
    const problems = analyze(readFileSync('examples/fit-rubidium.sublevel', 'utf8')).problems;
    expect(problems.find((p) => p.code === 'fit-several-roots')?.message).toBe("fit 'bias': 2 fields in the range are resonant at this frequency, 2.1523(54) G and 4.3056(54) G; the fit's value is the lowest, 2.1523(54) G.");
  });

  it('ends the mistakes example\'s findings with their full stop, after a quoted text, a unit or a number alike', () => {
    const messages = analyze(readFileSync('examples/mistakes.sublevel', 'utf8')).problems.map((p) => p.message);
    expect(messages).toContain('gradient needs T/m or G/cm, got T.');
    expect(messages).toContain('turns must be a whole number, got 40.5.');
    expect(messages).toContain("no level named 'uper' — did you mean 'upper'?");
  });

  it('adds the stop where problems are made, once', () => {
    expect(endSentence("temperature needs a number with a unit such as K or degC, got 'oven'")).toBe("temperature needs a number with a unit such as K or degC, got 'oven'.");
    expect(endSentence('gradient needs T/m or G/cm, got T')).toBe('gradient needs T/m or G/cm, got T.');
    expect(endSentence('read as 2P°1/2.')).toBe('read as 2P°1/2.');
    expect(endSentence("did you mean 'magnet'?")).toBe("did you mean 'magnet'?");
    expect(makeProblem('syntax-empty-item', 'empty item in a comma-separated list', AT).message).toBe('empty item in a comma-separated list.');
    const list = new ProblemList();
    list.add('name-unknown', "no level named 'x'", AT);
    list.push({ code: 'name-unknown', severity: 'error', message: "no level named 'y'", range: AT });
    list.push({ code: 'name-unknown', severity: 'error', message: "no level named 'z'.", range: AT });
    expect(list.items.map((p) => p.message)).toEqual(["no level named 'x'.", "no level named 'y'.", "no level named 'z'."]);
  });
});
