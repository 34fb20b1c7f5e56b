/**
 * VS Code entry point: starts the Sublevel language server over IPC for `.sublevel` files.
 * All checking and physics happen in the server; this file only wires the client up.
 */
import * as path from 'path';
import type { ExtensionContext } from 'vscode';
import { LanguageClient, LanguageClientOptions, ServerOptions, TransportKind } from 'vscode-languageclient/node';

let client: LanguageClient | undefined;

export async function activate(context: ExtensionContext): Promise<void> {
  const serverModule = context.asAbsolutePath(path.join('dist', 'server.js'));
  const serverOptions: ServerOptions = {
    run: { module: serverModule, transport: TransportKind.ipc },
    debug: { module: serverModule, transport: TransportKind.ipc, options: { execArgv: ['--nolazy', '--inspect=6021'] } },
  };
  const clientOptions: LanguageClientOptions = {
    documentSelector: [{ language: 'sublevel' }],
  };
  client = new LanguageClient('sublevel', 'Sublevel', serverOptions, clientOptions);
  await client.start();
}

export async function deactivate(): Promise<void> {
  await client?.stop();
  client = undefined;
}
