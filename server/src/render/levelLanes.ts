/**
 * What the level diagram's label lanes name, and the headers that say so. The left lane names each
 * state as it is at low field (|F, m_F⟩). The right lane names it by the uncoupled state it goes to
 * (|m_J, m_I⟩) when the range ends past the change of regime (x ≥ 1, where each state is mostly
 * that uncoupled state) or in the strong field; a range that ends before the change of regime (weak
 * or early intermediate field) keeps the low-field names, followed along each curve, since that is
 * how a reader names those states there.
 */
import { fieldOnAxisText, type DisplayUnit } from './units';
import type { LevelLanes } from './viewData';
import { trimNumber } from '../eval/quantityText';

/** True when the right lane gives the high-field names (also when the view said nothing: the older default). */
export function rightNamesHigh(lanes: LevelLanes | undefined): boolean {
  return lanes === undefined || lanes.ends === 'strong' || lanes.ends === 'uncoupling';
}

/** The header over a lane: its basis as a ket, and the field it belongs to. */
export function laneHeadText(lanes: LevelLanes, side: 'low' | 'high'): string {
  if (side === 'low') return `|${lanes.low}⟩ (low field)`;
  if (lanes.ends === 'strong') return `|${lanes.high}⟩ (strong field)`;
  if (lanes.ends === 'uncoupling') return `|${lanes.high}⟩ (mostly)`;
  return `|${lanes.low}⟩ (${lanes.ends === 'weak' ? 'low field' : 'from low field'})`;
}

/** The header's tooltip: why the lane names what it names. */
export function laneHeadWhy(lanes: LevelLanes, side: 'low' | 'high', unit: DisplayUnit): string {
  const limit = lanes.strongLimitT !== undefined && Number.isFinite(lanes.strongLimitT) && lanes.strongLimitT > 0 ? ` (from ${fieldOnAxisText(lanes.strongLimitT, unit)})` : '';
  if (side === 'low') return `Each state by its name at low field, in the coupled basis |${lanes.low}⟩.`;
  if (lanes.ends === 'strong') return `The range reaches the strong field${limit}: each state by the uncoupled state |${lanes.high}⟩ it goes to.`;
  if (lanes.ends === 'uncoupling') {
    const x = lanes.endX !== undefined ? ` (x = ${trimNumber(lanes.endX, 2)})` : '';
    return `The range ends past the change of regime${x}, short of the strong field${limit}: each state by the uncoupled state |${lanes.high}⟩ it mostly is and goes to.`;
  }
  if (lanes.ends === 'weak') return `The range ends in the low (linear) field: the states are still |${lanes.low}⟩.`;
  return `The range ends in the intermediate field, before the strong field${limit}: each state keeps its low-field name |${lanes.low}⟩, followed along its curve.`;
}
