/**
 * Invented view data for the renderer tests: a made-up J=1/2, I=3/2 atom with a 3 GHz
 * ground splitting (energies from the Breit–Rabi closed form, only to have realistic curve
 * shapes — the renderer tests check geometry, not physics), a five-peak detector pattern and
 * a small set of line components.
 */
import type { LevelsViewData, LinesViewData, PatternViewData } from '../../server/src/render/viewData';

const MU_B_HZ_PER_T = 1.3996e10; // rough μB/h for curve shapes only (from memory)
const SPLIT_HZ = 3e9;
const G_J = 2.0023;

export function levelsFixture(): LevelsViewData {
  const fieldsT = Array.from({ length: 121 }, (_, k) => (k / 120) * 0.3);
  const curves: LevelsViewData['curves'] = [];
  const twoI = 3;
  for (const upper of [true, false]) {
    const twoF = upper ? 4 : 2;
    for (let twoM = -twoF; twoM <= twoF; twoM += 2) {
      const m = twoM / 2;
      const energyHz = fieldsT.map((b) => {
        const x = (G_J * MU_B_HZ_PER_T * b) / SPLIT_HZ;
        const stretched = Math.abs(twoM) === twoI + 1;
        const root = stretched ? 1 + Math.sign(m) * x : Math.sqrt(1 + (4 * m * x) / (twoI + 1) + x * x);
        return -SPLIT_HZ / (2 * (twoI + 1)) + (upper ? 1 : -1) * (SPLIT_HZ / 2) * root;
      });
      const momentJT = energyHz.map((_, k) => {
        const k0 = Math.max(0, k - 1);
        const k1 = Math.min(fieldsT.length - 1, k + 1);
        return (-6.62607015e-34 * (energyHz[k1] - energyHz[k0])) / (fieldsT[k1] - fieldsT[k0]);
      });
      const mJ = upper && twoM !== -4 ? '+1/2' : '−1/2';
      const twoMI = mJ === '+1/2' ? twoM - 1 : twoM + 1;
      curves.push({
        id: `F${twoF / 2}m${twoM}`,
        lowLabel: `F=${twoF / 2}, m_F=${m}`,
        highLabel: `m_J=${mJ}, m_I=${twoMI}/2`,
        energyHz,
        momentJT,
      });
    }
  }
  return {
    title: 'Invented J=1/2, I=3/2 ground level',
    fieldUnit: 'mT',
    fieldsT,
    curves,
    markerT: 0.12,
    markerLabel: 'bias coil',
  };
}

function gaussian(x: number, mu: number, sigma: number, h: number): number {
  return h * Math.exp(-0.5 * ((x - mu) / sigma) ** 2);
}

export function patternFixture(): PatternViewData {
  const positionsM = Array.from({ length: 301 }, (_, k) => -3e-3 + (k / 300) * 6e-3);
  const centres = [-2.1e-3, -1.0e-3, 0, 1.0e-3, 2.1e-3];
  const parts = centres.map((c, i) => ({
    id: `m${i}`,
    label: `m_F=${i - 2}`,
    values: positionsM.map((x) => gaussian(x, c, 0.28e-3, 1 - 0.1 * Math.abs(i - 2))),
  }));
  const total = positionsM.map((_, k) => parts.reduce((s, p) => s + p.values[k], 0));
  return {
    title: 'Detector pattern after the selector',
    positionsM,
    total,
    parts,
    peaks: centres.map((c, i) => ({ positionM: c, height: 1 - 0.1 * Math.abs(i - 2), members: [`m_F=${i - 2}`] })),
    verdict: { resolved: true, text: 'adjacent peaks 1.0 mm apart, 2.5 widths' },
  };
}

export function linesFixture(): LinesViewData {
  return {
    title: 'Components of the invented line',
    components: [
      { offsetHz: -42e6, strength: 1, polarization: 'sigma-', label: 'm=1/2 → m′=−1/2' },
      { offsetHz: -14e6, strength: 2, polarization: 'pi', label: 'm=−1/2 → m′=−1/2' },
      { offsetHz: 14e6, strength: 2, polarization: 'pi', label: 'm=1/2 → m′=1/2' },
      { offsetHz: 42e6, strength: 1, polarization: 'sigma+', label: 'm=−1/2 → m′=1/2' },
    ],
  };
}
