/**
 * Two integrators for the four transverse coordinates (y, z, dy/ds, dz/ds) against the beam
 * coordinate s: Dormand–Prince 5(4) with step-size control (Hairer, Nørsett & Wanner, Solving
 * Ordinary Differential Equations I, 2nd ed., §II.4 and §II.5: the coefficients and the
 * controller), and the classical fixed-step fourth-order Runge–Kutta (same book, §II.1) for a
 * fixed number of field evaluations. Neither allocates per step.
 */

/** du/ds at (s, u) into du; false stops the integration (the field could not be evaluated there). */
export type Derivative = (s: number, u: Float64Array, du: Float64Array) => boolean;
/** Called at each point the solution passes through (after the derivative was evaluated there). */
export type Observer = (s: number, u: Float64Array) => void;

export interface StepperResult {
  ok: boolean;
  steps: number;
  rejected: number;
  evaluations: number;
  /** Where the integration stopped when ok is false. */
  stoppedAtS?: number;
  reason?: 'derivative' | 'too-many-steps' | 'step-too-small';
}

const N = 4;

// Dormand–Prince 5(4) tableau.
const C2 = 1 / 5, C3 = 3 / 10, C4 = 4 / 5, C5 = 8 / 9;
const A21 = 1 / 5;
const A31 = 3 / 40, A32 = 9 / 40;
const A41 = 44 / 45, A42 = -56 / 15, A43 = 32 / 9;
const A51 = 19372 / 6561, A52 = -25360 / 2187, A53 = 64448 / 6561, A54 = -212 / 729;
const A61 = 9017 / 3168, A62 = -355 / 33, A63 = 46732 / 5247, A64 = 49 / 176, A65 = -5103 / 18656;
const A71 = 35 / 384, A73 = 500 / 1113, A74 = 125 / 192, A75 = -2187 / 6784, A76 = 11 / 84;
const E1 = 71 / 57600, E3 = -71 / 16695, E4 = 71 / 1920, E5 = -17253 / 339200, E6 = 22 / 525, E7 = -1 / 40;

export interface AdaptiveOptions {
  /** Relative tolerance on every coordinate. */
  rtol: number;
  /** Absolute tolerance: [y, z, dy/ds, dz/ds]. */
  atol: readonly [number, number, number, number];
  /** Largest step (sets the fewest field samples along the way). */
  maxStep: number;
  maxSteps: number;
}

/** Integrates u from s0 to s1 in place with Dormand–Prince 5(4). */
export function dormandPrince(f: Derivative, s0: number, s1: number, u: Float64Array, o: AdaptiveOptions, observe?: Observer): StepperResult {
  const k1 = new Float64Array(N), k2 = new Float64Array(N), k3 = new Float64Array(N), k4 = new Float64Array(N);
  const k5 = new Float64Array(N), k6 = new Float64Array(N), k7 = new Float64Array(N);
  const w = new Float64Array(N), next = new Float64Array(N);
  const res: StepperResult = { ok: true, steps: 0, rejected: 0, evaluations: 0 };
  const fail = (s: number, reason: StepperResult['reason']): StepperResult => ({ ...res, ok: false, stoppedAtS: s, reason });
  let s = s0;
  res.evaluations++;
  if (!f(s, u, k1)) return fail(s, 'derivative');
  observe?.(s, u);
  let h = Math.min(o.maxStep, s1 - s0);
  const tiny = 1e-12 * Math.abs(s1 - s0);
  while (s < s1) {
    if (res.steps + res.rejected >= o.maxSteps) return fail(s, 'too-many-steps');
    if (s + h > s1) h = s1 - s;
    for (let i = 0; i < N; i++) w[i] = u[i] + h * A21 * k1[i];
    if (!f(s + C2 * h, w, k2)) return fail(s, 'derivative');
    for (let i = 0; i < N; i++) w[i] = u[i] + h * (A31 * k1[i] + A32 * k2[i]);
    if (!f(s + C3 * h, w, k3)) return fail(s, 'derivative');
    for (let i = 0; i < N; i++) w[i] = u[i] + h * (A41 * k1[i] + A42 * k2[i] + A43 * k3[i]);
    if (!f(s + C4 * h, w, k4)) return fail(s, 'derivative');
    for (let i = 0; i < N; i++) w[i] = u[i] + h * (A51 * k1[i] + A52 * k2[i] + A53 * k3[i] + A54 * k4[i]);
    if (!f(s + C5 * h, w, k5)) return fail(s, 'derivative');
    for (let i = 0; i < N; i++) w[i] = u[i] + h * (A61 * k1[i] + A62 * k2[i] + A63 * k3[i] + A64 * k4[i] + A65 * k5[i]);
    if (!f(s + h, w, k6)) return fail(s, 'derivative');
    for (let i = 0; i < N; i++) next[i] = u[i] + h * (A71 * k1[i] + A73 * k3[i] + A74 * k4[i] + A75 * k5[i] + A76 * k6[i]);
    if (!f(s + h, next, k7)) return fail(s, 'derivative');
    res.evaluations += 6;
    let sum = 0;
    for (let i = 0; i < N; i++) {
      const e = h * (E1 * k1[i] + E3 * k3[i] + E4 * k4[i] + E5 * k5[i] + E6 * k6[i] + E7 * k7[i]);
      const sc = o.atol[i] + o.rtol * Math.max(Math.abs(u[i]), Math.abs(next[i]));
      sum += (e / sc) * (e / sc);
    }
    const err = Math.sqrt(sum / N);
    const factor = err === 0 ? 5 : Math.min(5, Math.max(0.2, 0.9 * Math.pow(err, -0.2)));
    if (err <= 1 || h <= tiny) {
      s = s + h >= s1 - tiny ? s1 : s + h;
      u.set(next);
      k1.set(k7); // first same as last
      res.steps++;
      observe?.(s, u);
      h = Math.min(o.maxStep, h * factor);
    } else {
      res.rejected++;
      h *= Math.max(0.2, factor);
      if (h < tiny) return fail(s, 'step-too-small');
    }
  }
  return res;
}

/** Integrates u from s0 to s1 in place with `steps` classical Runge–Kutta steps (4 evaluations each, plus one at the end for the observer). */
export function rungeKutta4(f: Derivative, s0: number, s1: number, u: Float64Array, steps: number, observe?: Observer): StepperResult {
  const k1 = new Float64Array(N), k2 = new Float64Array(N), k3 = new Float64Array(N), k4 = new Float64Array(N), w = new Float64Array(N);
  const res: StepperResult = { ok: true, steps: 0, rejected: 0, evaluations: 0 };
  const h = (s1 - s0) / steps;
  for (let n = 0; n < steps; n++) {
    const s = s0 + n * h;
    res.evaluations += 4;
    if (!f(s, u, k1)) return { ...res, ok: false, stoppedAtS: s, reason: 'derivative' };
    observe?.(s, u);
    for (let i = 0; i < N; i++) w[i] = u[i] + 0.5 * h * k1[i];
    if (!f(s + 0.5 * h, w, k2)) return { ...res, ok: false, stoppedAtS: s, reason: 'derivative' };
    for (let i = 0; i < N; i++) w[i] = u[i] + 0.5 * h * k2[i];
    if (!f(s + 0.5 * h, w, k3)) return { ...res, ok: false, stoppedAtS: s, reason: 'derivative' };
    for (let i = 0; i < N; i++) w[i] = u[i] + h * k3[i];
    if (!f(s + h, w, k4)) return { ...res, ok: false, stoppedAtS: s, reason: 'derivative' };
    for (let i = 0; i < N; i++) u[i] += (h / 6) * (k1[i] + 2 * k2[i] + 2 * k3[i] + k4[i]);
    res.steps++;
  }
  if (observe) {
    res.evaluations++;
    if (!f(s1, u, k1)) return { ...res, ok: false, stoppedAtS: s1, reason: 'derivative' };
    observe(s1, u);
  }
  return res;
}
