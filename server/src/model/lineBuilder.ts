/** Builds `line` blocks: two levels of one species joined by an electric-dipole line. */
import type { BlockNode, Range } from '../format/ast';
import { resolveLevel, type NameIndex } from './nameIndex';
import type { ProblemList } from './problems';
import { readSpectrumRequest } from './spectrumRequestBuilder';
import type { LevelModel, LineModel, NameUse, SpeciesModel } from './types';

export function buildLine(node: BlockNode, species: NameIndex<SpeciesModel>, uses: NameUse[], problems: ProblemList): LineModel | undefined {
  if (!node.name) {
    problems.add('name-missing', 'a line needs a name, as in `line D2: ground -> upper`', node.keyword.range);
    return undefined;
  }
  const line: LineModel = { name: node.name.text, node, nameRange: node.name.range };
  const link = node.link;
  if (!link?.from || !link.to) {
    problems.add('line-incomplete', `line '${line.name}' needs two levels, as in \`line ${line.name}: ground -> upper\``, node.headerRange);
  }
  const lower = link?.from ? resolveLevel(link.from, species, undefined, uses, problems) : undefined;
  const upper = link?.to ? resolveLevel(link.to, species, lower?.species, uses, problems) : undefined;
  if (lower) line.lower = lower;
  if (upper) line.upper = upper;
  const spectrum = readSpectrumRequest(line, node.settings, problems);
  if (spectrum) line.spectrum = spectrum;
  for (const [level, ref] of [[lower, link?.from], [upper, link?.to]] as const) {
    // A term known only by its J-level energies has no nucleus in the engine, unlike the other end.
    const noNucleus = level?.kind === 'term' && !!level.levelEnergies && !level.levelA && !level.levelB && level.species.twoI.value > 0;
    if (noNucleus && ref) {
      problems.add(
        'line-to-whole-term',
        `line '${line.name}': the whole term '${level.name}' is given by its J-level energies without hyperfine constants, so it has no nucleus to share with the line's other end; give its A_J (e.g. \`A_J = 1/2 <A>, ${level.term ? termJ(level.term.twoS, level.term.L) : '3/2'} <A>\`), or zeta instead of E_J`,
        ref.range,
      );
    }
  }
  if (lower && upper) {
    if (lower.species !== upper.species) {
      problems.add('line-across-species', `line '${line.name}' joins ${lower.species.name} and ${upper.species.name}; a line joins two levels of one species`, node.headerRange);
    } else if (lower === upper) {
      problems.add('line-same-level', `line '${line.name}' goes from level '${lower.name}' to itself`, link!.to!.range);
    } else {
      orderByEnergy(line, lower, upper, problems);
    }
  }
  return line;
}

/**
 * Either order is a normal way to write a line: written upper level first, it is an emission
 * line, computed with the levels the right way round (the file keeps its order).
 */
function orderByEnergy(line: LineModel, first: LevelModel, second: LevelModel, problems: ProblemList): void {
  const e1 = first.energyHz?.value;
  const e2 = second.energyHz?.value;
  if (e1 === undefined || e2 === undefined) return;
  if (e1 === e2) {
    problems.add(
      'line-levels-same-energy',
      `line '${line.name}': levels '${first.name}' and '${second.name}' are given the same energy, so the line has no centre frequency; only the Zeeman offsets are computed`,
      line.node.headerRange,
    );
  } else if (e2 < e1) {
    line.lower = second;
    line.upper = first;
    line.emission = true;
    problems.add(
      'line-written-as-emission',
      `line '${line.name}' is written from the upper level '${first.name}' to the lower level '${second.name}' (emission); it is computed as the same line with '${second.name}' as its lower level, at a positive frequency`,
      lineLevelsRange(line.node),
    );
  }
}

/** `ground -> upper` of a line's header: what a finding about the pair of levels marks (the header when a side is missing). */
export function lineLevelsRange(node: BlockNode): Range {
  const { from, to } = node.link ?? {};
  return from && to ? { start: from.range.start, end: to.range.end } : node.headerRange;
}

/** The term's highest J, for the advice text. */
function termJ(twoS: number, L: number): string {
  const twoJ = 2 * L + twoS;
  return twoJ % 2 === 0 ? String(twoJ / 2) : `${twoJ}/2`;
}
