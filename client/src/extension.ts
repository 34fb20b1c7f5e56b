/**
 * VS Code entry point: starts the Sublevel language server over IPC for `.sublevel` files and
 * registers the diagram panel. All checking and physics happen in the server.
 */
import * as path from 'path';
import * as vscode from 'vscode';
import { LanguageClient, type LanguageClientOptions, type ServerOptions, TransportKind } from 'vscode-languageclient/node';
import { DiagramPanel, PANEL_VIEW_TYPE } from './host/diagramPanel';
import { createTraceChannel } from './host/traceChannel';

let client: LanguageClient | undefined;

export async function activate(context: vscode.ExtensionContext): Promise<void> {
  const serverModule = context.asAbsolutePath(path.join('dist', 'server.js'));
  // A larger young generation: parsing a long file allocates many short-lived objects, and with
  // V8's default the garbage collector takes most of a keystroke (see docs/editor.md, Speed).
  const heap = ['--max-semi-space-size=64'];
  const serverOptions: ServerOptions = {
    run: { module: serverModule, transport: TransportKind.ipc, options: { execArgv: heap } },
    debug: { module: serverModule, transport: TransportKind.ipc, options: { execArgv: [...heap, '--nolazy', '--inspect=6021'] } },
  };
  // Setup files changed on disk re-check the open files that `use` them.
  const watcher = vscode.workspace.createFileSystemWatcher('**/*.sublevel');
  context.subscriptions.push(watcher);
  // `sublevel.trace.server` alone turns the protocol trace on (see host/traceChannel.ts).
  const traceOutputChannel = createTraceChannel({
    readSetting: () => vscode.workspace.getConfiguration('sublevel').get<unknown>('trace.server'),
    onSettingChange: (listener) => vscode.workspace.onDidChangeConfiguration((event) => {
      if (event.affectsConfiguration('sublevel.trace.server')) listener();
    }),
    openChannel: (name) => vscode.window.createOutputChannel(name),
    levels: vscode.LogLevel,
  });
  context.subscriptions.push(traceOutputChannel);
  const clientOptions: LanguageClientOptions = {
    documentSelector: [{ language: 'sublevel' }],
    synchronize: { configurationSection: 'sublevel', fileEvents: watcher },
    traceOutputChannel,
  };
  const c = new LanguageClient('sublevel', 'Sublevel', serverOptions, clientOptions);
  client = c;
  context.subscriptions.push(
    vscode.commands.registerCommand('sublevel.showDiagrams', () => DiagramPanel.show(context, c)),
    vscode.window.registerWebviewPanelSerializer(PANEL_VIEW_TYPE, {
      deserializeWebviewPanel: async (panel, state) => DiagramPanel.restore(panel, context, c, state),
    }),
  );
  await c.start();
}

export async function deactivate(): Promise<void> {
  await client?.stop();
  client = undefined;
}
