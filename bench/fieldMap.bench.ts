/**
 * Field sources in use, on examples/coils-and-wires.sublevel (2 coils, a rail, a block: 7 parts):
 * the field-map figure (401 points along the coils' axis, view + SVG) and `sublevel field` on a
 * 201 × 201 grid (with the cleaning of exact cancellations, and the text table), each against a
 * baseline measured in the same run: the summed field alone at the same points. CPU time of this
 * process, medians of alternated runs. Goal: the figure well inside a keystroke's budget (< 16 ms).
 * Also a magnet of eight blocks on a ring (an invented one) on a 101 × 101 grid, cleaned against its
 * summed field: a block's round-off comes from the one evaluation that gives its field, so the
 * cleaned map costs about what the field does (docs/fields.md, "Speed").
 */
import { readFileSync } from 'node:fs';
import { analyze } from '../server/src/eval/analyze';
import { cleanField } from '../server/src/eval/cleanField';
import { sumField } from '../server/src/physics/fields';
import { fieldPointPlan } from '../server/src/cli/fieldPoints';
import { fieldText, sampleField } from '../server/src/cli/fieldCommand';
import { renderFieldMap } from '../server/src/render/fieldMap';
import { fieldMapView } from '../server/src/views/fieldMapView';
import { cpuMs, median } from './timing';
import type { SlabSpec, Vec3 } from '../server/src/physics/fields/types';

const RUNS = 15;

/** Eight 10 × 10 × 40 mm blocks on a 3 cm ring, magnetisation turning three times per turn (invented). */
function blockRing(): SlabSpec[] {
  return Array.from({ length: 8 }, (_, k) => {
    const t = (k * Math.PI) / 4;
    return { kind: 'slab', centre: [0.03 * Math.cos(t), 0.03 * Math.sin(t), 0], sizeM: [0.01, 0.01, 0.04], magnetisationT: [1.2 * Math.cos(3 * t), 1.2 * Math.sin(3 * t), 0] };
  });
}

export function runFieldMapBench(): { name: string; lines: string[] } {
  const model = analyze(readFileSync('examples/coils-and-wires.sublevel', 'utf8')).model!;
  const sources = model.sources.filter((s) => s.parts.length > 0);
  const parts = sources.flatMap((s) => s.parts);
  const field = sumField(parts);
  const view = () => {
    const clean = cleanField(parts);
    return fieldMapView(sources.map((s) => ({ name: s.name, kind: s.kind, parts: s.parts })), (p) => {
      const c = clean(p);
      return 'sample' in c ? c.sample : field(p);
    })!;
  };
  const drawn = view();
  const line = fieldPointPlan({ along: '0,0,-12cm:0,0,12cm', points: '401' });
  const grid = fieldPointPlan({ grid: 'x=-2:2cm,z=-2:2cm', points: '201x201' });
  const raw = (pts: readonly (readonly [number, number, number])[]) => () => {
    let s = 0;
    for (const p of pts) s += field(p).B[2];
    return s;
  };
  const ring = blockRing();
  const ringField = sumField(ring);
  const ringClean = cleanField(ring);
  const ringPoints: Vec3[] = [];
  for (let i = 0; i <= 100; i++) for (let j = 0; j <= 100; j++) ringPoints.push([-0.02 + 0.0004 * i, -0.02 + 0.0004 * j, 0.001]);
  const over = (f: (p: Vec3) => unknown) => () => {
    for (const p of ringPoints) f(p);
  };
  const times = { mapBase: [] as number[], map: [] as number[], svg: [] as number[], gridBase: [] as number[], grid: [] as number[], gridText: [] as number[], ringBase: [] as number[], ring: [] as number[] };
  for (let i = 0; i < RUNS; i++) {
    times.mapBase.push(cpuMs(raw(line.points)));
    times.map.push(cpuMs(view));
    times.svg.push(cpuMs(() => renderFieldMap(drawn, { kind: 'export' })));
    times.gridBase.push(cpuMs(raw(grid.points)));
    const rows: ReturnType<typeof sampleField>[] = [];
    times.grid.push(cpuMs(() => rows.push(sampleField(sources, grid))));
    times.gridText.push(cpuMs(() => fieldText(sources.map((s) => s.name), grid, rows[0]!, undefined)));
    times.ringBase.push(cpuMs(over(ringField)));
    times.ring.push(cpuMs(over(ringClean)));
  }
  const m = Object.fromEntries(Object.entries(times).map(([k, v]) => [k, median(v)])) as Record<keyof typeof times, number>;
  const row = (what: string, ms: number, base: number): string => `${what.padEnd(46)} ${ms.toFixed(2).padStart(8)} ms  ${(ms / base).toFixed(2)}× the field alone`;
  return {
    name: `field sources: ${parts.length} parts of examples/coils-and-wires.sublevel, CPU medians of ${RUNS}`,
    lines: [
      row('field alone, 401 points', m.mapBase, m.mapBase),
      row('field map view (clean field), 401 points', m.map, m.mapBase),
      row('  … its SVG', m.svg, m.mapBase),
      row('field alone, 201 × 201 grid', m.gridBase, m.gridBase),
      row('sublevel field --grid 201x201 (sampling)', m.grid, m.gridBase),
      row('  … its text table', m.gridText, m.gridBase),
      row('8-block ring, field alone, 101 × 101 grid', m.ringBase, m.ringBase),
      row('8-block ring, cleaned field, 101 × 101 grid', m.ring, m.ringBase),
    ],
  };
}
