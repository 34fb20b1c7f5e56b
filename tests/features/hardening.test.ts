/**
 * The language service against huge inputs and failing evaluations: a document over a cap gets
 * its one diagnostic at once and no feature works on it (a keystroke stays cheap); used files on
 * disk are read once per change; an evaluation that is stopped says so in a diagnostic.
 */
import { mkdtempSync, rmSync, utimesSync, writeFileSync } from 'fs';
import { tmpdir } from 'os';
import path from 'path';
import { pathToFileURL } from 'url';
import { afterAll, describe, expect, it } from 'vitest';
import type { Evaluator } from '../../server/src/service/evaluator';
import { LanguageService } from '../../server/src/service/languageService';
import { cachedDiskFiles, editorFiles } from '../../server/src/service/workspaceFiles';

function doc(text: string, version = 1, uri = 'file:///ws/a.sublevel') {
  return { uri, version, getText: () => text };
}

const LINE = 'species K39\n  level ground: 4s 2S1/2\n';
const dir = mkdtempSync(path.join(tmpdir(), 'sublevel-hardening-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('a document over a cap', () => {
  // 16 MB of realistic lines: before the cap every keystroke parsed all of it (48–80 s).
  const huge = LINE.repeat(Math.ceil(16e6 / LINE.length));

  it('gets one diagnostic at once, complete, and each keystroke stays cheap', () => {
    const svc = new LanguageService();
    let slowest = 0;
    for (let version = 1; version <= 5; version++) {
      const text = `${huge}# edit ${version}\n`;
      const started = Date.now();
      const { items, complete } = svc.diagnostics(doc(text, version));
      svc.semanticTokens(doc(text, version));
      svc.documentSymbols(doc(text, version));
      slowest = Math.max(slowest, Date.now() - started);
      expect(complete).toBe(true);
      expect(items.map((d) => `${d.code} ${d.range.start.line}:${d.range.start.character}`)).toEqual(['document-too-large 0:0']);
    }
    // A length check and nothing else (a few ms; generous for a loaded machine).
    expect(slowest).toBeLessThan(500);
  });

  it('answers features with nothing, and the diagram with the reason', async () => {
    const svc = new LanguageService();
    const d = doc(huge);
    expect(svc.formatting(d)).toEqual([]);
    expect(svc.foldingRanges(d)).toEqual([]);
    expect(svc.completion(d, { line: 0, character: 3 })).toEqual([]);
    expect(await svc.hover(d, { line: 0, character: 3 })).toBeNull();
    const diagram = await svc.diagram(d, { view: 'levels', theme: 'panel' });
    expect(diagram).toEqual({ ok: false, message: expect.stringContaining('Sublevel did not draw this file: this file is not checked: it has') });
  });

  it('with too many statements, says so too', () => {
    const svc = new LanguageService();
    expect(svc.diagnostics(doc('field f = 1 G\n'.repeat(20_001))).items.map((d) => d.code)).toEqual(['too-many-statements']);
    expect(svc.diagnostics(doc('field f = 1 G\n'.repeat(20_000), 2)).items.map((d) => d.code)).not.toContain('too-many-statements');
  });
});

describe('an evaluation that is cut short', () => {
  it('leaves a diagnostic on the file that says what is missing and why', async () => {
    const stopped: Evaluator = { evaluate: () => Promise.reject(new Error('an evaluation took longer than 30 s and was stopped')), dispose: () => undefined };
    const logged: string[] = [];
    const svc = new LanguageService((m) => logged.push(m), stopped);
    const d = doc('species Li7\n  level upper: 2p 2P°3/2\nfield bias = 5 G\n');
    await svc.evaluate(d);
    const { items, complete } = svc.diagnostics(d);
    expect(complete).toBe(true);
    expect(items.map((i) => `${i.code} ${i.severity} ${i.message}`)).toEqual([
      'evaluation-cut-short 2 the evaluation of this file stopped before it finished (an evaluation took longer than 30 s and was stopped); sublevel energies, beams, lines and resonances are not checked and hovers show only what the file says',
    ]);
    expect(logged.join('\n')).toContain('longer than 30 s');
  });
});

describe('used files on disk', () => {
  it('are read again only when their modification time or size changes', () => {
    const file = path.join(dir, 'atoms.sublevel');
    writeFileSync(file, LINE);
    const mtime = new Date(1_700_000_000_000); // whole seconds, so that it can be put back exactly
    utimesSync(file, mtime, mtime);
    const disk = cachedDiskFiles();
    expect(disk.readFile(file)).toBe(LINE);
    // Other content of the same size, the modification time put back: the kept text comes back (not read again).
    writeFileSync(file, 'species Na23\n'.padEnd(LINE.length, ' '));
    utimesSync(file, mtime, mtime);
    expect(disk.readFile(file)).toBe(LINE);
    // A changed modification time: read again.
    utimesSync(file, new Date(mtime.getTime() + 5000), new Date(mtime.getTime() + 5000));
    expect(disk.readFile(file)).toMatch(/^species Na23/);
  });

  it('over the cap are not read, on disk or open in the editor', () => {
    const file = path.join(dir, 'big.sublevel');
    writeFileSync(file, `${LINE}${'#'.repeat(600_000)}\n`);
    expect(cachedDiskFiles().readFile(file)).toEqual({ tooLarge: true, bytes: LINE.length + 600_001 });
    const uri = pathToFileURL(path.join(dir, 'main.sublevel')).href;
    const open = [{ uri: pathToFileURL(file).href, getText: () => `${LINE}${'#'.repeat(600_000)}\n` }];
    const svc = new LanguageService(undefined, undefined, editorFiles(() => open));
    const items = svc.diagnostics(doc('use "big.sublevel"\n', 1, uri)).items;
    expect(items.map((i) => i.code)).toEqual(['use-file-too-large']);
  });

  it('are confined to the workspace folders, or to the document’s own folder outside them', () => {
    const inWs = pathToFileURL(path.join(dir, 'ws', 'main.sublevel')).href;
    const wsFolder = pathToFileURL(path.join(dir, 'ws')).href;
    const files = editorFiles(() => [], () => [wsFolder]);
    expect(files.rootsFor!(inWs)).toEqual([wsFolder]);
    expect(files.rootsFor!(pathToFileURL(path.join(dir, 'elsewhere', 'x.sublevel')).href)).toBeUndefined();
    const svc = new LanguageService(undefined, undefined, files);
    const items = svc.diagnostics(doc('use "../atoms.sublevel"\n', 1, inWs)).items;
    expect(items.map((i) => i.code)).toEqual(['use-outside-root']);
  });
});
