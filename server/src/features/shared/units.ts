/**
 * Which units a value can be shown or rewritten in, per dimension, and which dimension a
 * setting expects. Unit texts here are ones the format reads (ASCII), with a display form.
 */
import type { BlockKind } from '../../format/ast';
import { convertSI, type Dimension } from '../../format/units';
import { trimNumber } from '../../eval/quantityText';
import { displayUnit, inWrittenUnit } from '../../eval/writtenUnit';

export { displayUnit };

/**
 * Unit families per dimension, largest unit first. A hover shows one value per family in the
 * unit that puts the number between 1 and 1000.
 */
const FAMILIES: Readonly<Record<Dimension, readonly (readonly string[])[]>> = {
  'flux-density': [['T', 'mT', 'uT', 'nT'], ['kG', 'G', 'mG', 'uG']],
  gradient: [['T/m', 'mT/m'], ['G/cm', 'mG/cm']],
  length: [['m'], ['km', 'm', 'cm', 'mm', 'um', 'nm']],
  temperature: [['K'], ['degC']],
  speed: [['m/s'], ['km/s']],
  'frequency-like': [['THz', 'GHz', 'MHz', 'kHz', 'Hz'], ['cm^-1'], ['eV', 'meV', 'ueV', 'neV']],
  mass: [['u'], ['kg']],
  moment: [['muN'], ['muB'], ['J/T']],
  dimensionless: [['%']],
  time: [['s', 'ms', 'us', 'ns']],
  area: [['a0^2'], ['nm^2', 'pm^2']],
  current: [['kA', 'A', 'mA']],
  magnetisation: [['kA/m', 'A/m']],
};

/** Units offered by the "convert to" refactoring, per dimension. */
const CONVERT_TARGETS: Readonly<Record<Dimension, readonly string[]>> = {
  'flux-density': ['T', 'mT', 'uT', 'G', 'mG'],
  gradient: ['T/m', 'G/cm'],
  length: ['m', 'cm', 'mm', 'um'],
  temperature: ['K', 'degC'],
  speed: ['m/s', 'km/s'],
  'frequency-like': ['Hz', 'kHz', 'MHz', 'GHz', 'cm^-1', 'eV', 'ueV'],
  mass: ['u', 'kg'],
  moment: ['muN', 'J/T'],
  dimensionless: ['%'],
  time: ['s', 'ms', 'us'],
  area: ['a0^2', 'nm^2', 'm^2'],
  current: ['A', 'mA', 'kA'],
  magnetisation: ['A/m', 'kA/m'],
};

/** Order matters: the first dimension that accepts a unit wins. */
const ALL_DIMENSIONS: readonly Dimension[] = [
  'flux-density', 'gradient', 'length', 'temperature', 'speed', 'frequency-like', 'mass', 'moment', 'time', 'area', 'current', 'magnetisation', 'dimensionless',
];

export function convertTargets(d: Dimension): readonly string[] {
  return CONVERT_TARGETS[d];
}

/** The dimension a unit measures, or undefined for units that fit none of ours (e.g. `N`). */
export function dimensionOfUnit(unit: string): Dimension | undefined {
  if (unit === '%') return 'dimensionless';
  return ALL_DIMENSIONS.find((d) => d !== 'dimensionless' && convertSI(1, d, unit) !== undefined);
}

/** Where a value sits: block kind, key, and the words before it in the value (for `source`). */
export interface ValueContext {
  blockKind: BlockKind;
  key: string;
  inLevel: boolean;
  /** The word that introduces the number, e.g. `oven` in `source = oven 720 K`. */
  previousWord?: string;
}

/** The dimension a setting's quantity must have, or undefined for plain numbers and words. */
export function expectedDimension(c: ValueContext): Dimension | undefined {
  if (c.inLevel) return ['A', 'B', 'C', 'energy', 'zeta', 'A_J', 'B_J', 'E_J', 'linewidth'].includes(c.key) ? 'frequency-like' : c.key === 'lifetime' ? 'time' : c.key === 'r2' ? 'area' : undefined;
  switch (c.blockKind) {
    case 'species':
      return c.key === 'mass' ? 'mass' : c.key === 'mu_I' ? 'moment' : undefined;
    case 'field':
      return 'flux-density';
    case 'magnet':
      return c.key === 'field' ? 'flux-density' : c.key === 'gradient' ? 'gradient' : c.key === 'length' ? 'length' : undefined;
    case 'line':
      return c.key === 'doppler' ? 'temperature' : c.key === 'instrument' || c.key === 'span' ? 'frequency-like' : undefined;
    case 'resonance':
      return c.key === 'frequency' ? 'frequency-like' : c.key === 'range' ? 'flux-density' : undefined;
    case 'beam':
      if (['drift', 'detector', 'slits'].includes(c.key)) return 'length';
      if (c.key === 'source') {
        if (c.previousWord === 'oven') return 'temperature';
        if (c.previousWord === 'jet' || c.previousWord === 'speed') return 'speed';
        if (c.previousWord === 'spread') return 'dimensionless';
      }
      return undefined;
    case 'coil':
    case 'solenoid':
      return c.key === 'current' ? 'current' : c.key === 'turns' || c.key === 'axis' || c.key === 'sense' ? undefined : 'length';
    case 'wire':
      return c.key === 'current' ? 'current' : c.key === 'direction' ? undefined : 'length';
    case 'slab':
      return c.key === 'magnetisation' ? (c.previousWord === undefined ? 'flux-density' : undefined) : 'length';
    default:
      return undefined;
  }
}

/** `0.45 T` style text in the family unit that reads best. */
function bestInFamily(si: number, d: Dimension, family: readonly string[]): string | undefined {
  let chosen: { unit: string; value: number } | undefined;
  for (const unit of family) {
    const value = convertSI(si, d, unit);
    if (value === undefined || !Number.isFinite(value)) continue;
    chosen = { unit, value };
    if (Math.abs(value) >= 1 || si === 0) break;
  }
  return chosen ? `${trimNumber(chosen.value, 7)} ${displayUnit(chosen.unit)}` : undefined;
}

/**
 * The SI value written once per unit family, e.g. ['0.45 T', '4.5 kG']; with `written` (the unit
 * the file used) that form comes first and its family's other form is left out.
 */
export function valueInUnits(si: number, d: Dimension, written?: string): string[] {
  const echoed = inWrittenUnit(si, d, written);
  const others: string[] = [];
  const writtenFamily = written === undefined ? undefined : FAMILIES[d].find((f) => f.includes(written));
  for (const family of FAMILIES[d]) {
    if (echoed && family === writtenFamily) continue;
    const text = bestInFamily(si, d, family);
    if (text && text !== echoed && !others.includes(text)) others.push(text);
  }
  // A form nobody reads at a glance (0.000025 m for 25 µm) is left out when a readable one exists;
  // the user's own text stays, but after the readable form.
  const readable = others.filter((t) => !hardToRead(t));
  const shown = readable.length > 0 || (echoed !== undefined && !hardToRead(echoed)) ? readable : others;
  if (!echoed) return shown;
  return hardToRead(echoed) && readable.length > 0 ? [...shown, echoed] : [echoed, ...shown];
}

/** A plain number below 0.001 or from a million up: `0.000025 m`, `2500000 Hz`. */
function hardToRead(text: string): boolean {
  const n = Number(text.split(' ')[0]!.replace('−', '-'));
  return Number.isFinite(n) && n !== 0 && (Math.abs(n) < 1e-3 || Math.abs(n) >= 1e6);
}
