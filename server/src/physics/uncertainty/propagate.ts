/** The law of propagation of uncertainty (GUM, JCGM 100:2008 §5.1) for independent inputs. */
import type { InputTable, Sensitivities, Uncertain, UncertainInput } from './types';

export const NO_SENSITIVITY: Sensitivities = Object.freeze({});

/** A number with no uncertain input. */
export function exact(value: number): Uncertain {
  return { value, sens: NO_SENSITIVITY };
}

/** An input as a derived number: ∂x/∂x = 1. */
export function fromInput(input: UncertainInput): Uncertain {
  return { value: input.value, sens: { [input.id]: 1 } };
}

/** Σ_k c_k · sens_k: the chain rule for a result depending on several intermediates. */
export function combine(terms: readonly (readonly [number, Sensitivities])[]): Sensitivities {
  const out: Record<string, number> = {};
  for (const [c, sens] of terms) {
    if (c === 0 || !Number.isFinite(c)) continue;
    for (const id in sens) out[id] = (out[id] ?? 0) + c * sens[id]!;
  }
  return out;
}

export function hasSensitivity(sens: Sensitivities): boolean {
  for (const id in sens) if (sens[id] !== 0) return true;
  return false;
}

/** cov(a, b) = Σ_i a_i b_i u_i² over the inputs both depend on. */
export function covariance(a: Sensitivities, b: Sensitivities, inputs: InputTable): number {
  let s = 0;
  for (const id in a) {
    const bi = b[id];
    const input = inputs.get(id);
    if (bi === undefined || !input) continue;
    s += a[id]! * bi * input.u * input.u;
  }
  return s;
}

/** Combined standard uncertainty u_c = sqrt(Σ_i (∂f/∂x_i)² u_i²). */
export function standardUncertainty(sens: Sensitivities, inputs: InputTable): number {
  return Math.sqrt(covariance(sens, sens, inputs));
}

/** Correlation coefficient of two results; undefined when either has no uncertainty. */
export function correlation(a: Sensitivities, b: Sensitivities, inputs: InputTable): number | undefined {
  const ua = standardUncertainty(a, inputs);
  const ub = standardUncertainty(b, inputs);
  if (!(ua > 0) || !(ub > 0)) return undefined;
  return Math.max(-1, Math.min(1, covariance(a, b, inputs) / (ua * ub)));
}

/** The full covariance matrix of several results (row-major), e.g. for a fit's parameters. */
export function covarianceMatrix(results: readonly Sensitivities[], inputs: InputTable): number[][] {
  return results.map((a) => results.map((b) => covariance(a, b, inputs)));
}
