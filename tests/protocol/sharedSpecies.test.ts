/**
 * The built server with two documents, one using the other: an edit of the used document
 * re-checks the using one (pushed and pulled diagnostics), go to definition lands in the used
 * document, and a used file on disk is read, and re-read when the client's watcher reports it.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'fs';
import { tmpdir } from 'os';
import path from 'path';
import { pathToFileURL } from 'url';
import type { Diagnostic, DocumentDiagnosticReport, Location } from 'vscode-languageserver-protocol';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ensureBuilt, open, startClient, type TestClient } from './lspClient';

const USING = 'file:///protocol/shared/setup.sublevel';
const USED = 'file:///protocol/shared/atoms/alkalis.sublevel';
const USING_TEXT = ['use "atoms/alkalis.sublevel"', 'field bias = 5 G', 'line D1: ground -> p12', ''].join('\n');
const USED_TEXT = ['species K39', '  level ground: 4s 2S1/2', '  level p12:    4p 2P°1/2', ''].join('\n');
const codes = (ds: Diagnostic[]): string[] => ds.map((d) => String(d.code)).filter((c) => !c.startsWith('zeeman-')).sort();

beforeAll(() => ensureBuilt(), 120_000);

describe('two open documents, one using the other (pushed diagnostics)', () => {
  let client: TestClient;
  beforeAll(async () => {
    client = await startClient({});
    await open(client, USED, USED_TEXT);
    await open(client, USING, USING_TEXT);
  }, 60_000);
  afterAll(async () => {
    if (client && client.process.exitCode === null) client.process.kill();
  });

  it('finds the used document’s species: the using one is clean (K39 4p 2P1/2 at 5 G is past its linear regime: a note only)', async () => {
    const ds = await client.waitForPush(USING, (d) => d.some((x) => x.code === 'zeeman-not-linear'));
    expect(codes(ds)).toEqual([]);
  });

  it('goes to the definition in the used document', async () => {
    const loc = (await client.connection.sendRequest('textDocument/definition', { textDocument: { uri: USING }, position: { line: 2, character: 20 } })) as Location;
    expect(loc).toEqual({ uri: USED, range: { start: { line: 2, character: 8 }, end: { line: 2, character: 11 } } });
  });

  it('re-checks the using document when the used one is edited', async () => {
    await client.connection.sendNotification('textDocument/didChange', {
      textDocument: { uri: USED, version: 2 },
      contentChanges: [{ range: { start: { line: 2, character: 8 }, end: { line: 2, character: 11 } }, text: 'p_half' }],
    });
    const ds = await client.waitForPush(USING, (d) => d.some((x) => x.code === 'name-unknown'));
    expect(ds.find((d) => d.code === 'name-unknown')!.message).toContain("no level named 'p12'");
    // An error in the used document: the using one gets one warning that points into it.
    await client.connection.sendNotification('textDocument/didChange', {
      textDocument: { uri: USED, version: 3 },
      contentChanges: [{ range: { start: { line: 2, character: 8 }, end: { line: 2, character: 14 } }, text: 'p12: 4p 2P°5/2 #' }],
    });
    const warned = await client.waitForPush(USING, (d) => d.some((x) => x.code === 'use-has-errors'));
    const w = warned.find((d) => d.code === 'use-has-errors')!;
    expect(w.relatedInformation?.[0]?.location.uri).toBe(USED);
  });

  it('reads the used file from the disk after it is closed (here: there is none)', async () => {
    await client.connection.sendNotification('textDocument/didClose', { textDocument: { uri: USED } });
    const ds = await client.waitForPush(USING, (d) => d.some((x) => x.code === 'use-file-missing'));
    expect(codes(ds)).toContain('use-file-missing');
  });

  it('shuts down and exits cleanly', async () => {
    expect(await client.stop()).toBe(0);
  });
});

describe('a used file on disk (pulled diagnostics)', () => {
  let client: TestClient;
  let dir = '';
  let usingUri = '';
  let usedFile = '';
  beforeAll(async () => {
    dir = mkdtempSync(path.join(tmpdir(), 'sublevel-protocol-'));
    usedFile = path.join(dir, 'alkalis.sublevel');
    writeFileSync(usedFile, USED_TEXT);
    usingUri = pathToFileURL(path.join(dir, 'setup.sublevel')).href;
    client = await startClient({ textDocument: { diagnostic: { dynamicRegistration: false } }, workspace: { diagnostics: { refreshSupport: true } } });
    await open(client, usingUri, USING_TEXT.replace('atoms/alkalis.sublevel', 'alkalis.sublevel'));
  }, 60_000);
  afterAll(async () => {
    if (client && client.process.exitCode === null) client.process.kill();
    rmSync(dir, { recursive: true, force: true });
  });

  const pull = (previousResultId?: string): Promise<DocumentDiagnosticReport> =>
    client.connection.sendRequest('textDocument/diagnostic', { textDocument: { uri: usingUri }, ...(previousResultId ? { previousResultId } : {}) }) as Promise<DocumentDiagnosticReport>;

  it('re-reads it when the watcher reports a change, with a new result id', async () => {
    const first = await pull();
    expect(first.kind).toBe('full');
    if (first.kind !== 'full') return;
    expect(codes(first.items)).toEqual([]);
    writeFileSync(usedFile, USED_TEXT.replace('p12', 'p_half'));
    const refreshes = client.requests.filter((r) => r === 'workspace/diagnostic/refresh').length;
    await client.connection.sendNotification('workspace/didChangeWatchedFiles', { changes: [{ uri: pathToFileURL(usedFile).href, type: 2 }] });
    const deadline = Date.now() + 20_000;
    while (client.requests.filter((r) => r === 'workspace/diagnostic/refresh').length === refreshes && Date.now() < deadline) await new Promise((r) => setTimeout(r, 50));
    const second = await pull(first.resultId);
    expect(second.kind).toBe('full');
    if (second.kind !== 'full') return;
    expect(second.resultId).not.toBe(first.resultId);
    expect(second.resultId).toMatch(/^1\.1/);
    expect(codes(second.items)).toEqual(['name-unknown']);
  });

  it('shuts down and exits cleanly', async () => {
    expect(await client.stop()).toBe(0);
  });
});
