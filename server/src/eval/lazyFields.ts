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
  let recipes = ownRecipes(target);
  if (!recipes) {
    recipes = {};
    Object.defineProperty(o, RECIPES, { value: recipes, enumerable: false, writable: true, configurable: true });
  }
  recipes[key] = { recipe, build: build as (recipe: never) => unknown };
  Object.defineProperty(o, key, accessorsFor(key));
}

/** The recipes of `o`'s properties still unread, by name (absent names are read or ordinary), or undefined when it never had any. */
export function unreadRecipes(o: object): Readonly<Record<string, { recipe: unknown } | undefined>> | undefined {
  return ownRecipes(o);
}

/** `o`'s own recipes: an object made with `o` as its prototype must not read or spend them. */
function ownRecipes(o: object): WithRecipes[typeof RECIPES] {
  return Object.prototype.hasOwnProperty.call(o, RECIPES) ? (o as WithRecipes)[RECIPES] : undefined;
}

function settle(o: object, key: string, value: unknown): void {
  const recipes = ownRecipes(o);
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
        const own = ownRecipes(this);
        // Inherited through a prototype: the value is the prototype's, built there.
        if (!own) return Reflect.get(Object.getPrototypeOf(this) as object, key);
        const entry = own[key];
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
