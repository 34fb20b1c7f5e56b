/**
 * `use` statements: each used file is read through the caller's reader, parsed with the same
 * parser and built into its own model (its own `use` statements followed in turn, up to a
 * depth limit and never round a circle); its species become available here. Everything else
 * in a used file is ignored. Problems of a used file stay in that file: here it gets one
 * warning that points at the first error.
 */
import type { Problem, SetupDocument, UseNode } from '../format/ast';
import { suggestNames } from '../format/didYouMean';
import { parseSetup } from '../format/parser';
import { baseName, folderOf, locationKey, relativeName, resolveLocation } from './locations';
import { countStatements, MAX_STATEMENTS, MAX_USE_DEPTH, MAX_USED_FILE_BYTES } from './limits';
import type { ProblemList } from './problems';
import { refuseUse, rootsOf, SETUP_EXTENSION } from './useConfinement';
import type { SetupSources } from './sources';
import type { SetupModel, SpeciesModel, SpeciesOrigin, UsedFileModel } from './types';

export { MAX_USE_DEPTH };

/** What one analysis shares across its used files: the chain being read, and the files read so far. */
export interface UseContext {
  /** Location keys of the files being read, outermost first (the analysed file included when it has a location). */
  stack: string[];
  /** Display names for the stack, for messages about circles. */
  names: string[];
  cache: Map<string, { doc: SetupDocument; model: SetupModel }>;
}

export type ModelBuilder = (doc: SetupDocument, sources: SetupSources, context: UseContext) => SetupModel;

export function rootUseContext(uri: string | undefined): UseContext {
  return uri !== undefined ? { stack: [locationKey(uri)], names: [baseName(uri)], cache: new Map() } : { stack: [], names: [], cache: new Map() };
}

/**
 * Used files parsed by earlier analyses, by location: a keystroke in a document that uses a large
 * file should not parse that file again. An entry is reused only for the very same text (the
 * readers give back the same string while a file is unchanged), and the parse is pure.
 */
const parsedFiles = new Map<string, { text: string; doc: SetupDocument }>();
const MAX_PARSED_FILES = 32;

function parseUsed(key: string, text: string): SetupDocument {
  const kept = parsedFiles.get(key);
  if (kept && kept.text === text) return kept.doc;
  const doc = parseSetup(text);
  parsedFiles.delete(key);
  if (parsedFiles.size >= MAX_PARSED_FILES) parsedFiles.delete(parsedFiles.keys().next().value!);
  parsedFiles.set(key, { text, doc });
  return doc;
}

function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

/** "did you mean" over the setup files beside the one that is missing, written as the `use` path would be. */
function siblingSuggestions(sources: SetupSources, location: string, written: string): string[] {
  const folder = folderOf(location);
  const names = folder !== undefined ? sources.listFolder?.(folder) : undefined;
  if (!names) return [];
  const wanted = baseName(location);
  const candidates = names.filter((n) => n.endsWith(SETUP_EXTENSION) && n !== wanted);
  const slash = Math.max(written.lastIndexOf('/'), written.lastIndexOf('\\'));
  const prefix = slash >= 0 ? written.slice(0, slash + 1) : '';
  return suggestNames(wanted, candidates).map((n) => prefix + n);
}

/** A `use-cycle` problem carries the keys of the files on its circle, so each file on it can say so. */
function cycleKeys(p: Problem): string[] {
  const keys = p.data?.['cycle'];
  return Array.isArray(keys) ? keys.filter((k): k is string => typeof k === 'string') : [];
}

/** The species of a used file, copied with their origin (their levels point at the copy). */
function adoptCopy(s: SpeciesModel, origin: SpeciesOrigin): SpeciesModel {
  const copy: SpeciesModel = { ...s, origin, levels: [] };
  copy.levels = s.levels.map((l) => ({ ...l, species: copy }));
  return copy;
}

/**
 * Reads every `use` of `doc`, reporting what goes wrong, and gives what each one brings in.
 * `build` builds a used file's model (buildModel itself, passed in to keep the modules apart).
 */
export function resolveUses(doc: SetupDocument, sources: SetupSources, context: UseContext, build: ModelBuilder, problems: ProblemList): UsedFileModel[] {
  return doc.uses.map((node) => resolveOne(node, sources, context, build, problems));
}

function resolveOne(node: UseNode, sources: SetupSources, context: UseContext, build: ModelBuilder, problems: ProblemList): UsedFileModel {
  const out: UsedFileModel = { node, loaded: false, species: [] };
  const p = node.path;
  if (!p) return out;
  const written = p.text;
  // A path whose quotes are wrong is already an error; a file it cannot find is not a second one.
  const missing = (message: string, extra?: Partial<Problem>): void => {
    if (!node.quotesWrong) problems.add('use-file-missing', message, p.range, extra);
  };
  if (!sources.readFile) {
    missing(`cannot read ${written}: this text is not read from a file, so it cannot use other files`);
    return out;
  }
  const location = resolveLocation(sources.uri, written);
  if (location === undefined) {
    missing(`cannot read ${written}: this document has no folder to start from (save it as a file first)`);
    return out;
  }
  out.location = location;
  const key = locationKey(location);
  const onStack = context.stack.indexOf(key);
  if (onStack >= 0) {
    const circle = [...context.names.slice(onStack), baseName(location)].join(' → ');
    problems.add('use-cycle', `${written} leads back to this file (${circle}): files cannot use each other in a circle`, p.range, {
      data: { cycle: context.stack.slice(onStack) },
    });
    return out;
  }
  if (context.stack.length > MAX_USE_DEPTH) {
    problems.add('use-too-deep', `${written} is not read: \`use\` is followed at most ${MAX_USE_DEPTH} files deep`, p.range);
    return out;
  }
  const refusal = refuseUse(location, written, sources);
  if (refusal) {
    problems.add(refusal.code, refusal.message, p.range);
    return out;
  }
  let used = context.cache.get(key);
  if (!used) {
    const text = sources.readFile(location);
    if (typeof text === 'object' || (text !== undefined && text.length > MAX_USED_FILE_BYTES)) {
      const size = typeof text === 'object' ? `${text.bytes} bytes` : `${text.length} characters`;
      problems.add('use-file-too-large', `${written} is not read: it has ${size}, more than the ${MAX_USED_FILE_BYTES} a used file may have`, p.range);
      return out;
    }
    if (text !== undefined && countStatements(text, MAX_STATEMENTS) > MAX_STATEMENTS) {
      problems.add('use-file-too-large', `${written} is not used: it has more than ${MAX_STATEMENTS} statements, the most a setup file may have`, p.range);
      return out;
    }
    if (text === undefined) {
      const suggestions = siblingSuggestions(sources, location, written);
      const hint = suggestions.length > 0 ? ` — did you mean ${suggestions.map((s) => `'${s}'`).join(' or ')}?` : '';
      missing(`cannot read ${written}: no such file${hint}`, { data: { suggestions } });
      return out;
    }
    const usedDoc = parseUsed(key, text);
    const inner: UseContext = { stack: [...context.stack, key], names: [...context.names, baseName(location)], cache: context.cache };
    // The roots stay those of the analysed file: a used file does not widen or narrow them.
    used = { doc: usedDoc, model: build(usedDoc, { ...sources, uri: location, roots: rootsOf(sources) }, inner) };
    context.cache.set(key, used);
  }
  out.loaded = true;
  reportErrorsOf(used, node, written, location, context, problems);
  out.species = used.model.species.map((s) => {
    const declaredIn = s.origin?.uri ?? location;
    return adoptCopy(s, { uri: declaredIn, path: s.origin ? relativeName(sources.uri, declaredIn) : written, useRange: p.range });
  });
  return out;
}

/**
 * One warning for a used file with errors (and an error when it leads back round to this
 * file). A used file that is clean itself but uses a file with errors says so too (from its own
 * warning), so that a problem deep down a chain is not silent at the top.
 */
function reportErrorsOf(
  used: { doc: SetupDocument; model: SetupModel },
  node: UseNode,
  written: string,
  location: string,
  context: UseContext,
  problems: ProblemList,
): void {
  const here = context.stack[context.stack.length - 1];
  let errors = [...used.doc.problems, ...used.model.problems].filter((x) => x.severity === 'error');
  const circle = errors.find((x) => x.code === 'use-cycle' && here !== undefined && cycleKeys(x).includes(here));
  if (circle) {
    problems.add('use-cycle', `${written} uses this file in turn: files cannot use each other in a circle`, node.path!.range, {
      related: [{ message: circle.message, range: circle.range, uri: location }],
      data: { cycle: cycleKeys(circle) },
    });
    errors = errors.filter((x) => x !== circle);
  }
  const byPlace = (a: Problem, b: Problem): number => a.range.start.line - b.range.start.line || a.range.start.character - b.range.start.character;
  const nested = used.model.problems.filter((x) => x.code === 'use-has-errors').sort(byPlace);
  let message: string;
  let first: Problem;
  if (errors.length > 0) {
    first = errors.sort(byPlace)[0]!;
    message = `${written} has ${plural(errors.length, 'error')}; first: line ${first.range.start.line + 1}: ${first.message}`;
  } else if (nested.length > 0) {
    first = nested[0]!;
    message = `${written} uses a file with errors: line ${first.range.start.line + 1}: ${first.message}`;
  } else return;
  problems.add('use-has-errors', message, node.range, {
    related: [{ message: first.message, range: first.range, uri: location }],
    data: { location },
  });
}
