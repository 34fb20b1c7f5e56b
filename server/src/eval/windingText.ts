/**
 * A winding's numbers in words, written once so the report line, its caution and the
 * coil-needs-cooling / coil-overheats findings print the same digits (`13.26 A/mm²`, `181 W`).
 */
import { lengthText, trimNumber } from './quantityText';

/** Significant digits of a winding's derived numbers everywhere they are printed. */
const WINDING_DIGITS = 4;

export interface WindingNumbersText {
  currentDensity: string;
  power: string;
  voltage: string;
  conductor: string;
}

export function windingNumbersText(w: { currentDensityAPerM2: number; powerW: number; voltageV: number; conductorM: number }): WindingNumbersText {
  return {
    currentDensity: `${trimNumber(w.currentDensityAPerM2 / 1e6, WINDING_DIGITS)} A/mm²`,
    power: `${trimNumber(w.powerW, WINDING_DIGITS)} W`,
    voltage: `${trimNumber(w.voltageV, WINDING_DIGITS)} V`,
    conductor: lengthText(w.conductorM),
  };
}
