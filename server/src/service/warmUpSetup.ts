/**
 * The built-in set-up a fresh evaluation worker evaluates before the first real job
 * (workerEvaluator.ts `warmUp`), so that the JavaScript engine has compiled and optimised the hot
 * paths by the time a user's file arrives: most of a fresh worker's CPU on a large file is that
 * warming up, not the arithmetic (docs/editor.md, "Where a fresh worker's time goes").
 *
 * It has the shapes the bundled examples and large files have: hand-made species with hyperfine
 * levels (A, B), built-in species, a whole term, fields that name their species, magnets with
 * beams and their advice, lines with spectra, a resonance search, coils, a wire, a slab and
 * solenoids, a trap, a slower, data and a fit. Every number is invented. Its result is never shown.
 */

/** Hand-made species: several, so that the per-level, per-beam and per-line code is called often enough to be optimised. */
const SPECIES = 16;

/**
 * One hand-made species with three levels, a line, and a magnet with a beam (invented numbers).
 * Beams are the code that takes longest to warm (their advice computes dozens of patterns; the
 * first beam costs 0.3 s cold, a warm one 10 ms), so every species has one.
 */
function handMadeSpecies(i: number): string[] {
  return [
    `species Warm${i}`,
    `  mass = ${(40 + 7 * i + 0.913).toFixed(3)} u`,
    `  I    = ${['3/2', '5/2', '1', '7/2'][i % 4]}`,
    '  g_I  = -0.000995',
    `  level g${i}: 5s 2S1/2  A = ${(1200 + 211 * i).toFixed(2)} MHz`,
    `  level p${i}: 5p 2P°3/2  A = ${(40 + i).toFixed(2)} MHz  B = 12.5 MHz`,
    `  level d${i}: 4d 2D5/2`,
    '',
    `line L${i}: g${i} -> p${i}`,
    '',
    `magnet m${i}`,
    `  field    = ${(0.2 + 0.05 * i).toFixed(2)} T`,
    `  gradient = ${90 + 10 * i} T/m`,
    '  length   = 6 cm',
    '',
    `beam b${i}`,
    `  species  = Warm${i}`,
    `  level    = g${i}`,
    `  source   = oven ${400 + 10 * i} K`,
    '  slits    = 80 um, 50 um apart 40 cm',
    `  magnet   = m${i}`,
    '  drift    = 30 cm',
    '  detector = 25 um',
    '',
  ];
}

const FIXED_PART = `
species Rb87
  level ground: 5s 2S1/2
  level p32:    5p 2P°3/2

species Li7
  level li_ground: 2s 2S1/2
  level li_p: 2p 2P°  zeta = 6.70 GHz

species Na23
  level na_ground: 3s 2S1/2
  level na_p32:    3p 2P°3/2

field low    = 0.8 G
field middle = 40 G
field high   = 0.3 T
field group  = 3 G
  species = Warm0, Warm1, Warm2, Warm3

line D2: ground -> p32
  spectrum   = across
  light      = all
  doppler    = 300 K
  instrument = 1.5 MHz

line LiD: li_ground -> li_p

line NaD2: na_ground -> na_p32

resonance hop
  level = ground
  lower = 1 -1
  upper = 2 +1
  range = 0 G, 8 G

coil pair
  radius    = 3 cm
  turns     = 90
  current   = 12 A
  spacing   = 6 cm
  sense     = opposite
  conductor = 1.2 mm

coil offset
  radius    = 5 cm
  turns     = 30
  current   = 1.5 A
  centre    = 0, 0, 7 cm

wire strip
  current   = 25 A
  through   = 0, 3, 0 mm
  direction = x
  length    = 15 cm
  return    = 0, -3, 0 mm

slab block
  size          = 8, 16, 4 mm
  centre        = 0, 0, -7 cm
  magnetisation = 1.1 T along y

trap hold
  sources     = pair, offset
  level       = ground
  gravity     = -z
  temperature = 250 uK
  cut         = 2 mK

solenoid s1
  radius  = 4 cm
  length  = 10 cm
  turns   = 300
  current = 15 A
  centre  = 0, 0, 0 cm

solenoid s2
  radius  = 4 cm
  length  = 10 cm
  turns   = 150
  current = 15 A
  centre  = 0, 0, 10 cm

solenoid s3
  radius  = 4 cm
  length  = 10 cm
  turns   = 60
  current = -15 A
  centre  = 0, 0, 20 cm

slower brake
  line       = NaD2
  capture    = 700 m/s
  final      = 40 m/s
  safety     = 0.5
  design     = spin_flip
  saturation = 2
  start      = 0, 0, -5 cm
  axis       = z
  sources    = s1, s2, s3

data ticks
  level = ground
  lower = 1 0
  upper = 2 0
  point = 6834697.0(400) kHz at 0.5 mT
  point = 6857650.4(400) kHz at 20 mT
  point = 7038690.9(400) kHz at 60 mT

fit constants
  data  = ticks
  free  = A
  start = A 3417 MHz
`;

/** The warm-up set-up's text (built once per call; it is small). */
export function warmUpSetup(): string {
  const parts = ['# Built-in warm-up set-up of the evaluation worker (invented numbers; never shown).', FIXED_PART];
  for (let i = 0; i < SPECIES; i++) parts.push(...handMadeSpecies(i));
  return parts.join('\n');
}
