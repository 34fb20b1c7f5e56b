/**
 * The language service: per document version, a fast analysis (parse and model) that every
 * keystroke pays for, and an evaluation that runs apart (see documentStore.ts). Every editor
 * feature is a call that never throws: a failure is logged and gives the feature's empty answer.
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
import { toDiagnostic } from '../features/diagnostics';
import { withoutStop } from '../format/sentenceEnd';
import { documentSymbols } from '../features/documentSymbols';
import { foldingRanges } from '../features/foldingRanges';
import { formatting } from '../features/formatting';
import { hover } from '../features/hover';
import { inlayHints } from '../features/inlayHints';
import { references } from '../features/references';
import { prepareRename, rename, type RenameRefusal } from '../features/rename';
import { semanticTokens } from '../features/semanticTokens';
import { diagramFor, type DiagramAnswer, type DiagramRequest } from '../views/diagram';
import { DocumentStore, type DocumentSnapshot } from './documentStore';
import { type Evaluator, inProcessEvaluator } from './evaluator';
import { DEFAULT_SETTINGS, REGIME_NOTE_CODES, type EditorSettings } from './settings';
import type { WorkspaceFiles } from './workspaceFiles';

export type { DocumentSnapshot } from './documentStore';

export type Log = (message: string) => void;

/**
 * How long a hover or inlay-hint request waits for the evaluation before answering with what
 * parse and model know (the server asks the client to refresh inlay hints once it is in).
 */
export const EVALUATION_WAIT_MS = 750;

function describe(e: unknown): string {
  return e instanceof Error ? (e.stack ?? e.message) : String(e);
}

export class LanguageService {
  private readonly store: DocumentStore;

  constructor(
    private readonly log: Log = () => undefined,
    private readonly evaluator: Evaluator = inProcessEvaluator(),
    /** Reads the files that `use` statements name (open documents first, then the disk, in the server). */
    private readonly files?: WorkspaceFiles,
  ) {
    this.store = new DocumentStore(evaluator, log, files);
  }

  private guard<T>(feature: string, doc: DocumentSnapshot, empty: T, run: (a: Analysis) => T): T {
    try {
      const a = this.store.analysis(doc);
      // A text over a cap was not analysed: features have nothing to work on (its diagnostic says why).
      return a.refused ? empty : run(a);
    } catch (e) {
      this.log(`sublevel: ${feature} failed on ${doc.uri} (version ${doc.version}): ${describe(e)}`);
      return empty;
    }
  }

  private async guardEvaluated<T>(feature: string, doc: DocumentSnapshot, empty: T, run: (a: Analysis) => T): Promise<T> {
    try {
      const a = await this.store.evaluatedWithin(doc, EVALUATION_WAIT_MS);
      return a.refused ? empty : run(a);
    } catch (e) {
      this.log(`sublevel: ${feature} failed on ${doc.uri} (version ${doc.version}): ${describe(e)}`);
      return empty;
    }
  }

  /** Parse and model of this version (with the evaluation once it has run). */
  analysis(doc: DocumentSnapshot): Analysis {
    return this.store.analysis(doc);
  }

  /** True when this version is analysed already (a request for it will not parse). */
  isAnalysed(doc: DocumentSnapshot): boolean {
    return this.store.has(doc);
  }

  /** Starts (or joins) the evaluation of this version; resolves when it is in. Never rejects. */
  evaluate(doc: DocumentSnapshot): Promise<Analysis> {
    return this.store.evaluate(doc);
  }

  forget(uri: string): void {
    this.store.forget(uri);
  }

  /**
   * Files changed (an open document edited, opened or closed, or a file changed on disk): the
   * open documents that use one of them are analysed again. Gives their URIs, so that their
   * diagnostics can be sent again.
   */
  filesChanged(locations: readonly string[]): string[] {
    try {
      return this.store.filesChanged(locations);
    } catch (e) {
      this.log(`sublevel: tracking used files failed: ${describe(e)}`);
      return [];
    }
  }

  /** The workspace folders changed, so what `use` may read did: every document is analysed again. Gives their URIs. */
  rootsChanged(): string[] {
    return this.store.invalidateAll();
  }

  /** 0 for the first analysis of this version, then one more each time a file it uses changed (for diagnostic result ids). */
  revision(doc: DocumentSnapshot): number {
    try {
      return this.store.revision(doc);
    } catch {
      return 0;
    }
  }

  dispose(): void {
    this.evaluator.dispose();
  }

  /**
   * Diagnostics to show now. `complete` is false while the evaluation of this version has not
   * run: the items are then the parser's and model's, with the last evaluation's carried over.
   */
  diagnostics(doc: DocumentSnapshot, settings: EditorSettings = DEFAULT_SETTINGS): { items: Diagnostic[]; complete: boolean } {
    try {
      const { problems, complete } = this.store.problems(doc);
      const shown = settings.regimeNotes.enabled ? problems : problems.filter((p) => !REGIME_NOTE_CODES.has(p.code));
      return { items: shown.map((p) => toDiagnostic(p, doc.uri)), complete };
    } catch (e) {
      this.log(`sublevel: diagnostics failed on ${doc.uri} (version ${doc.version}): ${describe(e)}`);
      return { items: [], complete: true };
    }
  }

  hover(doc: DocumentSnapshot, pos: Position, settings: EditorSettings = DEFAULT_SETTINGS): Promise<Hover | null> {
    return this.guardEvaluated('hover', doc, null, (a) => hover(a, pos, settings.hover));
  }

  inlayHints(doc: DocumentSnapshot, range: Range, settings: EditorSettings = DEFAULT_SETTINGS): Promise<InlayHint[]> {
    if (!settings.inlayHints.enabled) return Promise.resolve([]);
    return this.guardEvaluated('inlay hints', doc, [], (a) => inlayHints(a, range));
  }

  codeActions(doc: DocumentSnapshot, request: CodeActionRequest): CodeAction[] {
    return this.guard('code actions', doc, [], (a) => codeActions(a, doc.uri, request));
  }

  completion(doc: DocumentSnapshot, pos: Position): CompletionItem[] {
    const files = this.files;
    const folder = files ? { uri: doc.uri, listFolder: (l: string) => files.listFolder(l) } : undefined;
    return this.guard('completion', doc, [], (a) => completion(a, pos, folder));
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

  /** The diagram panel's picture of this version (evaluated first, as hovers are). */
  async diagram(doc: DocumentSnapshot, req: Pick<DiagramRequest, 'view' | 'line' | 'theme' | 'fieldName' | 'fromT' | 'toT' | 'fieldUnit'>): Promise<DiagramAnswer> {
    const failed: DiagramAnswer = { ok: false, message: 'Sublevel could not draw this file; the server log says why.' };
    const fast = this.store.analysis(doc); // never throws (analyzeFast catches)
    if (fast.refused) return { ok: false, message: `Sublevel did not draw this file: ${withoutStop(fast.problems[0]?.message ?? 'it is over a size cap')}.` };
    return this.guardEvaluated('diagram', doc, failed, (a) => diagramFor(a, req));
  }

  formatting(doc: DocumentSnapshot, range?: Range): TextEdit[] {
    return this.guard('formatting', doc, [], (a) => formatting(a, range));
  }
}
