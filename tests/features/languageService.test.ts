import { describe, expect, it } from 'vitest';
import type { Evaluator } from '../../server/src/service/evaluator';
import { inProcessEvaluator, SUPERSEDED } from '../../server/src/service/evaluator';
import { LanguageService } from '../../server/src/service/languageService';
import { DEFAULT_SETTINGS, readSettings } from '../../server/src/service/settings';

function doc(text: string, version = 1) {
  return { uri: 'file:///a.sublevel', version, getText: () => text };
}

/** Li-7 2p 2P3/2 at 5 G: the hyperfine structure is only a few MHz wide, so the evaluation notes the intermediate regime. */
const LI = 'species Li7\n  level upper: 2p 2P°3/2\nfield bias = 5 G\n';

describe('language service', () => {
  it('reuses one analysis per document version', () => {
    const svc = new LanguageService();
    const d = doc('field f = 1 G\n');
    expect(svc.isAnalysed(d)).toBe(false);
    const a = svc.analysis(d);
    expect(svc.isAnalysed(d)).toBe(true);
    expect(svc.analysis(d)).toBe(a);
    expect(svc.analysis(doc('field f = 2 G\n', 2))).not.toBe(a);
    svc.forget(d.uri);
    expect(svc.isAnalysed(doc('', 2))).toBe(false);
  });

  it('analyses a version number sent again with another text again (a client that reuses or rewinds versions)', () => {
    const svc = new LanguageService();
    expect(svc.diagnostics(doc('field f = 1 G\n', 3)).items.map((i) => i.code)).toEqual([]);
    // Before, the analysis of the first text at version 3 answered for the second (no finding).
    expect(svc.diagnostics(doc('spices X\n', 3)).items.map((i) => i.code)).toEqual(['syntax-unknown-statement']);
    expect(svc.revision(doc('spices X\n', 3))).toBe(1);
  });

  it('gives parse and model diagnostics at once and the evaluation’s after it ran', async () => {
    const svc = new LanguageService();
    const d = doc(LI);
    const first = svc.diagnostics(d);
    expect(first.complete).toBe(false);
    expect(first.items.map((i) => i.code)).toEqual([]);
    await svc.evaluate(d);
    const second = svc.diagnostics(d);
    expect(second.complete).toBe(true);
    expect(second.items.map((i) => i.code)).toEqual(['zeeman-not-linear']);
  });

  it('hides the regime notes when the setting says so, and only them', async () => {
    const svc = new LanguageService();
    const d = doc(`${LI}magent spare\n`);
    await svc.evaluate(d);
    expect(svc.diagnostics(d).items.map((i) => i.code)).toEqual(['zeeman-not-linear', 'syntax-unknown-statement']);
    const quiet = readSettings({ regimeNotes: { enabled: false } });
    expect(svc.diagnostics(d, quiet).items.map((i) => i.code)).toEqual(['syntax-unknown-statement']);
  });

  it('carries the evaluation’s diagnostics over to the next version until its own evaluation', async () => {
    const svc = new LanguageService();
    await svc.evaluate(doc(LI, 1));
    const next = svc.diagnostics(doc(`# a new first line\n${LI}`, 2));
    expect(next.complete).toBe(false);
    expect(next.items.map((i) => `${i.range.start.line} ${String(i.code)}`)).toEqual(['2 zeeman-not-linear']);
  });

  it('evaluates only the newest version of a document', async () => {
    const texts: string[] = [];
    const counting: Evaluator = { evaluate: (t) => (texts.push(t), inProcessEvaluator().evaluate(t)), dispose: () => undefined };
    const svc = new LanguageService(() => undefined, counting);
    const a = svc.evaluate(doc('field f = 1 G\n', 1));
    svc.analysis(doc('field f = 2 G\n', 2));
    const b = svc.evaluate(doc('field f = 3 G\n', 3));
    await Promise.all([a, b]);
    expect(texts).toEqual(['field f = 3 G\n']);
  });

  it('asks the evaluator to give up on an older version when a newer one wants evaluating', async () => {
    const texts: string[] = [];
    const patient: Evaluator = {
      evaluate: (t, signal) => {
        texts.push(t);
        if (t.includes('1 G')) return new Promise((_, reject) => signal?.addEventListener('abort', () => reject(new Error(SUPERSEDED))));
        return inProcessEvaluator().evaluate(t);
      },
      dispose: () => undefined,
    };
    const logged: string[] = [];
    const svc = new LanguageService((m) => logged.push(m), patient);
    const old = svc.evaluate(doc('field f = 1 G\n', 1));
    await new Promise((r) => setTimeout(r, 10)); // the old evaluation is running
    const next = await svc.evaluate(doc('field f = 2 G\n', 2));
    await old;
    expect(texts).toEqual(['field f = 1 G\n', 'field f = 2 G\n']);
    expect(next.result?.fields[0]?.field_T).toBe(2e-4);
    expect(svc.diagnostics(doc('field f = 2 G\n', 2)).complete).toBe(true);
    expect(logged).toEqual([]);
  });

  it('answers a hover without the evaluation when it fails, and logs', async () => {
    const logged: string[] = [];
    const failing: Evaluator = { evaluate: () => Promise.reject(new Error('worker gone')), dispose: () => undefined };
    const svc = new LanguageService((m) => logged.push(m), failing);
    const h = await svc.hover(doc('species Li7\n  level g: 2s 2S1/2\n'), { line: 1, character: 8 });
    expect(JSON.stringify(h)).toContain('appear once the evaluation has run');
    expect(logged.join('\n')).toContain('worker gone');
  });

  it('logs a failing feature and answers empty instead of throwing', async () => {
    const logged: string[] = [];
    const svc = new LanguageService((m) => logged.push(m));
    const broken = { uri: 'file:///b.sublevel', version: 1, getText: (): string => { throw new Error('disk on fire'); } };
    expect(await svc.hover(broken, { line: 0, character: 0 })).toBeNull();
    expect(svc.completion(broken, { line: 0, character: 0 })).toEqual([]);
    expect(svc.semanticTokens(broken)).toEqual({ data: [] });
    // Said in the file too, complete so that it is not asked again (it said nothing before: items []).
    const shown = svc.diagnostics(broken);
    expect(shown.complete).toBe(true);
    expect(shown.items.map((d) => [d.code, d.severity, d.message])).toEqual([
      ['internal-error', 1, 'Sublevel failed on this file (disk on fire); please report it with the file attached.'],
    ]);
    // The evaluation neither throws nor rejects: it resolves with the failure as the one problem.
    const evaluated = await svc.evaluate(broken);
    expect(evaluated.problems.map((p) => p.code)).toEqual(['internal-error']);
    expect(logged).toHaveLength(5);
    expect(logged[4]).toContain('evaluation failed on file:///b.sublevel (version 1)');
    // And it goes on serving: a sound document evaluates as before.
    const good = await svc.evaluate(doc(LI));
    expect(good.problems.map((p) => p.code)).toEqual(['zeeman-not-linear']);
    expect(logged[0]).toContain('hover failed on file:///b.sublevel');
    expect(logged[0]).toContain('disk on fire');
  });

  it('switches inlay hints off by setting', async () => {
    const svc = new LanguageService();
    const d = doc('field f = 1 G\n');
    const all = { start: { line: 0, character: 0 }, end: { line: 1, character: 0 } };
    expect(await svc.inlayHints(d, all)).toHaveLength(1);
    expect(await svc.inlayHints(d, all, readSettings({ inlayHints: { enabled: false } }))).toEqual([]);
  });

  it('reads settings defensively', () => {
    expect(readSettings(undefined)).toEqual(DEFAULT_SETTINGS);
    expect(readSettings({ inlayHints: { enabled: 'yes' }, hover: { sublevelRows: -3, levelTables: 2 } })).toEqual({
      inlayHints: { enabled: true },
      hover: { sublevelRows: DEFAULT_SETTINGS.hover.sublevelRows, levelTables: 2 },
      regimeNotes: { enabled: true },
      evaluation: { warmUp: false },
    });
    expect(readSettings({ regimeNotes: { enabled: false } }).regimeNotes.enabled).toBe(false);
    expect(readSettings({ hover: { sublevelRows: 1e9 } }).hover.sublevelRows).toBe(500);
    // The worker's warm-up is off unless asked for (it costs the server 35–80 MB, docs/editor.md).
    expect(DEFAULT_SETTINGS.evaluation.warmUp).toBe(false);
    expect(readSettings({ evaluation: { warmUp: true } }).evaluation.warmUp).toBe(true);
    expect(readSettings({ evaluation: { warmUp: 'on' } }).evaluation.warmUp).toBe(false);
  });
});
