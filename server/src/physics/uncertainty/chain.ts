/**
 * Chain rules that turn the engine's parameter derivatives into sensitivities to the inputs:
 * a level parameter (field, A, g_J …) may itself depend on inputs, and a root of an equation
 * (a resonance field, a field-insensitive point) moves with them by the implicit-function theorem.
 */
import { combine, NO_SENSITIVITY } from './propagate';
import type { LevelParam, ParamPartials } from './levelDerivatives';
import type { Sensitivities } from './types';

/** Each level parameter's sensitivities to the inputs (absent: the parameter is exact). */
export type ParamSensitivities = Partial<Record<LevelParam, Sensitivities>>;

/** df/dx_i = Σ_p (∂f/∂p)(∂p/∂x_i). */
export function throughParams(partials: ParamPartials, params: ParamSensitivities): Sensitivities {
  const terms: [number, Sensitivities][] = [];
  for (const p in params) {
    const d = partials[p as LevelParam];
    const s = params[p as LevelParam];
    if (d !== undefined && s) terms.push([d, s]);
  }
  return terms.length ? combine(terms) : NO_SENSITIVITY;
}

/**
 * The root x* of g(x, θ) = 0 moves as dx*∕dθ = −(∂g/∂θ)/(∂g/∂x). Undefined when ∂g/∂x = 0: a
 * touching root (a double root) is not a differentiable function of θ, so first order says nothing.
 */
export function implicitRoot(dgdx: number, dgdTheta: Sensitivities): Sensitivities | undefined {
  if (!(Math.abs(dgdx) > 0) || !Number.isFinite(dgdx)) return undefined;
  return combine([[-1 / dgdx, dgdTheta]]);
}

/** a − b of two sensitivity maps (a transition frequency from two sublevel energies). */
export function difference(a: Sensitivities, b: Sensitivities): Sensitivities {
  return combine([
    [1, a],
    [-1, b],
  ]);
}

/** c · a. */
export function scaled(c: number, a: Sensitivities): Sensitivities {
  return combine([[c, a]]);
}
