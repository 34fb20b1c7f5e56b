/**
 * A small language client for protocol tests: spawns the built server (`dist/server.js --stdio`,
 * rebuilt with esbuild.mjs when a source file is newer) and talks JSON-RPC to it.
 */
import { type ChildProcess, execFileSync, spawn } from 'child_process';
import { existsSync, readdirSync, statSync } from 'fs';
import path from 'path';
import { createMessageConnection, type MessageConnection, StreamMessageReader, StreamMessageWriter } from 'vscode-jsonrpc/node';
import { type ClientCapabilities, type Diagnostic, type InitializeResult, type PublishDiagnosticsParams, ShutdownRequest } from 'vscode-languageserver-protocol';

export const SERVER = path.resolve('dist/server.js');

function newestSource(dir: string): number {
  let newest = 0;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const p = path.join(dir, entry.name);
    newest = Math.max(newest, entry.isDirectory() ? newestSource(p) : statSync(p).mtimeMs);
  }
  return newest;
}

/** Builds dist/ when the server bundle is missing or older than the sources. */
export function ensureBuilt(): void {
  if (existsSync(SERVER) && statSync(SERVER).mtimeMs >= newestSource('server/src')) return;
  execFileSync(process.execPath, ['esbuild.mjs'], { stdio: 'inherit' });
}

export interface TestClient {
  connection: MessageConnection;
  process: ChildProcess;
  initialize: InitializeResult;
  /** Diagnostics pushed by the server, latest per URI. */
  pushed: Map<string, PublishDiagnosticsParams>;
  /** Waits until the server pushed diagnostics for `uri` that satisfy `ok`. */
  waitForPush(uri: string, ok: (d: Diagnostic[]) => boolean, timeoutMs?: number): Promise<Diagnostic[]>;
  /** Server → client requests seen, by method. */
  requests: string[];
  stderr: string[];
  stop(): Promise<number | null>;
}

/** `server`: the bundle to start (a test may start a copy beside a service with failures planted). */
export async function startClient(capabilities: ClientCapabilities, answers: Record<string, (params: unknown) => unknown> = {}, server = SERVER): Promise<TestClient> {
  const child = spawn(process.execPath, [server, '--stdio'], { stdio: ['pipe', 'pipe', 'pipe'] });
  const stderr: string[] = [];
  child.stderr!.on('data', (b: Buffer) => stderr.push(b.toString()));
  const connection = createMessageConnection(new StreamMessageReader(child.stdout!), new StreamMessageWriter(child.stdin!));
  const pushed = new Map<string, PublishDiagnosticsParams>();
  const listeners = new Set<() => void>();
  const requests: string[] = [];
  connection.onNotification('textDocument/publishDiagnostics', (p: PublishDiagnosticsParams) => {
    pushed.set(p.uri, p);
    for (const l of [...listeners]) l();
  });
  connection.onNotification('window/logMessage', () => undefined);
  connection.onRequest((method: string, params: unknown) => {
    requests.push(method);
    const answer = answers[method];
    if (answer) return answer(params);
    if (method === 'workspace/configuration') return ((params as { items: unknown[] }).items ?? []).map(() => null);
    return null;
  });
  connection.listen();
  const initialize = (await connection.sendRequest('initialize', {
    processId: process.pid,
    rootUri: null,
    capabilities,
    workspaceFolders: null,
  })) as InitializeResult;
  await connection.sendNotification('initialized', {});
  const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
  return {
    connection,
    process: child,
    initialize,
    pushed,
    requests,
    stderr,
    waitForPush(uri, ok, timeoutMs = 20_000) {
      return new Promise((resolve, reject) => {
        const check = (): void => {
          const p = pushed.get(uri);
          if (p && ok(p.diagnostics)) {
            listeners.delete(check);
            clearTimeout(timer);
            resolve(p.diagnostics);
          }
        };
        const timer = setTimeout(() => {
          listeners.delete(check);
          reject(new Error(`no matching diagnostics for ${uri} within ${timeoutMs} ms; last: ${JSON.stringify(pushed.get(uri)?.diagnostics.map((d) => d.code))}`));
        }, timeoutMs);
        listeners.add(check);
        check();
      });
    },
    async stop() {
      await connection.sendRequest(ShutdownRequest.type);
      await connection.sendNotification('exit');
      const code = await exited;
      connection.dispose();
      return code;
    },
  };
}

export async function open(client: TestClient, uri: string, text: string, version = 1): Promise<void> {
  await client.connection.sendNotification('textDocument/didOpen', { textDocument: { uri, languageId: 'sublevel', version, text } });
}
