/** One line on what a setting key or block word means and which units it takes. */
import type { BlockKind } from '../../format/ast';
import { mdTitle } from '../shared/markdown';

const BLOCK_WORDS: Record<BlockKind, string> = {
  species: 'an atom or ion: a built-in name (mass, spin and level data from published sources) or your own name with its own data',
  field: 'a named working field; every level is evaluated at it',
  magnet: 'a state-selecting magnet: the field at the beam, its gradient and its length',
  beam: 'an atomic beam: species, level, source, slits, magnet, drift and detector',
  line: 'an electric-dipole line between two levels of one species',
  resonance: 'magnetic-dipole (RF/microwave) transitions between the sublevels of one level: frequencies, field sensitivity, field-insensitive points and resonance fields',
  settings: 'file-wide choices: g_s (exact or 2) and reduced_mass (on or off)',
  data: 'measured points: resonance frequencies or level intervals of a pair of sublevels, or a detector profile; written here or read from a CSV file beside the setup',
  fit: 'a weighted least-squares fit of data on the exact engine: which parameters are free and where they start',
};

const LEVEL_KEYS: Record<string, string> = {
  A: 'magnetic-dipole hyperfine constant — a frequency (MHz), wave number (cm^-1) or energy (eV)',
  B: 'electric-quadrupole hyperfine constant — acts only when I ≥ 1 and J ≥ 1',
  C: 'magnetic-octupole hyperfine constant — acts only when I ≥ 3/2 and J ≥ 3/2',
  g_J: 'measured g_J; it replaces the Landé value in the energies, and the Landé value is still shown',
  energy: 'the level energy above the ground level, used for line frequencies',
  lifetime: 'radiative lifetime τ of the level: the natural width Γ/2π = 1/(2πτ) of lines to it',
  linewidth: 'natural linewidth Γ/2π (FWHM) of the level, instead of lifetime',
  zeta: 'spin–orbit constant ζ of a term written without J; all its J levels are then computed together, from weak field to Paschen–Back',
  A_J: 'hyperfine A of each J level of a term written without J: `A_J = 1/2 46 MHz, 3/2 -3.06 MHz`; the term is then computed with its hyperfine coupling inside and between the J levels',
  B_J: 'quadrupole B of J levels of a term written without J: `B_J = 3/2 -0.22 MHz`',
  r2: 'mean square radius ⟨r²⟩ of the valence electron (e.g. `r2 = 27 a0^2`) on a term written without J: adds the diamagnetic term (e²B²/8mₑ)⟨r²⟩⟨sin²θ⟩; off without it',
  E_J: 'energy of each J level of a term written without J, instead of zeta: `E_J = 1/2 0 GHz, 3/2 10.05 GHz`',
};

const BLOCK_KEYS: Record<string, string> = {
  'species.mass': 'atomic mass — u, Da or kg',
  'species.I': 'nuclear spin, written exactly: 0, 1/2, 1, 3/2, …',
  'species.g_I': 'nuclear g-factor in units of μ_B (negative for a positive nuclear moment)',
  'species.mu_I': 'nuclear magnetic moment — muN (or J/T); g_I is derived from it',
  'magnet.field': 'flux density at the beam — T, mT or G',
  'magnet.gradient': 'field gradient across the beam — T/m or G/cm',
  'magnet.length': 'length of the magnet along the beam',
  'magnet.sources': 'the field sources (coil, solenoid, wire, slab blocks) the magnet is built from; the beam flies through their field',
  'magnet.at': 'where the beam line (along +x) passes the middle of the magnet, e.g. 0, 0, 1.5 mm; default the origin',
  'beam.species': 'which species flies (a species block of this file)',
  'beam.level': 'which level the atoms are in (a level name, or Species.level)',
  'beam.source': 'oven <temperature>, jet <speed> spread <percent>, or speed <speed>',
  'beam.slits': '<width>, <width> apart <distance>',
  'beam.magnet': 'the magnet the beam passes (a magnet block of this file)',
  'beam.drift': 'distance from the magnet exit to the detector',
  'beam.detector': 'detector width or resolution',
  'line.spectrum': 'draw the line\u2019s spectrum as seen along or across the field (Voigt line shapes)',
  'line.light': 'analyser: all, pi, sigma (both), sigma+ or sigma-',
  'line.doppler': 'Doppler width from a gas temperature (310 K) or from a beam seen across (beam <name>)',
  'line.instrument': 'Gaussian instrument or laser width, FWHM',
  'line.span': 'width of the spectrum\u2019s frequency window',
  'line.points': 'number of samples of the spectrum (11 to 100,001)',
  'resonance.level': 'the level whose sublevels the RF or microwave field couples',
  'resonance.lower': 'the lower sublevel by its low-field label, F and m_F: e.g. 1 -1',
  'resonance.upper': 'the upper sublevel by its low-field label, F and m_F: e.g. 2 +1',
  'resonance.frequency': 'a source frequency: the fields where a transition is resonant with it are found',
  'resonance.range': 'the field range searched: <from>, <to>, e.g. 0 G, 10 G',
  'resonance.two_photon': 'on: also two-photon transitions (Δm = ±2)',
  'data.level': 'the level the resonances or intervals belong to (resonance and interval data)',
  'data.kind': 'resonance (magnetic-dipole pair), interval (any pair of sublevels) or profile (detector counts against position)',
  'data.lower': 'one sublevel of the pair by its low-field label, F and m_F',
  'data.upper': 'the other sublevel of the pair, F and m_F',
  'data.point': 'one measured point: <frequency>[(u)] [at <field>], or for a profile <position> <counts> [<error>]',
  'data.file': 'a CSV file beside the setup with the points (a header names the columns and their units)',
  'data.beam': 'the beam whose detector pattern a profile is compared with',
  'fit.data': 'the data blocks fitted together, comma separated',
  'fit.free': 'free parameters: field, g_J, A, B (resonances and intervals); gradient, temperature, offset, width, field, populations, background (profiles)',
  'fit.start': 'starting values, e.g. field 3 G, A 3417 MHz (defaults: the setup\'s values)',
  'fit.range': 'field range searched by a one-point field calibration: <from>, <to>',
  'settings.g_s': 'electron spin g-factor in the Landé formula: exact (CODATA) or 2 (textbook fractions)',
  'settings.reduced_mass': 'on: g_L = 1 − m_e/M instead of 1',
};

export function blockWordSection(kind: BlockKind): string {
  return `${mdTitle(kind)} — ${BLOCK_WORDS[kind]}`;
}

export function keySection(blockKind: BlockKind, key: string, inLevel: boolean): string | undefined {
  const text = inLevel || (blockKind === 'species' && key in LEVEL_KEYS) ? LEVEL_KEYS[key] : BLOCK_KEYS[`${blockKind}.${key}`];
  return text ? `${mdTitle(key)} — ${text}` : undefined;
}
