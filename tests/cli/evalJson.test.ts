import Ajv2020 from 'ajv/dist/2020';
import { readFileSync } from 'fs';
import { describe, expect, it } from 'vitest';
import { cli } from './runCli';

const schema = JSON.parse(readFileSync('docs/schema/evaluation.schema.json', 'utf8'));
const validate = new Ajv2020({ allErrors: true, strict: true }).compile(schema);

function evalJson(file: string) {
  const r = cli('eval', file, '--format', 'json');
  return { code: r.code, doc: JSON.parse(r.out) };
}

describe('sublevel eval --format json', () => {
  it.each(['lithium-beam', 'rubidium-bias', 'handmade-species', 'mistakes', 'fit-rubidium'])('%s validates against the published JSON Schema', (f) => {
    const { doc } = evalJson(`examples/${f}.sublevel`);
    const ok = validate(doc);
    expect(validate.errors ?? []).toEqual([]);
    expect(ok).toBe(true);
  });

  it('gives the 87Rb ground hyperfine interval and g_F values', () => {
    const { code, doc } = evalJson('examples/rubidium-bias.sublevel');
    expect(code).toBe(0);
    const ground = doc.levels.find((l: { level: string }) => l.level === 'ground');
    // 6 834 682 610.904 Hz: published 87Rb ground-state hyperfine splitting (alkali D-line data compilation for Rb-87).
    expect(ground.hyperfine.intervals[0].interval_Hz).toBeCloseTo(6834682610.904, 2);
    // g_F = ±1/2 · (g_J ∓ ...) ≈ -0.50182671 and +0.49983643 (same compilation lists -0.50182670 and 0.49983642; from memory).
    expect(ground.hyperfine.levels[0].g_F).toBeCloseTo(-0.5018267, 6);
    expect(ground.hyperfine.levels[1].g_F).toBeCloseTo(0.4998364, 6);
    expect(ground.sublevel_count).toBe(8);
  });

  it('reports linear energies m_F g_F μ_B B at the named fields', () => {
    const { doc } = evalJson('examples/rubidium-bias.sublevel');
    const ground = doc.levels.find((l: { level: string }) => l.level === 'ground');
    const trap = ground.at_fields.find((f: { source: { name: string } }) => f.source.name === 'trap');
    expect(trap.field_T).toBeCloseTo(3.23e-4, 15);
    const top = trap.linear.find((s: { label: string }) => s.label === 'F=2, m_F=+2');
    // μ_B/h = 13 996 244 917.1 Hz/T (CODATA 2022).
    const expected = ground.hyperfine.levels[1].shift_Hz + 2 * ground.hyperfine.levels[1].g_F * 13996244917.1 * 3.23e-4;
    expect(top.energy_Hz).toBeCloseTo(expected, 0);
  });
});
