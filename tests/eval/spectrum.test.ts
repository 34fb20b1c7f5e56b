/** Line spectra through the whole pipeline: widths from the data, weights, and every bad input in plain words at its place. */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { spectrumSamples } from '../../server/src/eval/spectrumSamples';
import { linesView } from '../../server/src/views/linesView';
import { renderLines } from '../../server/src/render';

const RB = `species Rb87
  level ground: 5s 2S1/2
  level p32: 5p 2P°3/2

field coil = 0.6 T
`;

function run(text: string) {
  const a = analyze(text);
  return { result: a.result!, problems: a.problems, text };
}

/** The problem with this code, and the text its range covers. */
function problem(r: ReturnType<typeof run>, code: string) {
  const p = r.problems.find((x) => x.code === code);
  if (!p) throw new Error(`no ${code} among ${r.problems.map((x) => x.code).join(', ')}`);
  const lines = r.text.split('\n');
  const covered = p.range.start.line === p.range.end.line ? lines[p.range.start.line]!.slice(p.range.start.character, p.range.end.character) : '';
  return { ...p, covered };
}

describe('widths', () => {
  it('natural width from the built-in lifetime (Steck: τ = 26.2348 ns, Γ/2π = 6.0666 MHz) and Doppler width at 310 K', () => {
    const r = run(`${RB}
line D2: ground -> p32
  spectrum = across
  doppler = 310 K
  instrument = 2 MHz
`);
    const s = r.result.lines[0]!.at_fields[0]!.spectrum!;
    expect(s.lifetime_s).toBeCloseTo(26.2348e-9, 15);
    expect(s.lifetime_source).toMatch(/Steck/);
    expect(s.natural_fwhm_Hz! / 1e6).toBeCloseTo(6.06656, 4);
    // ν₀/c √(8 ln2 k_B T/m) with ν₀ = 384.2304844685 THz, m = 86.909180531 u (hand calculation with CODATA 2022 k_B, u).
    expect(s.doppler_fwhm_Hz! / 1e6).toBeCloseTo(519.749, 2);
    expect(s.gamma_Hz).toBeCloseTo(s.natural_fwhm_Hz! / 2, 6);
    // σ² = σ_D² + σ_instrument²
    const sd = s.doppler_fwhm_Hz! / Math.sqrt(8 * Math.LN2);
    const si = 2e6 / Math.sqrt(8 * Math.LN2);
    expect(s.sigma_Hz).toBeCloseTo(Math.hypot(sd, si), 3);
    expect(r.problems.filter((p) => p.code.startsWith('spectrum'))).toEqual([]);
  });

  it('linewidth on a level is the natural FWHM: 5.87 MHz gives τ = 27.113 ns', () => {
    const r = run(`species Li7
  level g: 2s 2S1/2
  level u: 2p 2P°3/2  linewidth = 5.87 MHz
line L: g -> u
  spectrum = across
`);
    const s = r.result.lines[0]!.at_fields[0]!.spectrum!;
    expect(s.lifetime_s! * 1e9).toBeCloseTo(27.1133, 3);
    expect(s.natural_fwhm_Hz).toBeCloseTo(5.87e6, 0);
    expect(s.sigma_Hz).toBe(0);
  });
});

describe('Doppler width from a beam', () => {
  const LI = `species Li7
  level g: 2s 2S1/2
  level u: 2p 2P°3/2

magnet m
  field = 0.1 T
  gradient = 100 T/m
  length = 5 cm

beam B
  level = g
  source = oven 700 K
  slits = 80 um, 50 um apart 40 cm
  magnet = m
  drift = 30 cm
`;

  it('takes the transverse rms speed of the beam (SciPy quadrature over both slits and the flux: voigt.json)', async () => {
    const { readFileSync } = await import('node:fs');
    const ref = JSON.parse(readFileSync(new URL('../reference/voigt.json', import.meta.url), 'utf8')).beam_transverse;
    const r = run(`${LI}\nline L: g -> u\n  spectrum = across\n  doppler = beam B\n`);
    const at = r.result.lines[0]!.at_fields[0]!;
    const s = at.spectrum!;
    expect(s.beam).toBe('B');
    // Same slits, oven and temperature; the reference takes the mass as 7.016 u.
    expect(Math.abs(s.transverse_rms_speed_m_per_s! / ref.transverse_rms_speed - 1)).toBeLessThan(1e-5);
    const nu = r.result.lines[0]!.line_centre_Hz!;
    expect(s.doppler_fwhm_Hz! / ((nu / 299792458) * s.transverse_rms_speed_m_per_s! * Math.sqrt(8 * Math.LN2))).toBeCloseTo(1, 12);
  });

  it('an unknown beam, or one of another species, is said at the beam name', () => {
    const r = run(`${LI}\nline L: g -> u\n  spectrum = across\n  doppler = beam C\n`);
    const p = problem(r, 'spectrum-doppler-beam');
    expect(p.covered).toBe('C');
    expect(p.message).toMatch(/no beam 'C' in this file \(beams: B\)/);
  });
});

describe('what the observer sees', () => {
  const line = (extra: string) => run(`${RB}
line D2: ground -> p32
  doppler = 310 K
${extra}`).result.lines[0]!.at_fields[0]!;

  it('across the field: π at full strength, σ at half (textbook dipole pattern)', () => {
    const at = line('  spectrum = across\n');
    at.components.forEach((c, k) => expect(at.spectrum!.weights[k]).toBeCloseTo(c.polarization === 'pi' ? c.strength : c.strength / 2, 15));
  });

  it('along the field through a σ+ analyser: only σ+ components, at full strength', () => {
    const at = line('  spectrum = along\n  light = sigma+\n');
    at.components.forEach((c, k) => expect(at.spectrum!.weights[k]).toBe(c.polarization === 'sigma+' ? c.strength : 0));
    expect(at.spectrum!.peak_offset_Hz).toBeGreaterThan(0);
  });

  it('the samples integrate to the total observed weight (all components inside the window)', () => {
    const at = line('  spectrum = across\n  points = 20001\n');
    const s = at.spectrum!;
    const { offsetHz, intensity } = spectrumSamples(s, at.components);
    let area = 0;
    for (let i = 1; i < offsetHz.length; i++) area += 0.5 * (intensity[i]! + intensity[i - 1]!) * (offsetHz[i]! - offsetHz[i - 1]!);
    const total = s.weights.reduce((a, b) => a + b, 0);
    // The Lorentzian tails beyond the window (6 Voigt FWHM past the outer components) hold about 2γ/(π·3 GHz).
    expect(area / total).toBeGreaterThan(0.998);
    expect(area / total).toBeLessThan(1);
  });

  it('gives frequencies and wavelengths when the line frequency is known, air only from 200 nm', () => {
    const at = line('  spectrum = across\n');
    const lineHz = run(`${RB}\nline D2: ground -> p32\n  spectrum = across\n`).result.lines[0]!.line_centre_Hz!;
    const smp = spectrumSamples(at.spectrum!, at.components, lineHz);
    expect(smp.vacuumWavelengthM![0]! * 1e9).toBeCloseTo(780.3, 0);
    expect(smp.airWavelengthM![0]!).toBeLessThan(smp.vacuumWavelengthM![0]!);
  });
});

describe('bad input, in plain words at the right place', () => {
  it.each([
    ['0 ns', 'zero'],
    ['-3 ns', 'a negative value'],
  ])('lifetime = %s', (value, words) => {
    const r = run(`${RB.replace('level p32: 5p 2P°3/2', `level p32: 5p 2P°3/2  lifetime = ${value}`)}`);
    const p = problem(r, 'lifetime-not-positive');
    expect(p.severity).toBe('error');
    expect(p.covered).toBe(value);
    expect(p.message).toContain(words);
  });

  it('linewidth = 0 MHz', () => {
    const r = run(RB.replace('level p32: 5p 2P°3/2', 'level p32: 5p 2P°3/2  linewidth = 0 MHz'));
    expect(problem(r, 'lifetime-not-positive').covered).toBe('0 MHz');
  });

  it('both lifetime and linewidth: the lifetime is used, the linewidth is flagged', () => {
    const r = run(`${RB.replace('level p32: 5p 2P°3/2', 'level p32: 5p 2P°3/2  lifetime = 30 ns  linewidth = 6 MHz')}
line D2: ground -> p32
  spectrum = across
`);
    expect(problem(r, 'lifetime-and-linewidth').covered).toBe('6 MHz');
    expect(r.result.lines[0]!.at_fields[0]!.spectrum!.lifetime_s).toBeCloseTo(30e-9, 15);
  });

  it('no lifetime or linewidth for the upper level: said at `spectrum`, drawn with the Gaussian widths', () => {
    const r = run(`species X
  mass = 40 u
  I = 0
  level g: 1S0  energy = 0 Hz
  level u: 3P1  energy = 15000 cm^-1
line L: g -> u
  spectrum = across
  doppler = 300 K
`);
    const p = problem(r, 'spectrum-no-linewidth');
    expect(p.covered).toBe('spectrum = across');
    expect(p.message).toMatch(/level 'u' has no lifetime or natural linewidth/);
    expect(r.result.lines[0]!.at_fields[0]!.spectrum!.gamma_Hz).toBe(0);
  });

  it('no width at all: nothing drawn, and said so', () => {
    const r = run(`species X
  mass = 40 u
  I = 0
  level g: 1S0
  level u: 3P1
line L: g -> u
  spectrum = across
  doppler = 300 K
`);
    expect(problem(r, 'spectrum-no-width').message).toMatch(/no width at all/);
    expect(problem(r, 'spectrum-no-line-frequency').covered).toBe('300 K');
    expect(r.result.lines[0]!.at_fields[0]!.spectrum).toBeUndefined();
  });

  it('π light looked for along the field', () => {
    const r = run(`${RB}\nline D2: ground -> p32\n  spectrum = along\n  light = pi\n`);
    const p = problem(r, 'spectrum-nothing-seen');
    expect(p.covered).toBe('pi');
    expect(p.message).toMatch(/not emitted along the field/);
  });

  it('σ+ asked for across the field: a note that no polariser separates σ+ from σ−', () => {
    const r = run(`${RB}\nline D2: ground -> p32\n  spectrum = across\n  light = sigma+\n`);
    expect(problem(r, 'spectrum-analyser-mixes').severity).toBe('info');
  });

  it('spectrum settings on a line without `spectrum`', () => {
    const r = run(`${RB}\nline D2: ground -> p32\n  doppler = 300 K\n`);
    const p = problem(r, 'spectrum-setting-unused');
    expect(p.covered).toBe('doppler');
  });

  it('a line between different species gets no spectrum (line-across-species)', () => {
    const r = run(`${RB}
species Na23
  level na_p: 3p 2P°3/2
line bad: ground -> Na23.na_p
  spectrum = across
`);
    expect(problem(r, 'line-across-species').message).toMatch(/joins Rb87 and Na23/);
    expect(r.result.lines[0]!.at_fields).toEqual([]);
  });

  it('points out of range, a span that cuts components, and too few samples for the width', () => {
    const bad = run(`${RB}\nline D2: ground -> p32\n  spectrum = across\n  points = 5\n`);
    expect(problem(bad, 'spectrum-points-out-of-range').covered).toBe('5');
    const cut = run(`${RB}\nline D2: ground -> p32\n  spectrum = across\n  span = 2 GHz\n`);
    expect(problem(cut, 'spectrum-span-cuts').covered).toBe('2 GHz');
    const sparse = run(`${RB}\nline D2: ground -> p32\n  spectrum = across\n  points = 11\n`);
    expect(problem(sparse, 'spectrum-undersampled').message).toMatch(/11 samples over .* more than half the line width/);
    // The figure draws the peaks from finer samples of its own and says why, not only the diagnostic.
    const sparseView = linesView(sparse.result.lines[0]!)!;
    expect(sparseView.spectrum!.fine!.offsetHz.length).toBeGreaterThan(11);
    expect(renderLines(sparseView, { kind: 'export' })).toMatch(/curve drawn with \d+ extra samples: the report’s are [\d.]+ [GM]Hz apart, the line [\d.]+ MHz wide/);
    // The figure counts the components the span cuts apart from those too faint for its frame.
    const cutSvg = renderLines(linesView(cut.result.lines[0]!)!, { kind: 'export' });
    const cutOut = cut.result.lines[0]!.at_fields[0]!.components.filter((c, k) => {
      const [a, b] = cut.result.lines[0]!.at_fields[0]!.spectrum!.window_Hz;
      return (c.offset_Hz < a || c.offset_Hz > b) && cut.result.lines[0]!.at_fields[0]!.spectrum!.weights[k]! >= 1e-4 * Math.max(...cut.result.lines[0]!.at_fields[0]!.spectrum!.weights);
    }).length;
    expect(cutOut).toBeGreaterThan(0);
    expect(cutSvg).toContain(`outside the report’s window: ${cutOut} components (its span cuts them), listed in the report`);
  });

  it('with no `points` the samples follow the width: five per FWHM, at least 2001', () => {
    const r = run(`${RB}\nline D2: ground -> p32\n  spectrum = across\n`);
    const s = r.result.lines[0]!.at_fields[0]!.spectrum!;
    expect((s.window_Hz[1] - s.window_Hz[0]) / (s.points - 1)).toBeLessThanOrEqual(s.voigt_fwhm_Hz / 5 + 1);
    expect(r.problems.some((p) => p.code === 'spectrum-undersampled')).toBe(false);
  });
});

describe('the highest point of a spectrum', () => {
  // ³⁹K D1 at 50 G seen across the field in a 330 K cell: 38 components under one 815 MHz Doppler
  // profile; the samples are 5.22 MHz apart. Checked in a walk-through with NumPy (the two levels
  // diagonalised in the |m_J, m_I⟩ basis, SymPy Clebsch–Gordan strengths) and SciPy (wofz sum,
  // minimize_scalar): the maximum is at −44.4759 MHz; the highest sample, at −43.4893 MHz, is not it.
  const at = run(`species K39
  level ground: 4s 2S1/2
  level p12:    4p 2P°1/2
field bias = 50 G
line D1: ground -> p12
  spectrum   = across
  doppler    = 330 K
  instrument = 1 MHz
`).result.lines[0]!.at_fields[0]!;

  it('is refined between the samples, not the highest sample', () => {
    const s = at.spectrum!;
    expect(s.peak_offset_Hz / 1e6).toBeCloseTo(-44.4759, 3);
    const { intensity } = spectrumSamples(s, at.components);
    expect(s.peak_per_Hz).toBeGreaterThanOrEqual(Math.max(...intensity));
  });
});
