// Numeric helpers for a calibration run: velocity from positions, order statistics, and a series
// thinned for plotting.

/**
 * Half the span, in ms, over which velocity is derived from counts when the run has no velocity
 * column. At 1 ms sampling a single step is quantised to 1,000 counts/s; over 20 ms one count is
 * 50 counts/s, about 1 % of a door's running speed, while a 250 ms ramp is still resolved.
 */
export const DERIVE_HALF_SPAN_MS = 10;

/** Velocity (counts/s) at each sample: the central difference over ±`halfSpanMs`, or over the neighbours where samples are sparser. */
export function deriveVelocities(tMs: readonly number[], counts: readonly number[], halfSpanMs = DERIVE_HALF_SPAN_MS): number[] {
  const n = tMs.length;
  const out = new Array<number>(n).fill(0);
  let lo = 0;
  let hi = 0;
  for (let i = 0; i < n; i++) {
    const t = tMs[i]!;
    while (tMs[lo]! < t - halfSpanMs) lo++;
    if (hi < i) hi = i;
    while (hi + 1 < n && tMs[hi + 1]! <= t + halfSpanMs) hi++;
    let a = lo;
    let b = hi;
    if (a === b) {
      a = Math.max(0, i - 1);
      b = Math.min(n - 1, i + 1);
    }
    if (a === b) continue;
    out[i] = ((counts[b]! - counts[a]!) / (tMs[b]! - tMs[a]!)) * 1000;
  }
  return out;
}

/** The q-quantile of ascending values (nearest rank), or null for none. */
export function quantile(sorted: readonly number[], q: number): number | null {
  if (sorted.length === 0) return null;
  const rank = Math.min(sorted.length - 1, Math.max(0, Math.ceil(q * sorted.length) - 1));
  return sorted[rank]!;
}

/** The median (mean of the middle two for an even count), or null for none. */
export function median(values: readonly number[]): number | null {
  if (values.length === 0) return null;
  const s = [...values].sort((a, b) => a - b);
  const mid = s.length >> 1;
  return s.length % 2 ? s[mid]! : (s[mid - 1]! + s[mid]!) / 2;
}

export type SeriesPoint = { tMs: number; counts: number; velocityCps: number };

/**
 * At most `maxPoints` points for a plot: the run is cut into maxPoints / 2 equal slices of samples,
 * and each slice keeps its slowest and fastest sample in time order, so a dip in velocity (a stall,
 * a glitch) survives thinning where plain striding could skip it.
 */
export function thinSeries(points: readonly SeriesPoint[], maxPoints: number): SeriesPoint[] {
  if (points.length <= maxPoints) return [...points];
  const slices = Math.max(1, Math.floor(maxPoints / 2));
  const out: SeriesPoint[] = [];
  for (let s = 0; s < slices; s++) {
    const from = Math.floor((s * points.length) / slices);
    const to = Math.floor(((s + 1) * points.length) / slices);
    let min = from;
    let max = from;
    for (let i = from; i < to; i++) {
      if (points[i]!.velocityCps < points[min]!.velocityCps) min = i;
      if (points[i]!.velocityCps > points[max]!.velocityCps) max = i;
    }
    const [a, b] = min <= max ? [min, max] : [max, min];
    out.push(points[a]!);
    if (b !== a) out.push(points[b]!);
  }
  return out;
}
