/**
 * A level's two sublevel tables at one working field (`linear` and `exact` of a FieldPointResult),
 * made when first read rather than with the point. A large file has thousands of (level, field)
 * pairs whose tables only a hover, a view or the JSON output ever reads; building them all up
 * front was most of the objects (and the garbage collection) of its evaluation. Each point keeps
 * a recipe: the linear inputs and the solved states, which equal levels at equal fields share
 * (`exactAtField`'s memo, read only). Read, a table is built as it always was and becomes an
 * ordinary property of this point alone (the uncertainty pass writes into it). The recipe is plain
 * data, so the evaluation worker hands unread tables to the editor as recipes (service/packedValue.ts).
 */
import { linearSublevels } from '../physics/linearZeeman';
import { halfText, signedHalfText } from './halves';
import { defineLazyField } from './lazyFields';
import type { ExactSublevelResult, FieldPointResult, SublevelResult } from './resultTypes';

/** What the weak-field table of one level at one field is computed from. */
export interface LinearRecipe {
  kind: 'linear';
  gJ: number;
  gI: number;
  twoJ: number;
  twoI: number;
  /** The hyperfine F levels (F, its text, zero-field shift, g_F), when the level has A. */
  hyperfine?: { F: number; shift_Hz: number; g_F: number }[];
  fieldT: number;
}

/** The exact table: the shared solved states, each paired with the linear energy of its low-field state. */
export interface ExactRecipe {
  kind: 'exact';
  states: readonly ExactSublevelResult[];
  linear: LinearRecipe;
}

/** Puts `linear` and `exact` on the point (in that order, after the keys it has), each built when first read. */
export function defineLevelTables(point: Partial<FieldPointResult>, linear: LinearRecipe, states: readonly ExactSublevelResult[]): void {
  defineLazyField(point, 'linear', linear, buildLevelTable);
  defineLazyField(point, 'exact', { kind: 'exact', states, linear } satisfies ExactRecipe, buildLevelTable);
}

/** The table a recipe stands for, newly built. */
export function buildLevelTable(recipe: LinearRecipe | ExactRecipe): SublevelResult[] | ExactSublevelResult[] {
  return recipe.kind === 'linear' ? linearTable(recipe) : exactTable(recipe);
}

function exactTable(r: ExactRecipe): ExactSublevelResult[] {
  const exact = r.states.map((s) => ({ ...s }));
  const linear = new Map(linearTable(r.linear).map((s) => [lowFieldKey(s), s.energy_Hz]));
  for (const s of exact) {
    const e = linear.get(lowFieldKey(s));
    if (e !== undefined) s.linear_energy_Hz = e;
  }
  return exact;
}

/**
 * F, J, m and m_I (halves, or absent) packed into one number: a map keyed by it pairs the states
 * without building two strings per state. Quantum numbers beyond ±255 fall back to a string key.
 */
function lowFieldKey(s: SublevelResult | ExactSublevelResult): number | string {
  const parts = [s.F, s.J, s.m, s.m_I];
  let key = 0;
  for (const x of parts) {
    const twice = x === undefined ? -512 : 2 * x;
    if (!(Number.isInteger(twice) && Math.abs(twice) <= 511)) return `${s.F ?? ''}|${s.J ?? ''}|${s.m}|${s.m_I ?? ''}`;
    key = key * 1024 + (twice + 512);
  }
  return key;
}

function linearTable(r: LinearRecipe): SublevelResult[] {
  const { gJ, gI, twoJ, twoI, fieldT } = r;
  const linear: SublevelResult[] = [];
  if (twoI === 0) {
    for (const s of linearSublevels(gJ, twoJ, fieldT)) {
      linear.push({ label: `m_J=${signedHalfText(s.twoM)}`, J: twoJ / 2, m: s.twoM / 2, m_text: signedHalfText(s.twoM), energy_Hz: s.energyHz });
    }
  } else if (!r.hyperfine) {
    linear.push(...uncoupledLinear(gJ, gI, twoJ, twoI, fieldT));
  } else {
    for (const F of r.hyperfine) {
      const twoF = Math.round(2 * F.F);
      for (const s of linearSublevels(F.g_F, twoF, fieldT)) {
        linear.push({
          label: hyperfineLabel(twoF, s.twoM),
          F: F.F,
          m: s.twoM / 2,
          m_text: signedHalfText(s.twoM),
          energy_Hz: F.shift_Hz + s.energyHz,
        });
      }
    }
  }
  linear.sort((a, b) => a.energy_Hz - b.energy_Hz);
  return linear;
}

/** Linear-state labels by 2F and 2m: the same few strings recur in every level with a nucleus, so each is made once. */
const hyperfineLabels = new Map<number, string>();
export function hyperfineLabel(twoF: number, twoM: number): string {
  // (2F)² + (2m + 2F)/2 numbers the 2F + 1 states of each F after those of every smaller F, so no two (F, m) share a key.
  const key = Math.abs(twoM) <= twoF ? twoF * twoF + (twoM + twoF) / 2 : -1;
  let label = hyperfineLabels.get(key);
  if (label === undefined) {
    label = `F=${halfText(twoF)}, m_F=${signedHalfText(twoM)}`;
    if (key >= 0 && hyperfineLabels.size < 4096) hyperfineLabels.set(key, label);
  }
  return label;
}

/**
 * A nucleus without hyperfine constants: E/h = (μ_B B/h)(g_J m_J + g_I m_I) for every (m_J, m_I).
 * For J = 0 the states are |F = I, m_F = m_I>, labelled like the exact engine does.
 */
function uncoupledLinear(gJ: number, gI: number, twoJ: number, twoI: number, fieldT: number): SublevelResult[] {
  const out: SublevelResult[] = [];
  for (const j of linearSublevels(gJ, twoJ, fieldT)) {
    for (const n of linearSublevels(gI, twoI, fieldT)) {
      const twoM = j.twoM + n.twoM;
      const energy_Hz = j.energyHz + n.energyHz + 0;
      const m = { m: twoM / 2, m_text: signedHalfText(twoM), energy_Hz };
      if (twoJ === 0) out.push({ label: `F=${halfText(twoI)}, m_F=${signedHalfText(n.twoM)}`, F: twoI / 2, ...m });
      else out.push({ label: `m_J=${signedHalfText(j.twoM)}, m_I=${signedHalfText(n.twoM)}`, J: twoJ / 2, m_I: n.twoM / 2, ...m });
    }
  }
  return out;
}
