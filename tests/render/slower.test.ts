/** The slower view: ideal field and speeds along the slower, rules at B = 0 and where atoms are dropped. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { renderSlower } from '../../server/src/render';
import { diagramFor } from '../../server/src/views/diagram';
import { slowerView } from '../../server/src/views/slowerView';

const TEXT = readFileSync(new URL('../../examples/sodium-slower.sublevel', import.meta.url), 'utf8');

describe('slower view', () => {
  it('draws the ideal field, the resonant speed and the flight, with the zero crossing marked', () => {
    const a = analyze(TEXT);
    const d = diagramFor(a, { view: 'slower', theme: 'export', source: 'sodium-slower.sublevel' });
    expect(d.ok).toBe(true);
    if (!d.ok) return;
    expect(d.title).toBe('Slower main on D2: spin-flip field profile');
    expect(d.svg).toContain('data-view="slower"');
    for (const kind of ['ideal', 'coils', 'resonant', 'flight', 'zero-crossing']) expect(d.svg).toContain(`data-kind="${kind}"`);
    expect(d.svg).not.toContain('data-kind="drop"');
    expect(d.svg).not.toMatch(/NaN|Infinity/);
    const z0 = a.result!.slowers![0]!.zero_crossing_m!;
    expect(d.svg).toContain(`data-z-m="${Number(z0.toPrecision(12))}"`);
    expect(d.csv.split('\n')[1]).toBe('z_m,B_ideal_T,B_coils_T,resonant_speed_m_per_s,needed_deceleration_m_per_s2,flight_speed_m_per_s');
  });

  it('marks where coils drop the atoms and draws their field', () => {
    const s = analyze(TEXT).result!.slowers![0]!;
    const v = slowerView({ ...s, samples: s.samples!.map((x) => ({ ...x, B_coils_T: 0.9 * x.B_ideal_T })), coils: { sources: ['c'], worst_over_design: 2, capture_m_per_s: 900, drop_at_m: 0.3 } })!;
    const svg = renderSlower(v, { kind: 'panel' });
    expect(svg).toContain('data-kind="coils"');
    expect(svg).toMatch(/data-kind="drop" data-z-m="0.3"/);
  });

  it('says plainly when there is no slower', () => {
    const d = diagramFor(analyze('species Na23\n  level g: 3s 2S1/2\n'), { view: 'slower', theme: 'export' });
    expect(d).toEqual({ ok: false, message: expect.stringContaining('No slower to draw') });
  });
});
