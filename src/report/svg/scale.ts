/**
 * Scales and ticks: map data values to pixels. Linear and base-10 logarithmic. Tick steps are
 * 1, 2 or 5 times a power of ten (common practice in chart axes).
 */

/** A mapping from a data interval to a pixel interval. */
export interface Scale {
  /** Pixel position of a data value. */
  (value: number): number;
  /** Data interval [lo, hi], lo < hi. */
  readonly domain: [number, number];
  /** Pixel interval [start, end]. */
  readonly range: [number, number];
  /** Tick values inside the domain. */
  readonly ticks: number[];
  readonly log: boolean;
}

/**
 * The smallest and largest finite values, or null when there are none.
 * @param values numbers; null and non-finite entries are ignored
 */
export function extent(...values: Iterable<number | null>[]): [number, number] | null {
  let lo = Infinity;
  let hi = -Infinity;
  for (const list of values) {
    for (const v of list) {
      if (v === null || !Number.isFinite(v)) continue;
      if (v < lo) lo = v;
      if (v > hi) hi = v;
    }
  }
  return lo <= hi ? [lo, hi] : null;
}

/** Widens [lo, hi] by `fraction` of its width on each side; a single value becomes value ± max(1, |value| / 10). */
export function pad([lo, hi]: [number, number], fraction = 0.05): [number, number] {
  if (!(hi > lo)) {
    const d = Math.max(1, Math.abs(lo) / 10);
    return [lo - d, hi + d];
  }
  const d = (hi - lo) * fraction;
  return [lo - d, hi + d];
}

/** About `count` round tick values covering [lo, hi] (steps 1, 2 or 5 x 10^k). */
export function niceTicks(lo: number, hi: number, count = 5): number[] {
  if (!(hi > lo) || !Number.isFinite(lo) || !Number.isFinite(hi)) return [lo];
  const raw = (hi - lo) / Math.max(1, count);
  const power = 10 ** Math.floor(Math.log10(raw));
  const f = raw / power;
  const step = (f < 1.5 ? 1 : f < 3 ? 2 : f < 7 ? 5 : 10) * power;
  const first = Math.ceil(lo / step - 1e-9);
  const last = Math.floor(hi / step + 1e-9);
  // Far from zero relative to the step (|first| beyond 2^52), the tick index no longer moves by
  // one per step in double precision: fall back to the two ends rather than loop.
  if (!Number.isFinite(step) || step <= 0 || !(Math.abs(first) < 2 ** 52 && Math.abs(last) < 2 ** 52) || last - first > 100)
    return [lo, hi];
  const ticks: number[] = [];
  for (let t = first; t <= last; t++) {
    const v = t * step;
    ticks.push(Math.abs(v) < step * 1e-9 ? 0 : Number(v.toPrecision(12)));
  }
  return ticks;
}

/**
 * A linear scale.
 * @param domain data interval (widened when empty)
 * @param range pixel interval; may run backwards (y axes)
 */
export function linearScale(domain: [number, number], range: [number, number], tickCount = 5): Scale {
  const [lo, hi] = domain[1] > domain[0] ? domain : pad(domain);
  const k = (range[1] - range[0]) / (hi - lo);
  const f = ((v: number) => range[0] + (v - lo) * k) as Scale;
  return Object.assign(f, { domain: [lo, hi] as [number, number], range, ticks: niceTicks(lo, hi, tickCount), log: false });
}

/**
 * A base-10 logarithmic scale over [lo, hi] (both > 0), ticks at powers of ten (every
 * second or further power when the domain spans more than seven decades).
 * @param domain positive data interval
 * @param range pixel interval
 */
export function logScale(domain: [number, number], range: [number, number]): Scale {
  // Clamp to finite positive numbers: a padded domain can reach Infinity near 1e308, and the
  // tick loop below must stay bounded.
  const lo = Math.min(Math.max(domain[0], Number.MIN_VALUE), Number.MAX_VALUE / 10);
  const hi = Math.min(domain[1] > lo ? domain[1] : lo * 10, Number.MAX_VALUE);
  const a = Math.log10(lo);
  const b = Math.log10(hi);
  const k = (range[1] - range[0]) / (b - a);
  const f = ((v: number) => range[0] + (Math.log10(Math.max(v, Number.MIN_VALUE)) - a) * k) as Scale;
  const ticks: number[] = [];
  const first = Math.ceil(a - 1e-9);
  const last = Math.floor(b + 1e-9);
  const step = Math.max(1, Math.ceil((last - first) / 7));
  for (let e = first; e <= last; e += step) ticks.push(10 ** e);
  return Object.assign(f, { domain: [lo, hi] as [number, number], range, ticks, log: true });
}
