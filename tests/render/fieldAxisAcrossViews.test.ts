/**
 * One rule for every field axis (render/fieldAxisUnit.ts): with no unit written, the levels sweep,
 * the field map's |B|, the slower's B and the fit residuals' B read the same unit for the same
 * top of range. The field map used to keep gauss up to 0.1 T and the slower gauss always; the
 * residuals took a plain SI prefix (mT where the others read G). The rule is the reports' field
 * text (G up to 0.1 T, then T), so a figure and its report read the same unit. Fields are invented shapes.
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { diagramFor } from '../../server/src/views/diagram';
import { fieldMapView } from '../../server/src/views/fieldMapView';
import { fieldAxisUnit } from '../../server/src/render/fieldAxisUnit';
import { renderResiduals, renderSlower } from '../../server/src/render';
import type { FieldFunction, FieldSourceSpec, Vec3 } from '../../server/src/physics/fields/types';
import { all, parseSvg, textOf } from './svgTree';

const theme = { kind: 'export' } as const;
const ZERO3: [Vec3, Vec3, Vec3] = [[0, 0, 0], [0, 0, 0], [0, 0, 0]];
const parts: FieldSourceSpec[] = [{ kind: 'loop', centre: [0, 0, 0], axis: [0, 0, 1], radiusM: 0.03, ampereTurns: 100 }];
const coil = [{ name: 'c', kind: 'coil' as const, parts }];

function levelsUnit(topT: number): string | undefined {
  const d = diagramFor(analyze('species Rb87\n  level ground: 5s 2S1/2\n'), { view: 'levels', theme: 'export', toT: topT });
  if (!d.ok) throw new Error(d.message);
  return parseSvg(d.svg).attrs['data-x-unit'];
}

function mapUnit(topT: number): string {
  // |B| rising linearly along the coil's axis from 0 to topT at the line's far end: the axis tops out at topT.
  const line = fieldMapView(coil, () => ({ B: [0, 0, 0], gradient: ZERO3 }), { points: 11 });
  const end = Math.max(Math.abs(line!.positionsM[0]!), Math.abs(line!.positionsM[10]!));
  const field: FieldFunction = (p) => ({ B: [0, 0, (topT * Math.abs(p[2])) / end], gradient: ZERO3 });
  return fieldMapView(coil, field, { points: 101, scale: 'linear' })!.fieldUnit;
}

function slowerUnit(topT: number): string {
  const zM = Array.from({ length: 21 }, (_, k) => k * 0.05);
  const idealT = zM.map((z) => topT * (1 - z));
  const svg = renderSlower({ title: 'invented slower', zM, idealT, resonantMPerS: zM.map((z) => 500 * (1 - z) + 20), flightMPerS: zM.map((z) => 500 * (1 - z) + 20) }, theme);
  const title = all(parseSvg(svg), (n) => n.name === 'text' && /^B \(/.test(textOf(n)))[0]!;
  return /^B \((.+)\)$/.exec(textOf(title))![1]!;
}

function residualsUnit(topT: number): string | undefined {
  const x = [0.2, 0.4, 0.6, 0.8, 1].map((f) => f * topT);
  const svg = renderResiduals({ title: 'invented fit', xKind: 'field', x, measured: x.map((b) => 1e9 + 1e10 * b), sigma: x.map(() => 10), model: x.map((b) => 1e9 + 1e10 * b + 5), unit: 'Hz', modelLine: false }, theme);
  return parseSvg(svg).attrs['data-x-unit'];
}

describe('a file with no field unit reads the same axis unit in every figure', () => {
  it.each([
    [3e-7, 'nT'],
    [3e-5, 'µT'],
    [0.003, 'G'],
    [0.03, 'G'],
    [0.3, 'T'],
    [3, 'T'],
  ])('a range to %s T reads %s in the levels, field map, slower and residuals figures', (topT, unit) => {
    expect(fieldAxisUnit(topT)).toBe(unit);
    expect({ levels: levelsUnit(topT), fieldmap: mapUnit(topT), slower: slowerUnit(topT), residuals: residualsUnit(topT) }).toEqual({ levels: unit, fieldmap: unit, slower: unit, residuals: unit });
  });
});
