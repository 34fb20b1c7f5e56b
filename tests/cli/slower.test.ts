/** `sublevel slower`: a slower's profile as text, JSON and CSV (docs/slower.md). */
import { describe, expect, it } from 'vitest';
import { cli } from './runCli';

const FILE = 'examples/sodium-slower.sublevel';

describe('sublevel slower', () => {
  it('prints the profile, length, detuning and cautions as text', () => {
    const r = cli('slower', FILE);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/^slower main on line D2 \(spin-flip \(field through zero\)\)/);
    expect(r.out).toContain('driven pair: F=2, m_F=+2 → F=3, m_F=+3 by σ+ light');
    expect(r.out).toContain('Zeeman shift 1.39984 MHz/G');
    expect(r.out).toMatch(/length 90\.42 cm/);
    expect(r.out).toMatch(/field at the entrance 557\.76 G, at the exit -557\.76 G, through zero at z = 66\.43 cm/);
    expect(r.out).toMatch(/laser detuning from the zero-field line: -831\.695 MHz \(red\)/);
    expect(r.out).toMatch(/Slowing laser at 589 nm/);
    expect(r.out).toMatch(/coils \(zs01, .*, zs20\): catch atoms up to 95\d(\.\d+)? m\/s, need up to [\d.]+ × η a_max; no atoms dropped/);
    expect(r.out).not.toMatch(/NaN|Infinity|undefined/);
  });

  it('writes the profile as CSV: z, ideal field, resonant speed, needed deceleration, flight speed', () => {
    const r = cli('slower', FILE, '--format', 'csv');
    expect(r.code).toBe(0);
    const lines = r.out.split('\n');
    expect(lines[0]).toMatch(/^# sublevel slower: file=examples\/sodium-slower.sublevel; slower=main; line=D2; design=spin_flip; detuning_Hz=-831\d+/);
    expect(lines[1]).toBe('z_m,B_ideal_T,B_coils_T,resonant_speed_m_per_s,needed_deceleration_m_per_s2,flight_speed_m_per_s');
    // 101 uniform samples and 6 more where the fields bend at the exit (physics/slower/zGrid.ts).
    expect(lines).toHaveLength(2 + 107);
    const first = lines[2]!.split(',').map(Number);
    expect(first[0]).toBe(0);
    expect(first[1]).toBeCloseTo(0.0557761, 6);
    expect(Math.abs(first[2]! - first[1]!)).toBeLessThan(20e-4);
    const last = lines.at(-1)!.split(',').map(Number);
    expect(last[1]).toBeCloseTo(-0.0557761, 6);
    expect(last[5]).toBeGreaterThan(25);
    expect(last[5]).toBeLessThan(40);
  });

  it('writes the result as JSON with the diagnostics', () => {
    const r = cli('slower', FILE, '--format', 'json');
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.out) as { slower: { name: string; length_m: number; samples: unknown[] }; diagnostics: unknown[] };
    expect(doc.slower.name).toBe('main');
    expect(doc.slower.length_m).toBeCloseTo(0.90416, 4);
    expect(doc.slower.samples).toHaveLength(107);
  });

  it('eval includes the slower in its report', () => {
    const r = cli('eval', FILE);
    expect(r.code).toBe(0);
    expect(r.out).toContain('slower main on line D2');
  });

  it('says plainly when the file has no slower, or no slower of that name', () => {
    const none = cli('slower', 'examples/rubidium-bias.sublevel');
    expect(none.code).toBe(1);
    expect(none.err).toMatch(/the file has no slower; add a `slower` block/);
    const wrong = cli('slower', FILE, '--slower', 'mian');
    expect(wrong.code).toBe(2);
    expect(wrong.err).toMatch(/no slower named 'mian' — did you mean 'main'\?/);
  });
});
