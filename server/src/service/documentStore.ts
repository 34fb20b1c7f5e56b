/**
 * One state per open document: the fast analysis of its current version, the evaluation of
 * that version once it has run (results and the evaluation's own problems merged in), and
 * meanwhile the previous evaluation's problems carried over. Evaluations of one document run
 * one after another and only for its newest version. A document that uses other files is
 * analysed again, at the same version, when one of them changes (`filesChanged`).
 */
import type { Analysis, AnalyzeOptions } from '../eval/analyze';
import { internalError, sortProblems } from '../eval/analyze';
import { EVAL_RULES } from '../eval/evalCodes';
import type { Problem } from '../format/ast';
import { folderOf, locationKey } from '../model/locations';
import { carryOver, splitLines } from './carryOver';
import { type Evaluator, SUPERSEDED } from './evaluator';
import { analyzeFastAfter, type FastState } from './fastAnalysis';
import type { WorkspaceFiles } from './workspaceFiles';

export interface DocumentSnapshot {
  readonly uri: string;
  readonly version: number;
  getText(): string;
}

interface VersionState {
  version: number;
  /** How many times this version was analysed again because a file it uses changed. */
  revision: number;
  /** Set when a file this state read has changed: the next request analyses the version again. */
  stale?: boolean;
  text: string;
  /** The text split into lines, made when a carry-over first needs them (a file that is never evaluated never splits). */
  lines?: string[];
  /** Parse and model; `result` and the evaluation's problems are merged in when it arrives. */
  analysis: Analysis;
  /** The parse in segments and the model's blocks, which the next version reuses where the edit did not touch them. */
  fast?: FastState;
  evaluated: boolean;
  /** The previous version's evaluation problems, moved onto this version's lines. */
  carried: Problem[];
  /** Which evaluation `carried` comes from. */
  carriedFrom?: DocumentEntry['lastEvaluated'];
  evaluation?: Promise<Analysis>;
}

interface DocumentEntry {
  current: VersionState;
  /** The last version whose evaluation arrived: its lines and the problems only the evaluation found. */
  lastEvaluated?: { lines: string[]; problems: Problem[] };
  /** The evaluation running for this document, if any (evaluations of one document do not overlap). */
  running?: Promise<unknown>;
  /** Aborts the running evaluation when a newer version wants one. */
  abort?: AbortController;
}

function key(p: Problem): string {
  const r = p.range;
  return `${p.code}|${r.start.line}:${r.start.character}-${r.end.line}:${r.end.character}|${p.message}`;
}

/** The diagnostic that tells the user the evaluation of this version did not finish, and why. */
function cutShort(reason: string): Problem {
  const at = { line: 0, character: 0 };
  return {
    code: 'evaluation-cut-short',
    severity: EVAL_RULES['evaluation-cut-short'].severity,
    message: `the evaluation of this file stopped before it finished (${reason.split('\n')[0]}); sublevel energies, beams, lines and resonances are not checked and hovers show only what the file says`,
    range: { start: at, end: at },
  };
}

function linesOf(s: VersionState): string[] {
  s.lines ??= splitLines(s.text);
  return s.lines;
}

export class DocumentStore {
  private readonly docs = new Map<string, DocumentEntry>();

  constructor(
    private readonly evaluator: Evaluator,
    private readonly log: (message: string) => void,
    /** Reads the files `use` statements name; without it a `use` cannot be followed. */
    private readonly files?: WorkspaceFiles,
  ) {}

  private options(uri: string): AnalyzeOptions | undefined {
    const files = this.files;
    if (!files) return undefined;
    const roots = files.rootsFor?.(uri);
    return {
      uri,
      ...(roots ? { roots } : {}),
      readFile: (l) => files.readFile(l),
      ...(files.realLocation ? { realLocation: (l: string) => files.realLocation!(l) } : {}),
      listFolder: (l) => files.listFolder(l),
    };
  }

  /**
   * True when `s` is the analysis of this snapshot. The text is compared too: a client may send a
   * version number again (or go back) with another text. An unchanged document hands over the
   * same string, which compares at once.
   */
  private current(s: VersionState | undefined, doc: DocumentSnapshot): boolean {
    return s !== undefined && s.version === doc.version && !s.stale && s.text === doc.getText();
  }

  private state(doc: DocumentSnapshot): VersionState {
    const entry = this.docs.get(doc.uri);
    if (this.current(entry?.current, doc)) return entry!.current;
    const text = doc.getText();
    const { analysis, state: fast } = analyzeFastAfter(text, this.options(doc.uri), entry?.current.fast);
    // A text over a cap is not split into lines or evaluated: its one problem is all there is.
    const last = analysis.refused ? undefined : entry?.lastEvaluated;
    const state: VersionState = {
      version: doc.version,
      revision: entry && entry.current.version === doc.version ? entry.current.revision + 1 : 0,
      text,
      ...(analysis.refused ? { lines: [] } : {}),
      analysis,
      evaluated: analysis.refused === true,
      carried: [],
      ...(last ? { carriedFrom: last } : {}),
      ...(fast ? { fast } : {}),
    };
    if (last) state.carried = carryOver(last.lines, linesOf(state), last.problems);
    if (entry) entry.current = state;
    else this.docs.set(doc.uri, { current: state });
    return state;
  }

  /** Parse and model of this version (with the evaluation's result once it has run). */
  analysis(doc: DocumentSnapshot): Analysis {
    return this.state(doc).analysis;
  }

  has(doc: DocumentSnapshot): boolean {
    return this.current(this.docs.get(doc.uri)?.current, doc);
  }

  isEvaluated(doc: DocumentSnapshot): boolean {
    const current = this.docs.get(doc.uri)?.current;
    return this.current(current, doc) && current!.evaluated;
  }

  /** Which analysis of this version the current one is: 0 first, then one more each time a used file changed. */
  revision(doc: DocumentSnapshot): number {
    return this.state(doc).revision;
  }

  /**
   * Files that changed (open documents edited, opened or closed; files changed on disk): every
   * other document that read one of them, or listed its folder, is analysed again on its next
   * request. Gives those documents' URIs.
   */
  filesChanged(locations: readonly string[]): string[] {
    const changed = new Set(locations.map(locationKey));
    const folders = new Set(locations.map((l) => folderOf(l)).filter((f): f is string => f !== undefined).map(locationKey));
    const out: string[] = [];
    for (const [uri, entry] of this.docs) {
      if (changed.has(locationKey(uri))) continue;
      const sources = entry.current.analysis.sources;
      if (!sources) continue;
      const reads = Object.keys(sources.files).some((l) => changed.has(locationKey(l)));
      const lists = Object.keys(sources.folders).some((f) => folders.has(locationKey(f)));
      if (reads || lists) {
        entry.current.stale = true;
        out.push(uri);
      }
    }
    return out;
  }

  /** Every document is analysed again on its next request (what `use` may read has changed). Gives their URIs. */
  invalidateAll(): string[] {
    for (const entry of this.docs.values()) entry.current.stale = true;
    return [...this.docs.keys()];
  }

  /** The problems to show now: all of them once evaluated, otherwise parse and model plus the carried-over ones. */
  problems(doc: DocumentSnapshot): { problems: Problem[]; complete: boolean } {
    const s = this.state(doc);
    if (s.evaluated) return { problems: s.analysis.problems, complete: true };
    const last = this.docs.get(doc.uri)?.lastEvaluated;
    if (last && last !== s.carriedFrom) {
      s.carried = carryOver(last.lines, linesOf(s), last.problems);
      s.carriedFrom = last;
    }
    return { problems: s.carried.length > 0 ? sortProblems([...s.analysis.problems, ...s.carried]) : s.analysis.problems, complete: false };
  }

  /**
   * The analysis with its evaluation, starting the evaluation if needed. A failure is written
   * into this version's problems; it rejects only if even that fails (throws if the snapshot does).
   */
  evaluate(doc: DocumentSnapshot): Promise<Analysis> {
    const s = this.state(doc);
    if (s.evaluation) return s.evaluation;
    const entry = this.docs.get(doc.uri)!;
    entry.abort?.abort();
    const abort = new AbortController();
    entry.abort = abort;
    const previous = entry.running ?? Promise.resolve();
    const run = previous.then(async () => {
      // A newer version came while waiting: this one is not worth evaluating.
      if (entry.current !== s) return s.analysis;
      // Keys taken before the wait: a newer line-count edit moves shared nodes in place (incrementalParse.ts),
      // and the evaluator's problems keep this version's positions.
      const fastKeys = new Set(s.analysis.problems.map(key));
      try {
        const outcome = await this.evaluator.evaluate(s.text, abort.signal, s.analysis.sources);
        this.attach(entry, s, outcome.result, outcome.problems, fastKeys);
      } catch (e) {
        const message = e instanceof Error ? e.message : String(e);
        if (message === SUPERSEDED) return s.analysis;
        this.log(`sublevel: evaluation failed for ${doc.uri} (version ${s.version}): ${message}`);
        // Do not retry this version: parse and model problems stand, and one more says what is missing.
        s.analysis.problems = sortProblems([...s.analysis.problems, cutShort(message)]);
        s.evaluated = true;
      }
      return s.analysis;
    });
    // A failure outside the evaluator (a throw in the catch above, or in attach) belongs to this
    // version, whatever the snapshot holds by then (the server's documents change in place).
    const settled = run.catch((e: unknown) => this.failedOn(doc.uri, s, e));
    // Later evaluations wait for this one, even should that reject; hold no result here, so that old versions can be freed.
    entry.running = settled.then(
      () => undefined,
      () => undefined,
    );
    s.evaluation = settled;
    return settled;
  }

  private attach(entry: DocumentEntry, s: VersionState, result: Analysis['result'], problems: Problem[], fast: ReadonlySet<string>): void {
    const evaluationOnly = problems.filter((p) => !fast.has(key(p)));
    s.analysis.result = result;
    s.analysis.problems = problems;
    s.evaluated = true;
    entry.lastEvaluated = { lines: linesOf(s), problems: evaluationOnly };
  }

  /**
   * The evaluation of this version failed outside the evaluator (which reports its own failures as
   * `evaluation-cut-short`): it is not tried again, and the version's problems say so with an
   * `internal-error` after the parse and model problems. The failed evaluation is replaced by
   * this analysis, so that a later request for the version neither waits on nor reports it again.
   */
  evaluationFailed(doc: DocumentSnapshot, e: unknown): Analysis {
    const s = this.state(doc);
    this.recordFailure(s, e);
    s.evaluation = Promise.resolve(s.analysis);
    return s.analysis;
  }

  /** `evaluationFailed` for the version whose evaluation is this one, told in the log too. */
  private failedOn(uri: string, s: VersionState, e: unknown): Analysis {
    try {
      this.log(`sublevel: evaluation failed for ${uri} (version ${s.version}): ${e instanceof Error ? (e.stack ?? e.message) : String(e)}`);
    } catch {
      // The log is gone too; the problem below still says it in the file.
    }
    this.recordFailure(s, e);
    return s.analysis;
  }

  private recordFailure(s: VersionState, e: unknown): void {
    if (s.evaluated) return;
    s.analysis.problems = sortProblems([...s.analysis.problems, internalError(e)]);
    s.evaluated = true;
  }

  /** The evaluated analysis, or the fast one if the evaluation does not arrive within `waitMs`. */
  async evaluatedWithin(doc: DocumentSnapshot, waitMs: number): Promise<Analysis> {
    const s = this.state(doc);
    if (s.evaluated) return s.analysis;
    let timer: NodeJS.Timeout | undefined;
    const late = new Promise<Analysis>((resolve) => {
      timer = setTimeout(() => resolve(s.analysis), waitMs);
    });
    try {
      return await Promise.race([this.evaluate(doc), late]);
    } finally {
      clearTimeout(timer);
    }
  }

  forget(uri: string): void {
    this.docs.delete(uri);
  }
}
