/**
 * The built server against a broken message stream (it says why and exits with code 1, so the
 * client restarts it) and against many evaluations finishing at once (one refresh request per
 * pause, not one per evaluation).
 */
import { spawn } from 'child_process';
import type { DocumentDiagnosticReport } from 'vscode-languageserver-protocol';
import { beforeAll, describe, expect, it } from 'vitest';
import { ensureBuilt, open, SERVER, startClient } from './lspClient';

beforeAll(() => ensureBuilt(), 120_000);

/** Starts the server over stdio, writes `bytes`, and waits for it to exit. */
function feed(bytes: string): Promise<{ code: number | null; stderr: string }> {
  const child = spawn(process.execPath, [SERVER, '--stdio'], { stdio: ['pipe', 'pipe', 'pipe'] });
  let stderr = '';
  child.stderr.on('data', (b: Buffer) => (stderr += b.toString()));
  child.stdout.on('data', () => undefined);
  const timer = setTimeout(() => child.kill(), 15_000);
  child.stdin.write(bytes); // the stream stays open: only the broken header may end the server
  return new Promise((resolve) =>
    child.on('exit', (code) => {
      clearTimeout(timer);
      resolve({ code, stderr });
    }),
  );
}

describe('a broken Content-Length header', () => {
  const cases = [
    { name: 'a value that is not a number', bytes: 'Content-Length: twelve\r\n\r\n{"jsonrpc":"2.0"}' },
    { name: 'no Content-Length at all', bytes: 'Content-Type: application/vscode-jsonrpc\r\n\r\n{"jsonrpc":"2.0"}' },
    { name: 'a length that cuts a message in the middle', bytes: 'Content-Length: 5\r\n\r\n{"jsonrpc":"2.0","id":1,"method":"initialize","params":{}}' },
  ];
  for (const c of cases) {
    it(`with ${c.name}: logs why and exits with code 1`, async () => {
      const { code, stderr } = await feed(c.bytes);
      expect(code).toBe(1);
      expect(stderr).toContain('sublevel: the message stream from the client is broken');
    }, 20_000);
  }
});

describe('refresh requests', () => {
  it('are coalesced when many evaluations finish close together', async () => {
    let refreshes = 0;
    // A client that takes its time to answer, as a busy editor does.
    const client = await startClient(
      { textDocument: { diagnostic: { dynamicRegistration: false } }, workspace: { diagnostics: { refreshSupport: true } } },
      { 'workspace/diagnostic/refresh': () => (refreshes++, new Promise((r) => setTimeout(() => r(null), 1000))) },
    );
    const uris = Array.from({ length: 12 }, (_, i) => `file:///protocol/many${i}.sublevel`);
    for (const uri of uris) await open(client, uri, `species Li7\n  level upper: 2p 2P°3/2\nfield bias = ${i(uri)} G\n`);
    const pull = (uri: string): Promise<DocumentDiagnosticReport> =>
      client.connection.sendRequest('textDocument/diagnostic', { textDocument: { uri } }) as Promise<DocumentDiagnosticReport>;
    for (const uri of uris) await pull(uri);
    // Every evaluation is in once every pull answers in full.
    const deadline = Date.now() + 30_000;
    let complete = 0;
    while (Date.now() < deadline) {
      const reports = await Promise.all(uris.map(pull));
      complete = reports.filter((r) => r.kind === 'full' && !String(r.resultId).endsWith('-partial')).length;
      if (complete === uris.length) break;
      await new Promise((r) => setTimeout(r, 100));
    }
    expect(complete).toBe(uris.length);
    await new Promise((r) => setTimeout(r, 1500));
    // One per evaluation (12) before; now one per pause, plus one after an answer at most.
    expect(refreshes).toBeGreaterThanOrEqual(1);
    expect(refreshes).toBeLessThanOrEqual(4);
    expect(await client.stop()).toBe(0);
  }, 60_000);
});

function i(uri: string): number {
  return Number(/many(\d+)/.exec(uri)![1]) + 1;
}
