/**
 * Builds a LevelModel from a `level` statement: interprets the designation (configuration and
 * term symbol), reads A, B, C, g_J and energy, and merges matching built-in data.
 */
import type { LevelNode, SettingNode } from '../format/ast';
import { parseLevelDesignation } from '../physics/configuration';
import { lifetimeFromFwhm } from '../physics/lineshape';
import { citationOf, type BuiltinLevel, type Sourced } from '../physics/species';
import type { ProblemList } from './problems';
import { subRange } from './ranges';
import { readPerLevel } from './perLevelReader';
import { readSettingNumber, readSettingQuantity } from './settingReaders';
import { splitTermOf, writtenOffset } from './splitTerm';
import type { LevelModel, SpeciesModel, Valued } from './types';

export function buildLevel(node: LevelNode, species: SpeciesModel, problems: ProblemList): LevelModel | undefined {
  if (!node.name) {
    problems.add('name-missing', 'a level needs a name, as in `level ground: 2S1/2`', node.keyword.range);
    return undefined;
  }
  const level: LevelModel = {
    name: node.name.text,
    node,
    nameRange: node.name.range,
    species,
    designationText: node.designation?.text ?? '',
    configuration: null,
    term: null,
    kind: 'level',
    valid: false,
  };
  for (const s of node.settings) readLevelSetting(level, s, problems);
  reconcileWidth(level, problems);
  readDesignation(level, problems);
  mergeBuiltin(level);
  return level;
}

type ParsedDesignation = ReturnType<typeof parseLevelDesignation>;

/**
 * Parsed designations by text. A big file repeats a few designations many times, and every
 * keystroke builds the model again; the parse is pure and its result is only read, so one
 * result serves every level written the same way. Emptied when it grows past the limit.
 */
const designations = new Map<string, ParsedDesignation>();
const MAX_DESIGNATIONS = 4096;

function designationOf(text: string): ParsedDesignation {
  let parsed = designations.get(text);
  if (!parsed) {
    if (designations.size >= MAX_DESIGNATIONS) designations.clear();
    parsed = parseLevelDesignation(text);
    designations.set(text, parsed);
  }
  return parsed;
}

function readDesignation(level: LevelModel, problems: ProblemList): void {
  const d = level.node.designation;
  if (!d || d.text.trim() === '') {
    problems.add('level-needs-term', `level '${level.name}' needs a term symbol after the colon, such as 2S1/2 or 3p 2P°3/2`, level.node.name?.range ?? level.node.range);
    return;
  }
  const asWritten = designationOf(d.text);
  const split = splitTermOf(d.text, asWritten.issues.filter((i) => i.severity === 'error').length);
  const parsed = split ? designationOf(split.text) : asWritten;
  if (split) {
    problems.add('term-blank-inside', `a term symbol is written without blanks: read as ${split.term}`, subRange(d, split.start, split.end), {
      data: { suggestions: [split.term] },
    });
  }
  level.configuration = parsed.configuration;
  level.term = parsed.term;
  const parsedText = split ? split.text : d.text;
  for (const issue of parsed.issues) {
    const range = subRange(d, writtenOffset(split, issue.start, false), writtenOffset(split, issue.end, true));
    const suggestions = issue.suggestions && issue.code.startsWith('term-j-') ? offeredJ(parsedText, issue.start, issue.end, issue.suggestions) : issue.suggestions;
    problems.addWith(issue.code, issue.severity, issue.message, range, {
      ...(suggestions && suggestions.length > 0 ? { data: { suggestions } } : {}),
    });
  }
  const hasError = parsed.issues.some((i) => i.severity === 'error');
  const noJ = !!parsed.term && parsed.term.twoJ === null;
  if (noJ && (level.zeta || level.levelEnergies)) {
    level.kind = 'term';
  } else if (noJ && !hasError) {
    problems.add(
      'level-needs-j',
      `term ${parsed.term!.text} has no J; write the level's J, e.g. ${parsed.term!.text}${jHint(parsed.term!.twoS, parsed.term!.L)}, or give the term's spin–orbit constant zeta to treat all its J levels together`,
      d.range,
    );
  }
  if (!noJ && level.zeta?.range) {
    problems.add('zeta-needs-term', `zeta describes a whole term: write the term without J (e.g. ${parsed.term?.text.replace(/[0-9/₀-₉⁄]+$/, '')}) to compute all its J levels, or remove zeta`, level.zeta.range, {
      data: { removeSetting: 'zeta' },
    });
  }
  if (!noJ && level.r2?.range) {
    problems.add('r2-needs-term', `r2 adds the diamagnetic term to a whole term only: write the term without J and give zeta or E_J, or remove r2`, level.r2.range);
  }
  level.valid = !!parsed.term && !hasError && (parsed.term.twoJ !== null || level.kind === 'term');
}

/**
 * The J the term allows are offered only when the level then reads without error: `3p 2Q3/2` allows
 * J = 23/2 for 2Q, but 3p makes no 2Q, so that fix would trade one error for another. A
 * configuration makes whole LS terms, each with every J from |L − S| to L + S (textbook), so one
 * J read in place answers for all of them: the designation is parsed once, not once per J.
 */
function offeredJ(text: string, start: number, end: number, allowed: string[]): string[] {
  const first = allowed[0];
  if (first === undefined) return [];
  const clean = !designationOf(text.slice(0, start) + first + text.slice(end)).issues.some((i) => i.severity === 'error');
  return clean ? allowed : [];
}

function jHint(twoS: number, L: number): string {
  const twoJ = Math.abs(2 * L - twoS);
  return twoJ % 2 === 0 ? String(twoJ / 2) : `${twoJ}/2`;
}

function readLevelSetting(level: LevelModel, s: SettingNode, problems: ProblemList): void {
  switch (s.key.text) {
    case 'A':
      level.A = readSettingQuantity(s, 'frequency-like', problems, 'magnetic-dipole hyperfine constant, e.g. 401.75 MHz');
      break;
    case 'B':
      level.B = readSettingQuantity(s, 'frequency-like', problems, 'electric-quadrupole hyperfine constant, e.g. -0.22 MHz');
      break;
    case 'C':
      level.C = readSettingQuantity(s, 'frequency-like', problems, 'magnetic-octupole hyperfine constant, e.g. 0.56 kHz');
      break;
    case 'g_J':
      level.gJMeasured = readSettingNumber(s, problems, 'measured Landé g_J, e.g. 1.3341');
      break;
    case 'zeta':
      level.zeta = readSettingQuantity(s, 'frequency-like', problems, 'spin–orbit constant ζ of the term, e.g. 6.70 GHz');
      break;
    case 'A_J':
      level.levelA = readPerLevel(s, problems, '1/2 46.0 MHz, 3/2 -3.06 MHz');
      break;
    case 'B_J':
      level.levelB = readPerLevel(s, problems, '3/2 -0.22 MHz');
      break;
    case 'E_J':
      level.levelEnergies = readPerLevel(s, problems, '1/2 0 GHz, 3/2 10.05 GHz');
      break;
    case 'lifetime':
      level.lifetimeS = positive(readSettingQuantity(s, 'time', problems, 'radiative lifetime of the level, e.g. 26.2 ns'), 'lifetime', problems);
      break;
    case 'linewidth':
      level.linewidthHz = positive(readSettingQuantity(s, 'frequency-like', problems, 'natural linewidth Γ/2π (FWHM) of the level, e.g. 6.07 MHz'), 'linewidth', problems);
      break;
    case 'r2':
      level.r2 = readSettingQuantity(s, 'area', problems, 'mean square radius ⟨r²⟩ of the valence electron, e.g. 27 a0^2');
      if (level.r2 && !(level.r2.value > 0)) {
        problems.add('r2-not-positive', `r2 must be above zero (it is the mean square radius ⟨r²⟩ of the valence electron)`, level.r2.range!);
        level.r2 = undefined;
      }
      break;
    case 'energy':
      level.energyHz = readSettingQuantity(s, 'frequency-like', problems, 'energy above the ground level, e.g. 16973.37 cm^-1');
      break;
    default:
      // Unknown keys are reported by the parser's schema check.
      break;
  }
}

/** A lifetime or linewidth must be above zero: a zero lifetime would be an infinitely broad line. */
function positive(v: Valued<number> | undefined, key: string, problems: ProblemList): Valued<number> | undefined {
  if (!v || v.value > 0) return v;
  problems.add('lifetime-not-positive', `${key} must be above zero (a level that lives for no time has no line to draw), got ${v.value === 0 ? 'zero' : 'a negative value'}`, v.range!);
  return undefined;
}

/** `linewidth` is the natural FWHM Γ/2π = 1/(2πτ); one of the two is enough. */
function reconcileWidth(level: LevelModel, problems: ProblemList): void {
  const w = level.linewidthHz;
  if (!w) return;
  if (level.lifetimeS) {
    problems.add('lifetime-and-linewidth', `level '${level.name}' gives both lifetime and linewidth; they say the same thing (linewidth = 1/(2π·lifetime)), so the lifetime is used and the linewidth is ignored`, w.range!, {
      data: { removeSetting: 'linewidth' },
    });
    delete level.linewidthHz;
    return;
  }
  level.lifetimeS = { value: lifetimeFromFwhm(w.value), source: w.source, ...(w.range ? { range: w.range } : {}) };
}

/** Take A, B, C, g_J and energy from the built-in level with the same term, unless the file gives them. */
function mergeBuiltin(level: LevelModel): void {
  const builtin = level.species.builtin;
  if (!builtin || !level.term || !level.valid) return;
  const match = findBuiltinLevel(builtin.levels, level);
  if (!match) return;
  level.builtinKey = match.key;
  level.A ??= fromBuiltin(match.A);
  level.B ??= fromBuiltin(match.B);
  level.C ??= fromBuiltin(match.C);
  level.gJMeasured ??= fromBuiltin(match.gJ);
  level.energyHz ??= fromBuiltin(match.energyHz);
  level.lifetimeS ??= fromBuiltin(match.lifetimeS);
}

function fromBuiltin(v: Sourced<number> | undefined): Valued<number> | undefined {
  if (!v) return undefined;
  return { value: v.value, source: citationOf(v), ...(v.uncertainty !== undefined ? { uncertainty: v.uncertainty } : {}), ...(v.parts ? { parts: v.parts } : {}) };
}

function findBuiltinLevel(levels: readonly BuiltinLevel[], level: LevelModel): BuiltinLevel | undefined {
  const t = level.term!;
  const sameTerm = levels.filter((b) => {
    const p = parseLevelDesignation(b.designation);
    return p.term && p.term.twoS === t.twoS && p.term.L === t.L && p.term.twoJ === t.twoJ
      && (!level.configuration || !p.configuration || sameConfiguration(p.configuration.text, level.configuration.text));
  });
  return sameTerm[0];
}

function sameConfiguration(a: string, b: string): boolean {
  const norm = (s: string): string => s.replace(/[\s.]+/g, ' ').trim().split(' ').filter((x) => !/^\[/.test(x)).slice(-1).join(' ');
  // Compare the outermost subshell: '5p' vs '[Kr] 5p' vs '4d10 5p' all name the same level.
  return norm(a) === norm(b);
}
