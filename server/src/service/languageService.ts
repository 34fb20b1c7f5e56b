/**
 * The language service: one cached analysis per document version and every editor feature
 * as a call that never throws (a failure is logged and gives the feature's empty answer).
 * Knows nothing of the protocol connection; server.ts wires it up.
 */
import type {
  CodeAction,
  CompletionItem,
  Diagnostic,
  DocumentSymbol,
  FoldingRange,
  Hover,
  InlayHint,
  Location,
  Position,
  Range,
  SemanticTokens,
  TextEdit,
  WorkspaceEdit,
} from 'vscode-languageserver-types';
import type { Analysis } from '../eval/analyze';
import { codeActions, type CodeActionRequest } from '../features/codeActions';
import { completion } from '../features/completion';
import { definition } from '../features/definition';
import { diagnostics } from '../features/diagnostics';
import { documentSymbols } from '../features/documentSymbols';
import { foldingRanges } from '../features/foldingRanges';
import { formatting } from '../features/formatting';
import { hover } from '../features/hover';
import { inlayHints } from '../features/inlayHints';
import { references } from '../features/references';
import { prepareRename, rename, type RenameRefusal } from '../features/rename';
import { semanticTokens } from '../features/semanticTokens';
import { AnalysisCache } from './documentCache';
import { DEFAULT_SETTINGS, type EditorSettings } from './settings';

/** What the service needs of a document: a TextDocument fits. */
export interface DocumentSnapshot {
  readonly uri: string;
  readonly version: number;
  getText(): string;
}

export type Log = (message: string) => void;

export class LanguageService {
  private readonly cache: AnalysisCache;

  constructor(private readonly log: Log = () => undefined) {
    this.cache = new AnalysisCache(log);
  }

  private guard<T>(feature: string, doc: DocumentSnapshot, empty: T, run: (a: Analysis) => T): T {
    try {
      return run(this.analysis(doc));
    } catch (e) {
      this.log(`sublevel: ${feature} failed on ${doc.uri} (version ${doc.version}): ${e instanceof Error ? (e.stack ?? e.message) : String(e)}`);
      return empty;
    }
  }

  analysis(doc: DocumentSnapshot): Analysis {
    return this.cache.get(doc.uri, doc.version, doc.getText());
  }

  /** True when this version is analysed already (a request for it will not parse). */
  isAnalysed(doc: DocumentSnapshot): boolean {
    return this.cache.peek(doc.uri, doc.version) !== undefined;
  }

  /** Computes the evaluation ahead of the first hover or inlay-hint request. */
  warm(doc: DocumentSnapshot): void {
    this.guard('evaluation', doc, undefined, (a) => void a.result);
  }

  forget(uri: string): void {
    this.cache.drop(uri);
  }

  diagnostics(doc: DocumentSnapshot): Diagnostic[] {
    return this.guard('diagnostics', doc, [], (a) => diagnostics(a, doc.uri));
  }

  hover(doc: DocumentSnapshot, pos: Position, settings: EditorSettings = DEFAULT_SETTINGS): Hover | null {
    return this.guard('hover', doc, null, (a) => hover(a, pos, settings.hover));
  }

  inlayHints(doc: DocumentSnapshot, range: Range, settings: EditorSettings = DEFAULT_SETTINGS): InlayHint[] {
    if (!settings.inlayHints.enabled) return [];
    return this.guard('inlay hints', doc, [], (a) => inlayHints(a, range));
  }

  codeActions(doc: DocumentSnapshot, request: CodeActionRequest): CodeAction[] {
    return this.guard('code actions', doc, [], (a) => codeActions(a, doc.uri, request));
  }

  completion(doc: DocumentSnapshot, pos: Position): CompletionItem[] {
    return this.guard('completion', doc, [], (a) => completion(a, pos));
  }

  documentSymbols(doc: DocumentSnapshot): DocumentSymbol[] {
    return this.guard('document symbols', doc, [], (a) => documentSymbols(a));
  }

  definition(doc: DocumentSnapshot, pos: Position): Location | null {
    return this.guard('definition', doc, null, (a) => definition(a, doc.uri, pos));
  }

  references(doc: DocumentSnapshot, pos: Position, includeDeclaration: boolean): Location[] {
    return this.guard('references', doc, [], (a) => references(a, doc.uri, pos, includeDeclaration));
  }

  prepareRename(doc: DocumentSnapshot, pos: Position): { range: Range; placeholder: string } | RenameRefusal | null {
    return this.guard('prepare rename', doc, null, (a) => prepareRename(a, pos));
  }

  rename(doc: DocumentSnapshot, pos: Position, newName: string): WorkspaceEdit | RenameRefusal | null {
    return this.guard('rename', doc, null, (a) => rename(a, doc.uri, pos, newName));
  }

  foldingRanges(doc: DocumentSnapshot): FoldingRange[] {
    return this.guard('folding ranges', doc, [], (a) => foldingRanges(a));
  }

  semanticTokens(doc: DocumentSnapshot, range?: Range): SemanticTokens {
    return this.guard('semantic tokens', doc, { data: [] }, (a) => semanticTokens(a, range));
  }

  formatting(doc: DocumentSnapshot, range?: Range): TextEdit[] {
    return this.guard('formatting', doc, [], (a) => formatting(a, range));
  }
}
