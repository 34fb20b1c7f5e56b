/**
 * Whether the level diagram breaks its energy axis, and into which bands. A manifold is the
 * group of sublevels that share F (or J, without a nucleus); over the plotted fields it fills
 * the energy interval [lo, hi], its spread. At small fields the manifolds sit far apart compared
 * with their spreads (F = 1 and 2 of a ground level 6.8 GHz apart, fanning out by 0.28 and 0.56 MHz
 * at 20 µT): on one axis every fan is a flat line. Each group of manifolds then gets its own
 * band with its own scale, so its fan fills the band.
 *
 * The rule: neighbouring manifolds (in energy) share a band when the gap between their
 * intervals is less than BAND_GAP_RATIO times the larger spread; manifolds that meet (a gap of
 * zero or less: their curves cross or touch) always share one, so no crossing falls between
 * bands. Shared bands are joined again until no neighbours meet the rule. Two or more bands
 * break the axis; one band is the plain single axis (strong fields, Paschen–Back, where the
 * fans span the gaps).
 */
/** What the rule reads of a curve: its manifold at low field ("F=2", "J=3/2, F=3", "J=3/2") and its energies. */
export interface BandCurve {
  manifold?: string;
  energyHz: ArrayLike<number>;
}

/**
 * A gap of more than 4× the larger spread breaks the axis (our own display rule): on one axis two
 * such manifolds would each take at most a sixth of the height, the fans squeezed into a few pixels
 * at the gaps of a magnetometer's fields (10⁴× the spread and more).
 */
export const BAND_GAP_RATIO = 4;
/** At most this many bands; more are joined, closest (gap ÷ spread) first, so each stays tall enough to read. */
export const MAX_BANDS = 8;

export interface LevelBand {
  /** Indices into the curves, in their order. */
  curves: number[];
  /** The manifolds in the band, from low to high energy ("F=1"). */
  names: string[];
  /** Lowest and highest energy of its curves over the plotted samples, Hz. */
  lo: number;
  hi: number;
}

const spread = (b: LevelBand): number => b.hi - b.lo;

function joined(a: LevelBand, b: LevelBand): LevelBand {
  return { curves: [...a.curves, ...b.curves].sort((p, q) => p - q), names: [...a.names, ...b.names], lo: Math.min(a.lo, b.lo), hi: Math.max(a.hi, b.hi) };
}

/** The gap between neighbours in units of the larger spread; ≤ 0 when they meet. */
function gapRatio(a: LevelBand, b: LevelBand): number {
  const gap = b.lo - a.hi;
  if (gap <= 0) return 0;
  const s = Math.max(spread(a), spread(b));
  return s > 0 ? gap / s : Number.POSITIVE_INFINITY;
}

/** The manifolds of the curves with their energy intervals over the first `samples` samples; undefined when a curve has no manifold or no finite energy. */
function manifolds(curves: readonly BandCurve[], samples: number): LevelBand[] | undefined {
  const byName = new Map<string, LevelBand>();
  for (let i = 0; i < curves.length; i++) {
    const c = curves[i]!;
    if (c.manifold === undefined) return undefined;
    let band = byName.get(c.manifold);
    if (!band) byName.set(c.manifold, (band = { curves: [], names: [c.manifold], lo: Infinity, hi: -Infinity }));
    band.curves.push(i);
    const n = Math.min(samples, c.energyHz.length);
    for (let k = 0; k < n; k++) {
      const e = c.energyHz[k]!;
      if (!Number.isFinite(e)) continue;
      if (e < band.lo) band.lo = e;
      if (e > band.hi) band.hi = e;
    }
  }
  const all = [...byName.values()];
  return all.every((b) => b.lo <= b.hi) ? all : undefined;
}

/**
 * The bands from low to high energy: two or more when the axis breaks, else one (or none, when the
 * curves carry no manifold names or no spread: nothing to magnify). The level view works them out
 * once and its data carries them; the renderer only draws them.
 */
export function levelBands(curves: readonly BandCurve[], samples: number): LevelBand[] {
  const found = manifolds(curves, samples);
  if (!found || found.length === 0) return [];
  if (!found.some((b) => spread(b) > 0)) return [];
  let bands = found.sort((a, b) => a.lo - b.lo || a.hi - b.hi);
  for (let i = 0; i + 1 < bands.length; ) {
    if (gapRatio(bands[i]!, bands[i + 1]!) < BAND_GAP_RATIO) {
      bands = [...bands.slice(0, i), joined(bands[i]!, bands[i + 1]!), ...bands.slice(i + 2)];
      i = Math.max(0, i - 1); // the grown band may now meet the one below it
    } else i++;
  }
  while (bands.length > MAX_BANDS) {
    let k = 0;
    for (let i = 1; i + 1 < bands.length; i++) if (gapRatio(bands[i]!, bands[i + 1]!) < gapRatio(bands[k]!, bands[k + 1]!)) k = i;
    bands = [...bands.slice(0, k), joined(bands[k]!, bands[k + 1]!), ...bands.slice(k + 2)];
  }
  return bands;
}

/** A band's name for its axis header: its manifolds, low to high ("F=1 + F=2"). */
export function bandName(b: LevelBand): string {
  return b.names.join(' + ');
}
