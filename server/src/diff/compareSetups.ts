/**
 * The physical difference between two analysed versions of a setup: each thing (field, magnet,
 * level, term, beam, line, resonance, fit) matched by name and compared quantity by quantity beyond
 * the thresholds, plus the diagnostics that appeared or went away. Pure: no I/O.
 */
import type { SetupDocument } from '../format/ast';
import { toDiagnosticResult } from '../eval/evaluate';
import type { Analysis } from '../eval/analyze';
import type { EvaluationResult } from '../eval/resultTypes';
import type { ChangeList } from './changeList';
import { compareBeam, compareField, compareMagnet } from './compareApparatus';
import { compareLevel, compareTerm } from './compareLevels';
import { compareFit } from './compareFits';
import { compareLine, compareResonance } from './compareSpectra';
import { thingOf, type ThingRef, unmatched } from './diagnosticThings';
import { DIFF_FORMAT, DIFF_VERSION, type DiffThresholds, type SetupDiff, type ThingDiff, type ThingKind } from './diffTypes';

/** One version: its analysis and the name it is shown under. */
export interface DiffSide {
  label: string;
  analysis: Pick<Analysis, 'doc' | 'result' | 'problems'>;
}

/** The order things are reported in. */
const KIND_ORDER: readonly ThingKind[] = ['file', 'settings', 'species', 'field', 'magnet', 'level', 'term', 'beam', 'line', 'resonance', 'data', 'fit'];

interface Kind<T> {
  kind: ThingKind;
  list(r: EvaluationResult): readonly T[];
  name(x: T): string;
  compare(a: T, b: T, t: DiffThresholds): ChangeList;
}

const levelName = (x: { species: string; level: string }): string => `${x.species}.${x.level}`;

/** Each entry keeps its own item type; the loop below only needs them as one list. */
const kind = <T>(k: Kind<T>): Kind<unknown> => k as unknown as Kind<unknown>;
const named = (x: { name: string }): string => x.name;

const KINDS: readonly Kind<unknown>[] = [
  kind<EvaluationResult['fields'][number]>({ kind: 'field', list: (r) => r.fields, name: named, compare: compareField }),
  kind({ kind: 'magnet', list: (r) => r.magnets, name: named, compare: compareMagnet }),
  kind({ kind: 'level', list: (r) => r.levels, name: levelName, compare: compareLevel }),
  kind({ kind: 'term', list: (r) => r.terms, name: levelName, compare: compareTerm }),
  kind({ kind: 'beam', list: (r) => r.beams, name: named, compare: compareBeam }),
  kind({ kind: 'line', list: (r) => r.lines, name: named, compare: compareLine }),
  kind({ kind: 'resonance', list: (r) => r.resonances, name: named, compare: compareResonance }),
  kind({ kind: 'fit', list: (r) => r.fits ?? [], name: named, compare: compareFit }),
];

const thingKey = (t: ThingRef): string => `${t.kind}\u0000${t.name}`;

function diagnosticsWithThings(a: DiffSide['analysis'], terms: ReadonlySet<string>) {
  const doc: SetupDocument | undefined = a.doc;
  return a.problems.map(toDiagnosticResult).map((d) => ({ ...d, ...thingOf(d, doc, terms) }));
}

export function compareSetups(oldSide: DiffSide, newSide: DiffSide, thresholds: DiffThresholds): SetupDiff {
  const things = new Map<string, ThingDiff>();
  const thing = (ref: ThingRef, status: ThingDiff['status'] = 'changed'): ThingDiff => {
    let t = things.get(thingKey(ref));
    if (!t) {
      t = { kind: ref.kind, name: ref.name, status, changes: [], new_diagnostics: [], gone_diagnostics: [] };
      things.set(thingKey(ref), t);
    }
    return t;
  };
  const a = oldSide.analysis.result;
  const b = newSide.analysis.result;
  for (const k of KINDS) {
    const listA = a ? k.list(a) : [];
    const listB = b ? k.list(b) : [];
    const byName = new Map(listA.map((x) => [k.name(x), x]));
    const namesB = new Set(listB.map((x) => k.name(x)));
    for (const x of listB) {
      const old = byName.get(k.name(x));
      if (old === undefined) thing({ kind: k.kind, name: k.name(x) }, 'added');
      else {
        const changes = k.compare(old, x, thresholds).changes;
        if (changes.length) thing({ kind: k.kind, name: k.name(x) }).changes.push(...changes);
      }
    }
    for (const x of listA) if (!namesB.has(k.name(x))) thing({ kind: k.kind, name: k.name(x) }, 'removed');
  }
  const terms = new Set([...(a?.terms ?? []), ...(b?.terms ?? [])].map(levelName));
  const da = diagnosticsWithThings(oldSide.analysis, terms);
  const db = diagnosticsWithThings(newSide.analysis, terms);
  for (const d of unmatched(db, da)) thing(d).new_diagnostics.push(strip(d));
  for (const d of unmatched(da, db)) thing(d).gone_diagnostics.push(strip(d));
  const list = [...things.values()].sort((x, y) => KIND_ORDER.indexOf(x.kind) - KIND_ORDER.indexOf(y.kind));
  return { format: DIFF_FORMAT, version: DIFF_VERSION, old: oldSide.label, new: newSide.label, thresholds, changed: list.length > 0, things: list };
}

function strip(d: ReturnType<typeof diagnosticsWithThings>[number]) {
  const { kind: _kind, name: _name, ...rest } = d;
  return rest;
}
