/**
 * What the model builders made of each block of the previous version, kept so that a keystroke
 * builds again only the blocks it touched. The incremental parser hands over the very same node
 * for a block whose lines did not change (and a new node for one that moved or changed), so a
 * node is its own key. Only builders that read nothing but their block are memoised (species,
 * fields, magnets: the declarations); the checks of a species' levels also depend on the file's
 * settings, which are part of their key. A memo holds the entries of one version and reads those
 * of the version before it, so memory stays bounded by one document's blocks.
 */
import type { BlockNode, Problem } from '../format/ast';
import { ProblemList } from './problems';
import type { NameUse } from './types';

interface Entry {
  value: unknown;
  uses: NameUse[];
  problems: Problem[];
  /** The checks that depend on the settings too, under the settings they were made with. */
  checks?: { settings: string; problems: Problem[] };
}

export class BlockMemo {
  private readonly entries = new Map<BlockNode, Entry>();
  /** The previous version's entries (not the memo itself, so that versions do not chain). */
  private readonly before: Map<BlockNode, Entry> | undefined;

  constructor(previous?: BlockMemo) {
    this.before = previous?.entries;
  }

  /**
   * The builder's value for this block, with the name uses and problems it reports added to
   * `uses` and `problems` in the order the builder reports them.
   */
  build<T>(block: BlockNode, uses: NameUse[], problems: ProblemList, builder: (uses: NameUse[], problems: ProblemList) => T): T {
    let entry = this.before?.get(block);
    if (!entry) {
      const own = new ProblemList();
      const ownUses: NameUse[] = [];
      entry = { value: builder(ownUses, own), uses: ownUses, problems: own.items };
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
    }
    for (const p of entry.checks.problems) problems.push(p);
  }
}
