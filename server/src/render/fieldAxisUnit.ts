/**
 * The one rule for the unit of a figure's field axis (levels, resonance sweeps, field maps, slowers,
 * fit residuals; no figure keeps a rule of its own). The axis keeps the family the file wrote (a
 * lab that writes gauss reads gauss; one that writes µT reads the tesla family) while its tick
 * labels stay short; a gauss axis past
 * 0.1 T (ticks of 1000 G and more, 200000 G at 20 T) reads in T instead, the switch of the shared
 * field formatter (eval/quantityText.ts GAUSS_TESLA_SWITCH_T). The echo of the user's own value (a marker's
 * label) keeps the written unit; only the axis changes.
 */
import { GAUSS_TESLA_SWITCH_T } from '../eval/quantityText';
import { isGaussUnit } from '../eval/writtenUnit';
import { displayUnit } from '../eval/unitSpelling';
import type { FieldUnit } from './fieldUnits';
import { fieldDisplayUnit } from './units';


/**
 * The axis unit for an axis reaching `upperT`: the written family while it reads short, else the
 * reports' rule (eval/quantityText.ts fieldText) — G from 1 G up to GAUSS_TESLA_SWITCH_T, T from
 * there. Below 1 G the reports write mG; an axis takes µT or nT instead (a magnetometer's units),
 * since mG ticks would be a unit of its own no other figure uses. An axis with no positive, finite
 * top (every point at zero field) reads T rather than a prefix picked from nothing.
 */
export function fieldAxisUnit(upperT: number, writtenUnit?: string): FieldUnit {
  if (!(upperT > 0) || !Number.isFinite(upperT)) return 'T';
  if (writtenUnit !== undefined && isGaussUnit(writtenUnit)) return upperT >= GAUSS_TESLA_SWITCH_T ? 'T' : 'G';
  if (writtenUnit !== undefined && /^[mµμun]?T$/.test(writtenUnit)) return writtenPrefixFits(upperT, writtenUnit) ?? teslaPrefixFor(upperT);
  if (upperT < 1e-4) return teslaPrefixFor(upperT);
  if (upperT < GAUSS_TESLA_SWITCH_T) return 'G';
  return 'T';
}

/** The written tesla unit itself when the axis top reads 0.1–1000 in it (0.5 mT stays mT, not 500 µT). */
function writtenPrefixFits(upperT: number, writtenUnit: string): FieldUnit | undefined {
  const unit = displayUnit(writtenUnit) as FieldUnit; // uT, μT → µT
  const top = upperT / fieldDisplayUnit(unit).factor;
  return top >= 0.1 && top <= 1000 ? unit : undefined;
}

/** The tesla prefix that puts `upperT` between 1 and 1000. */
function teslaPrefixFor(upperT: number): FieldUnit {
  if (upperT < 1e-6) return 'nT';
  if (upperT < 1e-3) return 'µT';
  if (upperT < 1) return 'mT';
  return 'T';
}
