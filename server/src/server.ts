/**
 * Language server entry point: wires the language service (service/) to the protocol.
 * Nothing here parses or computes. The service and the physics behind it are loaded after the
 * `initialize` answer has gone out, so the editor sees a started server at once.
 */
import {
  type CancellationToken,
  CodeActionKind,
  createConnection,
  DidChangeConfigurationNotification,
  type DocumentDiagnosticReport,
  type InitializeParams,
  type InitializeResult,
  ProposedFeatures,
  ResponseError,
  TextDocuments,
  TextDocumentSyncKind,
} from 'vscode-languageserver/node';
import { TextDocument } from 'vscode-languageserver-textdocument';
import { SEMANTIC_TOKENS_LEGEND } from './features/semanticTokensLegend';
import type { LanguageService } from './service/languageService';
import type { EditorSettings } from './service/settings';

const connection = createConnection(ProposedFeatures.all);
const documents = new TextDocuments(TextDocument);
const log = (message: string): void => connection.console.error(message);

/** Short pause after a keystroke before pushing diagnostics, so fast typing is not slowed down. */
const PUSH_DEBOUNCE_MS = 60;
/** Pause after the last change before the evaluation is computed ahead of hovers. */
const WARM_DELAY_MS = 250;

const client = { pullDiagnostics: false, configuration: false, dynamicConfiguration: false, inlayHintRefresh: false };

// ---- the service, loaded lazily --------------------------------------------------------------

let service: LanguageService | undefined;
let serviceLoading: Promise<LanguageService> | undefined;
let readSettings: ((section: unknown) => EditorSettings) | undefined;

function loadService(): Promise<LanguageService> {
  serviceLoading ??= (async () => {
    const [svc, settings] = await Promise.all([import('./service/languageService'), import('./service/settings')]);
    readSettings = settings.readSettings;
    service = new svc.LanguageService(log);
    return service;
  })();
  return serviceLoading;
}

// ---- settings ---------------------------------------------------------------------------------

const settingsByUri = new Map<string, Promise<EditorSettings>>();
let globalSettings: unknown = {};

function settingsFor(uri: string): Promise<EditorSettings> {
  let s = settingsByUri.get(uri);
  if (!s) {
    s = (async () => {
      await loadService();
      const section = client.configuration
        ? await connection.workspace.getConfiguration({ scopeUri: uri, section: 'sublevel' }).catch(() => undefined)
        : globalSettings;
      return readSettings!(section);
    })();
    settingsByUri.set(uri, s);
  }
  return s;
}

connection.onDidChangeConfiguration((change) => {
  const settings = (change.settings as { sublevel?: unknown } | null)?.sublevel;
  if (settings !== undefined) globalSettings = settings;
  settingsByUri.clear();
  if (client.inlayHintRefresh) void connection.languages.inlayHint.refresh().catch(() => undefined);
});

// ---- request plumbing -----------------------------------------------------------------------

/**
 * Runs one request for an open document: gives `empty` when the document is unknown or the
 * request was cancelled, and logs and gives `empty` when anything fails.
 */
async function run<T>(
  name: string,
  uri: string,
  token: CancellationToken,
  empty: T,
  work: (svc: LanguageService, doc: TextDocument, settings: () => Promise<EditorSettings>) => T | Promise<T>,
): Promise<T> {
  try {
    const svc = await loadService();
    const doc = documents.get(uri);
    if (!doc || token.isCancellationRequested) return empty;
    const result = await work(svc, doc, () => settingsFor(uri));
    return token.isCancellationRequested ? empty : result;
  } catch (e) {
    log(`sublevel: ${name} failed for ${uri}: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}`);
    return empty;
  }
}

connection.onInitialize((params: InitializeParams): InitializeResult => {
  const caps = params.capabilities;
  client.pullDiagnostics = !!caps.textDocument?.diagnostic;
  client.configuration = !!caps.workspace?.configuration;
  client.dynamicConfiguration = !!caps.workspace?.didChangeConfiguration?.dynamicRegistration;
  client.inlayHintRefresh = !!caps.workspace?.inlayHint?.refreshSupport;
  return {
    capabilities: {
      textDocumentSync: TextDocumentSyncKind.Incremental,
      hoverProvider: true,
      completionProvider: { triggerCharacters: [' ', ':', '=', '>'] },
      definitionProvider: true,
      referencesProvider: true,
      renameProvider: caps.textDocument?.rename?.prepareSupport ? { prepareProvider: true } : true,
      documentSymbolProvider: true,
      foldingRangeProvider: true,
      documentFormattingProvider: true,
      documentRangeFormattingProvider: true,
      codeActionProvider: { codeActionKinds: [CodeActionKind.QuickFix, CodeActionKind.RefactorRewrite] },
      semanticTokensProvider: { legend: SEMANTIC_TOKENS_LEGEND, full: true, range: true },
      inlayHintProvider: true,
      ...(client.pullDiagnostics
        ? { diagnosticProvider: { identifier: 'sublevel', interFileDependencies: false, workspaceDiagnostics: false } }
        : {}),
    },
    serverInfo: { name: 'sublevel', version: '0.1.0' },
  };
});

connection.onInitialized(() => {
  if (client.dynamicConfiguration) {
    void connection.client.register(DidChangeConfigurationNotification.type, { section: 'sublevel' }).catch(() => undefined);
  }
  // Load the analysis code now, while the user is still looking at the file.
  setTimeout(() => void loadService().catch((e: unknown) => log(`sublevel: could not load the language service: ${String(e)}`)), 0);
});

// ---- diagnostics ----------------------------------------------------------------------------

const pushTimers = new Map<string, NodeJS.Timeout>();
const warmTimers = new Map<string, NodeJS.Timeout>();

/** After a pause in typing, compute the evaluation so that the next hover finds it ready. */
function scheduleWarm(doc: TextDocument): void {
  clearTimeout(warmTimers.get(doc.uri));
  warmTimers.set(
    doc.uri,
    setTimeout(() => {
      warmTimers.delete(doc.uri);
      const current = documents.get(doc.uri);
      if (current && current.version === doc.version) service?.warm(current);
    }, WARM_DELAY_MS),
  );
}

async function push(uri: string): Promise<void> {
  const svc = await loadService();
  const doc = documents.get(uri);
  if (!doc) return;
  await connection.sendDiagnostics({ uri, version: doc.version, diagnostics: svc.diagnostics(doc) });
  scheduleWarm(doc);
}

function schedulePush(uri: string, delay: number): void {
  clearTimeout(pushTimers.get(uri));
  pushTimers.set(
    uri,
    setTimeout(() => {
      pushTimers.delete(uri);
      push(uri).catch((e: unknown) => log(`sublevel: diagnostics failed for ${uri}: ${String(e)}`));
    }, delay),
  );
}

documents.onDidOpen((e) => {
  if (!client.pullDiagnostics) schedulePush(e.document.uri, 0);
});
documents.onDidChangeContent((e) => {
  if (!client.pullDiagnostics) schedulePush(e.document.uri, PUSH_DEBOUNCE_MS);
});
documents.onDidClose((e) => {
  const uri = e.document.uri;
  clearTimeout(pushTimers.get(uri));
  clearTimeout(warmTimers.get(uri));
  pushTimers.delete(uri);
  warmTimers.delete(uri);
  settingsByUri.delete(uri);
  service?.forget(uri);
  if (!client.pullDiagnostics) void connection.sendDiagnostics({ uri, diagnostics: [] });
});

connection.languages.diagnostics.on(async (params, token): Promise<DocumentDiagnosticReport> => {
  const uri = params.textDocument.uri;
  const empty: DocumentDiagnosticReport = { kind: 'full', items: [] };
  return run('diagnostics', uri, token, empty, (svc, doc) => {
    const resultId = String(doc.version);
    const report: DocumentDiagnosticReport =
      params.previousResultId === resultId && svc.isAnalysed(doc) ? { kind: 'unchanged', resultId } : { kind: 'full', resultId, items: svc.diagnostics(doc) };
    scheduleWarm(doc);
    return report;
  });
});

// ---- features -------------------------------------------------------------------------------

connection.onHover((p, token) => run('hover', p.textDocument.uri, token, null, async (svc, doc, settings) => svc.hover(doc, p.position, await settings())));

connection.languages.inlayHint.on((p, token) =>
  run('inlay hints', p.textDocument.uri, token, [], async (svc, doc, settings) => svc.inlayHints(doc, p.range, await settings())),
);

connection.onCodeAction((p, token) =>
  run('code actions', p.textDocument.uri, token, [], (svc, doc) =>
    svc.codeActions(doc, { range: p.range, diagnostics: p.context.diagnostics, ...(p.context.only ? { only: p.context.only } : {}) }),
  ),
);

connection.onCompletion((p, token) => run('completion', p.textDocument.uri, token, [], (svc, doc) => svc.completion(doc, p.position)));

connection.onDocumentSymbol((p, token) => run('document symbols', p.textDocument.uri, token, [], (svc, doc) => svc.documentSymbols(doc)));

connection.onDefinition((p, token) => run('definition', p.textDocument.uri, token, null, (svc, doc) => svc.definition(doc, p.position)));

connection.onReferences((p, token) =>
  run('references', p.textDocument.uri, token, [], (svc, doc) => svc.references(doc, p.position, p.context.includeDeclaration)),
);

connection.onPrepareRename(async (p, token) => {
  const r = await run('prepare rename', p.textDocument.uri, token, null, (svc, doc) => svc.prepareRename(doc, p.position));
  if (r && 'error' in r) throw new ResponseError(-32602, r.error);
  return r;
});

connection.onRenameRequest(async (p, token) => {
  const r = await run('rename', p.textDocument.uri, token, null, (svc, doc) => svc.rename(doc, p.position, p.newName));
  if (r && 'error' in r) throw new ResponseError(-32602, r.error);
  return r;
});

connection.onFoldingRanges((p, token) => run('folding ranges', p.textDocument.uri, token, [], (svc, doc) => svc.foldingRanges(doc)));

connection.languages.semanticTokens.on((p, token) => run('semantic tokens', p.textDocument.uri, token, { data: [] }, (svc, doc) => svc.semanticTokens(doc)));
connection.languages.semanticTokens.onRange((p, token) =>
  run('semantic tokens', p.textDocument.uri, token, { data: [] }, (svc, doc) => svc.semanticTokens(doc, p.range)),
);

connection.onDocumentFormatting((p, token) => run('formatting', p.textDocument.uri, token, [], (svc, doc) => svc.formatting(doc)));
connection.onDocumentRangeFormatting((p, token) => run('formatting', p.textDocument.uri, token, [], (svc, doc) => svc.formatting(doc, p.range)));

documents.listen(connection);
connection.listen();
