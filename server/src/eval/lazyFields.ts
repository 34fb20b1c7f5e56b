/**
 * Result properties built when first read (eval/levelTables.ts). The property is enumerable, so
 * JSON, spreads, structured clones and equality see an ordinary value; once read (or written) it
 * is an ordinary data property. Until then its recipe is kept under a symbol, which neither JSON
 * nor a structured clone carries, so that the evaluation worker can send the recipe instead of
 * the value (service/packedValue.ts).
 */

/** Under this symbol, an object's recipes by property name, while unread. */
const RECIPES = Symbol('recipes of unread properties');

interface WithRecipes {
  [RECIPES]?: Record<string, { recipe: unknown; build: (recipe: never) => unknown }>;
}

export function defineLazyField<R>(o: object, key: string, recipe: R, build: (recipe: R) => unknown): void {
  const target = o as WithRecipes;
  let recipes = target[RECIPES];
  if (!recipes) {
    recipes = {};
    Object.defineProperty(o, RECIPES, { value: recipes, enumerable: false, writable: true, configurable: true });
  }
  recipes[key] = { recipe, build: build as (recipe: never) => unknown };
  Object.defineProperty(o, key, accessorsFor(key));
}

/** The recipes of `o`'s properties still unread, by name (absent names are read or ordinary), or undefined when it never had any. */
export function unreadRecipes(o: object): Readonly<Record<string, { recipe: unknown } | undefined>> | undefined {
  return (o as WithRecipes)[RECIPES];
}

function settle(o: object, key: string, value: unknown): void {
  const recipes = (o as WithRecipes)[RECIPES];
  if (recipes) delete recipes[key];
  Object.defineProperty(o, key, { value, writable: true, enumerable: true, configurable: true });
}

/** One getter and setter per property name, shared by every object (the object comes as `this`). */
const accessors = new Map<string, PropertyDescriptor>();
function accessorsFor(key: string): PropertyDescriptor {
  let d = accessors.get(key);
  if (!d) {
    d = {
      get(this: WithRecipes) {
        const entry = this[RECIPES]?.[key];
        const value = entry ? entry.build(entry.recipe as never) : undefined;
        settle(this, key, value);
        return value;
      },
      set(this: object, value: unknown) {
        settle(this, key, value);
      },
      enumerable: true,
      configurable: true,
    };
    accessors.set(key, d);
  }
  return d;
}
