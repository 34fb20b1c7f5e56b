/** The factory functions mathjs exports but its type declarations leave out (lib/esm/factoriesAny.js). */
import 'mathjs';

declare module 'mathjs' {
  type Factory = (dependencies: Record<string, unknown>) => any; // eslint-disable-line @typescript-eslint/no-explicit-any
  export const createUnitClass: Factory;
  export const createComplexClass: Factory;
  export const createFractionClass: Factory;
}
