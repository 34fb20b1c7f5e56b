/**
 * `sublevel field <file> [--source a,b] (--at P | --along A:B [--points N] | --grid x=a:b,z=c:d [--points NxM] [--at P])
 * [--unit G|mT|uT|nT|T] [--format text|json|csv] [--out FILE]`: the summed field of the file's sources —
 * B, |B|, the gradient tensor ∂B_i/∂x_j and ∂|B|/∂x_j — at points, along a line or on a grid.
 * Text uses the chosen unit; JSON and CSV stay in SI (docs/csv.md).
 */
import { type CommandSpec, type ParsedArgs, stringOption, UsageError } from './args';
import { OUT_OPTION, ROOT_OPTION, rootOption } from './files';
import { analyzeFile, listErrorsFirst, reportErrors } from './analyzeFile';
import { cliProblem, FileProblemError } from './fileProblems';
import { fieldPointPlan, type FieldPointPlan } from './fieldPoints';
import { jsonText } from './escape';
import type { CliContext } from './io';
import { writeOutputFile } from './output';
import { table } from './table';
import { selectSources } from './selectors';
import { csvTable } from '../render/csv';
import { FIELD_UNIT_CHOICES, FIELD_UNIT_TESLA, fieldUnitOf, type FieldUnit } from '../render/fieldUnits';
import { csvNumber } from '../eval/machineText';
import { lengthUnitFor } from '../eval/lengthUnit';
import { GAUSS_TESLA_SWITCH_T, trimNumber } from '../eval/quantityText';
import type { FieldSourceModel, SetupModel } from '../model/types';
import { conductorOf, magnitudeGradient } from '../physics/fields';
import { cleanField } from '../eval/cleanField';
import type { FieldSample, Vec3 } from '../physics/fields/types';

const FORMATS = ['text', 'json', 'csv'] as const;

export const fieldSpec: CommandSpec = {
  name: 'field',
  operands: '<file>',
  summary: "the summed field of the file's coils, solenoids, wires and magnetised blocks at points, along a line or on a grid",
  options: {
    ...ROOT_OPTION,
    source: { value: 'NAMES', help: 'only these sources, comma-separated (default: every source of the file)' },
    at: { value: 'X,Y,Z', help: 'one point, e.g. 0,0,1cm (a unit at the end applies to all three); with --grid, a point of the plane' },
    along: { value: 'A:B', help: 'points on the segment from A to B, e.g. 0,0,-5cm:0,0,5cm' },
    grid: { value: 'RANGES', help: 'a rectangle in a coordinate plane, e.g. x=-2:2cm,z=-1:1cm' },
    points: { value: 'N', help: 'number of points: N along a line (default 201), N or NxM on a grid (default 41x41)' },
    unit: { value: 'UNIT', choices: FIELD_UNIT_CHOICES, help: 'field unit of the text output: G (gradients in G/cm), mT (mT/m), uT or µT (µT/m), nT (nT/m) or T (T/m); default by size' },
    format: { value: 'FORMAT', choices: FORMATS, help: 'text (default), json or csv (both in SI units)' },
    ...OUT_OPTION,
  },
  notes: [
    'Positions use the file\'s length units (m, cm, mm, um); zero needs none.',
    'A point on a wire, a loop, a winding or a block\'s face has no field value: the text says so, JSON gives null and CSV empty cells (with a note on stderr).',
  ],
};

/** One sampled point: the sample (none on a conductor, with the reason), and ∂|B|/∂x_j where defined. */
export interface FieldPointRow {
  point: Vec3;
  sample?: FieldSample;
  magnitudeGradient?: Vec3;
  onSource?: string;
  /** The conductor such a point lies on, in words ("a wire"). */
  conductor?: string;
}

export function runField(args: ParsedArgs, ctx: CliContext): number {
  if (args.positionals.length !== 1) throw new UsageError('field needs exactly one setup file');
  const file = args.positionals[0]!;
  const format = stringOption(args, 'format', FORMATS) ?? 'text';
  const unitText = stringOption(args, 'unit', FIELD_UNIT_CHOICES);
  const unitChoice = unitText === undefined ? undefined : fieldUnitOf(unitText);
  if (unitChoice !== undefined && format !== 'text') throw new UsageError(`--unit sets the unit of the text output; --format ${format} is always in SI units (T, T/m)`);
  const plan = fieldPointPlan({ at: stringOption(args, 'at'), along: stringOption(args, 'along'), grid: stringOption(args, 'grid'), points: stringOption(args, 'points') });
  const out = stringOption(args, 'out');

  const analysis = analyzeFile(file, ctx, rootOption(stringOption(args, 'root'), ctx.fsys));
  const model = analysis.model;
  if (!model) throw new FileProblemError(file, analysis.problems);
  const chosen = chooseSources(file, model, stringOption(args, 'source'));
  const broken = chosen.filter((s) => s.parts.length === 0);
  if (broken.length > 0) {
    const listed = listErrorsFirst(file, analysis, ctx);
    throw new FileProblemError(file, [cliProblem('nothing-to-compute', `${broken.map((s) => `${s.kind} '${s.name}'`).join(', ')} ${broken.length === 1 ? 'has' : 'have'} problems to fix before the field can be computed${listed}`, broken[0]!.nameRange)]);
  }
  const rows = sampleField(chosen, plan);
  const names = chosen.map((s) => s.name);
  const text =
    format === 'json' ? jsonText(fieldJson(file, names, plan, rows), 1) : format === 'csv' ? fieldCsv(file, names, rows).trimEnd() : fieldText(names, plan, rows, unitChoice).join('\n');
  if (out) {
    writeOutputFile(out, text + '\n', ctx.fsys);
    ctx.io.err(`wrote the field at ${rows.length} point${rows.length === 1 ? '' : 's'} to ${out}`);
  } else ctx.io.out(text);
  // A CSV's empty cells and a JSON's nulls are easy to miss: say on stderr why they are there.
  const onSource = rows.filter((r) => r.onSource !== undefined);
  if (onSource.length > 0 && (format !== 'text' || out)) {
    ctx.io.err(onConductorNote(onSource.map((r) => r.conductor ?? 'a conductor')));
  }
  return reportErrors(file, analysis, ctx) > 0 ? 1 : 0;
}

/** One sentence for the points without a value: "note: 4 points lie on the wire of a loop and have no field value." */
export function onConductorNote(conductors: readonly string[]): string {
  const n = conductors.length;
  const first = conductors[0]!;
  const verb = n === 1 ? 'lies' : 'lie';
  const has = n === 1 ? 'has' : 'have';
  if (conductors.every((c) => c === first)) return `note: ${n} point${n === 1 ? '' : 's'} ${verb} on ${first} and ${has} no field value.`;
  return `note: ${n} points lie on conductors and have no field value, the first on ${first}.`;
}

function chooseSources(file: string, model: SetupModel, wanted: string | undefined): FieldSourceModel[] {
  const all = model.sources;
  if (all.length === 0) throw new FileProblemError(file, [cliProblem('nothing-to-compute', 'the file has no field source: add a `coil`, `solenoid`, `wire` or `slab` block (docs/fields.md)')]);
  if (wanted === undefined) return all;
  return selectSources(model, wanted).map((n) => all.find((s) => s.name === n)!);
}

export function sampleField(sources: readonly FieldSourceModel[], plan: FieldPointPlan): FieldPointRow[] {
  const field = cleanField(sources.flatMap((s) => s.parts));
  return plan.points.map((point) => {
    const c = field(point);
    if ('onSource' in c) return { point, onSource: c.onSource.message, conductor: conductorOf(c.onSource) };
    const g = magnitudeGradient(c.sample);
    return { point, sample: c.sample, ...(g ? { magnitudeGradient: g } : {}) };
  });
}

// ---- text ----

/** The largest |value| over all rows, by a loop: spreading a 250 000-point grid into Math.max overflows the stack. */
function largest(rows: readonly FieldPointRow[], values: (r: FieldPointRow) => readonly number[]): number {
  let max = 0;
  for (const r of rows) for (const v of values(r)) if (Math.abs(v) > max) max = Math.abs(v);
  return max;
}

interface TextUnits {
  field: { name: string; factor: number };
  gradient: { name: string; factor: number };
}

function textUnits(choice: FieldUnit | undefined, rows: readonly FieldPointRow[]): TextUnits {
  const max = largest(rows, (r) => (r.sample ? [magnitude(r.sample.B)] : []));
  const unit = choice ?? (max < GAUSS_TESLA_SWITCH_T ? 'G' : 'T');
  // Gradients per cm beside gauss (the lab's G/cm), per metre beside the tesla family.
  if (unit === 'G') return { field: { name: 'G', factor: FIELD_UNIT_TESLA.G }, gradient: { name: 'G/cm', factor: 1e-2 } };
  const factor = FIELD_UNIT_TESLA[unit];
  return { field: { name: unit, factor }, gradient: { name: `${unit}/m`, factor } };
}

export function fieldText(names: string[], plan: FieldPointPlan, rows: readonly FieldPointRow[], unit: FieldUnit | undefined): string[] {
  const u = textUnits(unit, rows);
  // One length unit for the whole table: the one the options were written in, else by size.
  const len = lengthUnitFor(largest(rows, (r) => r.point), plan.lengthUnit);
  // Exact cancellations leave ~1e-16 relative dust: below 1e-12 of the largest value it prints as 0.
  const maxB = largest(rows, (r) => (r.sample ? [magnitude(r.sample.B)] : []));
  const maxG = largest(rows, (r) => (r.sample ? r.sample.gradient.flat() : []));
  const fieldNum = (t: number): string => trimNumber(t / u.field.factor, 6, { scale: maxB / u.field.factor, relative: 1e-12 });
  const gradNum = (t: number): string => trimNumber(t / u.gradient.factor, 6, { scale: maxG / u.gradient.factor, relative: 1e-12 });
  const pos = (p: Vec3): string => `(${p.map((c) => trimNumber(c / len.metres, 6, { scale: 1, relative: 1e-12 })).join(', ')}) ${len.symbol}`;
  const head = `field of ${names.join(', ')}`;
  if (plan.kind === 'point') {
    const r = rows[0]!;
    const out = [`${head} at ${pos(r.point)}:`];
    if (!r.sample) return [...out, `  no value: ${lowerFirst(r.onSource ?? 'the point lies on a conductor')}`];
    const s = r.sample;
    out.push(`  B   = (${s.B.map(fieldNum).join(', ')}) ${u.field.name}`);
    out.push(`  |B| = ${fieldNum(magnitude(s.B))} ${u.field.name}`);
    out.push(`  gradient ∂B_i/∂x_j (${u.gradient.name}):`);
    const axes = ['x', 'y', 'z'];
    out.push(...table(['', '∂/∂x', '∂/∂y', '∂/∂z'], s.gradient.map((row, i) => [`B_${axes[i]}`, ...row.map(gradNum)])).map((l) => `    ${l}`));
    out.push(r.magnitudeGradient ? `  ∇|B| = (${r.magnitudeGradient.map(gradNum).join(', ')}) ${u.gradient.name}` : '  ∇|B|: none where B = 0 (|B| has a cone there)');
    return out;
  }
  const what = plan.kind === 'line' ? `along ${pos(plan.from)} → ${pos(plan.to)}, ${rows.length} points` : `on a ${plan.counts[0]} × ${plan.counts[1]} grid`;
  const header = [`x (${len.symbol})`, `y (${len.symbol})`, `z (${len.symbol})`, ...['B_x', 'B_y', 'B_z', '|B|'].map((c) => `${c} (${u.field.name})`), ...['x', 'y', 'z'].map((c) => `∂|B|/∂${c} (${u.gradient.name})`)];
  const body = rows.map((r) => {
    const p = r.point.map((c) => trimNumber(c / len.metres, 6, { scale: 1, relative: 1e-12 }));
    if (!r.sample) return [...p, 'on a conductor', '', '', '', '', '', ''];
    const g = r.magnitudeGradient;
    return [...p, ...r.sample.B.map(fieldNum), fieldNum(magnitude(r.sample.B)), ...(g ? g.map(gradNum) : ['—', '—', '—'])];
  });
  return [`${head} ${what}:`, ...table(header, body)];
}

function lowerFirst(s: string): string {
  return s.charAt(0).toLowerCase() + s.slice(1);
}

const magnitude = (B: Vec3): number => Math.hypot(B[0], B[1], B[2]);

// ---- JSON and CSV (SI) ----

export function fieldJson(file: string, names: string[], plan: FieldPointPlan, rows: readonly FieldPointRow[]) {
  return {
    format: 'sublevel-field',
    version: 1,
    file,
    sources: names,
    sampling: plan.kind === 'point' ? { kind: 'point' } : plan.kind === 'line' ? { kind: 'line', from_m: plan.from, to_m: plan.to, points: rows.length } : { kind: 'grid', axes: plan.axes.map((a) => 'xyz'[a]), points: plan.counts },
    points: rows.map((r) => ({
      position_m: r.point,
      B_T: r.sample ? r.sample.B : null,
      B_abs_T: r.sample ? magnitude(r.sample.B) : null,
      gradient_T_per_m: r.sample ? r.sample.gradient : null,
      B_abs_gradient_T_per_m: r.magnitudeGradient ?? null,
      ...(r.sample ? {} : { note: r.onSource ?? 'on a conductor: no field value' }),
    })),
  };
}

const AXES = ['x', 'y', 'z'] as const;

export function fieldCsv(file: string, names: string[], rows: readonly FieldPointRow[]): string {
  const header = [
    ...AXES.map((a) => `${a}_m`),
    ...AXES.map((a) => `B${a}_T`),
    'B_abs_T',
    ...AXES.flatMap((i) => AXES.map((j) => `dB${i}_d${j}_T_per_m`)),
    ...AXES.map((a) => `dB_abs_d${a}_T_per_m`),
  ];
  const body = rows.map((r) => {
    const s = r.sample;
    const cells: (number | undefined)[] = [
      ...r.point,
      ...(s ? s.B : [undefined, undefined, undefined]),
      s ? magnitude(s.B) : undefined,
      ...(s ? s.gradient.flat() : new Array<undefined>(9).fill(undefined)),
      ...(r.magnitudeGradient ?? [undefined, undefined, undefined]),
    ];
    return cells.map(csvNumber);
  });
  return csvTable({ kind: 'field', about: [['file', file], ['sources', names.join(' + ')]] }, header, body);
}
