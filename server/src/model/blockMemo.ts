/**
 * What the model builders made of each block of the previous version, kept so that a keystroke
 * builds again only the blocks it touched. The incremental parser hands over the very same node
 * for a block whose lines did not change, or that only moved up or down with the lines above it
 * (and a new node for one that changed), so a node is its own key. A moved block's positions
 * moved in place; the positions a builder made itself (sub-ranges of a value, say) are gathered
 * the first time the block moves and moved here by the same amount. Only builders that read
 * nothing but their block are memoised (species, fields, magnets: the declarations); the checks
 * of a species' levels also depend on the file's settings, which are part of their key. A memo holds the entries of one version and reads those
 * of the version before it, so memory stays bounded by one document's blocks.
 */
import type { BlockNode, Position, Problem } from '../format/ast';
import { collectPositions, moveLines } from '../format/linePositions';
import { ProblemList } from './problems';
import type { NameUse } from './types';

interface Entry {
  value: unknown;
  uses: NameUse[];
  problems: Problem[];
  /** The block's first line when the entry was made (or last moved). */
  line: number;
  /**
   * The positions in `value`, `uses`, `problems` and the checks' problems that are not the
   * block's own (the builder made them), gathered the first time the block moves.
   */
  own?: Position[];
  /** The checks that depend on the settings too, under the settings they were made with. */
  checks?: { settings: string; problems: Problem[] };
}

/**
 * Moves the builder's own positions when the block has moved since the entry was made. The
 * block's tree has moved already, so its objects are set apart first: what else the entry
 * reaches is the builder's.
 */
function follow(entry: Entry, block: BlockNode): void {
  const delta = block.range.start.line - entry.line;
  if (delta === 0) return;
  if (!entry.own) {
    const tree = new Set<object>();
    collectPositions([block], tree);
    entry.own = collectPositions([entry.value, entry.uses, entry.problems, entry.checks?.problems], tree);
  }
  moveLines(entry.own, delta);
  entry.line += delta;
}

/** A value derived from a list of items (say, every species), with the items it was made from. */
interface Carried {
  items: readonly unknown[];
  value: unknown;
}

export class BlockMemo {
  private readonly entries = new Map<BlockNode, Entry>();
  /** The previous version's entries (not the memo itself, so that versions do not chain). */
  private readonly before: Map<BlockNode, Entry> | undefined;
  private readonly carried = new Map<string, Carried>();
  private readonly carriedBefore: Map<string, Carried> | undefined;

  constructor(previous?: BlockMemo) {
    this.before = previous?.entries;
    this.carriedBefore = previous?.carried;
  }

  /**
   * `build(items)`, or the previous version's value under this key when it was made from the
   * same items in the same order (an edit that changed no species keeps, say, the level-name
   * index of every species).
   */
  carry<T, V>(key: string, items: readonly T[], build: (items: T[]) => V): V {
    const before = this.carriedBefore?.get(key);
    const same = before !== undefined && before.items.length === items.length && items.every((x, i) => before.items[i] === x);
    const value = same ? (before.value as V) : build([...items]);
    this.carried.set(key, { items, value });
    return value;
  }

  /**
   * The builder's value for this block, with the name uses and problems it reports added to
   * `uses` and `problems` in the order the builder reports them.
   */
  build<T>(block: BlockNode, uses: NameUse[], problems: ProblemList, builder: (uses: NameUse[], problems: ProblemList) => T): T {
    let entry = this.before?.get(block);
    if (entry) follow(entry, block);
    else {
      const own = new ProblemList();
      const ownUses: NameUse[] = [];
      entry = { value: builder(ownUses, own), uses: ownUses, problems: own.items, line: block.range.start.line };
    }
    this.entries.set(block, entry);
    for (const u of entry.uses) uses.push(u);
    for (const p of entry.problems) problems.push(p);
    return entry.value as T;
  }

  /** Checks of a block's contents that also depend on `settings` (compared as given). */
  check(block: BlockNode, settings: string, problems: ProblemList, checker: (problems: ProblemList) => void): void {
    const entry = this.entries.get(block);
    if (!entry) return checker(problems);
    if (entry.checks?.settings !== settings) {
      const own = new ProblemList();
      checker(own);
      entry.checks = { settings, problems: own.items };
      delete entry.own; // the new checks' positions are gathered at the next move
    }
    for (const p of entry.checks.problems) problems.push(p);
  }
}
