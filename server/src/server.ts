/**
 * Language server entry point: wires the pure language service to the protocol.
 * No physics or parsing here — see service/ and features/.
 */
import { createConnection, ProposedFeatures, TextDocuments, TextDocumentSyncKind } from 'vscode-languageserver/node';
import { TextDocument } from 'vscode-languageserver-textdocument';
import { AnalysisCache } from './service/documentCache';
import { toLspDiagnostic } from './service/toLsp';

const connection = createConnection(ProposedFeatures.all);
const documents = new TextDocuments(TextDocument);
const cache = new AnalysisCache();
const pending = new Map<string, NodeJS.Timeout>();
/** Short pause after a keystroke before re-checking, so fast typing is not slowed down. */
const DEBOUNCE_MS = 60;

connection.onInitialize(() => ({
  capabilities: {
    textDocumentSync: TextDocumentSyncKind.Incremental,
  },
  serverInfo: { name: 'sublevel', version: '0.1.0' },
}));

function publish(doc: TextDocument): void {
  try {
    const analysis = cache.get(doc.uri, doc.version, doc.getText());
    void connection.sendDiagnostics({
      uri: doc.uri,
      version: doc.version,
      diagnostics: analysis.problems.map((p) => toLspDiagnostic(p, doc.uri)),
    });
  } catch (e) {
    connection.console.error(`sublevel: diagnostics failed for ${doc.uri}: ${(e as Error).stack ?? String(e)}`);
  }
}

function schedule(doc: TextDocument): void {
  const t = pending.get(doc.uri);
  if (t) clearTimeout(t);
  pending.set(
    doc.uri,
    setTimeout(() => {
      pending.delete(doc.uri);
      const current = documents.get(doc.uri);
      if (current) publish(current);
    }, DEBOUNCE_MS),
  );
}

documents.onDidOpen((e) => publish(e.document));
documents.onDidChangeContent((e) => schedule(e.document));
documents.onDidClose((e) => {
  const t = pending.get(e.document.uri);
  if (t) clearTimeout(t);
  pending.delete(e.document.uri);
  cache.drop(e.document.uri);
  void connection.sendDiagnostics({ uri: e.document.uri, diagnostics: [] });
});

documents.listen(connection);
connection.listen();
