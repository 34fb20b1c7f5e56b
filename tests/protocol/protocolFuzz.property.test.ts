/**
 * The built server over JSON-RPC against random and mutated documents: each case opens a document,
 * types a random edit sequence into it (incremental and whole-text changes, sent without waiting),
 * and between the edits fires every request the editor makes at random positions and ranges, stale
 * ones and what no careful client sends included (past the end of the text or of a line, negative,
 * fractional, 1e12, NaN (null in JSON), a range whose end is before its start). Every request must
 * answer (an error only for a refused rename), none may take longer than a hang bound, and the
 * server must log no failure, stay up, and answer a plain hover after the case; with diagnostics
 * pushed and pulled. A second property sends hostile edits (ranges past the end, overlapping,
 * reversed or broken; versions going backwards) and checks the text the server holds against a
 * reference model of the edits (referenceEdits.ts). Each case waits, before it closes its document, for the evaluation
 * of the last version (and, pushed, for its diagnostics), so late failures count for their case;
 * after the property an idle server must have logged none at all.
 * The bounds are hang detectors, not speed goals. FUZZ_RUNS raises the case count.
 */
import fc from 'fast-check';
import { TextDocument } from 'vscode-languageserver-textdocument';
import type { Position, Range } from 'vscode-languageserver-protocol';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { EDIT_SEEDS, editSequence, type TextEdit } from '../editSequences';
import { mutatedText } from '../mutatedExamples';
import { NEWER_BLOCKS } from '../features/newerBlockMistakes';
import { ensureBuilt, startClient, type TestClient } from './lspClient';
import { hostileChange, referenceText } from './referenceEdits';

const RUNS = Number(process.env.FUZZ_RUNS ?? '') || 6;
/** The whole property's limit, growing with the case count (a loaded machine takes ~2 s a case). */
const TIME_LIMIT = Math.min(2 ** 31 - 1, Math.max(600_000, RUNS * 5000)); // a timer longer than 2^31 ms fires at once
/** A request that has not answered within this is taken for a hang (the machine may be loaded). */
const HANG_MS = 10_000;
/** The diagram waits for the evaluation in the worker, which for the big generated setup is real work. */
const DIAGRAM_HANG_MS = 30_000;

const documents = fc.oneof(
  editSequence,
  fc.tuple(mutatedText([...EDIT_SEEDS.slice(0, -1), ...NEWER_BLOCKS.map((c) => c.text)], 8), fc.constant([] as TextEdit[])),
  fc.tuple(fc.string({ unit: 'binary', maxLength: 300 }), fc.constant([] as TextEdit[])),
);

/** Per edit: whether it goes as one whole-text change, and seeds for the positions probed after it. */
const probes = fc.array(fc.tuple(fc.boolean(), fc.array(fc.nat(), { minLength: 1, maxLength: 3 })), { minLength: 13, maxLength: 13 });

const VIEWS = ['levels', 'pattern', 'lines', 'resonance', 'residuals', 'fieldmap', 'slower'];

function positionFor(doc: TextDocument, seed: number): Position {
  const line = seed % (doc.lineCount + 1); // one line past the end too
  const text = doc.getText({ start: { line, character: 0 }, end: { line: line + 1, character: 0 } });
  const position = { line, character: (seed >> 4) % (text.length + 3) };
  // Now and then what no careful client sends: far past the end, negative, NaN (sent as null), or not a whole number.
  switch (seed % 17) {
    case 5:
      return { line: 2 ** 31 - 1, character: 2 ** 31 - 1 };
    case 7:
      return { line: line + 0.5, character: position.character + 0.25 };
    case 9:
      return { line: -3, character: -1 };
    case 11:
      return { line: NaN, character: position.character };
    case 13:
      return { line: 1e12, character: 1e12 };
    case 15:
      return { line, character: text.length + 1000 }; // far past the line's end
    default:
      return position;
  }
}

/** A range around the position, now and then reversed (end before start) or from a hostile position to a sound one. */
function rangeFor(position: Position, seed: number): Range {
  const line = Number.isFinite(position.line) ? Math.min(position.line, 2 ** 20) : 0;
  const around: Range = { start: { line: Math.max(0, line - 2), character: 0 }, end: { line: line + 3, character: 0 } };
  if (seed % 5 === 3) return { start: around.end, end: around.start };
  if (seed % 5 === 4) return { start: position, end: around.end };
  return around;
}

interface Pending {
  what: string;
  /** Undefined once answered, else what went wrong. */
  outcome: Promise<string | undefined>;
  bound: number;
}

/**
 * A request whose answer is judged as soon as it comes (a refused rename, with its reason, is an
 * answer; so is "method not found" for a request the server does not offer, and only that).
 */
function pending(what: string, answer: Promise<unknown>, bound: number, unserved = false): Pending {
  const outcome = answer.then(
    () => (unserved ? `${what}: answered, though the server does not offer it` : undefined),
    (e: { code?: number; message?: string }) =>
      (/rename/.test(what) && e.code === -32602) || (unserved && e.code === -32601) ? undefined : `${what}: error ${e.code} ${e.message}`,
  );
  return { what, outcome, bound };
}

/** Every request the editor makes about one position of one document version. */
function requestsAt(client: TestClient, uri: string, doc: TextDocument, seed: number): Pending[] {
  const c = client.connection;
  const textDocument = { uri };
  const position = positionFor(doc, seed);
  const around = rangeFor(position, seed >> 2);
  const diagnostics = (client.pushed.get(uri)?.diagnostics ?? []).filter((d) => Math.abs(d.range.start.line - position.line) <= 1);
  /** `unserved`: a request the server does not offer, which must be refused as such (-32601), not fail. */
  const ask = (what: string, method: string, params: unknown, bound = HANG_MS, unserved = false): Pending =>
    pending(what, c.sendRequest(method, params), bound, unserved);
  const all = [
    ask('hover', 'textDocument/hover', { textDocument, position }),
    ask('completion', 'textDocument/completion', { textDocument, position }),
    ask('definition', 'textDocument/definition', { textDocument, position }),
    ask('references', 'textDocument/references', { textDocument, position, context: { includeDeclaration: true } }),
    ask('code actions', 'textDocument/codeAction', { textDocument, range: seed % 2 ? { start: position, end: position } : around, context: { diagnostics } }),
    ask('range formatting', 'textDocument/rangeFormatting', { textDocument, range: around, options: { tabSize: 2, insertSpaces: true } }),
    ask('inlay hints', 'textDocument/inlayHint', { textDocument, range: around }),
    ask('semantic tokens (range)', 'textDocument/semanticTokens/range', { textDocument, range: around }),
    ask('prepare rename', 'textDocument/prepareRename', { textDocument, position }),
    ask('document highlight', 'textDocument/documentHighlight', { textDocument, position }, HANG_MS, true),
    ask('selection ranges', 'textDocument/selectionRange', { textDocument, positions: [position] }, HANG_MS, true),
    ask('code lens', 'textDocument/codeLens', { textDocument }, HANG_MS, true),
  ];
  if (client.initialize.capabilities.diagnosticProvider) all.push(ask('diagnostics', 'textDocument/diagnostic', { textDocument }));
  if (seed % 3 === 0) {
    all.push(
      ask('formatting', 'textDocument/formatting', { textDocument, options: { tabSize: 2, insertSpaces: true } }),
      ask('semantic tokens', 'textDocument/semanticTokens/full', { textDocument }),
      ask('document symbols', 'textDocument/documentSymbol', { textDocument }),
      ask('folding ranges', 'textDocument/foldingRange', { textDocument }),
      ask('rename', 'textDocument/rename', { textDocument, position, newName: 'renamed' }),
      ask('diagram', 'sublevel/diagram', { uri, view: VIEWS[seed % VIEWS.length], line: position.line, theme: 'panel' }, DIAGRAM_HANG_MS),
    );
  }
  all.push(...sameAsSound(client, textDocument, doc, position, around));
  return all;
}

/**
 * The position a hostile one means, made by the text library (floored, negatives 0, then clamped
 * by its offset rules), or undefined for nonsense (NaN). Written apart from the server's rule.
 */
function meant(doc: TextDocument, p: Position): Position | undefined {
  if (Number.isNaN(p.line) || Number.isNaN(p.character)) return undefined;
  const whole = { line: Math.max(0, Math.floor(p.line)), character: Math.max(0, Math.floor(p.character)) };
  return doc.positionAt(doc.offsetAt(whole));
}

/**
 * At a position or range no careful client sends, the answers must be those at the position or
 * range it means (the empty answer for nonsense): asked both ways in the same turn, so both see
 * one version. Only requests that do not wait for the evaluation, so that both answers are of the
 * same analysis.
 */
function sameAsSound(client: TestClient, textDocument: { uri: string }, doc: TextDocument, position: Position, range: Range): Pending[] {
  const c = client.connection;
  const out: Pending[] = [];
  const compare = (what: string, method: string, hostile: unknown, sound: unknown, empty: unknown): void => {
    const answers = Promise.all([c.sendRequest(method, hostile), sound === undefined ? Promise.resolve(empty) : c.sendRequest(method, sound)]);
    const outcome = answers.then(
      ([h, s]) => (JSON.stringify(h) === JSON.stringify(s) ? undefined : `${what}: ${JSON.stringify(h).slice(0, 200)} where the meant one gives ${JSON.stringify(s).slice(0, 200)}`),
      (e: { code?: number; message?: string }) => (/rename/.test(what) && e.code === -32602 ? undefined : `${what}: error ${e.code} ${e.message}`),
    );
    out.push({ what, outcome, bound: HANG_MS });
  };
  const sound = meant(doc, position);
  const hostile = !Number.isInteger(position.line) || !Number.isInteger(position.character) || position.line < 0 || position.character < 0 || !sound || sound.line !== position.line || sound.character !== position.character;
  if (hostile) {
    const at = (p: Position | undefined) => (p ? { textDocument, position: p } : undefined);
    compare(`definition at ${JSON.stringify(position)}`, 'textDocument/definition', { textDocument, position }, at(sound), null);
    compare(`references at ${JSON.stringify(position)}`, 'textDocument/references', { textDocument, position, context: { includeDeclaration: true } }, sound && { textDocument, position: sound, context: { includeDeclaration: true } }, []);
    compare(`prepare rename at ${JSON.stringify(position)}`, 'textDocument/prepareRename', { textDocument, position }, at(sound), null);
  }
  const reversed = range.end.line < range.start.line || (range.end.line === range.start.line && range.end.character < range.start.character);
  const start = meant(doc, range.start);
  const end = meant(doc, range.end);
  const soundRange = reversed || !start || !end ? undefined : { start, end };
  if (JSON.stringify(soundRange) !== JSON.stringify(range)) {
    const options = { tabSize: 2, insertSpaces: true };
    compare(`range formatting of ${JSON.stringify(range)}`, 'textDocument/rangeFormatting', { textDocument, range, options }, soundRange && { textDocument, range: soundRange, options }, []);
    compare(`semantic tokens of ${JSON.stringify(range)}`, 'textDocument/semanticTokens/range', { textDocument, range }, soundRange && { textDocument, range: soundRange }, { data: [] });
  }
  return out;
}

/** A hover at the start of the document, as any client sends it. */
function plainHover(client: TestClient, uri: string): Pending {
  return pending('plain hover', client.connection.sendRequest('textDocument/hover', { textDocument: { uri }, position: { line: 0, character: 0 } }), HANG_MS);
}

const pause = (ms: number): Promise<void> => new Promise((resolve) => setTimeout(resolve, ms));

/**
 * Waits until the evaluation of the open document's current version is in: a pull answer whose
 * result id is not marked partial (pulled again until then; a repeated pull of one version does not
 * put its evaluation off). Pushed diagnostics then go out for this version once more: waits for the
 * push that matches the complete pull. Undefined once settled, else what did not settle in time.
 */
async function settled(client: TestClient, uri: string, version: number, pushed: boolean): Promise<string | undefined> {
  const until = Date.now() + DIAGRAM_HANG_MS;
  let last: unknown;
  for (;;) {
    const report = (await client.connection.sendRequest('textDocument/diagnostic', { textDocument: { uri } })) as { resultId?: string; items?: unknown[] };
    last = report;
    if (report.resultId !== undefined && !report.resultId.includes('-partial')) {
      if (!pushed) return undefined;
      for (;;) {
        const p = client.pushed.get(uri);
        if (p?.version === version && JSON.stringify(p.diagnostics) === JSON.stringify(report.items)) return undefined;
        if (Date.now() > until) return `no push of version ${version} matching its complete pull within ${DIAGRAM_HANG_MS} ms`;
        await pause(20);
      }
    }
    if (Date.now() > until) return `the evaluation of version ${version} did not settle within ${DIAGRAM_HANG_MS} ms: last pull ${JSON.stringify(last).slice(0, 200)}`;
    await pause(50);
  }
}

/** Waits for an answer, at most the request's hang bound. */
async function answered(p: Pending): Promise<string | undefined> {
  let timer: NodeJS.Timeout | undefined;
  const hang = new Promise<string>((resolve) => (timer = setTimeout(() => resolve(`${p.what}: no answer within ${p.bound} ms`), p.bound)));
  const r = await Promise.race([p.outcome, hang]);
  clearTimeout(timer);
  return r;
}

beforeAll(() => ensureBuilt(), 120_000);

const CLIENTS = [
  { name: 'diagnostics pushed', capabilities: {} },
  { name: 'diagnostics pulled', capabilities: { diagnostic: { dynamicRegistration: false } } },
];

for (const kind of CLIENTS) {
  describe(`the server over JSON-RPC, fuzzed (${kind.name})`, () => {
    let client: TestClient;
    /** Error-level log lines of the current case: every failure the server's guards catch is logged there. */
    const failures: string[] = [];
    /** Every error-level log line of the whole run, never cleared: none may come late either. */
    const everFailed: string[] = [];
    let opened = 0;
    beforeAll(async () => {
      client = await startClient({ textDocument: { hover: { contentFormat: ['markdown'] }, rename: { prepareSupport: true }, ...kind.capabilities } });
      client.connection.onNotification('window/logMessage', (m: { type: number; message: string }) => {
        if (m.type === 1) {
          failures.push(m.message);
          everFailed.push(m.message);
        }
      });
    }, 60_000);
    afterAll(async () => {
      if (client && client.process.exitCode === null) client.process.kill();
    });

    it('answers every request on random and edited documents, and logs no failure', async () => {
      await fc.assert(
        fc.asyncProperty(documents, probes, async ([text, edits], shapes) => {
          failures.length = 0; // a case's own failures only, so that shrinking finds the smallest
          const uri = `file:///protocol/fuzz${opened++}.sublevel`;
          let doc = TextDocument.create(uri, 'sublevel', 1, text);
          await client.connection.sendNotification('textDocument/didOpen', { textDocument: { uri, languageId: 'sublevel', version: 1, text } });
          const pending: Pending[] = requestsAt(client, uri, doc, shapes[0]![1][0]! * 3);
          for (const [i, e] of edits.entries()) {
            const [whole, seeds] = shapes[i + 1]!;
            const at = e.at % (doc.getText().length + 1);
            const range = { start: doc.positionAt(at), end: doc.positionAt(at + e.remove) };
            const next = TextDocument.update(doc, [{ range, text: e.insert }], doc.version + 1);
            const change = whole ? { text: next.getText() } : { range, text: e.insert };
            doc = next;
            // Not awaited against the answers: requests about the older version are still in flight.
            await client.connection.sendNotification('textDocument/didChange', { textDocument: { uri, version: doc.version }, contentChanges: [change] });
            for (const s of seeds) pending.push(...requestsAt(client, uri, doc, s));
          }
          const problems = (await Promise.all(pending.map(answered))).filter((x) => x !== undefined);
          // After all that, a plain request still answers.
          const plain = await answered(plainHover(client, uri));
          if (plain) problems.push(plain);
          // The last version's evaluation (and its push) before the close, which would cancel it.
          const late = await settled(client, uri, doc.version, !kind.capabilities.diagnostic);
          if (late) problems.push(late);
          await client.connection.sendNotification('textDocument/didClose', { textDocument: { uri } });
          expect(problems, doc.getText()).toEqual([]);
          expect(failures, doc.getText()).toEqual([]);
          expect(client.process.exitCode).toBeNull();
        }),
        { numRuns: RUNS },
      );
    }, TIME_LIMIT);

    it('holds the text a reference model of hostile edits gives, versions going backwards included, and keeps answering', async () => {
      await fc.assert(
        fc.asyncProperty(
          fc.constantFrom(...EDIT_SEEDS.slice(0, -1)),
          fc.array(fc.tuple(fc.array(hostileChange(60, 40), { minLength: 1, maxLength: 3 }), fc.integer({ min: -2, max: 3 }), fc.nat()), { minLength: 1, maxLength: 8 }),
          async (text, batches) => {
            failures.length = 0;
            const uri = `file:///protocol/hostile${opened++}.sublevel`;
            await client.connection.sendNotification('textDocument/didOpen', { textDocument: { uri, languageId: 'sublevel', version: 10, text } });
            let expected = text;
            let version = 10;
            const pendingRequests: Pending[] = [];
            for (const [changes, step, seed] of batches) {
              version += step; // backwards, the same again, or on
              expected = referenceText(expected, changes);
              await client.connection.sendNotification('textDocument/didChange', { textDocument: { uri, version }, contentChanges: changes });
              pendingRequests.push(...requestsAt(client, uri, TextDocument.create(uri, 'sublevel', version, expected), seed));
            }
            // Requests that name no document, or no position or range: the empty answer, no failure.
            const c = client.connection;
            const empty: [string, string, unknown, unknown][] = [
              ['hover without a document', 'textDocument/hover', { position: { line: 0, character: 0 } }, null],
              ['definition without a position', 'textDocument/definition', { textDocument: { uri } }, null],
              ['references without a context or position', 'textDocument/references', { textDocument: { uri } }, []],
              ['code actions without a context or range', 'textDocument/codeAction', { textDocument: { uri } }, []],
              ['range formatting without a range', 'textDocument/rangeFormatting', { textDocument: { uri }, options: { tabSize: 2, insertSpaces: true } }, []],
              ['semantic tokens of no range', 'textDocument/semanticTokens/range', { textDocument: { uri } }, { data: [] }],
              ['inlay hints of no range', 'textDocument/inlayHint', { textDocument: { uri } }, []],
            ];
            for (const [what, method, params, expected] of empty) {
              const outcome = c.sendRequest(method, params).then(
                (a) => (JSON.stringify(a) === JSON.stringify(expected) ? undefined : `${what}: ${JSON.stringify(a).slice(0, 200)}`),
                (e: { code?: number; message?: string }) => `${what}: error ${e.code} ${e.message}`,
              );
              pendingRequests.push({ what, outcome, bound: HANG_MS });
            }
            const problems = (await Promise.all(pendingRequests.map(answered))).filter((x) => x !== undefined);
            const held = (await client.connection.sendRequest('sublevel/heldText', { uri })) as { version: number; text: string } | null;
            const plain = await answered(plainHover(client, uri));
            if (plain) problems.push(plain);
            const late = await settled(client, uri, version, !kind.capabilities.diagnostic);
            if (late) problems.push(late);
            await client.connection.sendNotification('textDocument/didClose', { textDocument: { uri } });
            expect(held).toEqual({ version, text: expected });
            expect(problems, expected).toEqual([]);
            expect(failures, expected).toEqual([]);
            expect(client.process.exitCode).toBeNull();
          },
        ),
        { numRuns: RUNS },
      );
    }, TIME_LIMIT);

    it('logs no failure late: none once a fresh document is evaluated after the last case', async () => {
      // The worker evaluates one job at a time, in order: once this one is in, every earlier one is done or dropped.
      const uri = 'file:///protocol/idle.sublevel';
      const text = EDIT_SEEDS[0]!;
      await client.connection.sendNotification('textDocument/didOpen', { textDocument: { uri, languageId: 'sublevel', version: 1, text } });
      expect(await settled(client, uri, 1, !kind.capabilities.diagnostic)).toBeUndefined();
      await client.connection.sendNotification('textDocument/didClose', { textDocument: { uri } });
      await client.connection.sendRequest('textDocument/diagnostic', { textDocument: { uri } }); // a round trip after the close
      expect(everFailed).toEqual([]);
      expect(client.process.exitCode).toBeNull();
    }, DIAGRAM_HANG_MS * 2);

    it('shuts down and exits cleanly', async () => {
      expect(await client.stop()).toBe(0);
    });
  });
}
