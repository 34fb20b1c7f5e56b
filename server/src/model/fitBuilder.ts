/**
 * Builds `fit` blocks: which data, which parameters are free, where they start, and the field
 * range of a one-point calibration. The one-line form `fit cal: clock -> field` names one data
 * block and one free parameter. Parameters the named data cannot determine are reported here.
 */
import type { BlockNode, SettingNode, Spanned } from '../format/ast';
import type { Dimension } from '../format/units';
import { FIT_PARAMETERS, PROFILE_PARAMETERS, SPECTRAL_PARAMETERS, type DataModel, type FitParameterName, type FitRequestModel } from './fitTypes';
import { didYouMeanText, suggestNames } from '../format/didYouMean';
import type { NameIndex } from './nameIndex';
import type { ProblemList } from './problems';
import { DEFAULT_RESONANCE_RANGE_T, readFieldRange } from './resonanceBuilder';
import { readPartQuantity } from './settingReaders';

const ALL = FIT_PARAMETERS;

/** What a starting value is measured in; populations and g_J are plain numbers. */
const START_DIMENSION: Record<FitParameterName, Dimension> = {
  field: 'flux-density',
  g_J: 'dimensionless',
  A: 'frequency-like',
  B: 'frequency-like',
  gradient: 'gradient',
  temperature: 'temperature',
  offset: 'length',
  width: 'length',
  populations: 'dimensionless',
  background: 'dimensionless',
  source_scale: 'dimensionless',
};

function isParameter(word: string): word is FitParameterName {
  return (ALL as readonly string[]).includes(word);
}

export function buildFit(node: BlockNode, data: NameIndex<DataModel>, problems: ProblemList): FitRequestModel | undefined {
  if (!node.name) {
    problems.add('name-missing', 'a fit needs a name, as in `fit calibration`', node.keyword.range);
    return undefined;
  }
  const f: FitRequestModel = { name: node.name.text, node, nameRange: node.name.range, data: [], free: [], starts: [], rangeT: { ...DEFAULT_RESONANCE_RANGE_T } };
  // A name that does not resolve has its own problem; "names no data" would then be untrue.
  const named = { data: false, free: false };
  const addData = (ref: Spanned): void => {
    named.data = true;
    const d = data.resolve(ref, problems);
    if (d && !f.data.includes(d)) f.data.push(d);
  };
  const addFree = (ref: Spanned): void => {
    named.free = true;
    if (!isParameter(ref.text)) {
      reportParameter(ref, problems);
      return;
    }
    const earlier = f.free.find((x) => x.name === ref.text);
    if (earlier) {
      problems.add('fit-parameter-twice', `${ref.text} is already free; a parameter is freed once`, ref.range, { related: [{ message: `${ref.text} is freed here`, range: earlier.range }] });
      return;
    }
    f.free.push({ name: ref.text, range: ref.range });
  };
  if (node.link?.from) addData(node.link.from.name);
  if (node.link?.to) addFree(node.link.to.name);
  for (const s of node.settings) {
    const words = s.groups.map((g) => g[0]).filter((p) => p !== undefined);
    switch (s.key.text) {
      case 'data':
        for (const p of words) addData(p);
        break;
      case 'free':
        for (const p of words) addFree(p);
        break;
      case 'start':
        readStarts(s, f, problems);
        break;
      case 'range': {
        const range = readFieldRange(s, problems);
        if (range) f.rangeT = range;
        break;
      }
      default:
        break;
    }
  }
  if (!named.data) problems.add('fit-incomplete', `fit '${f.name}' names no data: data = <data block>[, …]`, f.nameRange);
  if (!named.free) problems.add('fit-incomplete', `fit '${f.name}' frees no parameter: free = field, g_J, A, …`, f.nameRange);
  checkApplicable(f, problems);
  return f;
}

function reportParameter(ref: Spanned, problems: ProblemList): void {
  const suggestions = suggestNames(ref.text, [...ALL]);
  problems.add('fit-parameter-unknown', `'${ref.text}' is not a fit parameter${didYouMeanText(suggestions)} (they are ${ALL.join(', ')})`, ref.range, { data: { suggestions } });
}

/** A parameter the named data cannot see: spectral data see field, g_J, A, B; profiles the beam's. */
function checkApplicable(f: FitRequestModel, problems: ProblemList): void {
  const kinds = new Set(f.data.map((d) => (d.kind === 'profile' ? 'profile' : 'spectral')));
  if (kinds.size > 1) {
    problems.add('fit-parameter-not-applicable', `fit '${f.name}' mixes detector profiles with resonance or interval data; fit them separately`, f.nameRange);
    return;
  }
  const allowed: readonly string[] = kinds.has('profile') ? PROFILE_PARAMETERS : SPECTRAL_PARAMETERS;
  for (const p of f.free) {
    if (kinds.size > 0 && !allowed.includes(p.name)) {
      const what = kinds.has('profile') ? 'a detector profile' : 'resonance and interval data';
      problems.add('fit-parameter-not-applicable', `${p.name} cannot be fitted to ${what}; it takes ${allowed.join(', ')}`, p.range, { data: { suggestions: [...allowed] } });
    }
  }
}

/** `start = field 3 G, A 3417 MHz` */
function readStarts(s: SettingNode, f: FitRequestModel, problems: ProblemList): void {
  for (const group of s.groups) {
    const [name, value] = group;
    if (!name || name.kind !== 'word' || !value || group.length !== 2) {
      const range = group[0] ? { start: group[0].range.start, end: group[group.length - 1]!.range.end } : s.valueText.range;
      problems.add('fit-start-malformed', 'write start = <parameter> <value>, …, e.g. start = field 3 G, A 3417 MHz', range);
      continue;
    }
    if (!isParameter(name.text)) {
      reportParameter(name, problems);
      continue;
    }
    if (START_DIMENSION[name.text] === 'dimensionless' && value.kind === 'quantity' && value.unit.text !== '%') {
      // Else "fraction needs a plain number or %", which names no setting the user wrote; `5 %` is 0.05.
      problems.add('fit-start-malformed', `the start of ${name.text} is a plain number or %, got ${value.text}`, value.range);
      continue;
    }
    const v = readPartQuantity(value, START_DIMENSION[name.text], problems, name.text);
    if (v) f.starts.push({ name: name.text, value: v.value, ...(v.unit ? { unit: v.unit } : {}), range: value.range });
  }
}
