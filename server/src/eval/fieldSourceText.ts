/**
 * A field source's result in words, line by line: what it is, its field and gradient at the
 * centre, its winding. The text report and the hover both print these lines, so a source
 * reads the same in the terminal and in the editor.
 */
import type { FieldSourceResult } from './fieldSourceResultTypes';
import { lengthUnitFor, type LengthUnit } from './lengthUnit';
import { GAUSS_TESLA_SWITCH_T, gradientText, lengthText, MISSING, trimNumber } from './quantityText';
import { inWrittenUnit, isGaussUnit } from './writtenUnit';
import { VACUUM_PERMEABILITY } from '../physics/constants';
import { windingNumbersText } from './windingText';

const AXES = ['x', 'y', 'z'] as const;

/**
 * One unit for all three components and |B|: the family the file writes fields in (gauss or
 * tesla), else the lab habit (gauss below 0.1 T), with the prefix that suits |B|.
 */
export function fieldVectorUnit(absT: number, written: string | undefined): { factor: number; symbol: string } {
  const gauss = written !== undefined ? isGaussUnit(written) : absT < GAUSS_TESLA_SWITCH_T;
  if (gauss) return absT !== 0 && absT < 1e-4 ? { factor: 1e-7, symbol: 'mG' } : { factor: 1e-4, symbol: 'G' };
  if (absT === 0 || absT >= 1) return { factor: 1, symbol: 'T' };
  return absT >= 1e-3 ? { factor: 1e-3, symbol: 'mT' } : { factor: 1e-6, symbol: 'µT' };
}

/** One component or |B| at a source's centre, in the unit fieldVectorUnit chose. */
function centreFieldNumber(t: number, u: { factor: number }): string {
  return trimNumber(t / u.factor, 5);
}

/** |B| at a source's centre as its report line prints it (the caution quotes the same text). */
export function centreFieldText(absT: number, written: string | undefined): string {
  const u = fieldVectorUnit(absT, written);
  return `${centreFieldNumber(absT, u)} ${u.symbol}`;
}

/** A gradient in T/m and in the lab's G/cm. */
export function gradientPair(tPerM: number): string {
  if (!Number.isFinite(tPerM)) return MISSING;
  if (tPerM === 0) return '0 T/m';
  return `${gradientText(tPerM, 5)} = ${trimNumber(tPerM * 100, 5)} G/cm`;
}

function vectorText(v: readonly number[], each: (x: number) => string, unit: string): string {
  return `(${v.map((x) => each(x)).join(', ')}) ${unit}`;
}

/** A point with one length unit for all three coordinates (lengthUnit.ts), `(0, 0, 1) cm`; a caller's unit when a phrase shares one. */
export function pointText(p: readonly number[], u: LengthUnit = lengthUnitFor(Math.max(0, ...p.map(Math.abs)))): string {
  return vectorText(p, (x) => trimNumber(x / u.metres, 5), u.symbol);
}

export function sourceHeadline(r: FieldSourceResult): string {
  const loops = r.parts.filter((p) => p.kind === 'loop').length;
  switch (r.kind) {
    case 'coil': {
      if (r.pair) {
        const ratio = r.pair.spacing_over_radius;
        const named = Math.abs(ratio - 1) < 0.005 ? (r.pair.sense === 'same' ? ' (Helmholtz spacing)' : ' (spacing = radius)') : r.pair.sense === 'opposite' && Math.abs(ratio - Math.sqrt(3)) < 0.005 ? ' (√3 R: the most uniform gradient)' : '';
        const sense = r.pair.sense === 'opposite' ? 'a pair wound in opposite senses (anti-Helmholtz type)' : 'a pair wound in the same sense';
        return `coil ${r.name}: ${sense}, spacing ${lengthText(r.pair.spacing_m)} = ${trimNumber(ratio, 4)} R${named}`;
      }
      return `coil ${r.name}: ${loops === 1 ? 'one loop' : `${loops} loops`}`;
    }
    case 'solenoid':
      return `solenoid ${r.name}`;
    case 'wire': {
      const n = r.parts.length;
      return `wire ${r.name}: ${n === 2 ? 'with a return wire (the two-wire field)' : 'one straight wire'}`;
    }
    case 'slab': {
      const s = r.parts[0];
      if (s?.kind !== 'slab') return `slab ${r.name}`;
      const m = Math.hypot(...s.magnetisation_T);
      return `slab ${r.name}: ${s.size_m.map((x) => trimNumber(x * 1e3, 4)).join(' × ')} mm, ${magnetisationText(m, r.magnetisation_unit)}`;
    }
  }
}

/**
 * A block's magnetisation as the file wrote it, in the report line and the permanent-magnet caution
 * alike: `1234.5 mT` reads `μ0·M = 1234.5 mT`, `9.5e5 A/m` reads `M = 950000 A/m`; without a
 * written unit, μ0·M in T to 4 digits.
 */
export function magnetisationText(magnitudeT: number, unit?: string): string {
  const asField = inWrittenUnit(magnitudeT, 'flux-density', unit);
  if (asField) return `μ0·M = ${asField}`;
  const asM = inWrittenUnit(magnitudeT / VACUUM_PERMEABILITY, 'magnetisation', unit);
  return asM ? `M = ${asM}` : `μ0·M = ${trimNumber(magnitudeT, 4)} T`;
}

/** The lines after the headline (no cautions: callers show those their own way). */
export function sourceLines(r: FieldSourceResult): string[] {
  const out: string[] = [];
  if (r.parts.length === 0) return ['not computed: the block has problems to fix (see diagnostics)'];
  if (r.centre_m && r.field_T && r.field_abs_T !== undefined) {
    const where = r.kind === 'wire' ? 'midway between the wires' : r.kind === 'slab' ? 'inside the block, at its centre' : 'at the centre';
    const u = fieldVectorUnit(r.field_abs_T, r.field_unit);
    const num = (t: number): string => centreFieldNumber(t, u);
    out.push(`${where} ${pointText(r.centre_m)}: |B| = ${num(r.field_abs_T)} ${u.symbol}, B = ${vectorText(r.field_T, num, u.symbol)}`);
  } else if (r.kind === 'wire') {
    out.push('a lone wire has no centre: B = μ0 I / 2π r at distance r (sublevel field gives it at any point)');
  }
  if (r.axial_gradient_T_per_m !== undefined && r.axial_gradient_T_per_m !== 0) {
    const axis = r.parts[0] && 'axis' in r.parts[0] ? axisName(r.parts[0].axis) : 'axis';
    out.push(`axial gradient ∂B_${axis}/∂${axis} = ${gradientPair(r.axial_gradient_T_per_m)}`);
  } else if (r.gradient_T_per_m) {
    const largest = largestEntry(r.gradient_T_per_m);
    if (largest) out.push(`largest gradient ∂B_${AXES[largest.i]}/∂${AXES[largest.j]} = ${gradientPair(largest.value)}`);
  }
  const w = r.winding;
  if (w) {
    const cooling = w.cooling === 'air' ? 'air cooling can do' : w.cooling === 'water' ? 'needs water cooling' : 'beyond continuous operation';
    const n = windingNumbersText({ currentDensityAPerM2: w.current_density_A_per_m2, powerW: w.power_W, voltageV: w.voltage_V, conductorM: w.conductor_m });
    out.push(
      `winding: ${lengthText(w.wire_length_m)} of ${n.conductor} copper, ${trimNumber(w.resistance_ohm, 4)} Ω at ${trimNumber(w.temperature_C, 3)} °C; ` +
        `${n.currentDensity}, ${n.power}, ${n.voltage} (${cooling})`,
    );
  }
  return out;
}

function axisName(a: readonly number[]): string {
  const k = a.findIndex((x) => Math.abs(Math.abs(x) - 1) < 1e-12);
  return k >= 0 ? AXES[k]! : 'axis';
}

function largestEntry(g: readonly (readonly number[])[]): { i: number; j: number; value: number } | undefined {
  let best: { i: number; j: number; value: number } | undefined;
  g.forEach((row, i) => row.forEach((value, j) => {
    if (Number.isFinite(value) && value !== 0 && (!best || Math.abs(value) > Math.abs(best.value))) best = { i, j, value };
  }));
  return best;
}

/** One short line for an inlay hint: the centre's defining number, and the winding's power. */
export function sourceSummary(r: FieldSourceResult): string | undefined {
  const parts: string[] = [];
  const gradientFirst = r.pair?.sense === 'opposite' || (r.field_abs_T === 0 && r.axial_gradient_T_per_m !== undefined);
  if (gradientFirst && r.axial_gradient_T_per_m !== undefined) {
    parts.push(`∂B/∂axis ${trimNumber(r.axial_gradient_T_per_m * 100, 4)} G/cm`);
  } else if (r.field_abs_T !== undefined) {
    const u = fieldVectorUnit(r.field_abs_T, r.field_unit);
    parts.push(`|B| ${trimNumber(r.field_abs_T / u.factor, 4)} ${u.symbol}${r.kind === 'wire' ? ' midway' : r.kind === 'slab' ? ' inside' : ' at centre'}`);
  }
  if (r.winding) parts.push(`${trimNumber(r.winding.power_W, 3)} W, ${trimNumber(r.winding.current_density_A_per_m2 / 1e6, 3)} A/mm²`);
  return parts.length > 0 ? parts.join(', ') : undefined;
}
