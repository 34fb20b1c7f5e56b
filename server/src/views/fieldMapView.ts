/**
 * Field-map view data: which straight line to sample (the common axis of coaxial coils, else
 * the line across the wires, else through the blocks along their magnetisation), |B| and one
 * signed field component, and every source projected into the side view. The component is the
 * one along the line, unless that is 0 all along it: a wire's field circles the wire, so on the
 * line across the wires B lies across the line; there the component across it in the drawing
 * plane is drawn, which shows the field's sense and where it turns.
 */
import { fieldMapTitle, magnitudeAxis, type MagnitudeScale, type FieldMapShape, type FieldMapSource, type FieldMapViewData } from '../render/fieldMap';
import { fieldAxisUnit } from '../render/fieldAxisUnit';
import type { FieldUnit } from '../render';
import type { FieldFunction, FieldSourceSpec, Vec3 } from '../physics/fields/types';

export const FIELD_MAP_POINTS = 401;

export interface MapSource {
  name: string;
  kind: FieldMapSource['kind'];
  parts: readonly FieldSourceSpec[];
}

/** The sampled line: origin, unit direction `u` (positions are p·u), and `v` across it in the side view. */
export interface MapLine {
  origin: Vec3;
  u: Vec3;
  v: Vec3;
  from: number;
  to: number;
}

const dot = (a: Vec3, b: Vec3): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const add = (a: Vec3, b: Vec3, k = 1): Vec3 => [a[0] + k * b[0], a[1] + k * b[1], a[2] + k * b[2]];
const cross = (a: Vec3, b: Vec3): Vec3 => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
const norm = (a: Vec3): number => Math.hypot(a[0], a[1], a[2]);
const unit = (a: Vec3): Vec3 => {
  const n = norm(a);
  return [a[0] / n, a[1] / n, a[2] / n];
};
const AXIS: readonly Vec3[] = [[1, 0, 0], [0, 1, 0], [0, 0, 1]];
const AXIS_NAME = ['x', 'y', 'z'] as const;

/** A direction with its largest component made positive (the plot runs towards +z, not −z). */
function forwards(a: Vec3): Vec3 {
  const k = [0, 1, 2].reduce((best, i) => (Math.abs(a[i]!) > Math.abs(a[best]!) ? i : best), 0);
  // `+ 0` turns −0 into 0, so an axis reads as [0, 1, 0].
  return a[k]! < 0 ? [-a[0] + 0, -a[1] + 0, -a[2] + 0] : [a[0] + 0, a[1] + 0, a[2] + 0];
}

/** The component of `a` across `u`, or undefined when `a` lies along `u`. */
function across(a: Vec3, u: Vec3): Vec3 | undefined {
  const p = add(a, u, -dot(a, u));
  return norm(p) > 1e-9 * Math.max(1, norm(a)) ? unit(p) : undefined;
}

/** The coordinate axis most nearly perpendicular to `u`, made exactly perpendicular. */
function defaultAcross(u: Vec3): Vec3 {
  const k = [0, 1, 2].reduce((best, i) => (Math.abs(u[i]!) < Math.abs(u[best]!) ? i : best), 0);
  return across(AXIS[k]!, u)!;
}

function partPoint(p: FieldSourceSpec): Vec3 {
  return p.kind === 'wire' ? p.point : p.centre;
}

/** Size of a part (radius, half length, half diagonal) for choosing how far the line runs. */
function partSize(p: FieldSourceSpec): number {
  switch (p.kind) {
    case 'loop':
      return p.radiusM;
    case 'solenoid':
      return Math.max(p.radiusM, p.lengthM / 2);
    case 'slab':
      return norm(p.sizeM) / 2;
    case 'wire':
      return 0;
  }
}

export function chooseLine(parts: readonly FieldSourceSpec[]): MapLine | undefined {
  if (parts.length === 0) return undefined;
  const axial = parts.filter((p): p is Extract<FieldSourceSpec, { kind: 'loop' | 'solenoid' }> => p.kind === 'loop' || p.kind === 'solenoid');
  const size = Math.max(...parts.map(partSize));
  const points = parts.map(partPoint);
  let u: Vec3;
  let origin: Vec3;
  let v: Vec3 | undefined;
  const first = axial[0];
  const coaxial = first !== undefined && axial.every((p) => Math.abs(dot(p.axis, first.axis)) > 1 - 1e-9 && across(add(p.centre, first.centre, -1), first.axis) === undefined);
  if (first && coaxial) {
    u = forwards(first.axis);
    origin = first.centre;
  } else {
    const wires = parts.filter((p): p is Extract<FieldSourceSpec, { kind: 'wire' }> => p.kind === 'wire');
    // A block magnetised 0 has no direction to follow: a magnetised one leads; a dead one alone gets the z axis through it.
    const slabs = parts.filter((p): p is Extract<FieldSourceSpec, { kind: 'slab' }> => p.kind === 'slab');
    const slab = slabs.find((p) => norm(p.magnetisationT) > 0) ?? slabs[0];
    if (wires.length > 0 && axial.length === 0) {
      // Across the wires: through the first and the farthest other wire, else perpendicular to the one wire.
      const w0 = wires[0]!;
      const far = wires.map((w) => across(add(w.point, w0.point, -1), w0.direction)).find((d) => d !== undefined);
      u = forwards(far ?? defaultAcross(w0.direction));
      origin = w0.point;
      // The drawing plane is across the wires, so they show as dots with their current's sense.
      const c = cross(w0.direction, u);
      v = norm(c) > 1e-9 ? forwards(unit(c)) : undefined;
    } else if (slab && axial.length === 0) {
      const m = norm(slab.magnetisationT) > 0 ? slab.magnetisationT : ([0, 0, 1] as Vec3);
      u = forwards(unit(m));
      origin = slab.centre;
    } else {
      u = [0, 0, 1];
      origin = [0, 0, 0];
    }
  }
  // The line passes through the centroid of the sources' projections onto it.
  const along = points.map((p) => dot(p, u));
  const lo = Math.min(...along);
  const hi = Math.max(...along);
  const base = add(origin, u, -dot(origin, u));
  const margin = Math.max(2.5 * size, 0.5 * (hi - lo), sideSpread(points, base, u), 0.01);
  v ??= points.map((p) => across(add(p, base, -1), u)).find((d) => d !== undefined) ?? defaultAcross(u);
  return { origin: base, u: snapToAxis(u), v: snapToAxis(v), from: lo - margin, to: hi + margin };
}

/** Largest distance of a source point from the line (wires beside it set the scale when there is no size). */
function sideSpread(points: Vec3[], base: Vec3, u: Vec3): number {
  return Math.max(0, ...points.map((p) => {
    const d = add(p, base, -1);
    return 3 * norm(add(d, u, -dot(d, u)));
  }));
}

function snapToAxis(v: Vec3): Vec3 {
  const k = AXIS.findIndex((a) => Math.abs(Math.abs(dot(a, v)) - 1) < 1e-12);
  return k >= 0 ? (dot(AXIS[k]!, v) > 0 ? AXIS[k]! : v) : v;
}

/** The component along the line counts as 0 below this fraction of the largest |B| (round-off is ~1e-15 of it; our choice). */
const ALONG_IS_ZERO = 1e-9;

/** Largest |x| over the finite samples (the gaps on a conductor count for nothing). */
function largest(xs: Float64Array): number {
  let m = 0;
  for (const x of xs) if (Number.isFinite(x)) m = Math.max(m, Math.abs(x));
  return m;
}

function axisName(a: Vec3, fallback: string): string {
  const k = AXIS.findIndex((e) => Math.abs(dot(e, a) - 1) < 1e-12);
  return k >= 0 ? AXIS_NAME[k]! : fallback;
}

/** The parts of one source in the side view (s = p·u along the line, t = (p − origin)·v across it). */
export function sourceShapes(parts: readonly FieldSourceSpec[], line: MapLine): FieldMapShape[] {
  const n = cross(line.u, line.v); // towards the reader
  const s = (p: Vec3): number => dot(p, line.u);
  const t = (p: Vec3): number => dot(add(p, line.origin, -1), line.v);
  const out: FieldMapShape[] = [];
  for (const p of parts) {
    if (p.kind === 'loop' || p.kind === 'solenoid') {
      const e = cross(n, p.axis);
      if (norm(e) < 1e-9) {
        out.push({ kind: 'ring', s: s(p.centre), t: t(p.centre), r: p.radiusM });
        continue;
      }
      const eu = unit(e);
      const half = p.kind === 'solenoid' ? p.lengthM / 2 : 0;
      for (const side of [1, -1]) {
        const at = add(p.centre, eu, side * p.radiusM);
        // The current at c + R ê runs along sign(NI)·(axis × ê).
        const towardsReader = Math.sign(p.ampereTurns) * dot(cross(p.axis, eu), n) * side > 0;
        if (half > 0) {
          const a0 = add(at, p.axis, -half);
          const a1 = add(at, p.axis, half);
          out.push({ kind: 'segment', s0: s(a0), t0: t(a0), s1: s(a1), t1: t(a1) });
        }
        out.push({ kind: 'dot', s: s(at), t: t(at), towardsReader });
      }
    } else if (p.kind === 'wire') {
      const facing = dot(p.direction, n);
      if (Math.abs(facing) > 1 - 1e-9) {
        out.push({ kind: 'dot', s: s(p.point), t: t(p.point), towardsReader: Math.sign(p.currentA) * facing > 0 });
        continue;
      }
      // A wire in (or slanted to) the drawing plane: a line, cut to the plotted stretch.
      const half = p.lengthM !== undefined ? p.lengthM / 2 : (line.to - line.from) / 2;
      const a0 = add(p.point, p.direction, -half);
      const a1 = add(p.point, p.direction, half);
      out.push({ kind: 'segment', s0: s(a0), t0: t(a0), s1: s(a1), t1: t(a1) });
    } else {
      let s0 = Infinity, s1 = -Infinity, t0 = Infinity, t1 = -Infinity;
      for (const dx of [-0.5, 0.5]) for (const dy of [-0.5, 0.5]) for (const dz of [-0.5, 0.5]) {
        const c: Vec3 = [p.centre[0] + dx * p.sizeM[0], p.centre[1] + dy * p.sizeM[1], p.centre[2] + dz * p.sizeM[2]];
        s0 = Math.min(s0, s(c)); s1 = Math.max(s1, s(c)); t0 = Math.min(t0, t(c)); t1 = Math.max(t1, t(c));
      }
      // The magnetisation's direction in the drawing's terms (none for a block magnetised 0).
      const m = norm(p.magnetisationT) > 0 ? unit(p.magnetisationT) : undefined;
      out.push({ kind: 'rect', s0, t0, s1, t1, ...(m ? { magnetisation: { s: dot(m, line.u), t: dot(m, line.v), n: dot(m, n) } } : {}) });
    }
  }
  return out;
}

export interface FieldMapOptions {
  fieldUnit?: FieldUnit;
  /** The unit the file wrote its fields in (`field bias = 50 uT`): the |B| axis reads in that family. */
  writtenUnit?: string;
  scale?: MagnitudeScale;
  points?: number;
}

/** A block whose every part is magnetised 0: it adds no field and has no direction to draw. */
function unmagnetised(s: MapSource): boolean {
  return s.parts.length > 0 && s.parts.every((p) => p.kind === 'slab' && !(norm(p.magnetisationT) > 0));
}

/** The view of `sources` summed by `field`; undefined when no source has usable parts. */
export function fieldMapView(sources: readonly MapSource[], field: FieldFunction, options: FieldMapOptions = {}): FieldMapViewData | undefined {
  const usable = sources.filter((s) => s.parts.length > 0);
  const line = chooseLine(usable.flatMap((s) => s.parts));
  if (!line) return undefined;
  const count = options.points ?? FIELD_MAP_POINTS;
  const positionsM = new Float64Array(count);
  const magnitudeT = new Float64Array(count);
  const alongT = new Float64Array(count);
  const acrossT = new Float64Array(count);
  for (let k = 0; k < count; k++) {
    const sPos = k === count - 1 ? line.to : line.from + ((line.to - line.from) * k) / (count - 1);
    const p = add(line.origin, line.u, sPos);
    positionsM[k] = sPos;
    const b = field(p).B;
    const ok = b.every(Number.isFinite);
    magnitudeT[k] = ok ? norm(b) : NaN;
    alongT[k] = ok ? dot(b, line.u) : NaN;
    acrossT[k] = ok ? dot(b, line.v) : NaN;
  }
  let max = 0;
  for (const m of magnitudeT) if (Number.isFinite(m)) max = Math.max(max, m);
  const along = axisName(line.u, 's');
  const acrossName = axisName(line.v, 'across');
  const showAcross = largest(alongT) <= ALONG_IS_ZERO * max && largest(acrossT) > 0;
  const componentAxis = showAcross ? acrossName : along;
  const offset = dot(line.origin, line.v);
  const pointText = `(${line.origin.map((c) => Number(c.toPrecision(4))).join(', ')}) m`;
  const axis = magnitudeAxis(magnitudeT, options.scale);
  return {
    title: fieldMapTitle(usable),
    alongName: along,
    acrossName: Math.abs(offset) < 1e-15 ? acrossName : `${acrossName} from the line`,
    lineText: along === 's' ? `along (${line.u.map((c) => Number(c.toPrecision(4))).join(', ')}) through ${pointText}` : `along ${along} through ${pointText}`,
    positionsM,
    magnitudeT,
    componentT: showAcross ? acrossT : alongT,
    componentName: componentAxis === 's' ? 'B along the line' : componentAxis === 'across' ? 'B across the line' : `B_${componentAxis}`,
    componentAxis,
    // The one rule of every field axis (render/fieldAxisUnit.ts), from the top of the axis: a spike next to a wire is cut, so not its peak.
    fieldUnit: options.fieldUnit ?? fieldAxisUnit(axis?.domain[1] ?? max, options.writtenUnit),
    axis,
    sources: usable.map((s) => ({ name: s.name, kind: s.kind, shapes: sourceShapes(s.parts, line), ...(unmagnetised(s) ? { note: 'not magnetised' } : {}) })),
  };
}
