/**
 * What would resolve merged beam peaks, in one sentence shared by the diagnostic, the text
 * report, the hover and the JSON, so every place gives the same suggestions. Every change named
 * was computed on this setup (physics/beam/resolvingOptions.ts) and is shown with the dip it gives.
 */
import type { BeamGeometry, ResolvingOptions, SearchReach } from '../physics/beam';
import { gradientText, lengthText, percentText } from './quantityText';
import { lonePeak } from './lonePeak';
import type { BeamResult } from './resultTypes';

type Option = NonNullable<BeamResult['resolving_options']>[number];

/**
 * The sentence, or undefined when the peaks are resolved (or there is nothing to resolve) or the search did not run.
 * `reach`: how far gradient, magnet length and drift were searched, named when nothing helps.
 */
export function resolvingAdvice(r: BeamResult, geometry: BeamGeometry, reach: ResolvingOptions['reach']): string | undefined {
  if (!r.computed || r.all_resolved !== false || r.resolving_options === undefined || r.worst_dip_ratio === undefined) return undefined;
  // One merged peak: there is no dip yet, and each change is judged on the peaks it splits the beam into.
  const onePeak = lonePeak(r) === 'merged';
  const now = onePeak ? 'One peak with no dip' : `The worst dip is ${percentText(r.worst_dip_ratio, 2)}`;
  const deepens = onePeak ? 'splits it with a visible dip' : 'deepens it';
  if (r.resolving_options.length === 0 && r.deflection_model === 'field-map') {
    return `${now}; no narrower slits or detector and no narrower speed spread ${deepens}. The magnet is built from sources: change their currents or geometry (or the drift) and evaluate again.`;
  }
  if (r.resolving_options.length === 0) {
    return `${now}; ${grownReachText(reach)}, no narrower slits or detector and no narrower speed spread ${deepens}.`;
  }
  const dip = (o: Option): string => (onePeak ? `peaks with a worst dip of ${percentText(o.worst_dip_ratio, 2)}` : percentText(o.worst_dip_ratio, 2));
  const parts = r.resolving_options.map((o) => `${changeText(o, geometry)} ${o.change === 'slits' ? 'give' : 'gives'} ${dip(o)}${o.resolves_all ? (o.change === 'slits' ? ' and resolve every pair' : ' and resolves every pair') : ''}`);
  const lead = onePeak ? 'No dip now, one peak' : `Worst dip now ${percentText(r.worst_dip_ratio, 2)}`;
  return `${lead} (resolved at ≤ ${percentText(r.criterion_dip_ratio, 2)}); computed on this setup: ${parts.join('; ')}.`;
}

/**
 * How far gradient, magnet length and drift were searched: "100 times the present one" when that is
 * the reach of all three, else each with its limit and where the limit comes from.
 */
function grownReachText(reach: ResolvingOptions['reach']): string {
  const { gradient, magnetLength, drift } = reach;
  if ([gradient, magnetLength, drift].every((x) => x?.by === 'present')) return 'no gradient, magnet length or drift up to 100 times the present one';
  const by = (x: SearchReach, lab: string): string => (x.by === 'lab' ? `what a laboratory ${lab} gives` : x.by === 'magnet' ? '10 times the magnet length, the drift being 0' : '100 times the present one');
  const gradientPart = gradient ? `no gradient up to ${gradientText(gradient.limit, 3)} (${by(gradient, 'magnet')})` : undefined;
  const magnetPart = magnetLength ? `no magnet length up to ${lengthText(magnetLength.limit, 3)} (${by(magnetLength, 'magnet')})` : undefined;
  const driftPart = drift ? `no drift up to ${lengthText(drift.limit, 3)} (${by(drift, 'beam line')})` : undefined;
  return [gradientPart, magnetPart, driftPart].filter((x) => x !== undefined).join(', ');
}

function changeText(o: Option, g: BeamGeometry): string {
  switch (o.change) {
    case 'gradient':
      return `a gradient of ${gradientText(Math.abs(o.value), 3)}`;
    case 'magnet_length':
      return `a magnet of ${lengthText(o.value, 3)}`;
    case 'drift':
      return `a drift of ${lengthText(o.value, 3)}`;
    case 'slits': {
      const [a, b] = [lengthText(g.slit1M * o.value, 2), lengthText(g.slit2M * o.value, 2)];
      return a === b ? `slits of ${a}` : `slits of ${a} and ${b}`;
    }
    case 'detector':
      return `a detector of ${lengthText(g.detectorWidthM * o.value, 2)}`;
    case 'speed_spread':
      return `a velocity-selected source with an rms speed spread of ${percentText(o.value, 2)} of the mean`;
  }
}
