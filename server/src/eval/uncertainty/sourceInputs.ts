/**
 * The uncertain inputs of a magnet built from field sources (docs/beam.md §7): each source's
 * current, turns, radius, pair spacing, winding or segment length, the components of its place
 * (`centre`, a wire's `through` and `return`), a block's size and the size of its magnetisation,
 * and the components of the magnet's `at`. Each comes with the magnet's parts and beam-line
 * centre rebuilt with that input moved, so its effect can be found by flying again.
 */
import type { Range } from '../../format/ast';
import { magnitudeAndGradient } from '../../physics/beam/trajectory';
import { sumField } from '../../physics/fields';
import type { FieldSourceSpec, Vec3 } from '../../physics/fields/types';
import { combine, NO_SENSITIVITY, type Sensitivities } from '../../physics/uncertainty';
import type { FieldSourceModel, MagnetModel, Valued } from '../../model/types';

export interface MovedMagnet {
  parts: FieldSourceSpec[];
  centre: Vec3;
}

export interface SourceInput {
  id: string;
  /** In words, as the input table has it ("current of coil bias"). */
  label: string;
  /** The written value's range (where a problem about this input belongs). */
  range?: Range;
  /** {id: 1}. */
  sens: Sensitivities;
  u: number;
  /** The size the step is measured against (the value, or the magnet's length for a place). */
  scale: number;
  /** The magnet with this input moved by t (a strength of 0 is set rather than scaled). */
  at(t: number): MovedMagnet;
}

/**
 * Why an input has no first-order effect on the magnet's field: moving it puts a conductor on the
 * beam line's centre. (Every input can be moved: a current or magnetisation of 0 is set rather than
 * scaled, the readers give a magnetisation its direction and turns are at least 1.)
 */
export type SourceGapReason = 'onto-conductor';

export interface SourceGap {
  input: SourceInput;
  why: SourceGapReason;
}

/** Registers an input in the setup's table; returns its sensitivities ({} when it is exact). */
export type AddInput = (id: string, label: string, v: Valued<number> | undefined) => Sensitivities;

const AXES = ['x', 'y', 'z'] as const;

export function magnetSourceInputs(magnet: MagnetModel, add: AddInput): SourceInput[] {
  const sources = magnet.sources ?? [];
  const centre: Vec3 = magnet.atM?.value ?? [0, 0, 0];
  const lengthScale = magnet.lengthM?.value ?? 0.1;
  const out: SourceInput[] = [];
  const push = (id: string, label: string, v: Valued<number> | undefined, scale: number, at: (t: number) => MovedMagnet): void => {
    const sens = add(id, label, v);
    if (sens === NO_SENSITIVITY || !v?.uncertainty) return;
    out.push({ id, label, ...(v.range ? { range: v.range } : {}), sens, u: v.uncertainty, scale: scale > 0 ? scale : lengthScale, at });
  };
  const withSource = (s: FieldSourceModel, moved: (parts: FieldSourceSpec[]) => FieldSourceSpec[], c: Vec3 = centre): MovedMagnet => {
    const own = moved(s.parts);
    return { parts: sources.flatMap((o) => (o === s ? own : o.parts)), centre: c };
  };
  const components = (v: Valued<Vec3> | undefined, id: string, label: string, moved: (c: number, t: number) => MovedMagnet): void => {
    v?.componentUncertainty?.forEach((u, c) => {
      if (u !== undefined) push(`${id}.${AXES[c]}`, `${label} ${AXES[c]}`, { value: v.value[c], source: v.source, uncertainty: u, ...(v.range ? { range: v.range } : {}) }, lengthScale, (t) => moved(c, t));
    });
  };
  for (const s of sources) {
    if (s.parts.length === 0) continue;
    const id = `source:${s.name}`;
    // A current of 0 cannot be scaled: it is set instead (a step of its uncertainty's size, as the field is linear in it).
    const current = s.currentA?.value ?? 0;
    push(`${id}.current`, `current of ${s.kind} ${s.name}`, s.currentA, current !== 0 ? Math.abs(current) : s.currentA?.uncertainty ?? 0, (t) =>
      current !== 0 ? withSource(s, (parts) => parts.map((p) => scaleStrength(p, (current + t) / current))) : withSource(s, () => partsAtCurrent(s, t)),
    );
    // Turns are at least 1 (sourceReaders.ts: a source with fewer has no parts and is skipped above); with no current they change nothing, exactly.
    const turns = s.turns?.value ?? 1;
    push(`${id}.turns`, `turns of ${s.kind} ${s.name}`, s.turns, turns, (t) => withSource(s, (parts) => parts.map((p) => scaleStrength(p, (turns + t) / turns))));
    push(`${id}.radius`, `radius of ${s.kind} ${s.name}`, s.radiusM, s.radiusM?.value ?? 0, (t) =>
      withSource(s, (parts) => parts.map((p) => (p.kind === 'loop' || p.kind === 'solenoid' ? { ...p, radiusM: p.radiusM + t } : p))),
    );
    if (s.kind === 'coil' && s.parts.length === 2) {
      push(`${id}.spacing`, `spacing of coil ${s.name}`, s.spacingM, s.spacingM?.value ?? 0, (t) =>
        withSource(s, (parts) => parts.map((p, j) => (p.kind === 'loop' ? { ...p, centre: shift(p.centre, p.axis, (j === 0 ? -t : t) / 2) } : p))),
      );
    }
    if (s.kind === 'solenoid' || (s.kind === 'wire' && s.lengthM)) {
      push(`${id}.length`, `length of ${s.kind} ${s.name}`, s.lengthM, s.lengthM?.value ?? 0, (t) =>
        withSource(s, (parts) => parts.map((p) => (p.kind === 'solenoid' || (p.kind === 'wire' && p.lengthM !== undefined) ? { ...p, lengthM: p.lengthM! + t } : p))),
      );
    }
    components(s.centre, `${id}.centre`, `centre of ${s.kind} ${s.name}`, (c, t) => withSource(s, (parts) => parts.map((p) => movePart(p, c, t))));
    components(s.through, `${id}.through`, `line of wire ${s.name}`, (c, t) => withSource(s, (parts) => parts.map((p, j) => (j === 0 ? movePart(p, c, t) : p))));
    components(s.returnThrough, `${id}.return`, `return of wire ${s.name}`, (c, t) => withSource(s, (parts) => parts.map((p, j) => (j === 1 ? movePart(p, c, t) : p))));
    components(s.sizeM, `${id}.size`, `size of slab ${s.name}`, (c, t) =>
      withSource(s, (parts) => parts.map((p) => (p.kind === 'slab' ? { ...p, sizeM: withComponent(p.sizeM, c, p.sizeM[c] + t) } : p))),
    );
    const m = s.magnetisationT;
    if (m?.uncertainty !== undefined) {
      const size = Math.hypot(...m.value);
      // The reader gives every magnetisation its written direction (slabBuilder.ts: `… along y` is required).
      const along = s.magnetisationAlong!;
      // Like a current of 0, a magnetisation of 0 cannot be scaled: it is set along its written direction instead (the field is linear in it).
      push(`${id}.magnetisation`, `magnetisation of slab ${s.name}`, { value: size, source: m.source, uncertainty: m.uncertainty, ...(m.range ? { range: m.range } : {}) }, size !== 0 ? size : m.uncertainty, (t) =>
        size !== 0
          ? withSource(s, (parts) => parts.map((p) => scaleStrength(p, (size + t) / size)))
          : withSource(s, (parts) => parts.map((p) => (p.kind === 'slab' ? { ...p, magnetisationT: [t * along[0], t * along[1], t * along[2]] } : p))),
      );
    }
  }
  components(magnet.atM, `magnet:${magnet.name}.at`, `beam line of magnet ${magnet.name}`, (c, t) => ({ parts: sources.flatMap((o) => o.parts), centre: withComponent(centre, c, centre[c] + t) }));
  return out;
}

/** The first step for an input of standard uncertainty u and size `scale`: u, kept between 1e-4 and 1e-2 of the scale (our choice: above the flights' noise, inside the linear range). */
export function firstStep(u: number, scale: number): number {
  const s = scale > 0 ? scale : u;
  return Math.min(Math.max(u, 1e-4 * s), 1e-2 * s);
}

/**
 * The parts of a coil, solenoid or wire carrying current `I`, with the signs its builder gives
 * them (a pair's second loop reversed for `sense = opposite`, a wire's return carrying −I).
 */
export function partsAtCurrent(s: FieldSourceModel, I: number): FieldSourceSpec[] {
  const turns = s.turns?.value ?? 1;
  const opposite = s.kind === 'coil' && s.sense?.value === 'opposite';
  return s.parts.map((p, j) => {
    if (p.kind === 'wire') return { ...p, currentA: j === 0 ? I : -I };
    if (p.kind === 'loop' || p.kind === 'solenoid') return { ...p, ampereTurns: turns * I * (opposite && j === 1 ? -1 : 1) };
    return p;
  });
}

/**
 * Sensitivities of |B| and ∂|B|/∂z at the beam line's centre to the sources' inputs (central
 * differences of the exact field), and the inputs left out, with why (the caller says so).
 */
export function centreFieldSensitivities(inputs: readonly SourceInput[]): { field: Sensitivities; gradient: Sensitivities; gaps: SourceGap[] } {
  const m = new Float64Array(4);
  const at = (moved: MovedMagnet): [number, number] => {
    const sample = sumField(moved.parts)(moved.centre);
    // A nudge that puts a conductor on the centre leaves that part out: no derivative from it.
    if (sample.leftOut) return [Number.NaN, Number.NaN];
    magnitudeAndGradient(sample, m);
    return [m[0], m[3]];
  };
  const field: [number, Sensitivities][] = [];
  const gradient: [number, Sensitivities][] = [];
  const gaps: SourceGap[] = [];
  for (const input of inputs) {
    const h = firstStep(input.u, input.scale);
    const [bp, gp] = at(input.at(h));
    const [bm, gm] = at(input.at(-h));
    if (![bp, gp, bm, gm].every(Number.isFinite)) {
      gaps.push({ input, why: 'onto-conductor' });
      continue;
    }
    field.push([(bp - bm) / (2 * h), input.sens]);
    gradient.push([(gp - gm) / (2 * h), input.sens]);
  }
  return { field: combine(field), gradient: combine(gradient), gaps };
}

function scaleStrength(p: FieldSourceSpec, f: number): FieldSourceSpec {
  if (p.kind === 'wire') return { ...p, currentA: p.currentA * f };
  if (p.kind === 'slab') return { ...p, magnetisationT: [p.magnetisationT[0] * f, p.magnetisationT[1] * f, p.magnetisationT[2] * f] };
  return { ...p, ampereTurns: p.ampereTurns * f };
}

function movePart(p: FieldSourceSpec, c: number, t: number): FieldSourceSpec {
  if (p.kind === 'wire') return { ...p, point: withComponent(p.point, c, p.point[c] + t) };
  return { ...p, centre: withComponent(p.centre, c, p.centre[c] + t) };
}

function shift(v: Vec3, axis: Vec3, t: number): Vec3 {
  return [v[0] + t * axis[0], v[1] + t * axis[1], v[2] + t * axis[2]];
}

function withComponent(v: Vec3, c: number, x: number): Vec3 {
  return [c === 0 ? x : v[0], c === 1 ? x : v[1], c === 2 ? x : v[2]];
}
