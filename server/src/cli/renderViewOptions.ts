/**
 * Which `sublevel render` options act on which view. An option given to a view it does not act on
 * would be ignored without a word (a `--from` on the resonance view, a `--beam` on the levels view),
 * so it is a usage error that says what that view uses instead.
 */
import type { DiagramView } from '../views/diagram';
import { type ParsedArgs, UsageError } from './args';

const VIEWS_OF_OPTION: Readonly<Record<string, readonly DiagramView[]>> = {
  level: ['levels'],
  field: ['levels', 'lines'],
  beam: ['pattern'],
  line: ['lines'],
  resonance: ['resonance'],
  fit: ['residuals'],
  source: ['fieldmap'],
  scale: ['fieldmap'],
  slower: ['slower'],
  from: ['levels'],
  to: ['levels'],
  unit: ['levels', 'fieldmap'],
};

/** What the resonance view uses in place of the levels view's axis options. */
const RESONANCE_AXIS: Readonly<Record<string, string>> = {
  from: "the resonance view spans the resonance block's own `range` (e.g. `range = 0 G, 10 G`)",
  to: "the resonance view spans the resonance block's own `range` (e.g. `range = 0 G, 10 G`)",
  unit: "the resonance view takes the unit of the resonance block's `range`",
};

export function refuseOptionsOfOtherViews(view: DiagramView, args: ParsedArgs): void {
  for (const [option, views] of Object.entries(VIEWS_OF_OPTION)) {
    if (!args.options.has(option) || views.includes(view)) continue;
    const acts = `--${option} acts on the ${views.join(' and ')} view${views.length > 1 ? 's' : ''}`;
    const instead = view === 'resonance' && RESONANCE_AXIS[option] ? RESONANCE_AXIS[option] : `the ${view} view does not use it`;
    throw new UsageError(`${acts}; ${instead}`);
  }
}
