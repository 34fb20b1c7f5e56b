/**
 * The sweep's perturbation series (perturbationSeries.ts) against an outside reference
 * (tests/reference/perturbation_series.json from scripts/reference/perturbation_series.py):
 * the Rayleigh–Schrödinger coefficients of the textbook recursion in 50-digit arithmetic (mpmath),
 * which the engine reaches beyond order 8 by Wigner's 2n + 1 rule, and the exact eigenvalues of
 * NumPy's eigvalsh at offsets inside the series' reach.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { PLANCK_H } from '../../server/src/physics/constants';
import { SERIES_ORDER, evaluateSeries, expandAt, makeSeriesWorkspace, orderFor, seriesValueAt } from '../../server/src/physics/engine/perturbationSeries';

interface SeriesCase {
  values: number[];
  vectors: number[];
  zeeman: number[];
  coefficients: number[][];
  offsets: number[];
  exact: number[][];
}
const ref = JSON.parse(readFileSync(path.join(__dirname, '../reference/perturbation_series.json'), 'utf8')) as { order: number; cases: SeriesCase[] };

function expand(c: SeriesCase) {
  const n = c.values.length;
  const sw = makeSeriesWorkspace(n);
  expandAt(Float64Array.from(c.values), Float64Array.from(c.vectors), Float64Array.from(c.zeeman), n, sw, false);
  return { n, sw, scale: Math.max(...c.values.map(Math.abs)) };
}

describe('perturbation series against the textbook recursion (mpmath) and NumPy eigvalsh', () => {
  it('uses the reference order', () => {
    expect(SERIES_ORDER).toBe(ref.order);
  });

  ref.cases.forEach((c, i) => {
    it(`case ${i + 1} (${c.values.length} states): every coefficient, to its share of the energy inside the reach`, () => {
      const { n, sw, scale } = expand(c);
      expect(sw.scaleT).toBeGreaterThan(0);
      const reach = sw.reach * sw.scaleT;
      let worst = 0;
      for (let k = 0; k < n; k++) {
        for (let j = 0; j <= SERIES_ORDER; j++) {
          const ours = sw.coef[k * (SERIES_ORDER + 1) + j] / sw.scaleT ** j;
          const want = c.coefficients[k][j];
          // What the difference adds to the energy at the reach, against the energy scale; low
          // orders also relative to themselves.
          worst = Math.max(worst, (Math.abs(ours - want) * reach ** j) / scale);
          if (j <= 4) expect(Math.abs(ours - want)).toBeLessThanOrEqual(1e-12 * Math.abs(want) + 1e-15 * scale / reach ** j);
        }
      }
      // Measured up to 2.1e-18.
      expect(worst).toBeLessThan(1e-16);
    });

    it(`case ${i + 1}: energies at offsets inside the reach equal NumPy eigvalsh`, () => {
      const { n, sw, scale } = expand(c);
      const reach = sw.reach * sw.scaleT;
      const out = new Float64Array(2);
      let compared = 0;
      c.offsets.forEach((t, o) => {
        if (Math.abs(t) > reach) return;
        compared++;
        for (let k = 0; k < n; k++) {
          seriesValueAt(sw, k, t, out);
          // Measured up to 8e-16 of the scale (both sides carry the round-off of a solve).
          expect(Math.abs(out[0] - c.exact[o][k])).toBeLessThanOrEqual(1e-14 * scale);
        }
      });
      expect(compared).toBeGreaterThanOrEqual(2);
    });
  });

  ref.cases.forEach((c, i) => {
    it(`case ${i + 1}: the sweep's evaluation, each four points to the order orderFor gives, equals NumPy eigvalsh and the whole series`, () => {
      const { n, sw, scale } = expand(c);
      const reach = sw.reach * sw.scaleT;
      // The reference offsets inside the reach, then points from near the anchor out to the reach.
      const inside = c.offsets.map((t, o) => ({ t, o })).filter(({ t }) => Math.abs(t) <= reach);
      const spread = Array.from({ length: 23 }, (_, r) => reach * (r % 2 ? -1 : 1) * 1.5 ** (r - 22));
      const fieldsT = Float64Array.from([...inside.map(({ t }) => t), ...spread]);
      const points = fieldsT.length;
      const store = new Float64Array(2 * n * points);
      evaluateSeries(sw, n, fieldsT, 0, 0, points, { store, base: 0, stride: 2 * points, points, curvature: false });
      const out = new Float64Array(2);
      const zScale = Math.max(...c.zeeman.map(Math.abs));
      for (let k = 0; k < n; k++) {
        // Measured up to 8e-16 of the scale against NumPy, as the whole series.
        inside.forEach(({ o }, r) => expect(Math.abs(store[k * 2 * points + r] - c.exact[o][k])).toBeLessThanOrEqual(1e-14 * scale));
        for (let r = 0; r < points; r++) {
          seriesValueAt(sw, k, fieldsT[r], out);
          // Left-out terms: at most a quarter of the series' truncation tolerances (1e-16 of the energies, 1e-15 of the moments).
          expect(Math.abs(store[k * 2 * points + r] - out[0])).toBeLessThanOrEqual(1e-15 * scale);
          expect(Math.abs(store[k * 2 * points + points + r] + PLANCK_H * out[1])).toBeLessThanOrEqual(1e-14 * PLANCK_H * zScale);
        }
      }
    });

    it(`case ${i + 1}: fields out of order (the far ones in the middle of a four) get the order they need`, () => {
      const { n, sw, scale } = expand(c);
      const reach = sw.reach * sw.scaleT;
      const fieldsT = Float64Array.from([1e-6, 1, -1, -1e-6, 1e-6, -0.9, 0.95, 1e-6].map((f) => f * reach));
      const points = fieldsT.length;
      const store = new Float64Array(2 * n * points);
      evaluateSeries(sw, n, fieldsT, 0, 0, points, { store, base: 0, stride: 2 * points, points, curvature: false });
      const out = new Float64Array(2);
      for (let k = 0; k < n; k++) {
        for (let r = 0; r < points; r++) {
          seriesValueAt(sw, k, fieldsT[r], out);
          // As in the sorted case above: a quarter of the truncation tolerance.
          expect(Math.abs(store[k * 2 * points + r] - out[0])).toBeLessThanOrEqual(1e-15 * scale);
        }
      }
    });

    it(`case ${i + 1}: orderFor leaves out more orders nearer the anchor, none at the reach`, () => {
      const { sw } = expand(c);
      const orders = [1e-6, 1e-3, 0.1, 0.5, 1].map((f) => orderFor(sw, f * sw.reach));
      for (let q = 1; q < orders.length; q++) expect(orders[q]).toBeGreaterThanOrEqual(orders[q - 1]);
      expect(orders[0]).toBeLessThanOrEqual(3);
      expect(orders[2]).toBeLessThan(SERIES_ORDER);
      expect(orders[4]).toBeGreaterThanOrEqual(SERIES_ORDER - 2);
      expect(orderFor(sw, 0)).toBe(1);
    });
  });
});
