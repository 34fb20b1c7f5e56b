/**
 * Turns the `data-*` values the renderer puts on diagram elements into the lines of the
 * hover read-out. Pure (works on `dataset`-style records), so it is testable without a DOM.
 */

export type DataRecord = Record<string, string | undefined>;

export interface Readout {
  heading: string;
  lines: string[];
}

const PREFIXES: readonly [number, string][] = [
  [1e12, 'T'], [1e9, 'G'], [1e6, 'M'], [1e3, 'k'], [1, ''], [1e-3, 'm'], [1e-6, 'µ'], [1e-9, 'n'], [1e-12, 'p'],
];

/** 6.834683e9, 'Hz' → "6.83468 GHz" (engineering prefix, `digits` significant figures, true minus sign). */
export function formatEngineering(v: number, unit: string, digits = 6): string {
  if (!Number.isFinite(v)) return `— ${unit}`;
  if (v === 0) return `0 ${unit}`;
  const a = Math.abs(v);
  const [factor, prefix] = PREFIXES.find(([f]) => a >= f * 0.99999) ?? PREFIXES[PREFIXES.length - 1];
  const shown = Number((v / factor).toPrecision(digits)).toString().replace('-', '−');
  return `${shown} ${prefix}${unit}`;
}

const SUPERSCRIPT: Record<string, string> = { '-': '⁻', '+': '', 0: '⁰', 1: '¹', 2: '²', 3: '³', 4: '⁴', 5: '⁵', 6: '⁶', 7: '⁷', 8: '⁸', 9: '⁹' };

/** 9.2740e-24, 'J/T' → "9.274×10⁻²⁴ J/T": for quantities with no customary SI prefix. */
export function formatScientific(v: number, unit: string, digits = 4): string {
  if (!Number.isFinite(v)) return `— ${unit}`;
  const [mantissa, exponent] = v.toExponential(digits - 1).split('e');
  const m = Number(mantissa).toString().replace('-', '−');
  if (Number(exponent) === 0) return `${m} ${unit}`;
  return `${m}×10${Array.from(exponent).map((c) => SUPERSCRIPT[c] ?? c).join('')} ${unit}`;
}

function num(s: string | undefined): number {
  return s === undefined || s === '' ? NaN : Number(s);
}

function signed(text: string, v: number): string {
  return v > 0 ? `+${text}` : text;
}

const TREND: Record<string, string> = {
  rising: 'seeks low field (E rises with B)',
  falling: 'seeks high field (E falls with B)',
  flat: 'field-insensitive here',
};

export function readoutFor(data: DataRecord): Readout {
  const lines: string[] = [];
  if (data.low !== undefined && data.high !== undefined && data.low !== data.high) {
    lines.push(`low field: ${data.low}`, `high field: ${data.high}`);
  }
  const field = num(data.fieldT);
  const energy = num(data.energyHz);
  if (Number.isFinite(energy)) {
    lines.push(Number.isFinite(field) ? `E/h = ${formatEngineering(energy, 'Hz')} at B = ${formatEngineering(field, 'T', 4)}` : `E/h = ${formatEngineering(energy, 'Hz')}`);
  } else if (Number.isFinite(field)) {
    lines.push(`B = ${formatEngineering(field, 'T', 4)}`);
  }
  const mub = num(data.momentMub);
  const mjt = num(data.momentJt);
  if (Number.isFinite(mub)) {
    lines.push(`μ = ${mub.toFixed(4).replace('-', '−')} μB (${formatScientific(mjt, 'J/T')})`);
  } else if (Number.isFinite(mjt)) {
    lines.push(`μ = ${formatScientific(mjt, 'J/T')}`);
  }
  if (data.trend && TREND[data.trend]) lines.push(TREND[data.trend]);
  const offset = num(data.offsetHz);
  if (Number.isFinite(offset)) lines.push(`Δf = ${signed(formatEngineering(offset, 'Hz'), offset)}`);
  if (data.polarization) lines.push(`polarisation ${data.polarization}`);
  const strength = num(data.strength);
  if (Number.isFinite(strength)) lines.push(`strength ${Number(strength.toPrecision(4))}`);
  const position = num(data.positionM);
  if (Number.isFinite(position)) lines.push(`z = ${formatEngineering(position, 'm', 4)}`);
  const height = num(data.height);
  if (Number.isFinite(height)) lines.push(`height ${Number(height.toPrecision(4))}`);
  if (data.members) lines.push(`states: ${data.members}`);
  if (data.resolved !== undefined) lines.push(data.resolved === 'true' ? 'peaks resolved' : 'peaks not resolved');
  return { heading: data.label ?? '', lines };
}

/** The axis value under the pointer, from the root's `data-x-*` description of the horizontal scale. */
export function pointerValue(root: DataRecord, userX: number): string | undefined {
  const domain = (root.xDomain ?? '').split(',').map(Number);
  const range = (root.xRange ?? '').split(',').map(Number);
  const factor = num(root.xFactor);
  if (domain.length !== 2 || range.length !== 2 || ![...domain, ...range, factor].every(Number.isFinite)) return undefined;
  const [r0, r1] = range;
  if (r1 === r0 || userX < Math.min(r0, r1) || userX > Math.max(r0, r1)) return undefined;
  const t = (userX - r0) / (r1 - r0);
  // A logarithmic axis (data-x-scale="log", the residuals figure over decades of field) maps position to the logarithm.
  const log = root.xScale === 'log' && domain[0] > 0 && domain[1] > 0;
  const v = log ? domain[0] * (domain[1] / domain[0]) ** t : domain[0] + t * (domain[1] - domain[0]);
  const shown = Number((v / factor).toPrecision(4)).toString().replace('-', '−');
  return `${root.xName ?? 'x'} = ${shown} ${root.xUnit ?? ''}`.trim();
}

/**
 * The description of the horizontal scale under the pointer: a broken axis (the spectrum's
 * segments, each `data-x-*` of its own) describes each segment; else the root's.
 */
export function scaleAt(root: DataRecord, segments: readonly DataRecord[], userX: number): DataRecord {
  for (const seg of segments) {
    const [r0, r1] = (seg.xRange ?? '').split(',').map(Number);
    if (Number.isFinite(r0) && Number.isFinite(r1) && userX >= Math.min(r0!, r1!) && userX <= Math.max(r0!, r1!)) return { ...root, ...seg };
  }
  return root;
}
