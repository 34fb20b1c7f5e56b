/**
 * Moving parsed lines without copying them: the positions a run of lines' syntax tree holds (and
 * those a model builder made for it) are gathered the first time the run moves, and a change in
 * the line count above the run adds to their `line` in place. The nodes keep their identity, so whatever is keyed by a node
 * (the model's block memo) still finds it. The price: a tree moved this way is the tree of the
 * newest version only; the version it was read for sees the new line numbers too.
 */
import type { Position } from './ast';

/** `{ line, character }` and nothing else: how every position of the tree is written. */
function isPosition(o: Record<string, unknown>): boolean {
  if (typeof o['line'] !== 'number' || typeof o['character'] !== 'number') return false;
  let keys = 0;
  for (const _ in o) keys++;
  return keys === 2;
}

/** Arrays and plain objects are walked; class instances (units, caches) and typed arrays are not: they hold no positions of a block. */
function isWalked(v: object): boolean {
  if (Array.isArray(v)) return true;
  const proto = Object.getPrototypeOf(v);
  return proto === Object.prototype || proto === null;
}

/**
 * The distinct positions reachable from `roots` through arrays and plain objects that `seen` does
 * not hold yet. Every object reached is added to `seen`, so a second call with the same set finds
 * only what the first did not (a builder's own positions, apart from the tree's).
 */
export function collectPositions(roots: readonly unknown[], seen: Set<object> = new Set()): Position[] {
  const out: Position[] = [];
  const stack: unknown[] = [...roots];
  while (stack.length > 0) {
    const v = stack.pop();
    if (v === null || typeof v !== 'object' || seen.has(v)) continue;
    seen.add(v);
    if (!isWalked(v)) continue;
    if (Array.isArray(v)) {
      for (const x of v) if (x !== null && typeof x === 'object') stack.push(x);
      continue;
    }
    const o = v as Record<string, unknown>;
    if (isPosition(o)) {
      out.push(o as unknown as Position);
      continue;
    }
    for (const k in o) {
      const x = o[k];
      if (x !== null && typeof x === 'object') stack.push(x);
    }
  }
  return out;
}

/** Moves every position by `delta` lines, in place. */
export function moveLines(positions: readonly Position[], delta: number): void {
  for (const p of positions) p.line += delta;
}
