/**
 * The one wording of the trap findings whose figures the physics core carries (eval/trapIssueText.ts):
 * frequencies with a prefix, fields and gradients in the trap's family, lengths as the region was written.
 * Figures invented for the wording; 1 G/cm = 0.01 T/m and 1 G = 1e-4 T (CGS definitions).
 */
import { describe, expect, it } from 'vitest';
import { trapIssueText } from '../../server/src/eval/trapIssueText';
import { regionLengthUnit } from '../../server/src/eval/trapText';

/** The region unit of a 6 cm region about the origin when the file wrote none: cm by the length rule. */
const CM = regionLengthUnit(0.06, [0, 0, 0]);

describe('trapIssueText', () => {
  it('bias too small: both frequencies with a prefix (the core wrote "1230 Hz")', () => {
    const text = trapIssueText({ severity: 'warning', code: 'trap-bias-too-small', sublevel: '|F=2, m_F=+2⟩', larmorHz: 1234.5, topHz: 56.7, margin: 100 }, { field: 'G', region: CM });
    expect(text).toBe('The bias at the minimum is too small for |F=2, m_F=+2⟩: its Larmor frequency 1.23 kHz is less than 100 × the highest trap frequency 56.7 Hz: Majorana losses.');
  });

  it('gravity: G/cm in the gauss family, T/m with a prefix in the tesla family', () => {
    const g = { severity: 'warning', code: 'trap-gravity-too-strong', sublevel: '|F=2, m_F=+1⟩', needTPerM: 0.305, hasTPerM: 0.21 } as const;
    expect(trapIssueText(g, { field: 'G', region: CM })).toBe('This trap cannot hold |F=2, m_F=+1⟩ against gravity: it needs ≥ 30.5 G/cm along gravity (has 21 G/cm).');
    expect(trapIssueText(g, { field: 'T', region: CM })).toBe('This trap cannot hold |F=2, m_F=+1⟩ against gravity: it needs ≥ 305 mT/m along gravity (has 210 mT/m).');
  });

  it('turning point: 0.122093 T reads 1220.9 G or 122.09 mT (5 digits, as the report line)', () => {
    const t = { severity: 'info', code: 'trap-turning-point', sublevel: '|F=1, m_F=-1⟩', turningFieldT: 0.122093 } as const;
    expect(trapIssueText(t, { field: 'G', region: CM })).toContain('at 1220.9 G, where');
    expect(trapIssueText(t, { field: 'T', region: CM })).toContain('at 122.09 mT, where');
  });

  it('region: lengths in the region line’s unit and 4 digits (written unit, else the length rule)', () => {
    const r = { severity: 'warning', code: 'trap-region-reaches-source', radiusM: 0.06, nearestM: 0.0565685 } as const;
    expect(trapIssueText(r, { field: 'G', region: regionLengthUnit(0.06, [0, 0, 0], 'cm') })).toContain('(radius 6 cm) reaches a conductor 5.657 cm from its centre');
    expect(trapIssueText(r, { field: 'G', region: CM })).toContain('(radius 6 cm) reaches a conductor 5.657 cm from its centre');
    expect(trapIssueText(r, { field: 'G', region: regionLengthUnit(0.06, [0, 0, 0], 'mm') })).toContain('(radius 60 mm) reaches a conductor 56.57 mm from its centre');
  });
});
