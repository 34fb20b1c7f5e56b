/**
 * The residuals figure's CSV reads in the units the points were written in, as the figure does:
 * the example's points at 0.5–150 mT in kHz give `field_mT` and `measured_kHz` columns holding the
 * written digits (6834696.976 kHz at 0.5 mT), where it wrote T and Hz before. 1 kHz = 1e3 Hz,
 * 1 mT = 1e-3 T (SI prefixes).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import type { FitResult } from '../../server/src/eval/fitResultTypes';
import { residualsCsv } from '../../server/src/render/residualsCsv';
import { diagramFor } from '../../server/src/views/diagram';

describe('the residuals CSV', () => {
  it('the example fit: fields in mT and values in kHz as written, headers naming the units', () => {
    const a = analyze(readFileSync('examples/fit-rubidium.sublevel', 'utf8'));
    const d = diagramFor(a, { view: 'residuals', theme: 'export', source: 'fit-rubidium.sublevel', fitName: 'constants' });
    if (!d.ok) throw new Error(d.message);
    const rows = d.csv.trimEnd().split('\n');
    expect(rows[0]).toBe('# sublevel residuals: file=fit-rubidium.sublevel; fit=constants');
    expect(rows[1]).toBe('data,field_mT,measured_kHz,uncertainty_kHz,model_kHz,residual_kHz,residual_per_sigma,line');
    expect(rows).toHaveLength(2 + 8);
    const first = rows[2]!.split(',');
    // `point = 6834696.976(300) kHz at 0.5 mT` on line 23 of the example.
    expect(first.slice(0, 4)).toEqual(['pi_lines', '0.5', '6834696.976', '0.3']);
    expect(first[7]).toBe('23');
    const f = a.result!.fits!.find((x) => x.name === 'constants')!;
    const p = f.points[0]!;
    // The model and residual are the fit's own numbers in kHz; the last column is the residual over σ.
    expect(Number(first[4])).toBeCloseTo(p.model! / 1e3, 6);
    expect(Number(first[5])).toBeCloseTo(p.residual! / 1e3, 9);
    expect(Number(first[6])).toBeCloseTo(p.residual! / p.uncertainty!, 9);
    // Only the digits measured − model holds: ulp(6.83e9 Hz) = 2^-20 Hz ≈ 9.5e-10 kHz, so the residual
    // keeps digits down to 1e-10 kHz (it printed -0.165640265464783, 15 digits) and its ratio to
    // σ = 300 Hz down to 1e-9 (it printed -0.552134218215942).
    expect(first.slice(5, 7)).toEqual(['-0.1656402655', '-0.552134218']);
  });

  it('a profile: positions in the written length unit, counts as counts; without a written unit, SI', () => {
    const fit: FitResult = {
      name: 'shape',
      kind: 'profile',
      status: 'converged',
      measured_unit: 'counts',
      at_written_unit: 'um',
      parameters: [],
      dof: 1,
      uncertainty_basis: 'data',
      iterations: 3,
      points: [
        { data: 'scan', line: 9, position_m: -1.2e-4, measured: 40, uncertainty: 5, model: 42, residual: -2 },
        { data: 'scan', line: 10, csv_line: 4, position_m: 3e-5, measured: 120, model: 118, residual: 2 },
      ],
    };
    expect(residualsCsv(fit, 'p.sublevel').split('\n').slice(1, 4)).toEqual([
      'data,position_um,measured_counts,uncertainty_counts,model_counts,residual_counts,residual_per_sigma,line',
      'scan,-120,40,5,42,-2,-0.4,10',
      'scan,30,120,,118,2,,csv 4',
    ]);
    const { at_written_unit: _unused, ...bare } = fit;
    expect(residualsCsv(bare, 'p.sublevel').split('\n')[1]).toMatch(/^data,position_m,measured_counts,/);
  });
});
