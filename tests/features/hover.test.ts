import { describe, expect, it } from 'vitest';
import { hover } from '../../server/src/features/hover';
import { ATOMIC_MASS_UNIT } from '../../server/src/physics/constants';
import { atCursor, hoverText, plain } from './helpers';

interface Case {
  name: string;
  text: string;
  /** Fragments the plain hover text must contain. */
  has: string[];
  hasNot?: string[];
}

const LI = 'species Li7\n  level ground: 2s 2S1/2\n  level upper:  2p 2P°3/2  A = -3.055 MHz  B = -0.221 MHz\n';

const CASES: Case[] = [
  {
    name: 'term symbol: Landé g_J with CODATA g_s, the exact fraction, allowed J, sublevels, parity',
    // Landé formula (textbook) with g_s = |g_e| = 2.00231930436092 (CODATA 2022), g_L = 1:
    // 2P3/2: g_J = 2/3 + g_s/3 = 1.3341064; exactly 4/3 with g_s = 2.
    text: 'species Demo\n  mass = 40 u\n  level p: 3p 2P°3/|2\n',
    has: ['²P°₃/₂', '3p', 'odd parity', 'g_J = 1.334106', 'exactly 4/3 with g_s = 2', 'allows J = 1/2, 3/2', '4 sublevels (2J+1)'],
  },
  {
    name: 'term with a nucleus counts (2J+1)(2I+1) sublevels',
    // Li-7 has I = 3/2 (built-in table, IAEA nuclear moments table).
    text: `species Li7\n  level g: 2s 2S1|/2\n`,
    has: ['8 sublevels: (2J+1)(2I+1) = 2 × 4 with I = 3/2', 'even parity', 'exactly 2 with g_s = 2'],
  },
  {
    name: 'level name: hyperfine F levels, g_F and the splitting',
    // Li-7 2s A = 401.752 MHz (Arimondo, Inguscio & Violino 1977) → ΔE(F=1↔2) = 2A = 803.504 MHz.
    text: `species Li7\n  level gro|und: 2s 2S1/2\n`,
    // The built-in A carries its uncertainty (0.5 kHz; from memory of the same review), so does 2A.
    has: ['Hyperfine structure', 'A = 401.75204330(50) MHz', 'F = 1 ↔ 2: 803.5040866(10) MHz', '| F | E/h at zero field | g_F |'],
  },
  {
    name: 'sodium ground splitting from the built-in A',
    // Steck, Sodium D Line Data: ground-state splitting 1.771 626 128 8 GHz = 2A, u = 2 u(A) = 1.0 Hz.
    text: 'species Na23\n  level |g: 3s 2S1/2\n',
    has: ['F = 1 ↔ 2: 1.7716261288(10) GHz'],
  },
  {
    name: 'a nucleus without A: each m_J sublevel splits into 2I + 1 by g_I',
    text: 'species Demo\n  mass = 40 u\n  I = 1\n  g_I = 0.0001\n  level |x: 3d 2D5/2\n',
    has: ['no hyperfine constants for this level (I = 1)', 'each m_J sublevel splits into 3'],
  },
  {
    name: 'impossible J: the J values the term allows',
    text: 'species Na23\n  level upper: 3p 2P°5|/2\n',
    has: ['the term is not valid: ', 'nothing is computed for this level yet', '2P (S = 1/2, L = 1) allows J = 1/2, 3/2'],
  },
  {
    name: 'a wrong configuration is named as the wrong part, not the term',
    text: 'species Na23\n  level upper: 3s3 3p 2P°3|/2\n',
    has: ['the configuration is not valid: 3s holds at most 2 electrons'],
    hasNot: ['the term is not valid'],
  },
  {
    name: 'the run-together form of the built-in designation is a valid level (4f14 6s6p)',
    // Yb 4f14 6s6p 3P°1: g_J = 3/2 in LS coupling with g_s = 2 (Landé formula, textbook).
    text: 'species Yb174\n  level meta: 4f14 6s6p 3P°|1\n',
    has: ['³P°₁', 'odd parity', 'exactly 3/2 with g_s = 2'],
    hasNot: ['not valid'],
  },
  {
    name: 'field: other units, Zeeman scale and the sublevel table',
    // 1 G = 1e-4 T (definition of the gauss). μ_B/h = 13.996 244 171 GHz/T (CODATA 2022) → 5 G: 6.998122 MHz.
    text: `${LI}field bi|as = 5 G\n`,
    has: ['field bias', '= 5 G = 500 µT', 'μ_B·B/h = 6.998122 MHz', 'Li7 ground', 'F=2, m_F=+2'],
  },
  {
    name: 'unit echo: a field is shown first in the unit written (250 G = 25 mT by the definition of the gauss)',
    text: `${LI}field bi|as = 250 G\n`,
    has: ['= 250 G = 25 mT'],
    hasNot: ['= 25 mT = 250 G'],
  },
  {
    name: 'unit echo: a magnet written in kG and G/cm keeps those units (50 G/cm = 0.5 T/m)',
    text: `${LI}magnet sel|ector\n  field = 2 kG\n  gradient = 50 G/cm\n  length = 80 mm\n`,
    has: ['field = 2 kG = 200 mT', 'gradient = 50 G/cm = 500 mT/m', 'length = 80 mm = 0.08 m'],
  },
  {
    name: 'a dotted configuration and an o parity mark are shown space-separated with °',
    text: 'species Li7\n  level g: 1s2.2s 2S1/2\n  level e: 1s2.2p 2Po3/2\nline D|2: g -> e\n',
    has: ['lower: g — 1s2 2s ²S₁/₂', 'upper: e — 1s2 2p ²P°₃/₂'],
    hasNot: ['1s2.2s', '2Po3/2'],
  },
  {
    name: 'field value: the quantity in other units and the field',
    text: `${LI}field bias = 5| G\n`,
    has: ['5 G = 500 µT', 'Zeeman scale'],
  },
  {
    name: 'magnet: field, gradient and length in other units; force on one Bohr magneton',
    // 180 T/m = 18 000 G/cm (1 G = 1e-4 T, 1 cm = 1e-2 m); μ_B·180 T/m = 1.6693e-21 N (μ_B from CODATA 2022).
    text: `${LI}magnet sel|ector\n  field = 0.45 T\n  gradient = 180 T/m\n  length = 8 cm\n`,
    has: ['magnet selector', 'field = 0.45 T = 4.5 kG', '180 T/m = 18000 G/cm', '1.6693e-21 N', 'length = 8 cm = 0.08 m', 'Li7 upper'],
  },
  {
    name: 'magnet built from sources: field and gradient of |B| where the beam line passes',
    // Two long opposite currents ±900 A at y = ±2 mm; on their mid-plane |B| = μ0 I a/π(a² + z²) and
    // ∂|B|/∂z = −2 μ0 I a z/π(a² + z²)² = −55.296 T/m at z = 1.5 mm (superposition of two infinite wires, textbook).
    text: 'wire rails\n  current = 900 A\n  through = 0, 2, 0 mm\n  direction = x\n  return = 0, -2, 0 mm\nmagnet sel|ector\n  sources = rails\n  length = 8 cm\n  at = 0, 0, 1.5 mm\n',
    has: ['magnet selector', 'built from rails', 'the beam flies through their field', '-55.296 T/m', 'length = 8 cm'],
  },
  {
    name: 'magnet without settings says what is missing',
    text: 'magnet emp|ty\n',
    has: ['field: not given', 'gradient: not given', 'length: not given'],
  },
  {
    name: 'line: its levels, ΔJ, frequency and vacuum wavelength from the level energies',
    // Steck, Sodium D Line Data: D2 at 508.848 716 2 THz, vacuum wavelength 589.158 326 4 nm.
    text: 'species Na23\n  level g: 3s 2S1/2\n  level e: 3p 2P°3/2\nline D|2: g -> e\n',
    has: ['line D2 in Na23', 'lower: g — 3s ²S₁/₂ (J = 1/2, even)', 'upper: e — 3p ²P°₃/₂ (J = 3/2, odd)', 'ΔJ = +1', 'ν = 508.8487162(13) THz', '589.1583263(15) nm'],
  },
  {
    name: 'a reference in a line hovers the level it names',
    text: 'species Na23\n  level g: 3s 2S1/2\n  level e: 3p 2P°3/2\nline D2: g -> |e\n',
    has: ['level e of Na23', '²P°₃/₂'],
  },
  {
    name: 'a reference in a beam hovers the magnet it names',
    text: 'magnet sel\n  field = 1 T\nbeam b\n  magnet = s|el\n',
    has: ['magnet sel', 'field = 1 T'],
  },
  {
    name: 'species: built-in data with sources',
    text: 'species Rb8|7\n',
    has: ['built-in data (Rb87)', 'I = 3/2', 'g_I = ', 'μ_I = ', 'built-in levels: 5s 2S1/2'],
  },
  {
    name: 'wave number in frequency and energy',
    // 1 cm^-1 = c·100 m^-1 = 29.979 245 8 GHz (exact SI); h·29.9792458 GHz = 123.984 198 µeV (exact SI h and e).
    text: 'species Demo\n  mass = 40 u\n  level x: 3s 2S1/2  energy = 1 cm^|-1\n',
    has: ['29.97925 GHz', '123.9842 µeV'],
  },
  {
    name: 'temperature in kelvin and degrees Celsius',
    // 0 °C = 273.15 K (SI definition).
    text: 'beam b\n  source = oven 720 |K\n',
    has: ['720 K = 446.85 °C'],
  },
  {
    name: 'setting key: what it means',
    text: 'magnet m\n  gra|dient = 180 T/m\n',
    has: ['gradient — field gradient across the beam'],
  },
  {
    name: 'a setting key whose description carries an example: the example is marked as one, not read as the file\'s value',
    text: 'species K39\n  level g: 4s 2S1/2\n  level p: 4p 2P°1/2\nline D1: g -> p\n  spectrum = across\n  dop|pler = 330 K\n',
    has: ['Doppler width from a gas temperature (e.g. 310 K)'],
    hasNot: ['temperature (310 K)'],
  },
  {
    name: 'block word: what the block is for',
    text: 'mag|net m\n',
    has: ['magnet — a state-selecting magnet'],
  },
  {
    name: 'trap name: the summary, the trapped sublevels and their depth (docs/traps.md)',
    // A 1000 A-turn anti-Helmholtz pair (R = 4 cm at ±4 cm): 41.7 G/cm on the axis, holds ⁸⁷Rb |2,+2⟩ (needs 15.3 G/cm).
    text: 'species Rb87\n  level ground: 5s 2S1/2\ncoil quad\n  radius = 4 cm\n  turns = 100\n  current = 10 A\n  spacing = 8 cm\n  sense = opposite\ntrap q|t\n  sources = quad\n  level = ground\n',
    has: ['trap qt — Rb87.ground; sources quad', 'trapped: |F=1, m_F=-1⟩, |F=2, m_F=+1⟩, |F=2, m_F=+2⟩', '|F=2, m_F=-2⟩ | not low-field seeking', 'linear (no harmonic frequency)', '15.27 G/cm'],
    hasNot: ['NaN', 'undefined'],
  },
  {
    name: 'trap name with a temperature and a cut: the RF cut, the Majorana estimate and the safety cautions (docs/traps.md)',
    // The same pair at 20 A: 83.3 G/cm on the axis. The RF cut of |2,+2⟩ at 2 mK: the linear rule
    // ν = cut/(m_F h) = k_B·2 mK/(2h) = 20.84 MHz (CODATA k_B and h; exact SI constants).
    text: 'species Rb87\n  level ground: 5s 2S1/2\ncoil quad\n  radius = 4 cm\n  turns = 100\n  current = 20 A\n  spacing = 8 cm\n  sense = opposite\ntrap q|t\n  sources = quad\n  level = ground\n  temperature = 200 uK\n  cut = 2 mK\n',
    // One unit per trap (eval/trapText.ts trapFieldUnit): its region's |B| stays below 0.1 T, so gauss.
    has: ['|F=2, m_F=+2⟩: |B| at the minimum 0 G', 'linear rule 20.83662 MHz', 'Majorana loss ≈', '⚠ Trap coils dissipate power and heat up', "follow your lab's safety rules"],
    hasNot: ['NaN', 'undefined'],
  },
];

describe('hover', () => {
  for (const c of CASES) {
    it(c.name, () => {
      const { analysis, position } = atCursor(c.text);
      const md = hoverText(hover(analysis, position));
      const text = plain(md);
      for (const fragment of c.has) expect(text, `hover text:\n${text}`).toContain(fragment);
      for (const fragment of c.hasNot ?? []) expect(text).not.toContain(fragment);
    });
  }

  it('escapes Markdown in names: no link, emphasis or HTML survives', () => {
    const { analysis, position } = atCursor('species *x*\n  mass = 40 u\n  level |[a](x)<b>: 2S1/2\n');
    const md = hoverText(hover(analysis, position));
    expect(md).toContain('\\[a\\]\\(x\\)\\<b\\>');
    expect(md).toContain('\\*x\\*');
    expect(md).not.toMatch(/[^\\]\[a\]/);
  });

  it('gives nothing on blank space and in comments', () => {
    for (const t of ['species Li7\n|\n', 'species Li7  # a co|mment\n', '|']) {
      const { analysis, position } = atCursor(t);
      expect(hover(analysis, position)).toBeNull();
    }
  });

  it('ranges the hover to the word under the cursor', () => {
    const { analysis, position } = atCursor('field bias = 5| G\n');
    expect(hover(analysis, position)?.range).toEqual({ start: { line: 0, character: 13 }, end: { line: 0, character: 16 } });
  });

  it('limits the sublevel table to the configured number of rows', () => {
    const { analysis, position } = atCursor('species Cs133\n  level g: 6s 2S1/2\nfield f|ield = 1 G\n');
    const text = plain(hoverText(hover(analysis, position, { sublevelRows: 3, levelTables: 4 })));
    expect(text).toContain('… and 13 more sublevels');
  });
});

describe('hover on a whole term with fine structure', () => {
  it('shows its J levels with the Landé interval rule and g_J', () => {
    // Landé interval rule (textbook): E_J = ζ/2 [J(J+1) − L(L+1) − S(S+1)]; for ²P the 1/2 ↔ 3/2 interval is 3ζ/2.
    // ζ = 6.70 GHz → E(1/2) = −ζ = −6.7 GHz, E(3/2) = ζ/2 = 3.35 GHz, interval 10.05 GHz.
    // Landé g_J with g_s = |g_e| (CODATA 2022), g_L = 1: ²P₁/₂ = 4/3 − g_s/3 = 0.6658936, ²P₃/₂ = 2/3 + g_s/3 = 1.3341064.
    const { analysis, position } = atCursor('species Li7\n  level p|: 2p 2P°  zeta = 6.70 GHz\n');
    const text = plain(hoverText(hover(analysis, position)));
    expect(text).toContain('²P° term');
    expect(text).toContain('J = 1/2 ↔ 3/2: 10.05 GHz');
    expect(text).toContain('| 1/2 | -6.7 GHz | 0.6658936 |');
    expect(text).toContain('| 3/2 | 3.35 GHz | 1.334106 |');
  });
});

describe('hover on lines and resonances', () => {
  const RB = 'species Rb87\n  level ground: 5s 2S1/2\n  level p32: 5p 2P°3/2\nfield trap = 3.23 G\n';

  it('lists a line’s Zeeman components, strongest first, with g_eff', () => {
    // Stretched D2 components (F=2, m_F=±2 → F'=3, m_F=±3) have branching fraction 1 (textbook angular momentum).
    const { analysis, position } = atCursor(`${RB}line D|2: ground -> p32\n`);
    const text = plain(hoverText(hover(analysis, position)));
    expect(text).toContain('effective Landé factor g_eff = 1.16967');
    expect(text).toContain('68 components at field trap (3.23 G), strongest first');
    // At 3.23 G the 5P3/2 hyperfine structure (tens of MHz) is already past its linear range
    // (the regime verdict says intermediate), so upper states carry both labels.
    expect(text).toMatch(/\| σ[−+] \| F=2, m_F=[-+]2 → F=3, m_F=[-+]3 \/ m_J=[-+]3\/2, m_I=[-+]3\/2 \| \S+ GHz \| 1 \|/);
    expect(text).toContain('labels: ground low-field |F, m_F>; p32 low-field / strong-field (intermediate field)');
  });

  it('leads with the answer: the line centre is on the title line', () => {
    const { analysis, position } = atCursor(`${RB}line D|2: ground -> p32\n`);
    const first = plain(hoverText(hover(analysis, position))).split('\n')[0]!;
    // Steck, Rubidium 87 D Line Data: D2 at 384.230 484 468 5 THz, vacuum wavelength 780.241 209 686 nm.
    // Both carry the D2 energy's 6.2 kHz (recalled compilation uncertainty); u(λ) = λ u(ν)/ν.
    expect(first).toMatch(/^line D2 in Rb87 — ν = 384\.2304844685\(62\) THz, vacuum wavelength 780\.24120968\d*\(\d+\) nm/);
  });

  it('two working fields of the same value share one component table', () => {
    const two = 'species Rb87\n  level ground: 5s 2S1/2\n  level p32: 5p 2P°3/2\nfield f1 = 500 G\nfield f2 = 500 G\n';
    const { analysis, position } = atCursor(`${two}line D|2: ground -> p32\n`);
    const text = plain(hoverText(hover(analysis, position)));
    expect(text).toContain('68 components at field f1 and field f2 (500 G), strongest first');
    expect(text.match(/components at/g)).toHaveLength(1);
  });

  it('in a strong field the decoupled |m_J, m_I> labels name the states, without the linear column', () => {
    // Na 3p 2P3/2 (A ≈ 18.5 MHz, Steck) at 1 T: μ_B·B/h ≈ 14 GHz ≫ hyperfine spread: Paschen–Back.
    const { analysis, position } = atCursor('species Na23\n  level upper: 3p 2P°3/2\nfield str|ong = 1 T\n');
    const text = plain(hoverText(hover(analysis, position)));
    expect(text).toContain('regime: strong field');
    expect(text).toContain('| state (strong-field label) | E/h exact | μ/μ_B |');
    expect(text).toMatch(/\| m_J=\+3\/2, m_I=\+3\/2 \| /);
    expect(text).not.toContain('linear formula |');
  });

  it('in the weak-field regime the low-field labels and the linear column stay', () => {
    const { analysis, position } = atCursor('species Rb87\n  level ground: 5s 2S1/2\nfield we|ak = 100 mG\n');
    const text = plain(hoverText(hover(analysis, position)));
    expect(text).toContain('regime: weak field (linear)');
    expect(text).toContain('| state (low-field label) | E/h exact | E/h linear formula | μ/μ_B |');
    expect(text).not.toContain('strong-field label');
  });

  it('at 1 nT the sublevels of one F level read apart (enough digits for a ~14 Hz splitting on GHz)', () => {
    // Rb-87 ground at 1 nT (invented field): m_F of F = 2 lie μ_B·B·g_F/h ≈ 7 Hz apart around +2.563 GHz.
    const { analysis, position } = atCursor('species Rb87\n  level ground: 5s 2S1/2\nfield ti|ny = 1 nT\n');
    const text = plain(hoverText(hover(analysis, position)));
    // Both the exact and the linear-formula column (which carries no uncertainty to lengthen it).
    const rows = [...text.matchAll(/\| F=2, m_F=[+-]?\d \| ([^|]+) \| ([^|]+) \|/g)];
    expect(rows).toHaveLength(5);
    for (const col of [1, 2]) {
      const values = rows.map((m) => m[col]!.trim());
      expect(new Set(values).size).toBe(5);
      expect(values.every((t) => /^2\.56300\d+(\(\d+\))? GHz$/.test(t))).toBe(true);
    }
  });

  it('an intermediate field shows both labels and drops the linear column; thresholds to 3 digits', () => {
    const { analysis, position } = atCursor('species Rb87\n  level ground: 5s 2S1/2\nfield mi|d = 500 G\n');
    const text = plain(hoverText(hover(analysis, position)));
    expect(text).toContain('| low-field label | strong-field label | E/h exact | μ/μ_B |');
    expect(text).toContain('| F=2, m_F=+2 | m_J=+1/2, m_I=+3/2 |');
    expect(text).toMatch(/below \d+(\.\d)? G; strong-field formula within it above \d\.\d\d T/);
  });

  it('shows the field-insensitive point of a two-photon pair', () => {
    // Rb-87 ground-state two-photon pair |1,−1> ↔ |2,+1>: field-insensitive at 3.228917(3) G
    // (published trapped-atom clock measurement, Phys. Rev. A 66, 053616 (2002); from memory).
    const { analysis, position } = atCursor(`${RB}resonance cl|ock\n  level = ground\n  lower = 1 -1\n  upper = 2 +1\n  range = 0 G, 10 G\n`);
    const text = plain(hoverText(hover(analysis, position)));
    // The built-in A carries its published uncertainty, so both numbers may print as value(unc).
    expect(text).toMatch(/field-insensitive point: 3\.2289\d*(\(\d+\))? G at 6\.83467\d*(\(\d+\))? GHz/);
    expect(text).toContain('two-photon | F=1, m_F=-1 → F=2, m_F=+1');
    // The answer leads, before the range searched and the tables.
    expect(text.split('\n').slice(0, 3).join('\n')).toMatch(/^resonance clock of Rb87 ground\s*\nfield-insensitive point: 3\.2289/);
  });

  it('says when the range holds no field-insensitive point, as the CLI does; counts are singular when one', () => {
    // The pair |1,0> ↔ |2,0> has df/dB = 0 only at B = 0 (quadratic shift), not inside 1 G to 2 G.
    const { analysis, position } = atCursor(
      'species Rb87\n  level ground: 5s 2S1/2\nfield trap = 3.23 G\nresonance cl|ock\n  level = ground\n  lower = 1 0\n  upper = 2 0\n  range = 1 G, 2 G\n',
    );
    const text = plain(hoverText(hover(analysis, position)));
    expect(text).toContain('no field-insensitive point in the range');
    expect(text).toContain('searched 1 G to 2 G');
    // The chosen pair is one transition at the working field: "1 transition", not "1 transitions".
    expect(text).toContain('1 transition at field trap (3.23 G)');
  });
});

describe('hover on a beam', () => {
  it('shows the deflection of each sublevel and the verdict', () => {
    const text =
      'species Li7\n  level ground: 2s 2S1/2\nmagnet sel\n  field = 1 T\n  gradient = 100 T/m\n  length = 10 cm\n' +
      'beam b|\n  species = Li7\n  level = ground\n  source = speed 1000 m/s\n  slits = 10 um, 10 um apart 50 cm\n  magnet = sel\n  drift = 50 cm\n  detector = 10 um\n';
    const { analysis, position } = atCursor(text);
    const shown = plain(hoverText(hover(analysis, position)));
    expect(shown).toContain('source: single speed 1000 m/s');
    expect(shown).toMatch(/At the detector: 4 peaks, not all resolved\. Worst dip now \d+ % \(resolved at ≤ 80 %\); computed on this setup: a gradient of \d+ T\/m gives \d+ % and resolves every pair/);
    // Single speed, hard-edged magnet (textbook kinematics): z = μ b / (m v²) · (L²/2 + L·D), with the moment the
    // evaluation reports for |F=1, m_F=+1> and the Li-7 mass 7.016003437 u (built-in, NIST masses; u from CODATA 2022).
    const s = analysis.result!.beams[0]!.sublevels[0]!;
    const z = ((s.moment_J_per_T * 100) / (7.016003437 * ATOMIC_MASS_UNIT * 1000 ** 2)) * (0.1 ** 2 / 2 + 0.1 * 0.5);
    expect(s.mean_deflection_m / z).toBeCloseTo(1, 6);
    // At 1 T the Li-7 ground level (hyperfine 803.5 MHz ≪ μ_B·B/h ≈ 14 GHz) is decoupled: its
    // |F=1, m_F=+1> is |m_J=-1/2, m_I=+3/2> (adiabatic connection, m_F = m_J + m_I).
    // The moment and deflection carry the built-in constants' uncertainties (A, g_J, g_I of Li-7).
    expect(shown).toContain(`| m_J=-1/2, m_I=+3/2 | 1.00262417(35) | 0.125 | ${(z * 1000).toPrecision(8)}(15) mm |`);
    expect(shown).toContain('| sublevel (strong-field label) |');
    // Each peak names its sublevels.
    expect(shown).toMatch(/\| 4\.39 mm \| \S+ µm \| m_J=-1\/2, m_I=\+3\/2 \|/);
    // The cautions in one line that fits the setup (no oven here, so no hot-oven caution).
    const caution = shown.split('\n').filter((l) => l.startsWith('⚠'));
    expect(caution).toEqual(["⚠ Strong magnet (1 T at the beam) · Alkali metal (Li) · Vacuum: follow your lab's safety rules (full cautions in the eval report)"]);
    // The detector width in a unit read at a glance, not 0.00001 m.
    expect(shown).toMatch(/detector = 10 µm\s*\n/);
    expect(shown).not.toContain('0.00001 m');
  });
});
