import type { CodeAction, Diagnostic, DocumentDiagnosticReport, Hover, InlayHint, TextEdit, WorkspaceEdit } from 'vscode-languageserver-protocol';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { applyEdits } from '../features/helpers';
import { ensureBuilt, open, startClient, type TestClient } from './lspClient';

/** A setup with parse and model problems (a misspelt level, a quadrupole that cannot act) and an evaluation note (Li-7 2P3/2 at 5 G is past the linear regime). */
const TEXT = [
  'species Li7',
  '  level ground: 2s 2S1/2  B = 1 MHz',
  '  level upper:  2p 2P°3/2',
  'field bias=5 G',
  'line D2: ground -> uper',
  '',
].join('\n');
const URI = 'file:///protocol/test.sublevel';
const codes = (ds: Diagnostic[]): string[] => ds.map((d) => String(d.code)).sort();

beforeAll(() => ensureBuilt(), 120_000);

describe('the built server over JSON-RPC, diagnostics pushed', () => {
  let client: TestClient;
  beforeAll(async () => {
    client = await startClient({ textDocument: { hover: { contentFormat: ['markdown'] }, rename: { prepareSupport: true } } });
    await open(client, URI, TEXT);
  }, 60_000);
  afterAll(async () => {
    if (client && client.process.exitCode === null) client.process.kill();
  });

  it('announces its features', () => {
    const caps = client.initialize.capabilities;
    expect(caps.hoverProvider).toBe(true);
    expect(caps.inlayHintProvider).toBe(true);
    expect(caps.documentFormattingProvider).toBe(true);
    expect(caps.renameProvider).toEqual({ prepareProvider: true });
    expect(caps.semanticTokensProvider).toMatchObject({ full: true, range: true });
    expect(caps.diagnosticProvider).toBeUndefined();
    expect(client.initialize.serverInfo?.name).toBe('sublevel');
  });

  it('pushes parse and model problems, then the evaluation’s', async () => {
    const ds = await client.waitForPush(URI, (d) => d.some((x) => x.code === 'zeeman-not-linear'));
    expect(codes(ds)).toEqual(['name-unknown', 'quadrupole-cannot-act', 'zeeman-not-linear']);
    expect(ds.find((d) => d.code === 'name-unknown')!.data).toEqual({ suggestions: ['upper'] });
  });

  it('answers hover with the evaluated numbers', async () => {
    // Li-7 2s: A = 401.752 MHz (Arimondo et al. 1977) → F = 1 ↔ 2 splitting 803.504 MHz.
    const h = (await client.connection.sendRequest('textDocument/hover', { textDocument: { uri: URI }, position: { line: 1, character: 10 } })) as Hover;
    expect(JSON.stringify(h.contents)).toContain('803.504');
  });

  it('gives inlay hints', async () => {
    const hints = (await client.connection.sendRequest('textDocument/inlayHint', {
      textDocument: { uri: URI },
      range: { start: { line: 0, character: 0 }, end: { line: 10, character: 0 } },
    })) as InlayHint[];
    // μ_B/h = 13.996 244 171 GHz/T (CODATA 2022) at 5 G → 6.9981 MHz.
    expect(hints.map((h) => h.label)).toContain('μ_B·B/h 6.9981 MHz');
  });

  it('offers a quick fix that repairs the text', async () => {
    const d = client.pushed.get(URI)!.diagnostics.find((x) => x.code === 'name-unknown')!;
    const actions = (await client.connection.sendRequest('textDocument/codeAction', {
      textDocument: { uri: URI },
      range: d.range,
      context: { diagnostics: [d] },
    })) as CodeAction[];
    const fix = actions.find((a) => a.title === "Change to 'upper'")!;
    expect(applyEdits(TEXT, fix.edit!.changes![URI]!)).toContain('line D2: ground -> upper');
  });

  it('formats with small whitespace edits', async () => {
    const edits = (await client.connection.sendRequest('textDocument/formatting', {
      textDocument: { uri: URI },
      options: { tabSize: 2, insertSpaces: true },
    })) as TextEdit[];
    expect(applyEdits(TEXT, edits)).toContain('field bias = 5 G');
    expect(edits).toHaveLength(2);
  });

  it('renames a level everywhere', async () => {
    const prepared = await client.connection.sendRequest('textDocument/prepareRename', { textDocument: { uri: URI }, position: { line: 1, character: 9 } });
    expect(prepared).toMatchObject({ placeholder: 'ground' });
    const edit = (await client.connection.sendRequest('textDocument/rename', {
      textDocument: { uri: URI },
      position: { line: 1, character: 9 },
      newName: 'lower',
    })) as WorkspaceEdit;
    const out = applyEdits(TEXT, edit.changes![URI]!);
    expect(out).toContain('level lower:');
    expect(out).toContain('line D2: lower -> uper');
  });

  it('refuses a rename with the reason', async () => {
    await expect(
      client.connection.sendRequest('textDocument/rename', { textDocument: { uri: URI }, position: { line: 1, character: 9 }, newName: 'upper' }),
    ).rejects.toThrow("Li7 already has a level named 'upper'");
  });

  it('draws the diagram the panel asks for', async () => {
    const r = (await client.connection.sendRequest('sublevel/diagram', { uri: URI, view: 'levels', line: 1, theme: 'panel' })) as { ok: boolean; svg?: string; csv?: string };
    expect(r.ok).toBe(true);
    expect(r.svg).toMatch(/^<svg/);
    expect(r.csv?.split('\n').length).toBeGreaterThan(2);
    const closed = (await client.connection.sendRequest('sublevel/diagram', { uri: 'file:///closed.sublevel', view: 'levels', theme: 'panel' })) as { ok: boolean };
    expect(closed.ok).toBe(false);
  });

  it('draws every tab of the panel, not the levels in their place', async () => {
    // The file has no fit and no field source: each view says so in its own words.
    const residuals = (await client.connection.sendRequest('sublevel/diagram', { uri: URI, view: 'residuals', theme: 'panel' })) as { ok: boolean; message?: string };
    expect(residuals).toEqual({ ok: false, message: expect.stringMatching(/^No fit to draw/) });
    const map = (await client.connection.sendRequest('sublevel/diagram', { uri: URI, view: 'fieldmap', theme: 'panel' })) as { ok: boolean; message?: string };
    expect(map).toEqual({ ok: false, message: expect.stringMatching(/^No field source to draw/) });
  });

  it('pushes an edit’s diagnostics with no fixed wait: before requests sent just after it are all answered', async () => {
    const other = 'file:///protocol/keystroke.sublevel';
    await open(client, other, TEXT);
    await client.waitForPush(other, (d) => d.some((x) => x.code === 'zeeman-not-linear')); // evaluated: the server is idle
    const fixed = TEXT.replace('-> uper', '-> upper');
    await client.connection.sendNotification('textDocument/didChange', { textDocument: { uri: other, version: 2 }, contentChanges: [{ text: fixed }] });
    const outline = () => client.connection.sendRequest('textDocument/documentSymbol', { textDocument: { uri: other } });
    await Promise.all([outline(), outline(), outline()]);
    // A timer of even a few milliseconds before the push lets all three answers go out first.
    expect(client.pushed.get(other)?.version).toBe(2);
    expect(codes(client.pushed.get(other)!.diagnostics)).not.toContain('name-unknown');
    await client.connection.sendNotification('textDocument/didClose', { textDocument: { uri: other } });
  });

  it('follows edits and clears diagnostics on close', async () => {
    await client.connection.sendNotification('textDocument/didChange', {
      textDocument: { uri: URI, version: 2 },
      contentChanges: [{ range: { start: { line: 4, character: 19 }, end: { line: 4, character: 23 } }, text: 'upper' }],
    });
    const ds = await client.waitForPush(URI, (d) => !d.some((x) => x.code === 'name-unknown'));
    expect(codes(ds)).not.toContain('name-unknown');
    await client.connection.sendNotification('textDocument/didClose', { textDocument: { uri: URI } });
    expect(await client.waitForPush(URI, (d) => d.length === 0)).toEqual([]);
  });

  it('answers for an unknown document with nothing, and stays up', async () => {
    const h = await client.connection.sendRequest('textDocument/hover', { textDocument: { uri: 'file:///nope.sublevel' }, position: { line: 0, character: 0 } });
    expect(h).toBeNull();
  });

  it('shuts down and exits cleanly', async () => {
    expect(await client.stop()).toBe(0);
  });
});

describe('the built server over JSON-RPC, regime notes switched off', () => {
  let client: TestClient;
  beforeAll(async () => {
    client = await startClient(
      { textDocument: { diagnostic: { dynamicRegistration: false } }, workspace: { diagnostics: { refreshSupport: true }, configuration: true } },
      { 'workspace/configuration': () => [{ regimeNotes: { enabled: false } }] },
    );
    await open(client, URI, TEXT);
  }, 60_000);
  afterAll(async () => {
    if (client && client.process.exitCode === null) client.process.kill();
  });

  it('leaves the regime note out of the full diagnostics, and keeps the others', async () => {
    const pull = (): Promise<DocumentDiagnosticReport> =>
      client.connection.sendRequest('textDocument/diagnostic', { textDocument: { uri: URI } }) as Promise<DocumentDiagnosticReport>;
    await pull();
    const deadline = Date.now() + 20_000;
    while (!client.requests.includes('workspace/diagnostic/refresh') && Date.now() < deadline) await new Promise((r) => setTimeout(r, 50));
    const full = await pull();
    expect(full).toMatchObject({ kind: 'full', resultId: '1-quiet' });
    if (full.kind === 'full') expect(codes(full.items)).toEqual(['name-unknown', 'quadrupole-cannot-act']);
  });
});

describe('the built server over JSON-RPC, diagnostics pulled', () => {
  let client: TestClient;
  beforeAll(async () => {
    client = await startClient(
      { textDocument: { diagnostic: { dynamicRegistration: false } }, workspace: { diagnostics: { refreshSupport: true }, configuration: true } },
      { 'workspace/configuration': () => [{ inlayHints: { enabled: false } }] },
    );
    await open(client, URI, TEXT);
  }, 60_000);
  afterAll(async () => {
    if (client && client.process.exitCode === null) client.process.kill();
  });

  const pull = (previousResultId?: string): Promise<DocumentDiagnosticReport> =>
    client.connection.sendRequest('textDocument/diagnostic', { textDocument: { uri: URI }, ...(previousResultId ? { previousResultId } : {}) }) as Promise<DocumentDiagnosticReport>;

  it('announces pull diagnostics and pushes nothing', () => {
    expect(client.initialize.capabilities.diagnosticProvider).toMatchObject({ interFileDependencies: false, workspaceDiagnostics: false });
    expect(client.pushed.size).toBe(0);
  });

  it('answers a pull at once, asks for a refresh when the evaluation is in, then answers in full', async () => {
    const first = await pull();
    expect(first.kind).toBe('full');
    if (first.kind !== 'full') return;
    expect(codes(first.items)).toEqual(['name-unknown', 'quadrupole-cannot-act']);
    expect(first.resultId).toBe('1-partial');
    const deadline = Date.now() + 20_000;
    while (!client.requests.includes('workspace/diagnostic/refresh') && Date.now() < deadline) await new Promise((r) => setTimeout(r, 50));
    expect(client.requests).toContain('workspace/diagnostic/refresh');
    const second = await pull(first.resultId);
    expect(second).toMatchObject({ kind: 'full', resultId: '1' });
    if (second.kind === 'full') expect(codes(second.items)).toEqual(['name-unknown', 'quadrupole-cannot-act', 'zeeman-not-linear']);
    expect(await pull('1')).toEqual({ kind: 'unchanged', resultId: '1' });
  });

  it('reads its settings from the client (inlay hints switched off)', async () => {
    const hints = await client.connection.sendRequest('textDocument/inlayHint', {
      textDocument: { uri: URI },
      range: { start: { line: 0, character: 0 }, end: { line: 10, character: 0 } },
    });
    expect(hints).toEqual([]);
    expect(client.requests).toContain('workspace/configuration');
  });

  it('survives a cancelled request', async () => {
    const source = new (await import('vscode-languageserver-protocol')).CancellationTokenSource();
    const pending = client.connection.sendRequest('textDocument/hover', { textDocument: { uri: URI }, position: { line: 1, character: 10 } }, source.token);
    source.cancel();
    await pending.catch(() => undefined);
    const h = (await client.connection.sendRequest('textDocument/hover', { textDocument: { uri: URI }, position: { line: 2, character: 10 } })) as Hover;
    expect(JSON.stringify(h.contents)).toContain('²P°₃/₂');
  });

  it('shuts down and exits cleanly', async () => {
    expect(await client.stop()).toBe(0);
  });
});
