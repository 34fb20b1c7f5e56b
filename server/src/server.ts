/**
 * Language server entry point: wires the language service (service/) to the protocol.
 * Nothing here parses or computes. The service and the physics behind it are loaded after the
 * `initialize` answer has gone out, so the editor sees a started server at once. The same
 * bundle, started as a worker thread, runs evaluations for the service (workerEvaluator.ts).
 * Files named by `use` are read from the open documents first, then from the disk; a change to
 * one (an edit, opening or closing it, or the client's file watcher) re-checks the documents
 * that use it.
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
import type { TextDocument } from 'vscode-languageserver-textdocument';
import * as path from 'path';
import { isMainThread, workerData } from 'worker_threads';
import { coalescedRequest } from './coalescedRequest';
import { documentSync } from './documentSync';
import { lastResort } from './lastResort';
import { evaluationSchedule } from './evaluationSchedule';
import { SEMANTIC_TOKENS_LEGEND } from './features/semanticTokensLegend';
import type { LanguageService } from './service/languageService';
import type { EditorSettings } from './service/settings';
import { guardedStdio } from './stdioTransport';
import { type DiagramView, isDiagramView } from './views/diagram';
import { isFieldUnit } from './render/fieldUnits';

/** Same value as EVALUATOR_ROLE in service/workerEvaluator.ts (not imported: that would load the service here). */
const EVALUATOR_ROLE = 'sublevel-evaluator';

type ServiceModule = typeof import('./service/serviceEntry');

/**
 * The analysis side is its own bundle, `service.js` beside this one (esbuild.mjs), required only
 * when first needed: a path built at run time keeps esbuild from folding it into this bundle.
 */
function loadServiceModule(): ServiceModule {
  return require(path.join(__dirname, 'service.js')) as ServiceModule;
}

if (!isMainThread && (workerData as { role?: string } | null)?.role === EVALUATOR_ROLE) {
  loadServiceModule().serveEvaluations();
} else {
  startLanguageServer();
}

function startLanguageServer(): void {
  let shutdownReceived = false;
  const stdio = guardedStdio(() => shutdownReceived);
  const connection = stdio ? createConnection(ProposedFeatures.all, stdio[0], stdio[1]) : createConnection(ProposedFeatures.all);
  connection.onShutdown(() => {
    shutdownReceived = true;
  });
  const log = (message: string): void => connection.console.error(message);
  const documents = new TextDocuments(documentSync((message) => connection.console.warn(message)));
  lastResort(log);

  /** Refresh requests to the client within this pause of the first are one (see coalescedRequest). */
  const REFRESH_PAUSE_MS = 60;
  /** Pause after the last change before the evaluation (in the worker) starts. */
  const EVALUATION_DELAY_MS = 120;

  const client = { workspaceFolders: false, pullDiagnostics: false, diagnosticRefresh: false, configuration: false, dynamicConfiguration: false, inlayHintRefresh: false };

  /** The workspace folders (URIs): `use` reads only below them (a file outside them: below its own folder). */
  let workspaceFolders: string[] = [];

  /** Asks the client to pull diagnostics (or inlay hints) again: one request per pause, never a pile. */
  const refreshDiagnostics = coalescedRequest(() => connection.languages.diagnostics.refresh(), REFRESH_PAUSE_MS);
  const refreshInlayHints = coalescedRequest(() => connection.languages.inlayHint.refresh(), REFRESH_PAUSE_MS);

  // ---- the service, loaded lazily --------------------------------------------------------------

  let service: LanguageService | undefined;
  let serviceLoading: Promise<LanguageService> | undefined;
  let readSettings: ((section: unknown) => EditorSettings) | undefined;

  /**
   * The evaluation worker's warm-up (WorkerEvaluator.warmUp) starts once the editor thread has
   * nothing to analyse: after the first diagnostics went out, or WARM_UP_AFTER_MS after the service
   * loaded when no document is open then. Started with the service instead, its thread delayed a
   * large file's first parse and model (20,000 lines: 2.2 s instead of 1.0–1.3 s on 2 cores).
   */
  const WARM_UP_AFTER_MS = 200;
  let startWarmUp: (() => void) | undefined;
  function warmUpWhenIdle(): void {
    const start = startWarmUp;
    startWarmUp = undefined;
    start?.();
  }

  function loadService(): Promise<LanguageService> {
    serviceLoading ??= (async () => {
      // After the current turn, so an `initialize` answer already queued goes out first.
      await new Promise<void>((resolve) => setImmediate(resolve));
      const m = loadServiceModule();
      readSettings = m.readSettings;
      const evaluator = new m.WorkerEvaluator(__filename, log);
      // With `sublevel.evaluation.warmUp` on (off by default: it costs 35–80 MB of memory), the worker
      // evaluates a built-in set-up until the first real job comes, so that job finds it warm.
      startWarmUp = () => {
        settingsWithoutDocument()
          .then((s) => {
            if (s.evaluation.warmUp) evaluator.warmUp();
          })
          .catch((e: unknown) => log(`sublevel: the warm-up failed to start: ${String(e)}`));
      };
      setTimeout(() => {
        if (documents.all().length === 0) warmUpWhenIdle();
      }, WARM_UP_AFTER_MS);
      service = new m.LanguageService(log, evaluator, m.editorFiles(() => documents.all(), () => workspaceFolders));
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

  /** The settings that belong to no document (the warm-up's), as the editor has them now. */
  async function settingsWithoutDocument(): Promise<EditorSettings> {
    const section = client.configuration ? await connection.workspace.getConfiguration({ section: 'sublevel' }).catch(() => undefined) : globalSettings;
    return readSettings!(section);
  }

  connection.onDidChangeConfiguration((change) => {
    const settings = (change.settings as { sublevel?: unknown } | null)?.sublevel;
    if (settings !== undefined) globalSettings = settings;
    settingsByUri.clear();
    if (client.inlayHintRefresh) refreshInlayHints();
    // The regime-notes setting changes what the diagnostics show.
    recheck(documents.all().map((d) => d.uri));
  });

  // ---- request plumbing -----------------------------------------------------------------------

  /** The document a request names; '' (no open document, so the empty answer) when it names none. */
  const uriOf = (p: { textDocument?: { uri?: unknown } } | null | undefined): string => {
    const uri = p?.textDocument?.uri;
    return typeof uri === 'string' ? uri : '';
  };

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
    client.diagnosticRefresh = !!caps.workspace?.diagnostics?.refreshSupport;
    client.workspaceFolders = !!caps.workspace?.workspaceFolders;
    workspaceFolders = params.workspaceFolders?.map((f) => f.uri) ?? (params.rootUri ? [params.rootUri] : []);
    return {
      capabilities: {
        workspace: { workspaceFolders: { supported: true, changeNotifications: client.workspaceFolders } },
        textDocumentSync: TextDocumentSyncKind.Incremental,
        hoverProvider: true,
        completionProvider: { triggerCharacters: [' ', ':', '=', '>', '"', '/'] },
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
    if (client.workspaceFolders) {
      connection.workspace.onDidChangeWorkspaceFolders((e) => {
        const removed = new Set(e.removed.map((f) => f.uri));
        workspaceFolders = [...workspaceFolders.filter((f) => !removed.has(f)), ...e.added.map((f) => f.uri)];
        // What `use` may read has changed: every open document is checked again.
        if (service) recheck(service.rootsChanged());
      });
    }
    if (client.dynamicConfiguration) {
      void connection.client.register(DidChangeConfigurationNotification.type, { section: 'sublevel' }).catch(() => undefined);
    }
    // Load the analysis code now, while the user is still looking at the file.
    setTimeout(() => void loadService().catch((e: unknown) => log(`sublevel: could not load the language service: ${String(e)}`)), 0);
  });

  // ---- diagnostics ----------------------------------------------------------------------------
  // Parse and model problems go out at once; the evaluation of the same version runs in the
  // worker after a short pause in typing, and its problems follow (pushed again, or the client
  // is asked to pull again).

  const pushTimers = new Map<string, NodeJS.Immediate>();

  const evaluations = evaluationSchedule<TextDocument>({
    delayMs: EVALUATION_DELAY_MS,
    current: (uri) => documents.get(uri),
    evaluate: (doc) => service?.evaluate(doc),
    evaluated: (doc) => {
      if (client.inlayHintRefresh) refreshInlayHints();
      if (client.pullDiagnostics) {
        if (client.diagnosticRefresh) refreshDiagnostics();
      } else schedulePush(doc.uri);
    },
    log,
  });
  const scheduleEvaluation = (doc: TextDocument): void => evaluations.schedule(doc);

  async function push(uri: string): Promise<void> {
    const svc = await loadService();
    const doc = documents.get(uri);
    if (!doc) return;
    const { items, complete } = svc.diagnostics(doc, await settingsFor(uri));
    await connection.sendDiagnostics({ uri, version: doc.version, diagnostics: items });
    if (!complete) scheduleEvaluation(doc);
    warmUpWhenIdle();
  }

  /**
   * Pushes the diagnostics with no fixed wait, but only once the changes already received are
   * taken in. The protocol library handles one received message per turn of the event loop and
   * schedules the next one after the handler, so waiting two turns lets a change queued behind
   * this one be handled first; it cancels this push (a burst of edits is one push). A keystroke
   * on its own is pushed at once.
   */
  function schedulePush(uri: string): void {
    clearImmediate(pushTimers.get(uri));
    const run = (): void => {
      pushTimers.delete(uri);
      push(uri).catch((e: unknown) => log(`sublevel: diagnostics failed for ${uri}: ${String(e)}`));
    };
    pushTimers.set(uri, setImmediate(() => pushTimers.set(uri, setImmediate(run))));
  }

  // ---- files used by other documents ----------------------------------------------------------

  /** Re-checks the open documents that use one of these files (their diagnostics go out again). */
  function filesChanged(locations: string[]): void {
    if (!service || locations.length === 0) return; // nothing analysed yet, so nothing depends on them
    recheck(service.filesChanged(locations));
  }

  /** Sends the diagnostics of these documents again (pushed, or the client is asked to pull). */
  function recheck(dependents: string[]): void {
    if (dependents.length === 0) return;
    if (!client.pullDiagnostics) {
      for (const uri of dependents) schedulePush(uri);
    } else if (client.diagnosticRefresh) refreshDiagnostics();
  }

  connection.onDidChangeWatchedFiles((p) => filesChanged(p.changes.map((c) => c.uri)));

  documents.onDidOpen((e) => {
    if (!client.pullDiagnostics) schedulePush(e.document.uri);
  });
  documents.onDidChangeContent((e) => {
    if (!client.pullDiagnostics) schedulePush(e.document.uri);
    // Also on open: the open text may differ from the disk's.
    filesChanged([e.document.uri]);
  });
  documents.onDidClose((e) => {
    const uri = e.document.uri;
    clearImmediate(pushTimers.get(uri));
    pushTimers.delete(uri);
    evaluations.cancel(uri);
    settingsByUri.delete(uri);
    service?.forget(uri);
    if (!client.pullDiagnostics) connection.sendDiagnostics({ uri, diagnostics: [] }).catch(() => undefined); // the client went away
    // Documents that use it read it from the disk now.
    filesChanged([uri]);
  });

  connection.languages.diagnostics.on(async (params, token): Promise<DocumentDiagnosticReport> => {
    const uri = uriOf(params);
    const empty: DocumentDiagnosticReport = { kind: 'full', items: [] };
    return run('diagnostics', uri, token, empty, async (svc, doc, settings): Promise<DocumentDiagnosticReport> => {
      const shown = await settings();
      const { items, complete } = svc.diagnostics(doc, shown);
      // The id says which version (and which analysis of it, when a used file changed) and whether the evaluation's problems are in.
      const revision = svc.revision(doc);
      const resultId = `${doc.version}${revision > 0 ? `.${revision}` : ''}${complete ? '' : '-partial'}${shown.regimeNotes.enabled ? '' : '-quiet'}`;
      if (!complete) scheduleEvaluation(doc);
      setImmediate(warmUpWhenIdle); // after this answer has gone out
      return params.previousResultId === resultId ? { kind: 'unchanged', resultId } : { kind: 'full', resultId, items };
    });
  });

  // ---- features -------------------------------------------------------------------------------

  connection.onHover((p, token) => run('hover', uriOf(p), token, null, async (svc, doc, settings) => svc.hover(doc, p.position, await settings())));

  connection.languages.inlayHint.on((p, token) =>
    run('inlay hints', uriOf(p), token, [], async (svc, doc, settings) => svc.inlayHints(doc, p.range, await settings())),
  );

  connection.onCodeAction((p, token) =>
    run('code actions', uriOf(p), token, [], (svc, doc) =>
      svc.codeActions(doc, { range: p.range, diagnostics: p.context?.diagnostics ?? [], ...(p.context?.only ? { only: p.context.only } : {}) }),
    ),
  );

  connection.onCompletion((p, token) => run('completion', uriOf(p), token, [], (svc, doc) => svc.completion(doc, p.position)));

  connection.onDocumentSymbol((p, token) => run('document symbols', uriOf(p), token, [], (svc, doc) => svc.documentSymbols(doc)));

  connection.onDefinition((p, token) => run('definition', uriOf(p), token, null, (svc, doc) => svc.definition(doc, p.position)));

  connection.onReferences((p, token) =>
    run('references', uriOf(p), token, [], (svc, doc) => svc.references(doc, p.position, p.context?.includeDeclaration === true)),
  );

  connection.onPrepareRename(async (p, token) => {
    const r = await run('prepare rename', uriOf(p), token, null, (svc, doc) => svc.prepareRename(doc, p.position));
    if (r && 'error' in r) throw new ResponseError(-32602, r.error);
    return r;
  });

  connection.onRenameRequest(async (p, token) => {
    const r = await run('rename', uriOf(p), token, null, (svc, doc) => svc.rename(doc, p.position, p.newName));
    if (r && 'error' in r) throw new ResponseError(-32602, r.error);
    return r;
  });

  connection.onFoldingRanges((p, token) => run('folding ranges', uriOf(p), token, [], (svc, doc) => svc.foldingRanges(doc)));

  connection.languages.semanticTokens.on((p, token) => run('semantic tokens', uriOf(p), token, { data: [] }, (svc, doc) => svc.semanticTokens(doc)));
  connection.languages.semanticTokens.onRange((p, token) =>
    // A range request without a range is nonsense (null), not a request for the whole document.
    run('semantic tokens', uriOf(p), token, { data: [] }, (svc, doc) => svc.semanticTokens(doc, p.range ?? null)),
  );

  // The diagram panel (client/src/host/diagramPanel.ts) asks for the SVG and CSV of one view.
  connection.onRequest('sublevel/diagram', (p: { uri?: unknown; view?: unknown; line?: unknown; theme?: unknown; field?: unknown; fromT?: unknown; toT?: unknown; unit?: unknown } | null, token) => {
    const uri = typeof p?.uri === 'string' ? p.uri : '';
    // Every view the panel has (the residuals and field-map tabs included), else the default.
    const view: DiagramView = isDiagramView(p?.view) ? p.view : 'levels';
    const finite = (v: unknown): number | undefined => (typeof v === 'number' && Number.isFinite(v) ? v : undefined);
    const choices = {
      ...(typeof p?.field === 'string' ? { fieldName: p.field } : {}),
      ...(finite(p?.fromT) !== undefined ? { fromT: finite(p?.fromT) } : {}),
      ...(finite(p?.toT) !== undefined ? { toT: finite(p?.toT) } : {}),
      ...(isFieldUnit(p?.unit) ? { fieldUnit: p.unit } : {}),
    };
    const theme = p?.theme === 'export' ? 'export' : 'panel';
    // Made sound with every other position, in the service (a nonsense line means no line).
    const line = typeof p?.line === 'number' ? p.line : undefined;
    const closed = { ok: false as const, message: 'Open the .sublevel file in an editor to see its diagrams.' };
    return run('diagram', uri, token, closed, (svc, doc) => svc.diagram(doc, { view, theme, ...choices, ...(line !== undefined ? { line } : {}) }));
  });

  // The text this server holds for an open document, as its edits made it: lets a client (and the
  // protocol tests) check that both sides agree. Null for a document that is not open.
  connection.onRequest('sublevel/heldText', (p: { uri?: unknown } | null) => {
    const doc = typeof p?.uri === 'string' ? documents.get(p.uri) : undefined;
    return doc ? { version: doc.version, text: doc.getText() } : null;
  });

  connection.onDocumentFormatting((p, token) => run('formatting', uriOf(p), token, [], (svc, doc) => svc.formatting(doc)));
  connection.onDocumentRangeFormatting((p, token) => run('formatting', uriOf(p), token, [], (svc, doc) => svc.formatting(doc, p.range ?? null)));

  documents.listen(connection);
  connection.listen();
}
