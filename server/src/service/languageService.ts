/**
 * The language service: per document version, a fast analysis (parse and model) that every
 * keystroke pays for, and an evaluation that runs apart (see documentStore.ts). Every editor
 * feature is a call that never throws: a failure is logged and gives the feature's empty answer.
 * Positions and ranges are taken as the client sent them and made sound here, in one way
 * (requestPositions.ts): a feature never sees a position outside the text, and nonsense gets the
 * empty answer. Knows nothing of the protocol connection; server.ts wires it up.
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
import { internalError, sortProblems, type Analysis } from '../eval/analyze';
import type { Problem } from '../format/ast';
import { unparsedDocument } from '../eval/inputLimits';
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
import { requestPosition, requestRange } from './requestPositions';

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

/** The text of a snapshot, or undefined when reading it throws (a broken snapshot is still told apart by its version). */
function textOf(doc: DocumentSnapshot): string | undefined {
  try {
    return doc.getText();
  } catch {
    return undefined;
  }
}

/** An evaluation failure the store could not record, kept for the version (and text) it belongs to. */
interface UnrecordedFailure {
  version: number;
  text: string | undefined;
  problem: Problem;
}

/** Runs `run` at the position the client meant, or gives `empty` for a nonsense one (requestPositions.ts). */
function at<T>(a: Analysis, pos: unknown, empty: T, run: (p: Position) => T): T {
  const p = requestPosition(a.doc, pos);
  return p ? run(p) : empty;
}

/** Runs `run` over the range the client meant, or gives `empty` for a nonsense one. */
function within<T>(a: Analysis, range: unknown, empty: T, run: (r: Range) => T): T {
  const r = requestRange(a.doc, range);
  return r ? run(r) : empty;
}

export class LanguageService {
  private readonly store: DocumentStore;
  /** By URI: the failure of an evaluation that the store itself failed to record, so that `diagnostics` still shows it. */
  private readonly unrecorded = new Map<string, UnrecordedFailure>();
  /** The log, made safe: a log that throws (a closed connection) must not turn a failure's answer into a throw. */
  private readonly log: Log;

  constructor(
    log: Log = () => undefined,
    private readonly evaluator: Evaluator = inProcessEvaluator(),
    /** Reads the files that `use` statements name (open documents first, then the disk, in the server). */
    private readonly files?: WorkspaceFiles,
  ) {
    this.log = (message) => {
      try {
        log(message);
      } catch {
        // Nowhere left to say it; the answer (or diagnostic) still says what it can.
      }
    };
    // The store gets the log as given: its failure path copes with a log that throws (documentStore.ts).
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

  /**
   * Starts (or joins) the evaluation of this version; resolves when it is in. Never throws or
   * rejects: a failure is logged and the version's diagnostics get an `internal-error`.
   */
  evaluate(doc: DocumentSnapshot): Promise<Analysis> {
    try {
      return this.store.evaluate(doc).catch((e: unknown) => this.evaluationFailed(doc, e));
    } catch (e) {
      return Promise.resolve(this.evaluationFailed(doc, e));
    }
  }

  private evaluationFailed(doc: DocumentSnapshot, e: unknown): Analysis {
    this.log(`sublevel: evaluation failed on ${doc.uri} (version ${doc.version}): ${describe(e)}`);
    try {
      return this.store.evaluationFailed(doc, e);
    } catch {
      // The store (or the snapshot's text) is broken for this version: keep the failure here, so that
      // `diagnostics` shows it for this version (with whatever else the store can still give).
      const problem = internalError(e);
      this.unrecorded.set(doc.uri, { version: doc.version, text: textOf(doc), problem });
      return { doc: unparsedDocument(''), problems: [problem] };
    }
  }

  /** The failure kept for this version by `evaluationFailed`, if any (a newer version or text drops it). */
  private unrecordedFailure(doc: DocumentSnapshot): Problem | undefined {
    const kept = this.unrecorded.get(doc.uri);
    if (!kept) return undefined;
    if (kept.version === doc.version && kept.text === textOf(doc)) return kept.problem;
    this.unrecorded.delete(doc.uri);
    return undefined;
  }

  forget(uri: string): void {
    this.unrecorded.delete(uri);
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
      const failure = this.unrecordedFailure(doc);
      const stored = this.store.problems(doc);
      // Complete with a kept failure: the version is not evaluated again (it would only fail again).
      const { problems, complete } = failure ? { problems: sortProblems([...stored.problems, failure]), complete: true } : stored;
      const shown = settings.regimeNotes.enabled ? problems : problems.filter((p) => !REGIME_NOTE_CODES.has(p.code));
      return { items: shown.map((p) => toDiagnostic(p, doc.uri)), complete };
    } catch (e) {
      this.log(`sublevel: diagnostics failed on ${doc.uri} (version ${doc.version}): ${describe(e)}`);
      // Said in the file, not only in the log; complete, so that it is not asked again for this version.
      return { items: [toDiagnostic(internalError(e), doc.uri)], complete: true };
    }
  }

  hover(doc: DocumentSnapshot, pos: Position, settings: EditorSettings = DEFAULT_SETTINGS): Promise<Hover | null> {
    return this.guardEvaluated('hover', doc, null, (a) => at(a, pos, null, (p) => hover(a, p, settings.hover)));
  }

  inlayHints(doc: DocumentSnapshot, range: Range, settings: EditorSettings = DEFAULT_SETTINGS): Promise<InlayHint[]> {
    if (!settings.inlayHints.enabled) return Promise.resolve([]);
    return this.guardEvaluated('inlay hints', doc, [], (a) => within(a, range, [], (r) => inlayHints(a, r)));
  }

  codeActions(doc: DocumentSnapshot, request: CodeActionRequest): CodeAction[] {
    return this.guard('code actions', doc, [], (a) =>
      within(a, request.range, [], (range) => {
        // The client's copies of our diagnostics name the problems to fix; one with a nonsense range names none.
        const given: unknown = request.diagnostics;
        const diagnostics = Array.isArray(given) ? given.filter((d: Diagnostic | null) => requestRange(a.doc, d?.range) !== undefined) : [];
        const only = Array.isArray(request.only) ? request.only.filter((k) => typeof k === 'string') : undefined;
        return codeActions(a, doc.uri, { range, diagnostics, ...(only ? { only } : {}) });
      }),
    );
  }

  completion(doc: DocumentSnapshot, pos: Position): CompletionItem[] {
    const files = this.files;
    const folder = files ? { uri: doc.uri, listFolder: (l: string) => files.listFolder(l) } : undefined;
    return this.guard('completion', doc, [], (a) => at(a, pos, [], (p) => completion(a, p, folder)));
  }

  documentSymbols(doc: DocumentSnapshot): DocumentSymbol[] {
    return this.guard('document symbols', doc, [], (a) => documentSymbols(a));
  }

  definition(doc: DocumentSnapshot, pos: Position): Location | null {
    return this.guard('definition', doc, null, (a) => at(a, pos, null, (p) => definition(a, doc.uri, p)));
  }

  references(doc: DocumentSnapshot, pos: Position, includeDeclaration: boolean): Location[] {
    return this.guard('references', doc, [], (a) => at(a, pos, [], (p) => references(a, doc.uri, p, includeDeclaration === true)));
  }

  prepareRename(doc: DocumentSnapshot, pos: Position): { range: Range; placeholder: string } | RenameRefusal | null {
    return this.guard('prepare rename', doc, null, (a) => at(a, pos, null, (p) => prepareRename(a, p)));
  }

  rename(doc: DocumentSnapshot, pos: Position, newName: string): WorkspaceEdit | RenameRefusal | null {
    if (typeof newName !== 'string') return null;
    return this.guard('rename', doc, null, (a) => at(a, pos, null, (p) => rename(a, doc.uri, p, newName)));
  }

  foldingRanges(doc: DocumentSnapshot): FoldingRange[] {
    return this.guard('folding ranges', doc, [], (a) => foldingRanges(a));
  }

  /** Without `range`, the whole document's tokens; `null` is a range request that sent none (nonsense). */
  semanticTokens(doc: DocumentSnapshot, range?: Range | null): SemanticTokens {
    const empty: SemanticTokens = { data: [] };
    if (range === undefined) return this.guard('semantic tokens', doc, empty, (a) => semanticTokens(a));
    return this.guard('semantic tokens', doc, empty, (a) => within(a, range, empty, (r) => semanticTokens(a, r)));
  }

  /** The diagram panel's picture of this version (evaluated first, as hovers are). */
  async diagram(doc: DocumentSnapshot, req: Pick<DiagramRequest, 'view' | 'line' | 'theme' | 'fieldName' | 'fromT' | 'toT' | 'fieldUnit'>): Promise<DiagramAnswer> {
    const failed: DiagramAnswer = { ok: false, message: 'Sublevel could not draw this file; the server log says why.' };
    const fast = this.store.analysis(doc); // never throws (analyzeFast catches)
    if (fast.refused) return { ok: false, message: `Sublevel did not draw this file: ${withoutStop(fast.problems[0]?.message ?? 'it is over a size cap')}.` };
    return this.guardEvaluated('diagram', doc, failed, (a) => {
      const { line, ...rest } = req;
      const at = line === undefined ? undefined : requestPosition(a.doc, { line, character: 0 });
      return diagramFor(a, at ? { ...rest, line: at.line } : rest);
    });
  }

  /** Without `range`, the whole document; `null` is a range request that sent none (nonsense). */
  formatting(doc: DocumentSnapshot, range?: Range | null): TextEdit[] {
    if (range === undefined) return this.guard('formatting', doc, [], (a) => formatting(a));
    return this.guard('formatting', doc, [], (a) => within(a, range, [], (r) => formatting(a, r)));
  }
}
