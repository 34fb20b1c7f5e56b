import { describe, expect, it } from 'vitest';
import { LanguageService } from '../../server/src/service/languageService';
import { DEFAULT_SETTINGS, readSettings } from '../../server/src/service/settings';

function doc(text: string, version = 1) {
  return { uri: 'file:///a.sublevel', version, getText: () => text };
}

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

  it('logs a failing feature and answers empty instead of throwing', () => {
    const logged: string[] = [];
    const svc = new LanguageService((m) => logged.push(m));
    const broken = { uri: 'file:///b.sublevel', version: 1, getText: (): string => { throw new Error('disk on fire'); } };
    expect(svc.hover(broken, { line: 0, character: 0 })).toBeNull();
    expect(svc.completion(broken, { line: 0, character: 0 })).toEqual([]);
    expect(svc.semanticTokens(broken)).toEqual({ data: [] });
    expect(logged).toHaveLength(3);
    expect(logged[0]).toContain('hover failed on file:///b.sublevel');
    expect(logged[0]).toContain('disk on fire');
  });

  it('switches inlay hints off by setting', () => {
    const svc = new LanguageService();
    const d = doc('field f = 1 G\n');
    const all = { start: { line: 0, character: 0 }, end: { line: 1, character: 0 } };
    expect(svc.inlayHints(d, all)).toHaveLength(1);
    expect(svc.inlayHints(d, all, readSettings({ inlayHints: { enabled: false } }))).toEqual([]);
  });

  it('reads settings defensively', () => {
    expect(readSettings(undefined)).toEqual(DEFAULT_SETTINGS);
    expect(readSettings({ inlayHints: { enabled: 'yes' }, hover: { sublevelRows: -3, levelTables: 2 } })).toEqual({
      inlayHints: { enabled: true },
      hover: { sublevelRows: DEFAULT_SETTINGS.hover.sublevelRows, levelTables: 2 },
    });
    expect(readSettings({ hover: { sublevelRows: 1e9 } }).hover.sublevelRows).toBe(500);
  });
});
