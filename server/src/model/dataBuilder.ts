/**
 * Builds `data` blocks: the kind of measurement, the level and pair (resonance, interval) or the
 * beam (profile), and the points, written inline (`point = …`, one per line) or read from a CSV
 * file beside the setup through the caller's reader. Every point that cannot be used is reported
 * where it is written (a line of the CSV file is reported on the `file` setting with its number).
 */
import type { BlockNode, Range, SettingNode, ValuePart } from '../format/ast';
import { convertSI } from '../format/units';
import { physicalField, MAX_FIELD_T } from './fieldRange';
import { MAX_LENGTH_M } from './lengthRange';
import { MAX_USED_FILE_BYTES } from './limits';
import { resolveLocation } from './locations';
import { readCsvPoints } from './csvPoints';
import { refuseDataFile } from './dataFileConfinement';
import type { DataKind, DataModel } from './fitTypes';
import type { NameIndex } from './nameIndex';
import type { ProblemList } from './problems';
import { readLevelSetting, readSublevelName } from './resonanceBuilder';
import { readPartQuantity, readSettingWord, singlePart } from './settingReaders';
import type { SetupSources } from './sources';
import type { BeamModel, NameUse, SpeciesModel } from './types';
import { allParts } from '../format/values';

export const DATA_KINDS = ['resonance', 'interval', 'profile'] as const;

interface Context {
  species: NameIndex<SpeciesModel>;
  beams: NameIndex<BeamModel>;
  sources: SetupSources;
}

export function buildData(node: BlockNode, ctx: Context, uses: NameUse[], problems: ProblemList): DataModel | undefined {
  if (!node.name) {
    problems.add('name-missing', 'a data block needs a name, as in `data clock`', node.keyword.range);
    return undefined;
  }
  const kindSetting = node.settings.find((s) => s.key.text === 'kind');
  const kind: DataKind | undefined = kindSetting ? readSettingWord(kindSetting, DATA_KINDS, problems) : 'resonance';
  const d: DataModel = { name: node.name.text, node, nameRange: node.name.range, kind: kind ?? 'resonance', spectral: [], profile: [], units: {} };
  if (!kind) return d;
  const points: SettingNode[] = [];
  for (const s of node.settings) {
    switch (s.key.text) {
      case 'level': {
        const lv = readLevelSetting(s, ctx.species, uses, problems);
        if (lv) d.level = lv;
        break;
      }
      case 'lower':
      case 'upper': {
        const n = readSublevelName(s, problems);
        if (n) d[s.key.text] = n;
        break;
      }
      case 'beam': {
        const part = singlePart(s, problems, 'beam name');
        const b = part ? ctx.beams.resolve(part, problems) : undefined;
        if (b) d.beam = b;
        break;
      }
      case 'point':
        points.push(s);
        break;
      case 'file':
        readFileSetting(s, d, ctx.sources, problems);
        break;
      default:
        break;
    }
  }
  for (const s of points) (kind === 'profile' ? readProfilePoint : readSpectralPoint)(s, d, problems);
  checkComplete(d, problems);
  return d;
}

function checkComplete(d: DataModel, problems: ProblemList): void {
  const at = d.nameRange;
  if (d.kind === 'profile') {
    if (!d.beam) problems.add('data-incomplete', `data '${d.name}' is a detector profile: name the beam that predicts it, beam = <name>`, at);
    if (d.profile.length === 0 && !d.file) problems.add('data-incomplete', `data '${d.name}' has no usable points: write point = <position> <counts> [<error>] lines or file = "<name>.csv"`, at);
    return;
  }
  if (!d.level) problems.add('data-incomplete', `data '${d.name}' needs the level its ${d.kind}s belong to: level = <name>`, at);
  if (!d.lower || !d.upper) problems.add('data-incomplete', `data '${d.name}' needs the pair of sublevels measured: lower = <F> <m_F> and upper = <F> <m_F>`, at);
  if (d.spectral.length === 0 && !d.file) problems.add('data-incomplete', `data '${d.name}' has no usable points: write point = <frequency> [at <field>] lines or file = "<name>.csv"`, at);
}

/** `point = 6834.678(5) MHz` or `point = 6834.712 MHz at 0.5 mT`. */
function readSpectralPoint(s: SettingNode, d: DataModel, problems: ProblemList): void {
  const parts = allParts(s.groups);
  const how = 'write point = <frequency>[(uncertainty)] [at <field>], e.g. point = 6834.6786(5) MHz at 0.3 mT';
  const atIndex = parts.findIndex((p) => p.kind === 'word' && p.text === 'at');
  const head = atIndex >= 0 ? parts.slice(0, atIndex) : parts;
  const tail = atIndex >= 0 ? parts.slice(atIndex + 1) : [];
  if (head.length !== 1 || (atIndex >= 0 && tail.length !== 1) || s.groups.length > 1) {
    problems.add('data-point-malformed', how, s.valueText.range.start === s.valueText.range.end ? s.range : s.valueText.range);
    return;
  }
  const f = readPartQuantity(head[0]!, 'frequency-like', problems, 'point');
  if (!f) return;
  if (!(f.value > 0)) {
    problems.add('data-point-malformed', `a measured frequency must be positive, got ${head[0]!.text}`, head[0]!.range);
    return;
  }
  const field = tail[0] ? physicalField(readPartQuantity(tail[0], 'flux-density', problems, 'point'), tail[0].text, tail[0].range, problems) : undefined;
  if (tail[0] && !field) return;
  if (field && field.value < 0) {
    problems.add('data-point-malformed', `a field is not negative here; got ${tail[0]!.text}`, tail[0]!.range);
    return;
  }
  if (f.unit && !d.units.frequency) d.units.frequency = f.unit;
  if (field?.unit && !d.units.field) d.units.field = field.unit;
  d.spectral.push({
    frequencyHz: f.value,
    ...(f.uncertainty !== undefined && f.uncertainty > 0 ? { uncertaintyHz: f.uncertainty } : {}),
    ...(field ? { fieldT: field.value } : {}),
    ...(f.unit ? { unit: f.unit } : {}),
    range: s.range,
  });
}

function plainNumber(p: ValuePart | undefined): number | undefined {
  return p && p.kind === 'number' ? p.number.value : undefined;
}

const PROFILE_POINT_SHAPE = 'write point = <position> <counts> [<error>], e.g. point = -120 um 14 4';

/**
 * A profile point whose position is not first (`14 -120 um`: the columns swapped) or that has
 * no counts (`-120 um`): said as such, not as a missing unit on the counts with fixes that add one.
 * A quantity that is not a length (`14 5 MHz`, `3 G`) is no position, so it gets the shape alone.
 */
function misplacedPosition(parts: readonly ValuePart[]): string | undefined {
  const at = parts.findIndex((p) => p.kind === 'quantity');
  const quantity = parts[at];
  if (!quantity || quantity.kind !== 'quantity') return undefined;
  const alone = parts.length === 1 && at === 0;
  const swapped = at > 0 && parts.length <= 3 && parts.every((p, i) => i === at || p.kind === 'number');
  if (!alone && !swapped) return undefined;
  if (convertSI(1, 'length', quantity.unit.text) === undefined) return PROFILE_POINT_SHAPE;
  if (alone) return `this point gives a position but no counts: write point = ${quantity.text} <counts> [<error>]`;
  return `the position goes first, then the counts: write point = ${quantity.text} ${parts.filter((_, i) => i !== at).map((p) => p.text).join(' ')}`;
}

/** `point = -120 um 14` or `point = -120 um 14 4` (position, counts, optional error). */
function readProfilePoint(s: SettingNode, d: DataModel, problems: ProblemList): void {
  const parts = allParts(s.groups);
  const misplaced = misplacedPosition(parts);
  if (misplaced && s.groups.length === 1) {
    problems.add('data-point-malformed', misplaced, s.valueText.range);
    return;
  }
  if (parts.length < 2 || parts.length > 3 || s.groups.length > 1) {
    problems.add('data-point-malformed', PROFILE_POINT_SHAPE, s.valueText.range.start === s.valueText.range.end ? s.range : s.valueText.range);
    return;
  }
  const x = readPartQuantity(parts[0]!, 'length', problems, 'point');
  if (!x) return;
  const counts = plainNumber(parts[1]);
  const error = parts[2] ? plainNumber(parts[2]) : undefined;
  if (counts === undefined || !(counts >= 0)) {
    problems.add('data-counts-invalid', `counts must be a number ≥ 0, got ${parts[1]!.text}`, parts[1]!.range);
    return;
  }
  if (parts[2] && (error === undefined || !(error > 0))) {
    problems.add('data-counts-invalid', `an error must be a number > 0, got ${parts[2].text}`, parts[2].range);
    return;
  }
  if (x.unit && !d.units.position) d.units.position = x.unit;
  d.profile.push({ positionM: x.value, counts, ...(error !== undefined ? { error } : {}), range: s.range });
}

/** `file = "scan.csv"`: read through the caller's reader, inside the roots only. */
function readFileSetting(s: SettingNode, d: DataModel, sources: SetupSources, problems: ProblemList): void {
  const part = singlePart(s, problems, 'a CSV file in double quotes');
  if (!part) return;
  const written = part.text.replace(/^"|"$/g, '');
  const range: Range = part.range;
  d.file = { written, range };
  if (!sources.readFile) {
    problems.add('data-file-missing', `cannot read ${written}: this text is not read from a file, so it cannot read data files`, range);
    return;
  }
  const location = resolveLocation(sources.uri, written);
  if (location === undefined) {
    problems.add('data-file-missing', `cannot read ${written}: this document has no folder to start from (save it as a file first)`, range);
    return;
  }
  d.file.location = location;
  const refusal = refuseDataFile(location, written, sources);
  if (refusal) {
    problems.add('data-file-refused', refusal, range);
    return;
  }
  const text = sources.readFile(location);
  if (text === undefined) {
    problems.add('data-file-missing', `cannot read ${written}: no such file beside this setup`, range);
    return;
  }
  if (typeof text === 'object' || text.length > MAX_USED_FILE_BYTES) {
    problems.add('data-file-missing', `${written} is not read: it is larger than the ${MAX_USED_FILE_BYTES} characters a data file may have`, range);
    return;
  }
  const reading = readCsvPoints(text, d.kind);
  const lineRange = (line: number): Range => ({ start: { line: Math.max(0, line - 1), character: 0 }, end: { line: Math.max(0, line - 1), character: 0 } });
  for (const p of reading.problems.slice(0, 20)) {
    problems.add('data-file-malformed', `${written}${p.line > 0 ? ` line ${p.line}` : ''}: ${p.message}`, range, {
      related: [{ message: p.message, range: lineRange(p.line), uri: location }],
      data: { line: p.line },
    });
  }
  if (reading.problems.length > 20) problems.add('data-file-malformed', `${written}: ${reading.problems.length - 20} more lines cannot be read`, range);
  const u = reading.units;
  if (u.frequency) d.units.frequency ??= u.frequency;
  if (u.field) d.units.field ??= u.field;
  if (u.position) d.units.position ??= u.position;
  for (const row of reading.rows) {
    const v = row.values;
    if (d.kind === 'profile') {
      const counts = v.counts!;
      if (!(counts >= 0) || (v.error !== undefined && !(v.error > 0))) {
        problems.add('data-counts-invalid', `${written} line ${row.line}: counts must be ≥ 0 and errors > 0`, range, { related: [{ message: 'this line', range: lineRange(row.line), uri: location }] });
        continue;
      }
      if (!(Math.abs(v.position!) <= MAX_LENGTH_M)) {
        // The code a written point gets (lengthRange.ts); the row is named and linked.
        problems.add('value-beyond-apparatus', `${written} line ${row.line}: positions must be within 1 km of the beam axis`, range, { related: [{ message: 'this line', range: lineRange(row.line), uri: location }] });
        continue;
      }
      d.profile.push({ positionM: v.position!, counts, ...(v.error !== undefined ? { error: v.error } : {}), range, csvLine: row.line });
    } else {
      if (v.field !== undefined && !(Math.abs(v.field) <= MAX_FIELD_T)) {
        // The code a written point gets (fieldRange.ts); the row is named and linked.
        problems.add('field-beyond-physical', `${written} line ${row.line}: fields must be at most 1e5 T (near the atomic unit, 2.35e5 T, the atom's own binding is no longer the larger term)`, range, {
          related: [{ message: 'this line', range: lineRange(row.line), uri: location }],
        });
        continue;
      }
      if (!(v.frequency! > 0) || (v.field !== undefined && !(v.field >= 0)) || (v.uncertainty !== undefined && !(v.uncertainty > 0))) {
        problems.add('data-point-malformed', `${written} line ${row.line}: frequencies and uncertainties must be positive and fields not negative`, range, {
          related: [{ message: 'this line', range: lineRange(row.line), uri: location }],
        });
        continue;
      }
      d.spectral.push({
        frequencyHz: v.frequency!,
        ...(v.uncertainty !== undefined ? { uncertaintyHz: v.uncertainty } : {}),
        ...(v.field !== undefined ? { fieldT: v.field } : {}),
        range,
        csvLine: row.line,
      });
    }
  }
}
