/**
 * A magnet built from field sources (`sources = …`, `at = x, y, z`): the sources are resolved by
 * name, and the magnet's field and gradient become |B| and ∂|B|/∂z where the beam line passes,
 * so everything that reads a magnet's field and gradient keeps working (docs/beam.md §7).
 */
import type { BlockNode } from '../format/ast';
import { magnitudeAndGradient } from '../physics/beam/trajectory';
import { conductorOf, sumField } from '../physics/fields';
import type { Vec3 } from '../physics/fields/types';
import type { NameIndex } from './nameIndex';
import type { ProblemList } from './problems';
import { readSourceList } from './sourceListReader';
import type { FieldSourceModel, MagnetModel } from './types';
import { readVector } from './vectorReader';

export function readMagnetSources(node: BlockNode, magnet: MagnetModel, index: { sources: NameIndex<FieldSourceModel> }, problems: ProblemList): void {
  const setting = node.settings.find((s) => s.key.text === 'sources');
  const atSetting = node.settings.find((s) => s.key.text === 'at');
  if (!setting) {
    if (atSetting) problems.add('magnet-at-without-sources', `\`at\` places the beam line in the field of sources; magnet '${magnet.name}' has no \`sources\``, atSetting.key.range);
    return;
  }
  const list = readSourceList(setting, index.sources, problems);
  if (!list) return;
  magnet.sources = list;
  if (atSetting) {
    const at = readVector(atSetting, 'length', problems);
    if (at) magnet.atM = at;
  }
  for (const key of ['field', 'gradient'] as const) {
    const s = node.settings.find((x) => x.key.text === key);
    if (s) {
      problems.add('magnet-sources-and-numbers', `magnet '${magnet.name}' takes its ${key} from its sources; remove \`${key}\` (or remove \`sources\` to use the numbers)`, s.key.range, {
        related: [{ message: 'the sources are named here', range: setting.valueText.range }],
      });
    }
  }
  // The written numbers do not count once sources are given.
  delete magnet.fieldT;
  delete magnet.gradientTPerM;
  const parts = list.flatMap((s) => s.parts);
  if (parts.length === 0) return; // each source has said why it is unusable
  const centre: Vec3 = magnet.atM?.value ?? [0, 0, 0];
  const sample = sumField(parts)(centre);
  if (sample.leftOut) {
    const on = sample.leftOut[0]!;
    const owner = list.flatMap((s) => s.parts.map(() => s.name))[on.partIndex ?? 0];
    problems.add('magnet-at-on-source', `the beam line of magnet '${magnet.name}' passes through ${conductorOf(on)} of source '${owner}' at its centre, where the field is not defined; move \`at\``, atSetting?.valueText.range ?? setting.valueText.range);
    return;
  }
  const m = new Float64Array(4);
  magnitudeAndGradient(sample, m);
  const from = `sources ${list.map((s) => s.name).join(', ')}`;
  magnet.fieldT = { value: m[0], source: from, range: setting.valueText.range };
  magnet.gradientTPerM = { value: m[3], source: from, range: setting.valueText.range };
}
