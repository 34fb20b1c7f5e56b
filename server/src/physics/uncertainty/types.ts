/**
 * First-order (GUM) uncertainty propagation. Every uncertain input is an independent variable
 * with an id and a standard uncertainty; every derived number carries its sensitivities, a sparse
 * map input id → ∂result/∂input. Two results that share an input stay correlated:
 * cov(a, b) = Σ_i (∂a/∂x_i)(∂b/∂x_i) u_i², i.e. Jᵀ Σ J with a diagonal Σ.
 */

/** Sparse sensitivities: input id → ∂result/∂input (in the result's unit per the input's unit). */
export type Sensitivities = Readonly<Record<string, number>>;

/** A derived number and its sensitivities to the uncertain inputs. */
export interface Uncertain {
  readonly value: number;
  readonly sens: Sensitivities;
}

/** One independent uncertain input: where it comes from and its standard uncertainty (k = 1). */
export interface UncertainInput {
  readonly id: string;
  /** What a reader calls it: "field bias", "A of Rb87.ground". */
  readonly label: string;
  readonly value: number;
  readonly u: number;
  /** The setup file wrote this uncertainty (`0.35(2) T`); absent for published built-in data. */
  readonly written?: boolean;
}

/** The inputs of one evaluation, by id. */
export type InputTable = ReadonlyMap<string, UncertainInput>;
