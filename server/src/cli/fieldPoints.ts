/**
 * Where `sublevel field` samples the field, read from its options:
 *   --at 0,0,1cm                       one point (a unit at the end applies to all three numbers)
 *   --along 0,0,-5cm:0,0,5cm --points 201     evenly spaced points on a segment
 *   --grid x=-2:2cm,z=-1:1cm --points 41x41   a rectangle in a coordinate plane (through --at, default the origin)
 * Lengths use the format's units (m, cm, mm, um, in); zero needs none.
 */
import { readQuantityArgument } from '../format/quantityArgument';
import type { Vec3 } from '../physics/fields/types';
import { MAX_LENGTH_M } from '../model/lengthRange';
import { UsageError } from './args';

/** Most points one run samples (a 500 × 500 grid). */
export const MAX_FIELD_POINTS = 250_000;
/** Largest coordinate accepted, m: far beyond any laboratory, small enough that squares stay finite. */
export const MAX_COORDINATE_M = MAX_LENGTH_M;

/** `lengthUnit`: the one length unit the options were written in, when they agree on one (reports echo it). */
export type FieldPointPlan = { lengthUnit?: string } & (
  | { kind: 'point'; points: Vec3[] }
  | { kind: 'line'; from: Vec3; to: Vec3; points: Vec3[] }
  | { kind: 'grid'; axes: [number, number]; counts: [number, number]; points: Vec3[] }
);

const AXES = ['x', 'y', 'z'] as const;
const NUMBER_THEN_UNIT = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?\s*(\S.*)$/;
const BARE_NUMBER = /^\s*[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?\s*$/;

/**
 * A list of lengths where a unit written only on the last applies to the bare numbers before it.
 * The units written are added to `units` when given.
 */
export function readLengths(option: string, text: string, count: number, units?: Set<string>): number[] {
  const pieces = text.split(',');
  if (pieces.length !== count) throw new UsageError(`${option} needs ${count} comma-separated lengths such as ${count === 3 ? '0,0,1cm' : '-2:2cm'}, got '${text}'`);
  const last = pieces[pieces.length - 1]!;
  const trailingUnit = BARE_NUMBER.test(last) ? undefined : NUMBER_THEN_UNIT.exec(last.trim())?.[1]?.trim();
  return pieces.map((p) => {
    const bare = BARE_NUMBER.test(p);
    if (bare && Number(p) === 0) return 0;
    const written = bare && trailingUnit ? `${p.trim()} ${trailingUnit}` : p;
    if (bare && !trailingUnit) throw new UsageError(`${option}: '${p.trim()}' needs a length unit, e.g. ${p.trim()}cm`);
    const unit = bare ? trailingUnit : NUMBER_THEN_UNIT.exec(p.trim())?.[1]?.trim();
    if (unit !== undefined) units?.add(unit);
    const r = readQuantityArgument(written, 'length', option);
    if (r.si === undefined) throw new UsageError(r.message ?? `${option}: cannot read '${p}'`);
    if (!Number.isFinite(r.si) || Math.abs(r.si) > MAX_COORDINATE_M) throw new UsageError(`${option}: ${p.trim()} is outside ±${MAX_COORDINATE_M} m`);
    return r.si;
  });
}

export function readPoint(option: string, text: string, units?: Set<string>): Vec3 {
  const [x, y, z] = readLengths(option, text, 3, units);
  return [x!, y!, z!];
}

/** `--points N` (line) or `NxM` / `N` (grid: N along both axes). */
export function readCounts(text: string | undefined, kind: 'line' | 'grid'): [number, number] {
  const fallback = kind === 'line' ? '201' : '41x41';
  const t = (text ?? fallback).trim();
  const m = /^([0-9]+)(?:[x×]([0-9]+))?$/.exec(t);
  if (!m || (kind === 'line' && m[2] !== undefined)) {
    throw new UsageError(kind === 'line' ? `--points must be a whole number for --along, got '${t}'` : `--points must be N or NxM for --grid, e.g. 41x41, got '${t}'`);
  }
  const a = Number(m[1]);
  const b = m[2] !== undefined ? Number(m[2]) : kind === 'grid' ? a : 1;
  if (a < 2 || (kind === 'grid' && b < 2)) throw new UsageError(`--points needs at least 2 along each direction, got '${t}'`);
  if (a * b > MAX_FIELD_POINTS) throw new UsageError(`--points ${t} is ${a * b} points, more than the ${MAX_FIELD_POINTS} one run samples`);
  return [a, b];
}

/** `x=-2:2cm,z=-1:1cm`: two different axes, each with its range. */
export function readGridRanges(text: string, units?: Set<string>): { axes: [number, number]; ranges: [[number, number], [number, number]] } {
  const parts = text.split(/,(?=\s*[xyz]\s*=)/);
  const shape = "--grid needs two axes with ranges, e.g. 'x=-2:2cm,z=-1:1cm'";
  if (parts.length !== 2) throw new UsageError(`${shape}, got '${text}'`);
  const read = parts.map((p) => {
    const m = /^\s*([xyz])\s*=\s*(.+)$/.exec(p);
    if (!m) throw new UsageError(`${shape}, got '${p.trim()}'`);
    const [a, b] = readLengths(`--grid ${m[1]}`, m[2]!.replace(':', ','), 2, units);
    if (!(b! > a!)) throw new UsageError(`--grid ${m[1]}: the range must go from a smaller to a larger value, got '${m[2]!.trim()}'`);
    return { axis: AXES.indexOf(m[1] as 'x'), range: [a!, b!] as [number, number] };
  });
  if (read[0]!.axis === read[1]!.axis) throw new UsageError(`--grid needs two different axes, got ${AXES[read[0]!.axis]} twice`);
  return { axes: [read[0]!.axis, read[1]!.axis], ranges: [read[0]!.range, read[1]!.range] };
}

export interface PlanOptions {
  at?: string;
  along?: string;
  grid?: string;
  points?: string;
}

export function fieldPointPlan(o: PlanOptions): FieldPointPlan {
  const units = new Set<string>();
  const plan = pointsOf(o, units);
  return units.size === 1 ? { ...plan, lengthUnit: [...units][0]! } : plan;
}

function pointsOf(o: PlanOptions, units: Set<string>): FieldPointPlan {
  const given = [o.along !== undefined, o.grid !== undefined].filter(Boolean).length;
  if (given > 1) throw new UsageError('give one of --along or --grid (with --grid, --at places the plane)');
  if (o.along !== undefined) {
    if (o.at !== undefined) throw new UsageError('--at and --along do not go together: --along gives its own points');
    const ends = o.along.split(':');
    if (ends.length !== 2) throw new UsageError(`--along needs two points joined by ':', e.g. 0,0,-5cm:0,0,5cm, got '${o.along}'`);
    const from = readPoint('--along', ends[0]!, units);
    const to = readPoint('--along', ends[1]!, units);
    if (from.every((v, i) => v === to[i])) throw new UsageError('--along needs two different points');
    const [n] = readCounts(o.points, 'line');
    const points: Vec3[] = [];
    for (let k = 0; k < n; k++) {
      const t = k / (n - 1);
      points.push([lerp(from[0], to[0], t), lerp(from[1], to[1], t), lerp(from[2], to[2], t)]);
    }
    return { kind: 'line', from, to, points };
  }
  if (o.grid !== undefined) {
    const { axes, ranges } = readGridRanges(o.grid, units);
    const base = o.at !== undefined ? readPoint('--at', o.at, units) : ([0, 0, 0] as Vec3);
    const counts = readCounts(o.points, 'grid');
    const points: Vec3[] = [];
    // Rows of the second axis, the first axis fastest: the order a spreadsheet reads a map in.
    for (let j = 0; j < counts[1]; j++) {
      for (let i = 0; i < counts[0]; i++) {
        const p: [number, number, number] = [base[0], base[1], base[2]];
        p[axes[0]] = lerp(ranges[0][0], ranges[0][1], i / (counts[0] - 1));
        p[axes[1]] = lerp(ranges[1][0], ranges[1][1], j / (counts[1] - 1));
        points.push(p);
      }
    }
    return { kind: 'grid', axes, counts, points };
  }
  if (o.points !== undefined) throw new UsageError('--points goes with --along or --grid');
  if (o.at === undefined) throw new UsageError('say where: --at x,y,z, --along A:B or --grid x=a:b,z=c:d');
  return { kind: 'point', points: [readPoint('--at', o.at, units)] };
}

/** Exact at both ends (a + t(b − a) would miss b by a rounding). */
function lerp(a: number, b: number, t: number): number {
  return t === 1 ? b : a + t * (b - a);
}
