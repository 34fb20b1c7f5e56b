/**
 * Mistakes in the newer blocks (field sources, traps, slowers, measured data and fits, line
 * shapes, populations), invented numbers: the table of tests/features/badInputs.test.ts, also run
 * through the command line there, and seeds of the property tests (their neighbourhoods fuzzed).
 */
export interface MistakeCase {
  name: string;
  text: string;
  /** Errors and warnings (notes left out): `line:col-col code [the text it covers]`, 1-based. */
  findings: string[];
  /** Every quick fix offered for the findings: `code: title → the changed line`. */
  fixes?: string[];
  /** Words the messages must hold. */
  says?: string[];
  /** The first beam's normalised population of each sublevel, by low-field label. */
  beamPopulations?: Record<string, number>;
}

export const NEWER_BLOCKS: MistakeCase[] = [
  {
    name: 'a coil with a radius of zero or below, no turns or a current in tesla: each said at its value; a negative current is a direction, not a mistake',
    text: 'coil a\n  radius  = -4 cm\n  turns   = 100\n  current = -20 A\ncoil b\n  radius  = 0 cm\n  turns   = 0\n  current = 20 T\n',
    findings: ['2:13-18 value-out-of-range [-4 cm]', '6:13-17 value-out-of-range [0 cm]', '7:13-14 value-out-of-range [0]', '8:16-17 unit-wrong-dimension [T]'],
    fixes: ['unit-wrong-dimension: Change the unit to A →   current = 20 A', 'unit-wrong-dimension: Change the unit to mA →   current = 20 mA', 'unit-wrong-dimension: Change the unit to kA →   current = 20 kA'],
    says: ['radius must be greater than zero, got -4 cm', 'turns must be at least 1, got 0', 'current needs A, mA or kA, got T'],
  },
  {
    name: 'two field sources of one name: the second name is the error',
    text: 'coil quad\n  radius  = 4 cm\n  turns   = 100\n  current = 20 A\ncoil quad\n  radius  = 5 cm\n  turns   = 10\n  current = 2 A\n',
    findings: ['5:6-10 name-duplicate [quad]'],
    fixes: [],
    says: ["there is already a source named 'quad'"],
  },
  {
    name: 'a trap naming a source and a level that do not exist, with a temperature, a cut and a region below zero and gravity as a word it does not know',
    text: 'species Rb87\n  level ground: 5s 2S1/2\ncoil q\n  radius  = 4 cm\n  turns   = 100\n  current = 20 A\n  spacing = 8 cm\n  sense   = opposite\ntrap t\n  sources     = q, nosuch\n  level       = nolevel\n  temperature = -300 uK\n  cut         = -3 mK\n  region      = -2 cm\n  gravity     = up\n',
    findings: ['10:20-26 name-unknown [nosuch]', '11:17-24 name-unknown [nolevel]', '12:17-24 value-out-of-range [-300 uK]', '13:17-22 value-out-of-range [-3 mK]', '14:17-22 value-out-of-range [-2 cm]', '15:17-19 direction-unknown [up]'],
    fixes: [],
    says: ["no source named 'nosuch'","no level named 'nolevel'",'temperature must be greater than zero, got -300 uK', 'cut must be greater than zero, got -3 mK',"got 'up'"],
  },
  {
    name: 'a trap cut written in metres and a trap named twice',
    text: 'species Rb87\n  level ground: 5s 2S1/2\ncoil q\n  radius  = 4 cm\n  turns   = 100\n  current = 20 A\n  spacing = 8 cm\n  sense   = opposite\ntrap t\n  sources = q\n  level   = ground\n  cut     = 3 m\ntrap t\n  sources =\n  level   = ground\n',
    findings: ['9:6-7 trap-zero-field [t]', '12:15-16 unit-wrong-dimension [m]', '13:6-7 name-duplicate [t]', '14:3-12 value-missing [sources =]'],
    // Neither a temperature nor a frequency: both kinds' fixes, each keeping the number and naming its kind.
    fixes: [
      'unit-wrong-dimension: Change the unit to mK (a temperature) →   cut     = 3 mK',
      'unit-wrong-dimension: Change the unit to uK (a temperature) →   cut     = 3 uK',
      'unit-wrong-dimension: Change the unit to K (a temperature) →   cut     = 3 K',
      'unit-wrong-dimension: Change the unit to MHz (a frequency) →   cut     = 3 MHz',
      'unit-wrong-dimension: Change the unit to GHz (a frequency) →   cut     = 3 GHz',
      'unit-wrong-dimension: Change the unit to cm^-1 (a wavenumber) →   cut     = 3 cm^-1',
      'unit-wrong-dimension: Change the unit to eV (an energy) →   cut     = 3 eV',
    ],
    says: ["cut needs an energy above the trap's bottom, written as a temperature (mK, uK, K) or as a frequency, a wavenumber or an energy (MHz, GHz, cm^-1, eV); got m, which is none of these", "there is already a trap named 't'"],
  },
  {
    name: 'a trap cut written in degrees Celsius (degC and ℃): a reading on a scale, not an energy above the bottom; the fixes keep the number',
    text: 'species Rb87\n  level ground: 5s 2S1/2\ncoil q\n  radius  = 4 cm\n  turns   = 100\n  current = 20 A\n  spacing = 8 cm\n  sense   = opposite\ntrap t\n  sources = q\n  level   = ground\n  cut     = 3 degC\ntrap u\n  sources = q\n  level   = ground\n  cut     = 3 ℃\n',
    findings: ['9:6-7 trap-zero-field [t]', '12:15-19 unit-wrong-dimension [degC]', '13:6-7 trap-zero-field [u]', '16:15-16 unit-wrong-dimension [℃]'],
    fixes: [
      'unit-wrong-dimension: Change the unit to mK →   cut     = 3 mK',
      'unit-wrong-dimension: Change the unit to uK →   cut     = 3 uK',
      'unit-wrong-dimension: Change the unit to K →   cut     = 3 K',
      'unit-wrong-dimension: Change the unit to mK →   cut     = 3 mK',
      'unit-wrong-dimension: Change the unit to uK →   cut     = 3 uK',
      'unit-wrong-dimension: Change the unit to K →   cut     = 3 K',
    ],
    says: ["cut needs an energy above the trap's bottom, not a reading on a temperature scale: got degC; write it in mK, uK or K", 'got ℃; write it in mK, uK or K'],
  },
  {
    name: 'a slower with an undefined line, a speed in kelvin, a safety above 1, a negative saturation, a misspelt design and a bias in m/s',
    text: 'species Na23\n  level ground: 3s 2S1/2\n  level p32:    3p 2P°3/2\nline D2: ground -> p32\nslower s\n  line       = D3\n  capture    = 950 K\n  final      = 30 m/s\n  safety     = 1.5\n  saturation = -2\n  design     = spinflip\n  bias       = 5 m/s\n',
    findings: ['6:16-18 name-unknown [D3]', '7:20-21 unit-wrong-dimension [K]', '9:16-19 slower-safety-out-of-range [1.5]', '10:16-18 value-out-of-range [-2]', '11:16-24 value-not-allowed [spinflip]', '12:18-21 unit-wrong-dimension [m/s]'],
    fixes: ['unit-wrong-dimension: Change the unit to m/s →   capture    = 950 m/s', 'unit-wrong-dimension: Change the unit to km/s →   capture    = 950 km/s',"value-not-allowed: Replace with 'decreasing' →   design     = decreasing","value-not-allowed: Replace with 'increasing' →   design     = increasing","value-not-allowed: Replace with 'spin_flip' →   design     = spin_flip",'unit-wrong-dimension: Change the unit to T →   bias       = 5 T', 'unit-wrong-dimension: Change the unit to mT →   bias       = 5 mT', 'unit-wrong-dimension: Change the unit to G →   bias       = 5 G'],
    says: ["no line named 'D3'",'speed needs m/s or km/s, got K', 'so it must be in (0, 1]; got 1.5', 'saturation must be greater than zero, got -2', 'flux density needs T, mT or G, got m/s'],
  },
  {
    name: 'a slower whose final speed is above its capture speed, or zero or negative speeds',
    text: 'species Na23\n  level ground: 3s 2S1/2\n  level p32:    3p 2P°3/2\nline D2: ground -> p32\nslower s\n  line    = D2\n  capture = 300 m/s\n  final   = 600 m/s\nslower z\n  line    = D2\n  capture = 0 m/s\n  final   = -30 m/s\n',
    findings: ['8:13-20 slower-final-not-below-capture [600 m/s]', '11:13-18 value-out-of-range [0 m/s]', '12:13-20 value-out-of-range [-30 m/s]'],
    fixes: [],
    says: ['the final speed (600 m/s) must be below the capture speed (300 m/s)', 'capture must be greater than zero, got 0 m/s', 'final must not be negative, got -30 m/s'],
  },
  {
    name: 'a line shape with a negative lifetime or a zero linewidth, a Doppler temperature of zero or in m/s, an instrument width of zero or below or in tesla',
    text: 'species Rb87\n  level ground: 5s 2S1/2\n  level p32:    5p 2P°3/2  lifetime = -26 ns\n  level p12:    5p 2P°1/2  linewidth = 0 MHz\nline D2: ground -> p32\n  spectrum   = across\n  doppler    = 0 K\n  instrument = -2 MHz\nline D1: ground -> p12\n  spectrum   = along\n  doppler    = 310 m/s\n  instrument = 2 T\n',
    findings: ['3:39-45 lifetime-not-positive [-26 ns]', '4:40-45 lifetime-not-positive [0 MHz]', '7:16-19 value-out-of-range [0 K]', '8:16-22 value-out-of-range [-2 MHz]', '11:20-23 unit-wrong-dimension [m/s]', '12:18-19 unit-wrong-dimension [T]'],
    fixes: ['unit-wrong-dimension: Change the unit to K →   doppler    = 310 K', 'unit-wrong-dimension: Change the unit to degC →   doppler    = 310 degC', 'unit-wrong-dimension: Change the unit to MHz →   instrument = 2 MHz', 'unit-wrong-dimension: Change the unit to GHz →   instrument = 2 GHz', 'unit-wrong-dimension: Change the unit to cm^-1 →   instrument = 2 cm^-1', 'unit-wrong-dimension: Change the unit to eV →   instrument = 2 eV'],
    says: ['lifetime must be above zero', 'linewidth must be above zero', 'the temperature must be above zero', 'the instrument width must be above zero', 'temperature needs K or degC, got m/s', 'frequency needs MHz, GHz, cm^-1 or eV, got T'],
  },
  {
    name: 'a data block with no points and the fit of it: the empty data is said, and the fit says it has nothing to fit',
    text: 'species Rb87\n  level ground: 5s 2S1/2\ndata clock\n  level = ground\n  lower = 1 -1\n  upper = 2 1\nfit f: clock -> field\n',
    findings: ['3:6-11 data-incomplete [clock]', '7:5-6 fit-too-few-points [f]'],
    fixes: [],
    says: ["data 'clock' has no usable points",'0 data points cannot determine 1 free parameter (field)'],
  },
  {
    name: 'a fit with more free parameters than points, and points written without a number or without a unit',
    text: 'species Rb87\n  level ground: 5s 2S1/2\ndata clock\n  level = ground\n  lower = 1 -1\n  upper = 2 1\n  point = 6834678.6136(50) kHz\n  point = kHz\n  point = 6834 at 1 mT\n  point = 6834678 kHz at 1 MHz\nfit f\n  data = clock\n  free = field, g_J, A\n',
    findings: ['8:11-14 unit-not-a-quantity [kHz]', '9:11-15 unit-missing [6834]', '10:28-31 unit-wrong-dimension [MHz]', '11:5-6 fit-too-few-points [f]'],
    fixes: ['unit-missing: Add a unit: 6834 MHz →   point = 6834 MHz at 1 mT', 'unit-missing: Add a unit: 6834 GHz →   point = 6834 GHz at 1 mT', 'unit-missing: Add a unit: 6834 cm^-1 →   point = 6834 cm^-1 at 1 mT', 'unit-missing: Add a unit: 6834 eV →   point = 6834 eV at 1 mT', 'unit-wrong-dimension: Change the unit to T →   point = 6834678 kHz at 1 T', 'unit-wrong-dimension: Change the unit to mT →   point = 6834678 kHz at 1 mT', 'unit-wrong-dimension: Change the unit to G →   point = 6834678 kHz at 1 G'],
    says: ['1 data point cannot determine 3 free parameters (field, g_J, A)',"got 'kHz'",'flux density needs T, mT or G, got MHz'],
  },
  {
    name: 'a measured point at a field beyond what is computed, or with a frequency too small to hold its digits',
    text: 'species Rb87\n  level ground: 5s 2S1/2\ndata clock\n  level = ground\n  lower = 1 -1\n  upper = 2 1\n  point = 6834678.6136(50) kHz at 1e308 T\n  point = 1e-320 kHz at 1 G\n  point = 6834678.6136(50) kHz\nfit f: clock -> field\n',
    findings: ['7:35-42 field-beyond-physical [1e308 T]', '8:11-17 syntax-bad-number [1e-320]', '9:3-31 fit-no-root [point = 6834678.6136(50) kHz]'],
    fixes: [],
    says: ['1e308 T is outside the fields Sublevel computes', 'the number 1e-320 is too small to represent'],
  },
  {
    name: 'profile points with their columns swapped, without counts, with negative counts or a zero error',
    text: 'species Rb87\n  level ground: 5s 2S1/2\nmagnet m\n  field    = 0.1 T\n  gradient = 100 T/m\n  length   = 5 cm\nbeam b\n  level    = ground\n  source   = oven 400 K\n  slits    = 80 um, 50 um apart 40 cm\n  magnet   = m\n  drift    = 50 cm\n  detector = 10 um\ndata prof\n  kind  = profile\n  beam  = b\n  point = 14 -1200 um\n  point = 14 -1200 um 4\n  point = -1200 um\n  point = -1200 um -14\n  point = 0 um 20 0\n  point = 0 um 20\n  point = 10 um 22\n  point = 20 um 30\n',
    findings: ['5:14-21 beam-unresolved [100 T/m]', '17:11-22 data-point-malformed [14 -1200 um]', '18:11-24 data-point-malformed [14 -1200 um 4]', '19:11-19 data-point-malformed [-1200 um]', '20:20-23 data-counts-invalid [-14]', '21:19-20 data-counts-invalid [0]'],
    fixes: [],
    says: ['the position goes first, then the counts: write point = -1200 um 14', 'this point gives a position but no counts', 'counts must be a number ≥ 0, got -14', 'an error must be a number > 0, got 0'],
  },
  {
    name: 'a profile of a beam that does not exist, a fit of data that does not exist, a magnet of a source that does not exist',
    text: 'species Rb87\n  level ground: 5s 2S1/2\ndata prof\n  kind  = profile\n  beam  = nobeam\n  point = -1200 um 14\nfit pf\n  data = prof, nodata\n  free = gradient\nmagnet m\n  sources = quad\n  length  = 5 cm\n',
    findings: ['3:6-10 data-incomplete [prof]', '5:11-17 name-unknown [nobeam]', '8:16-22 name-unknown [nodata]', '11:13-17 name-unknown [quad]'],
    fixes: [],
    says: ["no beam named 'nobeam'","no data named 'nodata'","no source named 'quad'"],
  },
  {
    name: 'two data blocks of one name',
    text: 'species Rb87\n  level ground: 5s 2S1/2\ndata x\n  level = ground\n  lower = 1 -1\n  upper = 2 1\n  point = 6834.678 MHz at 1 G\ndata x\n  level = ground\n  lower = 1 0\n  upper = 2 0\n  point = 6834.682 MHz at 1 G\n',
    findings: ['8:6-7 name-duplicate [x]'],
    fixes: [],
    says: ["there is already a data named 'x'"],
  },
  {
    name: 'populations that give one sublevel twice: the later entry is said, not silently dropped',
    text: 'species K39\n  level ground: 4s 2S1/2\nmagnet m\n  field    = 0.1 T\n  gradient = 100 T/m\n  length   = 5 cm\nbeam c\n  level    = ground\n  source   = oven 400 K\n  slits    = 80 um, 50 um apart 40 cm\n  magnet   = m\n  drift    = 50 cm\n  detector = 10 um\n  populations = 1 1 1, 1 1 2, 2 0.5, 2 -1 1\n',
    findings: ['14:24-29 beam-population-twice [1 1 2]', '14:38-44 beam-population-twice [2 -1 1]'],
    fixes: [],
    says: ["F = 1, m_F = +1 already has its weight from the entry '1 1 1', which is the one used; this entry is not","F = 2, m_F = -1 already has its weight from the entry '2 0.5'"],
  },
  {
    name: 'populations that give one sublevel, then the rest of its F: both are used, without a warning; a whole F after each of its m_F is said',
    text: 'species K39\n  level ground: 4s 2S1/2\nmagnet m\n  field    = 0.1 T\n  gradient = 100 T/m\n  length   = 5 cm\nbeam c\n  level    = ground\n  source   = oven 400 K\n  slits    = 80 um, 50 um apart 40 cm\n  magnet   = m\n  drift    = 50 cm\n  detector = 10 um\n  populations = 2 1 1, 2 0.5, 1 -1 0, 1 0 0, 1 1 0, 1 3\n',
    findings: ['14:53-56 beam-population-twice [1 3]'],
    fixes: [],
    says: ["every m_F of F = 1 already has its weight from the entries '1 -1 0', '1 0 0', '1 1 0'"],
    // m_F = +1 of F = 2 weighs 1, the other four 0.5 (the first entry that names a sublevel): 1/3 and 1/6 of 3.
    beamPopulations: { 'F=2, m_F=-2': 1 / 6, 'F=2, m_F=-1': 1 / 6, 'F=2, m_F=0': 1 / 6, 'F=2, m_F=+1': 1 / 3, 'F=2, m_F=+2': 1 / 6, 'F=1, m_F=-1': 0, 'F=1, m_F=0': 0, 'F=1, m_F=+1': 0 },
  },
  {
    name: 'a length of 1e308 m or 5 km in an apparatus is said where it is written, not computed into a wrong finding',
    text: 'slab s\n  size          = 10, 20, 1 mm\n  centre        = 0, 0, 1e308 m\n  magnetisation = 1.2 T along y\ncoil c\n  radius  = 1e308 m\n  turns   = 1\n  current = 1 A\nmagnet m\n  sources = s, c\n  length  = 5 km\n',
    findings: ['3:25-32 value-beyond-apparatus [1e308 m]', '6:13-20 value-beyond-apparatus [1e308 m]', '11:13-17 value-beyond-apparatus [5 km]'],
    fixes: [],
    says: ['1e308 m is beyond the lengths Sublevel takes (up to 1 km either way', '5 km is beyond the lengths'],
  },
  {
    name: 'a field too large, or too small to hold its digits, even after its unit',
    text: 'species Rb87\n  level ground: 5s 2S1/2\nfield f = 1e308 T\nfield g = 1e-320 T\nfield h = 1e-400 T\nfield k = 1e-305 nT\nfield z = 0e-400 T\n',
    findings: ['3:11-18 field-beyond-physical [1e308 T]', '4:11-17 syntax-bad-number [1e-320]', '5:11-17 syntax-bad-number [1e-400]', '6:11-20 syntax-bad-number [1e-305 nT]'],
    fixes: [],
    says: ['1e308 T is outside the fields Sublevel computes', 'the number 1e-320 is too small to represent (numbers below 2.2e-308 lose their digits or become 0): write 0 or check the exponent', '1e-305 nT is too small'],
  },
  {
    name: 'a free field when every point carries its own field: said at the parameter, not as a combination without effect',
    text: 'species Rb87\n  level ground: 5s 2S1/2\ndata clock\n  level = ground\n  lower = 1 -1\n  upper = 2 1\n  point = 6834678.6136(50) kHz at 1 G\nfit f: clock -> field\n',
    findings: ['8:17-22 fit-not-possible [field]'],
    fixes: [],
    says: ['every point gives its own field (`at <field>`), so the free field acts on none of them'],
  },
  {
    name: 'a parameter freed twice, a start of g_J with a unit, and a pair that names one sublevel twice',
    text: 'species Rb87\n  level ground: 5s 2S1/2\ndata d1\n  level = ground\n  lower = 1 0\n  upper = 1 0\n  point = 6834 MHz at 1 G\n  point = 6835 MHz at 2 G\nfit f\n  data  = d1\n  free  = g_J, g_J\n  start = g_J 2 MHz\nresonance r\n  level = ground\n  lower = 1 0\n  upper = 1 0\n',
    findings: ['6:11-14 fit-pair-not-found [1 0]', '11:16-19 fit-parameter-twice [g_J]', '12:15-20 fit-start-malformed [2 MHz]', '15:11-14 resonance-no-such-pair [1 0]'],
    fixes: [],
    says: ['g_J is already free; a parameter is freed once', 'the start of g_J is a plain number or %, got 2 MHz', 'lower and upper name one sublevel, F = 1, m = 0',"resonance 'r': lower and upper name one sublevel"],
  },
  {
    name: 'a size of two values, a zero direction, a negative solenoid length and half a turn',
    text: 'slab s\n  size          = 10, 20 mm\n  magnetisation = 1.2 T along y\nwire w\n  current   = 5 A\n  through   = 0, 0, 0 cm\n  direction = 0, 0, 0\nsolenoid so\n  radius  = 2 cm\n  length  = -10 cm\n  turns   = 2.5\n  current = 1 A\n',
    findings: ['2:19-28 vector-malformed [10, 20 mm]', '7:15-22 direction-zero [0, 0, 0]', '10:13-19 value-out-of-range [-10 cm]', '11:13-16 source-turns-not-whole [2.5]'],
    fixes: ["source-turns-not-whole: Replace with '3' →   turns   = 3"],
    says: ["size needs three values separated by commas with a unit (e.g. 0, 0, 3 cm), got '10, 20 mm'",'direction = 0, 0, 0 has no direction', 'length must be greater than zero, got -10 cm', 'turns must be a whole number, got 2.5'],
  },
];
