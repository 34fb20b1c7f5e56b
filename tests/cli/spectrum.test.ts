/** `sublevel spectrum`: a line's synthesized spectrum as CSV (docs/csv.md). */
import { describe, expect, it } from 'vitest';
import { cli } from './runCli';

describe('sublevel spectrum', () => {
  it('writes the spectrum of the first line that asks for one as CSV, with frequency and wavelength columns', () => {
    const r = cli('spectrum', 'examples/rubidium-spectrum.sublevel');
    expect(r.code).toBe(0);
    const lines = r.out.split('\n');
    expect(lines[0]).toMatch(/^# sublevel spectrum: file=examples\/rubidium-spectrum.sublevel; line=D2; field=field coil 0.6 T; view=across the field, all light; widths=natural 6.067 MHz, Doppler 519.7 MHz at 310 K/);
    // The D2 energy's 6.2 kHz (recalled compilation uncertainty) reaches every absolute cell: said once, with u(λ) = λ u(ν)/ν.
    expect(lines[0]).toContain('; centre=384230484468500 Hz ± 6200 Hz, vacuum 7.80241209686155e-7 m ± 1.25900877093232e-17 m (standard uncertainty shared by every frequency and wavelength cell)');
    expect(lines[1]).toBe('offset_Hz,frequency_Hz,vacuum_wavelength_m,air_wavelength_m,intensity_per_Hz');
    expect(lines.length).toBe(2 + 2001);
    const row = lines[2]!.split(',').map(Number);
    expect(row[2]! * 1e9).toBeCloseTo(780.302, 2);
    expect(row[3]!).toBeLessThan(row[2]!);
    expect(row.every(Number.isFinite)).toBe(true);
  });

  it('says plainly when the file has no spectrum to write', () => {
    const r = cli('spectrum', 'examples/rubidium-bias.sublevel');
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/no line with a spectrum; add `spectrum = across`/);
  });
});
