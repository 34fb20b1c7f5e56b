/**
 * A plain-data value (the evaluation result) packed into two typed arrays, a string table and a
 * key table, so that the evaluation worker can hand it to the editor's thread without a
 * structured clone: the typed arrays' buffers are transferred (no copy), and arrays under the
 * keys named "deferred" (a level's sublevel tables, a line's components) are unpacked only when
 * first read. A structured clone of the 20,000-line file's result took 2.3–3.5 s of CPU; almost
 * all of it was those tables, which the editor reads one level at a time (a hover).
 *
 * The unpacked value equals the packed one: same keys in the same order, numbers bit for bit
 * (-0 and NaN included), `undefined` properties kept. Shared objects come back as separate copies,
 * except inside recipes: an array or object met again there is the same object as the first time
 * (two regime limits share their level and field, eval/regimeLimits.ts).
 * Anything but numbers, strings, booleans, null, undefined, arrays and plain objects makes
 * `packValue` throw (the caller then posts the value as it is). A property still unread
 * (eval/lazyFields.ts) is packed as its recipe, which `unpackValue`'s `revive` makes lazy again.
 */
import { unreadRecipes } from '../eval/lazyFields';


export interface PackedValue {
  /** Tags and their operands: the structure. */
  ops: Int32Array;
  /** Every number, in the order of the walk. */
  numbers: Float64Array;
  strings: string[];
  /** Key lists of the objects, by shape number. */
  shapes: string[][];
}

const NUMBER = 0;
const STRING = 1;
const TRUE = 2;
const FALSE = 3;
const NULL = 4;
const UNDEFINED = 5;
const ARRAY = 6; // length, then the elements
const OBJECT = 7; // shape, then the values in the shape's key order
const DEFERRED = 8; // ops length, numbers length, then an ARRAY
const UNREAD = 9; // then the recipe of a property not yet built (eval/lazyFields.ts)
const AGAIN = 10; // op and number position of an array or object packed before inside a recipe (recipes share their states)

/** Keys of one shape that get a site of their own for the shape guess (later keys share the last). */
const SITES_PER_SHAPE = 32;

/** One step of the key-sequence tree: objects with the same keys in the same order share a shape number. */
interface ShapeStep {
  next: Map<string, ShapeStep>;
  id: number;
  keys: string[];
}

export function packValue(value: unknown, deferredKeys: ReadonlySet<string>): PackedValue {
  const out = new Packer(deferredKeys);
  out.walk(value);
  return out.finish();
}

/** Growable typed arrays and the string and key tables of one packing. */
class Packer {
  private ops = new Int32Array(1 << 16);
  private opCount = 0;
  private numbers = new Float64Array(1 << 14);
  private numberCount = 0;
  private readonly strings: string[] = [];
  private readonly stringIds = new Map<string, number>();
  private readonly shapes: string[][] = [];
  private readonly root: ShapeStep = { next: new Map(), id: -1, keys: [] };
  /** Arrays and objects packed inside recipes, by identity: where they start in `ops` and `numbers`. */
  private readonly recipeParts = new Map<object, [number, number]>();
  private inRecipe = false;
  /** By site: (shape number + 1) × SITES_PER_SHAPE + key index, 0 for the root. */
  private readonly lastShape: (ShapeStep | undefined)[] = [];

  constructor(private readonly deferredKeys: ReadonlySet<string>) {}

  finish(): PackedValue {
    return { ops: this.ops.slice(0, this.opCount), numbers: this.numbers.slice(0, this.numberCount), strings: this.strings, shapes: this.shapes };
  }

  private op(x: number): void {
    if (this.opCount === this.ops.length) {
      const grown = new Int32Array(this.ops.length * 2);
      grown.set(this.ops);
      this.ops = grown;
    }
    this.ops[this.opCount++] = x;
  }

  private number(x: number): void {
    if (this.numberCount === this.numbers.length) {
      const grown = new Float64Array(this.numbers.length * 2);
      grown.set(this.numbers);
      this.numbers = grown;
    }
    this.numbers[this.numberCount++] = x;
  }

  private stringId(s: string): number {
    let id = this.stringIds.get(s);
    if (id === undefined) {
      id = this.strings.length;
      this.strings.push(s);
      this.stringIds.set(s, id);
    }
    return id;
  }

  /** `site` says where the value sits (a key of some shape, or the root): objects at one site mostly share a shape. */
  walk(v: unknown, site = 0): void {
    switch (typeof v) {
      case 'number':
        this.op(NUMBER);
        this.number(v);
        return;
      case 'string':
        this.op(STRING);
        this.op(this.stringId(v));
        return;
      case 'boolean':
        this.op(v ? TRUE : FALSE);
        return;
      case 'undefined':
        this.op(UNDEFINED);
        return;
      case 'object':
        if (v === null) this.op(NULL);
        else if (this.inRecipe && this.packedBefore(v)) return;
        else if (Array.isArray(v)) this.walkArray(v, site);
        else if (Object.getPrototypeOf(v) === Object.prototype) this.walkObject(v as Record<string, unknown>, site);
        else throw new Error(`cannot pack a ${Object.prototype.toString.call(v)}`);
        return;
      default:
        throw new Error(`cannot pack a ${typeof v}`);
    }
  }

  private walkArray(a: unknown[], site: number): void {
    this.op(ARRAY);
    this.op(a.length);
    for (let i = 0; i < a.length; i++) this.walk(a[i], site);
  }

  /** Inside a recipe: true (and a reference written) when `v` was packed before, else noted for next time. */
  private packedBefore(v: object): boolean {
    const seen = this.recipeParts.get(v);
    if (seen) {
      this.op(AGAIN);
      this.op(seen[0]);
      this.op(seen[1]);
      return true;
    }
    this.recipeParts.set(v, [this.opCount, this.numberCount]);
    return false;
  }

  private walkObject(o: Record<string, unknown>, site: number): void {
    const shape = this.shapeOf(o, site);
    this.op(OBJECT);
    this.op(shape.id);
    const keys = shape.keys;
    const unread = unreadRecipes(o);
    for (let i = 0; i < keys.length; i++) {
      const k = keys[i]!;
      const at = (shape.id + 1) * SITES_PER_SHAPE + Math.min(i, SITES_PER_SHAPE - 1);
      const recipe = unread?.[k];
      if (recipe) {
        this.op(UNREAD);
        const was = this.inRecipe;
        this.inRecipe = true;
        this.walk(recipe.recipe, at);
        this.inRecipe = was;
        continue;
      }
      const v = o[k];
      if (Array.isArray(v) && this.deferredKeys.has(k)) {
        const start = this.opCount;
        const numbersAt = this.numberCount;
        this.op(DEFERRED);
        this.op(0);
        this.op(0);
        this.walkArray(v, at);
        this.ops[start + 1] = this.opCount - start - 3;
        this.ops[start + 2] = this.numberCount - numbersAt;
      } else this.walk(v, at);
    }
  }

  /** The object's shape: the one last seen at this site if its keys match (no allocation), else found in the key tree. */
  private shapeOf(o: Record<string, unknown>, site: number): ShapeStep {
    const guess = this.lastShape[site];
    if (guess) {
      const keys = guess.keys;
      let i = 0;
      let same = true;
      for (const k in o) {
        if (keys[i++] !== k) {
          same = false;
          break;
        }
      }
      if (same && i === keys.length) return guess;
    }
    let step = this.root;
    for (const k in o) {
      let s = step.next.get(k);
      if (!s) {
        s = { next: new Map(), id: -1, keys: [...step.keys, k] };
        step.next.set(k, s);
      }
      step = s;
    }
    if (step.id < 0) {
      step.id = this.shapes.length;
      this.shapes.push(step.keys);
    }
    this.lastShape[site] = step;
    return step;
  }
}

/**
 * The value `packValue` packed; deferred arrays become properties that unpack themselves when
 * first read, and `revive` puts each unread property back on its object from its recipe.
 */
export function unpackValue(p: PackedValue, revive: Revive): unknown {
  return readAt({ ...p, revive, again: new Map(), recipeDepth: 0 }, 0, 0);
}

export type Revive = (o: Record<string, unknown>, key: string, recipe: unknown) => void;

interface Unpacking extends PackedValue {
  revive: Revive;
  /** Arrays and objects inside recipes, by op position: those met again are the same object as the first. */
  again: Map<number, unknown>;
  /** Recipes being read around the current value (> 0: inside one). */
  recipeDepth: number;
}

/** The value whose tags start at `startOp` and whose numbers start at `startNum`. */
function readAt(p: Unpacking, startOp: number, startNum: number): unknown {
  const { ops, numbers, strings, shapes } = p;
  let op = startOp;
  let num = startNum;
  const read = (): unknown => {
    switch (ops[op++]) {
      case NUMBER:
        return numbers[num++];
      case STRING:
        return strings[ops[op++]!];
      case TRUE:
        return true;
      case FALSE:
        return false;
      case NULL:
        return null;
      case UNDEFINED:
        return undefined;
      case AGAIN: {
        const at = ops[op++]!;
        const atNum = ops[op++]!;
        let a = p.again.get(at);
        if (a === undefined) {
          a = readAt(p, at, atNum);
          p.again.set(at, a);
        }
        return a;
      }
      case ARRAY: {
        const n = ops[op++]!;
        const a: unknown[] = new Array(n);
        if (p.recipeDepth > 0) p.again.set(op - 2, a);
        for (let i = 0; i < n; i++) a[i] = read();
        return a;
      }
      case OBJECT: {
        const keys = shapes[ops[op++]!]!;
        const o: Record<string, unknown> = {};
        if (p.recipeDepth > 0) p.again.set(op - 2, o);
        for (const k of keys) {
          if (ops[op] === DEFERRED) {
            defer(p, o, k, op + 3, num);
            num += ops[op + 2]!;
            op += 3 + ops[op + 1]!;
          } else if (ops[op] === UNREAD) {
            op++;
            p.recipeDepth++;
            const recipe = read();
            p.recipeDepth--;
            p.revive(o, k, recipe);
          } else if (k === '__proto__') Object.defineProperty(o, k, { value: read(), writable: true, enumerable: true, configurable: true }); // a key, not the prototype
          else o[k] = read();
        }
        return o;
      }
      default:
        throw new Error(`packed value: unknown tag at ${op - 1}`);
    }
  };
  return read();
}

/** `o[k]` unpacked on first read (then an ordinary property); a write before that replaces it. */
function defer(p: Unpacking, o: Record<string, unknown>, k: string, op: number, num: number): void {
  const settle = (v: unknown): void => {
    Object.defineProperty(o, k, { value: v, writable: true, enumerable: true, configurable: true });
  };
  Object.defineProperty(o, k, {
    get() {
      const v = readAt(p, op, num);
      settle(v);
      return v;
    },
    set: settle,
    enumerable: true,
    configurable: true,
  });
}
