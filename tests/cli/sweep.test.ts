import { mkdtempSync, readFileSync, writeFileSync } from 'fs';
import os from 'os';
import path from 'path';
import { describe, expect, it } from 'vitest';
import { cli } from './runCli';

const RB = 'examples/rubidium-bias.sublevel';

describe('sublevel sweep', () => {
  it('writes CSV with one labelled column per state; the zero-field row holds the hyperfine levels', () => {
    const r = cli('sweep', RB, '--level', 'ground', '--to', '1000 G', '--points', '11');
    expect(r.code).toBe(0);
    const rows = r.out.split('\n');
    expect(rows).toHaveLength(13);
    expect(rows[0]).toBe(`# sublevel sweep: file=${RB}; level=Rb87.ground`);
    // field_T, then 8 energies and 8 moments, states sorted by zero-field energy (F=1 first), ties by energy at the top field.
    const header = rows[1]!.split('","');
    // Then one energy_Hz_unc column per state: the built-in A carries its published uncertainty (docs/csv.md).
    expect(header).toHaveLength(24);
    expect(header[16]).toBe('energy_Hz_unc[F=1, m_F=+1 -> m_J=-1/2, m_I=+3/2]');
    expect(header[0]).toBe('field_T,"energy_Hz[F=1, m_F=+1 -> m_J=-1/2, m_I=+3/2]');
    expect(rows[1]).toContain('"energy_Hz[F=2, m_F=+2 -> m_J=+1/2, m_I=+3/2]"');
    expect(rows[1]).toContain('"moment_J_per_T[F=2, m_F=+2 -> m_J=+1/2, m_I=+3/2]"');
    const zero = rows[2]!.split(',').slice(0, 9).map(Number);
    expect(zero[0]).toBe(0);
    // 87Rb ground splitting 6 834 682 610.904 Hz (published measurement): F=2 minus F=1 at zero field.
    expect(Math.max(...zero.slice(1)) - Math.min(...zero.slice(1))).toBeCloseTo(6834682610.904, 2);
    expect(Number(rows[12]!.split(',')[0])).toBeCloseTo(0.1, 15);
    // The stretched state's moment is field-independent: −(g_J/2 + g_I·3/2)·μ_B with g_J = 2.00233113 and
    // g_I = −0.0009951414 (alkali D-line data compilation) and CODATA 2022 μ_B = 9.2740100657e-24 J/T.
    const top = rows[12]!.split(',').map(Number);
    expect(top[16]! / -9.270976100e-24).toBeCloseTo(1, 7);
  });

  it('gives JSON with moments and reads units the way the format does', () => {
    const r = cli('sweep', RB, '--level', 'Rb87.ground', '--from', '-5 mT', '--to', '50 G', '--points', '3', '--format', 'json');
    const doc = JSON.parse(r.out);
    expect(doc.format).toBe('sublevel-sweep');
    expect(doc.field_T).toEqual([-0.005, 0, 0.005]);
    expect(doc.states[0].moment_J_per_T).toHaveLength(3);
    // The crossing search runs only when asked for; its absence is not an empty list.
    expect(doc.version).toBe(2);
    expect(doc).not.toHaveProperty('crossings');
    expect(doc.notes).toEqual([]);
  });

  it('lists the crossings with --crossings, as the NumPy/SciPy reference finds them (Cs 6P3/2, 0 to 1 T)', () => {
    const dir = mkdtempSync(path.join(os.tmpdir(), 'sublevel-crossings-'));
    const file = path.join(dir, 'cs.sublevel');
    writeFileSync(file, 'species Cs133\n  level p32: 6p 2P°3/2\n');
    const r = cli('sweep', file, '--to', '1 T', '--format', 'json', '--crossings');
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.out);
    // scripts/reference/engine_cs6p32.py: 39 crossings, SciPy brentq on NumPy block eigenvalues. Its level
    // rounds g_J to 1.334; the built-in data differ from it in the fourth digit, hence the tolerance.
    const ref = JSON.parse(readFileSync('tests/reference/engine_cs6p32.json', 'utf8')) as { crossings: { fieldT: number }[] };
    expect(doc.crossings).toHaveLength(ref.crossings.length);
    doc.crossings.forEach((c: { field_T: number }, k: number) => expect(Math.abs(c.field_T / ref.crossings[k]!.fieldT - 1)).toBeLessThan(1e-3));
  });

  it('refuses --crossings for CSV, which has no place for them', () => {
    const r = cli('sweep', RB, '--level', 'ground', '--to', '1 T', '--crossings');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--crossings lists the crossings in the JSON document; add --format json/);
  });

  it.each([
    [['--level', 'grund', '--to', '0.1 T'], /did you mean 'ground'/],
    [['--level', 'ground', '--to', '0.1'], /--to needs a unit/],
    [['--level', 'ground', '--to', '0.1 T/m'], /--to needs/],
    [['--level', 'ground', '--to', '0 T'], /same field/],
    [['--level', 'ground', '--to', '1 T', '--points', '1'], /at least 2/],
    [['--level', 'ground', '--to', '1 T', '--points', '1000000000'], /more than the 200001/],
    [['--level', 'ground', '--to', '1 T', '--points', '1e3'], /decimal digits, got '1e3'/],
    [['--level', 'ground', '--to', '1 T', '--points', '0x10'], /decimal digits, got '0x10'/],
    [['--level', 'ground', '--to', '1e30 T'], /outside the fields Sublevel computes \(\|B\| up to 1e5 T\)/],
    [['--level', 'ground', '--to', '1 T', '--from', '-2e5 T'], /--from -2e5 T is outside/],
    [['--level', 'ground', '--to', '1e400 T'], /the number 1e400 is too large/],
    [['--to', '1 T'], /needs --level, one of: Rb87.ground, Rb87.p32/],
  ])('rejects %j with a usage error', (opts, message) => {
    const r = cli('sweep', RB, ...opts);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(message);
  });
});

describe('sublevel sweep with uncertain constants', () => {
  it('adds one energy_Hz_unc column per state; at zero field u(E_F) = |∂E_F/∂A| u(A) (GUM, linear in A)', async () => {
    const { mkdtempSync, writeFileSync } = await import('node:fs');
    const { join } = await import('node:path');
    const { tmpdir } = await import('node:os');
    const file = join(mkdtempSync(join(tmpdir(), 'sweep-unc-')), 'li.sublevel');
    writeFileSync(file, 'species Li7\n  level ground: 2s 2S1/2  A = 401.7520433(5) MHz\n');
    const r = cli('sweep', file, '--to', '0.1 T', '--points', '3');
    expect(r.code).toBe(0);
    const rows = r.out.split('\n');
    const header = rows[1]!.split('","');
    // field_T, 8 energies, 8 moments, 8 uncertainties.
    expect(header).toHaveLength(24);
    expect(rows[1]).toContain('"energy_Hz_unc[F=1, m_F=+1 -> m_J=-1/2, m_I=+3/2]"');
    const zero = rows[2]!.split(',').map(Number);
    // E(F=1) = −5/4 A, E(F=2) = +3/4 A at zero field (interval rule, textbook): u = 0.625 Hz and 0.375 Hz.
    expect(zero.slice(17, 20).every((u) => Math.abs(u - 0.625) < 1e-9)).toBe(true);
    expect(zero.slice(20, 25).every((u) => Math.abs(u - 0.375) < 1e-9)).toBe(true);
  });
});

describe('sweep picks its level as every command does', () => {
  it('a bare name two species share is ambiguous in the words render uses; the qualified name picks one', () => {
    const dir = mkdtempSync(path.join(os.tmpdir(), 'sublevel-sweep-level-'));
    const file = path.join(dir, 'two.sublevel');
    // Invented species: two hand-made atoms with a level of the same name.
    writeFileSync(file, 'species A\n  mass = 20 u\n  level g: 2S1/2\nspecies B\n  mass = 30 u\n  level g: 3P2\n');
    const sweep = cli('sweep', file, '--level', 'g', '--to', '10 G', '--points', '3');
    const render = cli('render', file, '--level', 'g');
    expect(sweep.code).toBe(2);
    expect(sweep.err).toContain("level 'g' is ambiguous; write one of A.g, B.g");
    expect(render.err).toContain("level 'g' is ambiguous; write one of A.g, B.g");
    expect(cli('sweep', file, '--level', 'B.g', '--to', '10 G', '--points', '3').code).toBe(0);
    expect(cli('sweep', file, '--level', 'h', '--to', '10 G', '--points', '3').err).toContain("no level named 'h'");
  });
});
