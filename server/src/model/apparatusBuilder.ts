/** Builds fields, magnets and beams: the experiment's hardware. */
import type { BlockNode, SettingNode, ValuePart } from '../format/ast';
import type { Dimension } from '../format/units';
import { halfText } from '../physics/engine/halfIntegers';
import { physicalField } from './fieldRange';
import { NameIndex, resolveLevel } from './nameIndex';
import { ProblemList } from './problems';
import { isUnreadable, readPartQuantity, readSettingQuantity, singlePart, strayUnit } from './settingReaders';
import { readMagnetSources } from './magnetSources';
import type { BeamModel, BeamSource, FieldModel, FieldSourceModel, MagnetModel, NameUse, SpeciesModel, Valued } from './types';
import { allParts } from '../format/values';

export function buildField(node: BlockNode, problems: ProblemList): FieldModel | undefined {
  if (!node.name) {
    problems.add('name-missing', 'a field needs a name, as in `field bias = 3.2 G`', node.keyword.range);
    return undefined;
  }
  const field: FieldModel = { name: node.name.text, node, nameRange: node.name.range };
  if (!node.headerSetting) {
    problems.add('field-needs-value', `field '${field.name}' needs a value, as in \`field ${field.name} = 3.2 G\``, node.headerRange);
    return field;
  }
  const hs = node.headerSetting;
  const t = physicalField(readSettingQuantity(hs, 'flux-density', problems, 'magnetic flux density, e.g. 3.2 G or 0.45 T'), hs.valueText.text, hs.valueText.range, problems);
  if (t) field.tesla = t;
  return field;
}

export function buildMagnet(node: BlockNode, problems: ProblemList, index?: { sources: NameIndex<FieldSourceModel> }): MagnetModel | undefined {
  if (!node.name) {
    problems.add('name-missing', 'a magnet needs a name, as in `magnet selector`', node.keyword.range);
    return undefined;
  }
  const magnet: MagnetModel = { name: node.name.text, node, nameRange: node.name.range };
  for (const s of node.settings) {
    switch (s.key.text) {
      case 'field': {
        const v = physicalField(readSettingQuantity(s, 'flux-density', problems, 'field at the beam, e.g. 0.45 T'), s.valueText.text, s.valueText.range, problems);
        if (v) magnet.fieldT = v;
        break;
      }
      case 'gradient': {
        const v = readSettingQuantity(s, 'gradient', problems, 'field gradient, e.g. 180 T/m');
        if (v) magnet.gradientTPerM = v;
        break;
      }
      case 'length': {
        const v = positive(s, readSettingQuantity(s, 'length', problems, 'magnet length, e.g. 8 cm'), problems);
        if (v) magnet.lengthM = v;
        break;
      }
      default:
        break;
    }
  }
  if (index) readMagnetSources(node, magnet, index, problems);
  const built = node.settings.some((s) => s.key.text === 'sources');
  const needed = built ? (['sources', 'length'] as const) : (['field', 'gradient', 'length'] as const);
  const missing = needed.filter((k) => !node.settings.some((s) => s.key.text === k));
  if (missing.length > 0) {
    problems.add('magnet-incomplete', `magnet '${magnet.name}' has no ${missing.join(', ')}; deflections need ${built ? 'both' : 'all three'}`, node.name.range, {
      data: { missing },
    });
  }
  return magnet;
}

export function buildBeam(
  node: BlockNode,
  index: { species: NameIndex<SpeciesModel>; magnets: NameIndex<MagnetModel> },
  uses: NameUse[],
  problems: ProblemList,
  ordinal: number,
): BeamModel {
  const name = node.name?.text ?? `beam${ordinal + 1}`;
  const beam: BeamModel = { name, node, nameRange: node.name?.range ?? node.keyword.range };
  const levelSetting = node.settings.find((s) => s.key.text === 'level');
  for (const s of node.settings) {
    switch (s.key.text) {
      case 'species': {
        const part = singlePart(s, problems, 'species name');
        if (part) {
          const sp = index.species.resolve(part, problems);
          if (sp) beam.species = sp;
        }
        break;
      }
      case 'magnet': {
        const part = singlePart(s, problems, 'magnet name');
        if (part) {
          const m = index.magnets.resolve(part, problems);
          if (m) beam.magnet = m;
        }
        break;
      }
      case 'source': {
        const src = readSource(s, problems);
        if (src) beam.source = src.source;
        if (src?.temperature) beam.ovenTemperatureK = src.temperature;
        break;
      }
      case 'slits': {
        const sl = readSlits(s, problems);
        if (sl) {
          beam.slits = sl.slits;
          beam.slitParts = sl.parts;
        }
        break;
      }
      case 'drift': {
        const v = positive(s, readSettingQuantity(s, 'length', problems, 'distance from magnet exit to detector'), problems);
        if (v) beam.driftM = v;
        break;
      }
      case 'detector':
        readDetector(s, beam, problems);
        break;
      case 'populations': {
        const p = readPopulations(s, problems);
        if (p) beam.populations = p;
        break;
      }
      default:
        break;
    }
  }
  if (levelSetting) {
    const part = singlePart(levelSetting, problems, 'level name');
    if (part) {
      const [q, n] = splitQualified(part);
      // A species that is not found is the error already said: its level is not looked for elsewhere.
      const speciesUnknown = !beam.species && node.settings.some((s) => s.key.text === 'species');
      const lv = resolveLevel(q ? { qualifier: q, name: n } : { name: n }, index.species, beam.species, uses, speciesUnknown ? new ProblemList() : problems);
      if (lv) {
        // The level decides what flies (its mass, its moments); a `species` that names another
        // one is a contradiction the user must settle, not something to pick a side of quietly.
        // The beam is then left without a level (not computed), so no result mixes one species'
        // mass with another's moments.
        if (beam.species && beam.species !== lv.species) {
          problems.add(
            'beam-level-of-other-species',
            `beam '${name}' carries ${beam.species.name}, but its level '${lv.name}' belongs to ${lv.species.name}; name a level of ${beam.species.name}, or change the species`,
            part.range,
          );
        } else {
          beam.level = lv;
          beam.species ??= lv.species;
        }
      }
    }
  }
  const needed = ['level', 'source', 'slits', 'magnet', 'drift'].filter((k) => !node.settings.some((s) => s.key.text === k));
  if (needed.length > 0) {
    problems.add('beam-incomplete', `beam '${name}' has no ${needed.join(', ')}; the detector pattern needs ${needed.length > 1 ? 'them' : 'it'}`, beam.nameRange, {
      data: { missing: needed },
    });
  }
  return beam;
}

/** `Na23.ground` written as one word → qualifier and name spans. */
function splitQualified(part: ValuePart): [ValuePart | undefined, ValuePart] {
  const dot = part.text.indexOf('.');
  if (dot <= 0 || dot === part.text.length - 1) return [undefined, part];
  const { line, character } = part.range.start;
  const q = { kind: 'word' as const, text: part.text.slice(0, dot), range: { start: { line, character }, end: { line, character: character + dot } } };
  const n = {
    kind: 'word' as const,
    text: part.text.slice(dot + 1),
    range: { start: { line, character: character + dot + 1 }, end: part.range.end },
  };
  return [q, n];
}

export function positive(s: SettingNode, v: Valued<number> | undefined, problems: ProblemList): Valued<number> | undefined {
  if (v && v.value <= 0) {
    problems.add('value-out-of-range', `${s.key.text} must be greater than zero, got ${s.valueText.text}`, v.range ?? s.valueText.range);
    return undefined;
  }
  return v;
}

const SOURCE_FORMS = 'oven <temperature>, jet <speed> spread <percent>, or speed <speed>';

function readSource(s: SettingNode, problems: ProblemList): { source: Valued<BeamSource>; temperature?: Valued<number> } | undefined {
  const parts = allParts(s.groups);
  const bad = (msg: string): undefined => {
    problems.add('beam-source-malformed', msg, s.valueText.range, { data: { suggestions: ['oven 450 K', 'jet 1500 m/s spread 10 %', 'speed 800 m/s'] } });
    return undefined;
  };
  // A value out of range in a well-formed source: said at the value, with no template that would overwrite the user's numbers.
  const outOfRange = (msg: string, part: ValuePart): undefined => {
    problems.add('beam-source-malformed', msg, part.range);
    return undefined;
  };
  const kind = parts[0];
  if (!kind || kind.kind !== 'word') return bad(`source must be ${SOURCE_FORMS}`);
  let read: Valued<number> | undefined;
  const q = (i: number, d: Dimension, what: string): number | undefined => {
    const p = parts[i];
    if (!p) {
      bad(`source '${kind.text}' needs ${what}`);
      return undefined;
    }
    read = readPartQuantity(p, d, problems, 'source');
    return read?.value;
  };
  const done = (value: BeamSource) => ({ source: { value, source: 'this file', range: s.valueText.range } });
  switch (kind.text) {
    case 'oven': {
      const t = q(1, 'temperature', 'a temperature, e.g. oven 450 K');
      if (t === undefined) return undefined;
      if (t <= 0) return outOfRange(`an oven temperature must be above absolute zero, got ${parts[1]!.text}`, parts[1]!);
      return { ...done({ kind: 'oven', temperatureK: t }), ...(read ? { temperature: read } : {}) };
    }
    case 'jet': {
      const v = q(1, 'speed', 'a mean speed, e.g. jet 1500 m/s spread 10 %');
      if (v === undefined) return undefined;
      if (v <= 0) return outOfRange(`a jet speed must be positive, got ${parts[1]!.text}`, parts[1]!);
      if (parts[2]?.text !== 'spread') return bad('a jet needs its speed spread: jet <speed> spread <percent>');
      const spread = q(3, 'dimensionless', 'a relative spread, e.g. spread 10 %');
      if (spread === undefined) return undefined;
      if (spread <= 0 || spread >= 1) return outOfRange(`a jet's relative speed spread must be between 0 and 100 %, got ${parts[3]!.text}`, parts[3]!);
      return done({ kind: 'jet', speedMPerS: v, spreadFraction: spread });
    }
    case 'speed': {
      const v = q(1, 'speed', 'a speed, e.g. speed 800 m/s');
      if (v === undefined) return undefined;
      if (v <= 0) return outOfRange(`a beam speed must be positive, got ${parts[1]!.text}`, parts[1]!);
      return done({ kind: 'speed', speedMPerS: v });
    }
    default:
      return bad(`unknown source '${kind.text}'; write ${SOURCE_FORMS}`);
  }
}

function readSlits(s: SettingNode, problems: ProblemList): { slits: NonNullable<BeamModel['slits']>; parts: NonNullable<BeamModel['slitParts']> } | undefined {
  const [g1, g2] = s.groups;
  const form = 'slits = <width>, <width> apart <distance>, e.g. slits = 80 um, 50 um apart 40 cm';
  const bad = (): undefined => {
    problems.add('beam-slits-malformed', `write ${form}`, s.valueText.range);
    return undefined;
  };
  if (!g1 || !g2 || s.groups.length !== 2 || g1.length !== 1 || g2.length !== 3 || g2[1]!.text !== 'apart') return bad();
  const first = readPartQuantity(g1[0]!, 'length', problems, 'slits');
  const second = readPartQuantity(g2[0]!, 'length', problems, 'slits');
  const sep = readPartQuantity(g2[2]!, 'length', problems, 'slits');
  if (!first || !second || !sep) return undefined;
  for (const [v, part] of [[first, g1[0]!], [second, g2[0]!], [sep, g2[2]!]] as const) {
    if (v.value <= 0) {
      problems.add('value-out-of-range', `slit widths and their distance must be greater than zero, got ${part.text}`, part.range);
      return undefined;
    }
  }
  return {
    slits: { value: { firstM: first.value, secondM: second.value, separationM: sep.value }, source: 'this file', range: s.valueText.range },
    parts: { firstM: first, secondM: second, separationM: sep },
  };
}

/** `detector = <width>` or `detector = <width> at <offset from the axis>`. */
function readDetector(s: SettingNode, beam: BeamModel, problems: ProblemList): void {
  const parts = allParts(s.groups);
  if (s.groups.length !== 1 || (parts.length !== 1 && (parts.length !== 3 || parts[1]!.text !== 'at'))) {
    problems.add('beam-detector-malformed', 'write detector = <width>, or detector = <width> at <offset>, e.g. detector = 25 um at 1.2 mm', s.valueText.range);
    return;
  }
  const width = readPartQuantity(parts[0]!, 'length', problems, 'detector');
  if (width && width.value <= 0) {
    problems.add('value-out-of-range', `the detector width must be greater than zero, got ${parts[0]!.text}`, parts[0]!.range);
  } else if (width) beam.detectorM = width;
  if (parts.length === 3) {
    const offset = readPartQuantity(parts[2]!, 'length', problems, 'detector');
    if (offset) beam.detectorOffsetM = offset;
  }
}

/** What is wrong with one well-shaped entry, in words; undefined when nothing is (`twoM` null: not a half-integer). */
function populationMistake(twoF: number, twoM: number | null | undefined, weight: number): string | undefined {
  if (twoF < 0) return 'F cannot be negative';
  if (twoM === null) return 'm_F must be a whole or half-integer';
  const f = twoF % 2 === 0 ? String(twoF / 2) : `${twoF}/2`;
  if (twoM !== undefined && Math.abs(twoM) > twoF) return `m_F runs from -F to F, so from -${f} to ${f} for F = ${f}`;
  if (twoM !== undefined && (twoF - twoM) % 2 !== 0) return `m_F differs from F = ${f} by a whole number`;
  if (!(weight >= 0)) return `a weight cannot be negative, got ${weight}`;
  return undefined;
}

/**
 * The earlier entries that leave nothing to a new one (F, and m_F unless it is undefined): an
 * earlier entry for the whole F, the same F and m_F, or, for a whole F, entries for each of its
 * m_F. Empty when the new entry gives some sublevel its weight (`2 1 1, 2 0.5`: the rest of F = 2).
 */
function coveringEntries(earlier: NonNullable<BeamModel['populations']>, twoF: number, twoM: number | undefined): number[] {
  const whole = earlier.findIndex((p) => p.twoF === twoF && (p.twoM === undefined || p.twoM === twoM));
  if (whole >= 0) return [whole];
  if (twoM !== undefined) return [];
  const each: number[] = [];
  for (let m = -twoF; m <= twoF; m += 2) {
    const at = earlier.findIndex((p) => p.twoF === twoF && p.twoM === m);
    if (at < 0) return [];
    each.push(at);
  }
  return each;
}

/** `populations = F m weight, ...` or `F weight` for a whole F manifold. */
function readPopulations(s: SettingNode, problems: ProblemList): BeamModel['populations'] {
  const out: NonNullable<BeamModel['populations']> = [];
  const written: string[] = [];
  // Every wrong entry is said; one wrong entry leaves the beam without populations.
  let anyWrong = false;
  for (const g of s.groups) {
    if (g.some(isUnreadable)) {
      anyWrong = true;
      continue;
    }
    const range = g.length > 0 ? { start: g[0]!.range.start, end: g[g.length - 1]!.range.end } : s.valueText.range;
    const nums = g.map((p) => (p.kind === 'number' ? p.number.value : NaN));
    const twice = (x: number): number | undefined => (Number.isFinite(x) && Math.abs(2 * x - Math.round(2 * x)) < 1e-9 ? Math.round(2 * x) : undefined);
    const ok = (g.length === 2 || g.length === 3) && nums.every(Number.isFinite);
    const twoF = ok ? twice(nums[0]!) : undefined;
    const twoM = ok && g.length === 3 ? twice(nums[1]!) : undefined;
    const weight = nums[nums.length - 1]!;
    const word = g.find((p) => p.kind !== 'number');
    const wrong = word
      ? `'${(strayUnit(word) ?? word).text}' is not a number`
      : g.length !== 2 && g.length !== 3
        ? `an entry has 2 or 3 numbers, this one has ${g.length}`
        : twoF === undefined
          ? 'F must be a whole or half-integer'
          : populationMistake(twoF, g.length === 3 ? twoM ?? null : undefined, weight);
    if (!ok || twoF === undefined || wrong) {
      const shape = 'write populations = <F> <m_F> <weight>, … (or <F> <weight> for every m_F of F), e.g. populations = 2 +2 1, 2 +1 0.1';
      problems.add('beam-populations-malformed', wrong ? `${wrong}: ${shape}` : shape, range);
      anyWrong = true;
      continue;
    }
    const covering = coveringEntries(out, twoF, twoM);
    if (covering.length > 0) {
      // The beam takes the first entry that names a sublevel; one wholly covered by earlier entries would be dropped without a word.
      const named = twoM === undefined ? `F = ${halfText(twoF)}` : `F = ${halfText(twoF)}, m_F = ${halfText(twoM, true)}`;
      const from = covering.map((i) => `'${written[i]}'`).join(', ');
      const message =
        covering.length === 1
          ? `${named} already has its weight from the entry ${from}, which is the one used; this entry is not`
          : `every m_F of ${named} already has its weight from the entries ${from}, which are the ones used; this entry is not`;
      problems.add('beam-population-twice', message, range, {
        related: covering.map((i) => ({ message: covering.length === 1 ? 'the entry that is used' : 'an entry that is used', range: out[i]!.range })),
      });
      continue;
    }
    out.push({ twoF, ...(twoM !== undefined ? { twoM } : {}), weight, range });
    written.push(g.map((p) => p.text).join(' '));
  }
  if (anyWrong) return undefined;
  if (out.length > 0 && out.every((p) => p.weight === 0)) {
    problems.add('beam-populations-malformed', 'every listed population is 0, so no atoms reach the detector', s.valueText.range);
    return undefined;
  }
  return out.length > 0 ? out : undefined;
}
